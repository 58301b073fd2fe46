"use client";

import { useEffect, useRef, useState } from "react";
import type { AnswerSuggestion } from "@/lib/answers/repository";
import type { SuggestionIndex } from "@/lib/answers/suggest";
import { QUESTION_MIN_LENGTH } from "@/lib/validation/question-limits";

const DEBOUNCE_MS = 300;

async function loadIndex(): Promise<SuggestionIndex> {
  // The fuzzy matcher comes with the answers, not with the page.
  const [response, { createSuggestionIndex }] = await Promise.all([fetch("/api/answers/suggestions"), import("@/lib/answers/suggest")]);
  if (!response.ok) throw new Error(`suggestions answered ${response.status}`);
  const data = (await response.json()) as { answers?: AnswerSuggestion[] };
  return createSuggestionIndex(Array.isArray(data.answers) ? data.answers : []);
}

/**
 * Published answers that look like the question being typed, so a parent may find the answer
 * at once. Only a help: the form sends either way, and without JavaScript nothing shows here.
 */
export function AnswerSuggestions({ question, school }: { question: string; school: string }) {
  const [index, setIndex] = useState<SuggestionIndex | null>(null);
  const [matches, setMatches] = useState<AnswerSuggestion[]>([]);
  const loading = useRef(false);
  const wantsIndex = question.trim().length >= QUESTION_MIN_LENGTH;

  // Loaded on first need, so a parent who only reads the page downloads nothing extra.
  useEffect(() => {
    if (index || loading.current || !wantsIndex) return;
    loading.current = true;
    loadIndex()
      .then(setIndex)
      .catch(() => {
        // Suggestions are optional; the next keystroke tries again.
        loading.current = false;
      });
  }, [index, wantsIndex]);

  useEffect(() => {
    if (!index) return;
    const timer = setTimeout(() => setMatches(index.suggest(question, school)), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [index, question, school]);

  const count = matches.length;
  return (
    <div className="-mt-2 mb-5">
      <p aria-live="polite" className="sr-only">
        {count === 0
          ? ""
          : `${count === 1 ? "One published answer looks" : `${count} published answers look`} like your question. They are listed under the question box.`}
      </p>
      {count > 0 ? (
        <section aria-labelledby="ask-suggestions-title" className="rounded-plate border-2 border-harbour-line bg-harbour-soft p-4">
          <h2 id="ask-suggestions-title" className="text-lg">
            Already answered?
          </h2>
          <p className="mt-1">
            {count === 1
              ? "This published answer looks like your question. It opens in a new tab, so what you typed stays here. If it does not help, send your question below."
              : "These published answers look like your question. Each opens in a new tab, so what you typed stays here. If none of them helps, send your question below."}
          </p>
          <ul className="mt-3 space-y-3">
            {matches.map((m) => (
              <li key={m.id} className="rounded-plate border-2 border-paper-line bg-white p-3">
                <a href={m.url} target="_blank" rel="noopener" className="font-bold">
                  {m.question}
                  <span className="sr-only"> (opens in a new tab)</span>
                </a>
                <p className="text-sm text-ink-soft">
                  {m.schoolName} · {m.topicLabel}
                </p>
                <p className="mt-1 text-sm">{m.excerpt}</p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
