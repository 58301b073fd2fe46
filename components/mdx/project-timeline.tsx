import { db } from "@/db/client";
import type { ProjectStatus } from "@/db/types";
import { listProjects, PROJECT_STATUS_LABELS } from "@/lib/projects/repository";

const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" });

const STATUS_STYLE: Record<ProjectStatus, { mark: string; box: string; when: string }> = {
  finished: { mark: "✓", box: "border-leaf bg-leaf-soft text-ink", when: "Finished" },
  under_way: { mark: "◐", box: "border-harbour bg-harbour-soft text-ink", when: "Expected to finish" },
  planned: { mark: "○", box: "border-ink-soft bg-white text-ink", when: "Expected to start" },
};

/** Building work from the database, so facilities can update a status without touching the page's words. */
export async function ProjectTimeline({ school }: { school?: string }) {
  const projects = school ? await listProjects(db(), school) : [];
  if (projects.length === 0) return <p className="my-6">No building projects are listed for this school yet.</p>;
  return (
    <ol className="my-6 space-y-3 border-l-4 border-harbour-line pl-5" aria-label="Building projects and their status">
      {projects.map((p) => {
        const style = STATUS_STYLE[p.status];
        return (
          <li key={p.id} className="relative" data-testid={`project-${p.key}`}>
            <span aria-hidden="true" className="absolute top-1 -left-[2.1rem] flex h-7 w-7 items-center justify-center rounded-full border-2 border-harbour bg-paper font-bold">
              {style.mark}
            </span>
            <p className="font-bold text-harbour-deep">{p.title}</p>
            <p>
              <span className={`mr-2 inline-block rounded-plate border-2 px-2 text-sm font-bold ${style.box}`}>
                {PROJECT_STATUS_LABELS[p.status]}
              </span>
              <span className="text-sm">
                {style.when}: <time dateTime={p.status_date}>{dateFormat.format(new Date(`${p.status_date}T00:00:00Z`))}</time>
              </span>
            </p>
            <p className="mt-1">{p.summary}</p>
          </li>
        );
      })}
    </ol>
  );
}
