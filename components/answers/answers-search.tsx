"use client";

import Link from "next/link";
import { useEffect, useMemo, useRef, useState, type FormEvent, type MouseEvent } from "react";
import { buttonClasses } from "@/components/ui/button";
import { resultSummary } from "@/lib/answers/format";
import { DISTRICT } from "@/lib/answers/constants";
import { answersHref } from "@/lib/answers/href";
import type { AnswersQuery } from "@/lib/answers/query";
import type { AnswerSearch, SearchIndexPayload, SearchResult } from "@/lib/answers/search";
import { AnswerResultList, SectionResultList } from "./result-lists";

export interface AnswersSearchProps {
  initialQuery: AnswersQuery;
  /** The server's results for the URL: what the page shows without JavaScript and until the index has loaded. */
  initialResult: SearchResult;
  initialLimit: number;
  pageSize: number;
  schools: [slug: string, name: string][];
  topics: [code: string, label: string][];
  /** The versioned address of the compact index. */
  indexUrl: string;
}

/** Screen readers hear the new count once typing pauses, not at every letter. */
const ANNOUNCE_AFTER_MS = 800;

const CONTROL = "mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink";

/**
 * The engine (Fuse.js and the ranking) and the index are fetched together once the page is
 * showing, so neither weighs on the first load; until they arrive the form goes to the server.
 */
async function loadIndex(url: string): Promise<AnswerSearch> {
  const [engine, response] = await Promise.all([import("@/lib/answers/search"), fetch(url)]);
  if (!response.ok) throw new Error(`the search index answered ${response.status}`);
  return engine.createAnswerSearch((await response.json()) as SearchIndexPayload);
}

/**
 * The answers page's search. Without JavaScript it is a plain GET form and the list the server
 * rendered. With JavaScript the same index is searched in the browser as the parent types, with
 * the same ranking, and the address bar follows (?q=&school=&topic=), so the list can be shared.
 */
