import Link from "next/link";
import { formatDay } from "@/lib/answers/format";
import type { AnswerHit, SectionHit } from "@/lib/answers/search";
import { Highlighted } from "./highlighted";

/** Published answers as the answers page lists them: the question as a link, where and when, then the opening words. */
export function AnswerResultList({ answers }: { answers: readonly AnswerHit[] }) {
  return (
    <ol className="space-y-4" data-testid="answer-results">
      {answers.map((a) => (
        <li key={a.id} className="rounded-plate border-2 border-paper-line bg-white p-4">
          <h3 className="text-lg leading-snug">
            <Link href={a.url} prefetch={false} className="font-bold">
              <Highlighted value={a.question} />
            </Link>
          </h3>
          <p className="mt-1 text-sm text-ink-soft">
            {a.schoolName} · {a.topicLabel} · <time dateTime={a.day}>{formatDay(a.day)}</time>
          </p>
          <p className="mt-2">
            <Highlighted value={a.excerpt} />
          </p>
        </li>
      ))}
    </ol>
  );
}

/** Parts of the school and district pages, each linking to its heading on the page. */
export function SectionResultList({ sections }: { sections: readonly SectionHit[] }) {
  return (
    <ol className="space-y-3" data-testid="section-results">
      {sections.map((s) => (
        <li key={s.url} className="rounded-plate border-2 border-harbour-line bg-paper-deep p-4">
          <h3 className="text-base leading-snug">
            <Link href={s.url} prefetch={false} className="font-bold">
              <Highlighted value={s.heading} />
            </Link>
          </h3>
          <p className="mt-1 text-sm text-ink-soft">
            On the page “{s.pageTitle}” · {s.schoolName}
          </p>
          {s.excerpt.text ? (
            <p className="mt-2 text-sm">
              <Highlighted value={s.excerpt} />
            </p>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
