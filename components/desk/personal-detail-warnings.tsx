"use client";

import type { PersonalDetailWarning } from "@/lib/questions/desk-types";

const FIELD_LABELS: Record<PersonalDetailWarning["field"], string> = { answer: "Answer", publicQuestion: "Public question" };

export function mergeWarnings(...lists: PersonalDetailWarning[][]): PersonalDetailWarning[] {
  const seen = new Set<string>();
  const out: PersonalDetailWarning[] = [];
  for (const w of lists.flat()) {
    const key = `${w.field}:${w.kind}:${w.match.toLowerCase()}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(w);
  }
  return out;
}

/** Warnings, not a lock: staff decide, since a district phone number in an answer is fine. */
export function PersonalDetailWarnings({ warnings, id }: { warnings: PersonalDetailWarning[]; id: string }) {
  if (warnings.length === 0) {
    return (
      <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-3" data-testid="personal-details">
        <h3 id={`${id}-title`} className="text-base">
          Personal details
        </h3>
        <p className="text-sm">
          <span aria-hidden="true">✓ </span>No e-mail address, phone number, child&apos;s name or health detail found.
        </p>
      </section>
    );
  }
  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-ember bg-ember-soft p-3" data-testid="personal-details">
      <h3 id={`${id}-title`} className="text-base text-ember-deep">
        <span aria-hidden="true">! </span>
        {warnings.length === 1 ? "1 possible personal detail" : `${warnings.length} possible personal details`}
      </h3>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
        {warnings.map((w) => (
          <li key={`${w.field}:${w.kind}:${w.match}`}>
            <strong>{FIELD_LABELS[w.field]}:</strong> {w.message}
          </li>
        ))}
      </ul>
    </section>
  );
}
