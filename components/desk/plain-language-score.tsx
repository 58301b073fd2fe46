"use client";

import { useDeferredValue, useMemo } from "react";
import { markdownToPlainText } from "@/lib/markdown/parse";
import { fleschKincaidGradeOfText, hardestSentence, PLAIN_LANGUAGE_TARGET_GRADE } from "@/lib/readability";

const one = (n: number) => (Math.round(n * 10) / 10).toLocaleString("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/** The answer's Flesch–Kincaid grade against the district's plain-language target, and the sentence that hurts most. */
export function PlainLanguageScore({ markdown, id }: { markdown: string; id: string }) {
  const text = useDeferredValue(markdown);
  const score = useMemo(() => {
    const plain = markdownToPlainText(text);
    const grade = fleschKincaidGradeOfText(plain);
    return { grade, hardest: grade === null ? null : hardestSentence(plain) };
  }, [text]);

  if (score.grade === null) {
    return (
      <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-3">
        <h3 id={`${id}-title`} className="text-base">
          Plain language
        </h3>
        <p className="text-sm text-ink-soft">The reading grade appears once the answer has a sentence.</p>
      </section>
    );
  }
  const grade = Math.max(0, score.grade);
  const ok = grade <= PLAIN_LANGUAGE_TARGET_GRADE;
  const hardest = score.hardest;
  return (
    <section aria-labelledby={`${id}-title`} className={`rounded-plate border-2 p-3 ${ok ? "border-leaf bg-leaf-soft" : "border-ember bg-ember-soft"}`} data-testid="plain-language">
      <h3 id={`${id}-title`} className="text-base">
        Plain language
      </h3>
      <p>
        <span className="text-xl font-bold" data-testid="reading-grade">
          Grade {one(grade)}
        </span>{" "}
        <span>
          (target: grade {PLAIN_LANGUAGE_TARGET_GRADE} or lower) —{" "}
          <strong>
            <span aria-hidden="true">{ok ? "✓ " : "! "}</span>
            {ok ? "easy enough to read" : "harder than the target"}
          </strong>
        </span>
      </p>
      {hardest && hardest.grade > PLAIN_LANGUAGE_TARGET_GRADE ? (
        <div className="mt-2 text-sm">
          <p className="font-bold">The hardest sentence (grade {one(Math.max(0, hardest.grade))}, {hardest.words} words):</p>
          <blockquote className="mt-1 border-l-4 border-ink-soft pl-3">{hardest.sentence}</blockquote>
          <p className="mt-1 text-ink-soft">Shorter sentences and shorter words bring the grade down.</p>
        </div>
      ) : null}
      <p className="mt-2 text-sm text-ink-soft">Flesch–Kincaid reading grade, counted as you type. An estimate: read the answer aloud as well.</p>
    </section>
  );
}
