import type { QuestionEventView } from "@/lib/questions/desk-types";
import { STATE_LABELS } from "@/lib/questions/labels";
import { formatDateTime } from "./format";

/** Every event on the question, oldest first, as the server recorded it. */
export function HistoryList({ events, timeZone, id }: { events: QuestionEventView[]; timeZone: string; id: string }) {
  const sorted = [...events].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  return (
    <section aria-labelledby={id} className="mt-8" data-testid="history">
      <h2 id={id} className="text-xl">
        History
      </h2>
      {sorted.length === 0 ? (
        <p className="mt-2">Nothing has happened yet.</p>
      ) : (
        <ol className="mt-3 border-l-4 border-harbour-line">
          {sorted.map((e) => (
            <li key={e.id} className="relative mb-4 pl-4" data-kind={e.kind}>
              <p className="text-sm text-ink-soft">
                <time dateTime={e.createdAt}>{formatDateTime(e.createdAt, timeZone)}</time>
                {" · "}
                {e.actor?.name ?? "Clearhall"}
              </p>
              <p className="font-bold">{e.summary}</p>
              {e.fromState && e.toState && e.fromState !== e.toState ? (
                <p className="text-sm">
                  {STATE_LABELS[e.fromState] ?? e.fromState} <span aria-hidden="true">→</span>
                  <span className="sr-only">to</span> {STATE_LABELS[e.toState] ?? e.toState}
                </p>
              ) : null}
              {e.comment ? <blockquote className="mt-1 whitespace-pre-wrap border-l-4 border-ink-soft bg-white p-2">{e.comment}</blockquote> : null}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