export function AnswersSearch({ initialQuery, initialResult, initialLimit, pageSize, schools, topics, indexUrl }: AnswersSearchProps) {
  const [query, setQuery] = useState<AnswersQuery>(initialQuery);
  const [limit, setLimit] = useState(initialLimit);
  const [engine, setEngine] = useState<AnswerSearch | null>(null);
  const [wanted, setWanted] = useState(false);
  const [failed, setFailed] = useState(false);
  const [announcement, setAnnouncement] = useState("");
  const touched = useRef(false);

  // The engine and index are fetched when the parent turns to the search (focus, a tap or a
  // pointer on the form), not with the page: a family reading the list on a phone downloads and
  // runs none of it, and the first paint is not held up by building the engine.
  useEffect(() => {
    if (!wanted) return;
    let live = true;
    loadIndex(indexUrl)
      .then((e) => live && setEngine(e))
      // The form still works: it is sent to the server, which answers with the same results.
      .catch(() => live && setFailed(true));
    return () => {
      live = false;
    };
  }, [wanted, indexUrl]);
  const want = () => {
    if (!wanted) setWanted(true);
  };

  const result = useMemo(
    () => (engine ? engine.search(query, { answerLimit: limit }) : initialResult),
    [engine, query, limit, initialResult],
  );
  const stale = !engine && (query.q !== initialQuery.q || query.school !== initialQuery.school || query.topic !== initialQuery.topic);
  const schoolName = schools.find(([slug]) => slug === result.query.school)?.[1] ?? (result.query.school === DISTRICT ? "every school" : undefined);
  const topicLabel = topics.find(([code]) => code === result.query.topic)?.[1];
  const summary = resultSummary(result, { school: schoolName, topic: topicLabel });

  useEffect(() => {
    if (!touched.current || stale) return;
    const timer = setTimeout(() => setAnnouncement(summary), ANNOUNCE_AFTER_MS);
    return () => clearTimeout(timer);
  }, [summary, stale]);

  function update(change: Partial<AnswersQuery>, nextLimit = pageSize) {
    touched.current = true;
    const next = { ...query, ...change };
    setQuery(next);
    setLimit(nextLimit);
    window.history.replaceState(null, "", answersHref(next, nextLimit > pageSize ? { shown: String(nextLimit) } : {}));
  }

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    // Until the index has loaded, the form goes to the server like any form.
    if (engine) event.preventDefault();
  }

  function showMore(event: MouseEvent<HTMLAnchorElement>) {
    if (!engine) return;
    event.preventDefault();
    update({}, limit + pageSize);
  }

  const filtered = Boolean(query.q || query.school || query.topic);
  const more = result.totalAnswers - result.answers.length;

  return (
    <div>
      <form
        role="search"
        aria-label="Find an answer"
        method="get"
        action="/answers"
        onSubmit={onSubmit}
        onFocus={want}
        onPointerDown={want}
        onPointerEnter={want}
        className="rounded-plate border-2 border-harbour-line bg-white p-4 sm:p-5">
        <label htmlFor="answers-q" className="block font-bold">
          Search the answers
        </label>
        <p id="answers-q-hint" className="text-sm text-ink-soft">
          Use your own words. Short forms such as “AC” and small spelling mistakes are fine.
        </p>
        <input
          id="answers-q"
          type="search"
          name="q"
          value={query.q}
          onChange={(e) => update({ q: e.target.value })}
          maxLength={200}
          autoComplete="off"
          spellCheck={false}
          aria-describedby="answers-q-hint"
          aria-controls="answers-results"
          className={CONTROL}
        />
        <div className="mt-4 grid gap-4 sm:grid-cols-2">
          <FilterSelect
            name="school"
            label="School"
            hint="A school’s list also has the answers for every school."
            value={query.school}
            onChange={(school) => update({ school })}
            options={[["", "Any school"], ...schools, [DISTRICT, "Only answers for every school"]]}
          />
          <FilterSelect
            name="topic"
            label="Topic"
            hint="What the question is about."
            value={query.topic}
            onChange={(topic) => update({ topic })}
            options={[["", "Any topic"], ...topics]}
          />
        </div>
        <div className="mt-4 flex flex-wrap items-center gap-x-5 gap-y-2">
          <button type="submit" className={buttonClasses("primary")}>
            Search
          </button>
          {filtered ? (
            <Link
              href="/answers"
              prefetch={false}
              onClick={(e) => {
                if (!engine) return;
                e.preventDefault();
                update({ q: "", school: "", topic: "" });
              }}
            >
              Show every answer
            </Link>
          ) : null}
          {failed ? <span className="text-sm text-ink-soft">Searching as you type is not available right now; press Search.</span> : null}
        </div>
      </form>

      <p className="sr-only" role="status" aria-live="polite" aria-atomic="true">
        {announcement}
      </p>

      <div id="answers-results" className="mt-8 grid gap-x-10 gap-y-8 lg:grid-cols-[minmax(0,1fr)_22rem]" aria-busy={stale}>
        <section aria-labelledby="answers-count">
          <h2 id="answers-count" className="text-xl" data-testid="answers-count">
            {summary}
          </h2>
          {stale ? <p className="mt-1 text-sm text-ink-soft">Getting the search ready…</p> : null}
          {!result.matchedAll ? (
            <p className="mt-2">No answer has all of your words, so these have the most of them.</p>
          ) : null}
          {result.answers.length > 0 ? (
            <div className="mt-4">
              <AnswerResultList answers={result.answers} />
            </div>
          ) : (
            <p className="mt-4">
              We have not published an answer to that yet. <a href={`/ask${query.topic ? `?topic=${encodeURIComponent(query.topic)}` : ""}`}>Ask us your question</a> and we will reply by e-mail.
            </p>
          )}
          {more > 0 ? (
            <p className="mt-6">
              <a href={answersHref(query, { shown: String(limit + pageSize) })} onClick={showMore} className={buttonClasses("secondary")}>
                Show {Math.min(more, pageSize)} more {more === 1 ? "answer" : "answers"}
              </a>
            </p>
          ) : null}
        </section>
        {result.sections.length > 0 ? (
          <section aria-labelledby="answers-pages" className="self-start">
            <h2 id="answers-pages" className="text-xl">
              On our pages
            </h2>
            <p className="mt-1 text-sm text-ink-soft">
              {result.totalSections > result.sections.length
                ? `The ${result.sections.length} best of ${result.totalSections} parts that match.`
                : "Parts of the school and district pages that match."}
            </p>
            <div className="mt-3">
              <SectionResultList sections={result.sections} />
            </div>
          </section>
        ) : null}
      </div>
    </div>
  );
}

interface FilterSelectProps {
  name: "school" | "topic";
  label: string;
  hint: string;
  value: string;
  onChange: (value: string) => void;
  options: [value: string, label: string][];
}

/** One labelled filter with its hint; a plain select, so it works in the GET form without JavaScript. */
function FilterSelect({ name, label, hint, value, onChange, options }: FilterSelectProps) {
  const id = `answers-${name}`;
  return (
    <div>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        {hint}
      </p>
      <select id={id} name={name} value={value} onChange={(e) => onChange(e.target.value)} aria-describedby={`${id}-hint`} className={CONTROL}>
        {options.map(([optionValue, optionLabel]) => (
          <option key={optionValue || "any"} value={optionValue}>
            {optionLabel}
          </option>
        ))}
      </select>
    </div>
  );
}
