import { REVIEWER_LABELS, type Frontmatter } from "@/lib/content/frontmatter";

const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" });

export function LastReviewed({ updated, reviewedBy }: Pick<Frontmatter, "updated" | "reviewedBy">) {
  return (
    <p className="mt-2 text-sm text-ink-soft">
      Last reviewed <time dateTime={updated}>{dateFormat.format(new Date(`${updated}T00:00:00Z`))}</time> by{" "}
      {REVIEWER_LABELS[reviewedBy]}.
    </p>
  );
}
