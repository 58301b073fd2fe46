import type { ReactNode } from "react";
import type { HighlightedText } from "@/lib/answers/search";

/**
 * A text with the searched words marked. <mark> is announced as highlighted by screen readers;
 * on screen the mark is deep harbour on harbour soft (over 12:1) with a rule beneath it, so it
 * never depends on colour alone.
 */
export function Highlighted({ value }: { value: HighlightedText }) {
  const parts: ReactNode[] = [];
  let at = 0;
  for (const [start, end] of value.marks) {
    if (start < at) continue;
    if (start > at) parts.push(value.text.slice(at, start));
    parts.push(
      <mark key={start} className="rounded-sm border-b-2 border-harbour-deep bg-harbour-soft px-0.5 text-harbour-deep">
        {value.text.slice(start, end)}
      </mark>,
    );
    at = end;
  }
  if (at < value.text.length) parts.push(value.text.slice(at));
  return <>{parts}</>;
}
