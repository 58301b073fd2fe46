import Link from "next/link";
import { SCHOOL_TOPICS } from "@/lib/content/topics";

export function SchoolTopicNav({ school, current }: { school: string; current?: string }) {
  return (
    <nav aria-label="This school's pages" className="mb-6 no-print">
      <ul className="flex flex-wrap gap-2">
        <li>
          <Link
            href={`/schools/${school}`}
            aria-current={current === undefined ? "page" : undefined}
            className={`inline-block rounded-plate border-2 border-harbour px-3 py-1 font-bold no-underline ${current === undefined ? "bg-harbour text-paper" : "bg-white text-harbour-deep"}`}
          >
            At a glance
          </Link>
        </li>
        {SCHOOL_TOPICS.map((t) => (
          <li key={t.slug}>
            <Link
              href={`/schools/${school}/${t.slug}`}
              aria-current={current === t.slug ? "page" : undefined}
              className={`inline-block rounded-plate border-2 border-harbour px-3 py-1 font-bold no-underline ${current === t.slug ? "bg-harbour text-paper" : "bg-white text-harbour-deep"}`}
            >
              {t.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
