"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useSearchParams } from "next/navigation";
import { useEffect, useId, useMemo, useRef, useState, type FormEvent, type MouseEvent } from "react";
import { STATE_LABELS, TOPIC_LABELS } from "@/lib/questions/labels";
import { QUESTION_STATES, QUESTION_TOPICS } from "@/lib/questions/state-machine";
import type { QueueItem } from "@/lib/questions/desk-types";
import type { QueueQuery, QueueSort } from "@/lib/validation/desk";
import { deskApi, deskKeys } from "./api";
import { formatDateTime, plural, schoolDaysLeftLabel, urgencyOf } from "./format";
import { LoadError } from "./load-error";
import { parseQueueParams, queueSearch, QUEUE_DEFAULTS } from "./queue-params";
import { StateBadge } from "./state-badge";

export interface QuestionQueueProps {
  schools: { slug: string; name: string }[];
  timeZone: string;
  /** How often the table asks the server again, in milliseconds. */
  refreshMs?: number;
}

const PAGE_SIZES = [10, 25, 50, 100] as const;

const SELECT =
  "mt-1 block min-h-11 w-full rounded-plate border-2 border-ink-soft bg-white px-2 text-base text-ink";

const COLUMNS: { key: string; label: string; sort?: QueueSort; className?: string }[] = [
  { key: "reference", label: "Question", sort: "reference" },
  { key: "received", label: "Received", sort: "received" },
  { key: "school", label: "School", sort: "school" },
  { key: "topic", label: "Topic", sort: "topic" },
  { key: "state", label: "Where it is", sort: "state" },
  { key: "assignee", label: "Assigned to" },
  { key: "due", label: "Reply target", sort: "due" },
  { key: "technical", label: "Facilities check" },
];

const URGENCY_CLASS = {
  late: "font-bold text-ember-deep",
  today: "font-bold text-ember-deep",
  soon: "font-bold text-ink",
  fine: "text-ink",
  closed: "text-ink-soft",
} as const;

const URGENCY_MARK = { late: "!", today: "!", soon: "", fine: "", closed: "" } as const;

function pageWindow(current: number, last: number): (number | "gap")[] {
  const pages = new Set<number>([1, last, current - 1, current, current + 1]);
  const sorted = [...pages].filter((p) => p >= 1 && p <= last).sort((a, b) => a - b);
  const out: (number | "gap")[] = [];
  sorted.forEach((p, i) => {
    const previous = sorted[i - 1];
    if (previous !== undefined && p - previous > 1) out.push("gap");
    out.push(p);
  });
  return out;
}

export function QuestionQueue({ schools, timeZone, refreshMs = 30_000 }: QuestionQueueProps) {
  const params = useSearchParams();
  const query = useMemo(() => parseQueueParams(new URLSearchParams(params.toString())), [params]);
  const search = queueSearch(query);
  const formId = useId();
  const resultsHeading = useRef<HTMLHeadingElement>(null);
  const [focusResults, setFocusResults] = useState(0);
  const [words, setWords] = useState(query.q ?? "");
  const [wordsFor, setWordsFor] = useState(query.q ?? "");
  // The address bar changed under the search box (Back, a shared link): show its words.
  if ((query.q ?? "") !== wordsFor) {
    setWordsFor(query.q ?? "");
    setWords(query.q ?? "");
  }

  const queue = useQuery({
    queryKey: deskKeys.queue(search),
    queryFn: () => deskApi.queue(search),
    placeholderData: keepPreviousData,
    refetchInterval: refreshMs,
    refetchOnWindowFocus: true,
  });
  const assignees = useQuery({ queryKey: deskKeys.assignees, queryFn: deskApi.assignees, staleTime: 5 * 60_000 });

  // Next.js keeps useSearchParams in step with the History API, without asking the server for the page again.
  function go(next: QueueQuery, mode: "push" | "replace" = "push") {
    const qs = queueSearch(next);
    const url = `${window.location.pathname}${qs ? `?${qs}` : ""}`;
    if (mode === "push") window.history.pushState(null, "", url);
    else window.history.replaceState(null, "", url);
  }

  function change(patch: Partial<QueueQuery>, mode: "push" | "replace" = "push") {
    go({ ...query, page: 1, ...patch }, mode);
  }

  // Typing searches after a short pause; Enter searches at once.
  useEffect(() => {
    const trimmed = words.trim();
    if (trimmed === (query.q ?? "")) return;
    const timer = window.setTimeout(() => {
      setWordsFor(trimmed);
      change({ q: trimmed || undefined }, "replace");
    }, 400);
    return () => window.clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [words]);

  useEffect(() => {
    if (focusResults > 0) resultsHeading.current?.focus();
  }, [focusResults]);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setWordsFor(words.trim());
    change({ q: words.trim() || undefined });
  }

  function sortBy(column: QueueSort) {
    if (query.sort === column) change({ dir: query.dir === "asc" ? "desc" : "asc" }, "push");
    else change({ sort: column, dir: column === "received" ? "desc" : "asc" }, "push");
  }

  function toPage(event: MouseEvent<HTMLAnchorElement>, page: number) {
    if (event.metaKey || event.ctrlKey || event.shiftKey || event.button !== 0) return;
    event.preventDefault();
    go({ ...query, page });
    setFocusResults((n) => n + 1);
  }

  const data = queue.data;
  const total = data?.total ?? 0;
  const pageSize = data?.pageSize ?? query.pageSize;
  const lastPage = Math.max(1, Math.ceil(total / pageSize));
  const page = Math.min(data?.page ?? query.page, lastPage);
  const firstShown = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const lastShown = Math.min(total, page * pageSize);
  const filtered = search !== "" && queueSearch({ ...QUEUE_DEFAULTS, sort: query.sort, dir: query.dir, pageSize: query.pageSize }) !== search;

  const summary = queue.isPending
    ? "Loading questions…"
    : queue.isError && !data
      ? "The questions could not be loaded."
      : total === 0
        ? "No question matches these filters."
        : `${plural(total, "question")} ${total === 1 ? "matches" : "match"}. Showing ${firstShown}–${lastShown}.`;

  const hrefFor = (p: number) => {
    const qs = queueSearch({ ...query, page: p });
    return `/staff/desk${qs ? `?${qs}` : ""}`;
  };

  const staff = assignees.data?.staff ?? [];

  return (
    <div>
      <form
        id={formId}
        role="search"
        aria-labelledby={`${formId}-title`}
        onSubmit={onSubmit}
        className="rounded-plate border-2 border-paper-line bg-white p-4"
      >
        <h2 id={`${formId}-title`} className="text-lg">
          Find questions
        </h2>
        <div className="mt-2 grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
          <div className="sm:col-span-2">
            <label htmlFor="queue-q" className="block font-bold">
              Words or reference
            </label>
            <div className="mt-1 flex gap-2">
              <input
                id="queue-q"
                type="search"
                value={words}
                onChange={(e) => setWords(e.target.value)}
                maxLength={200}
                autoComplete="off"
                aria-describedby="queue-q-hint"
                className="block min-h-11 w-full min-w-0 rounded-plate border-2 border-ink-soft bg-white px-3 text-base text-ink"
              />
              <button type="submit" className="min-h-11 shrink-0 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep">
                Search
              </button>
            </div>
            <p id="queue-q-hint" className="mt-1 text-sm text-ink-soft">
              Searches the question, the reference (e.g. Q-2026-0004), the room, and the asker&apos;s name and e-mail address.
            </p>
          </div>
          <div>
            <label htmlFor="queue-state" className="block font-bold">
              Where it is
            </label>
            <select id="queue-state" className={SELECT} value={query.state} onChange={(e) => change({ state: e.target.value as QueueQuery["state"] })}>
              <option value="open">Still waiting (all open)</option>
              <option value="all">Every question</option>
              {QUESTION_STATES.map((s) => (
                <option key={s} value={s}>
                  {STATE_LABELS[s] ?? s}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="queue-assignee" className="block font-bold">
              Assigned to
            </label>
            <select id="queue-assignee" className={SELECT} value={query.assignee ?? ""} onChange={(e) => change({ assignee: e.target.value || undefined })}>
              <option value="">Anyone or nobody</option>
              <option value="me">Me</option>
              <option value="none">Nobody yet</option>
              {staff.map((s) => (
                <option key={s.id} value={String(s.id)}>
                  {s.name}
                </option>
              ))}
              {query.assignee && !["me", "none"].includes(query.assignee) && !staff.some((s) => String(s.id) === query.assignee) ? (
                <option value={query.assignee}>Staff member {query.assignee}</option>
              ) : null}
            </select>
          </div>
          <div>
            <label htmlFor="queue-school" className="block font-bold">
              School
            </label>
            <select id="queue-school" className={SELECT} value={query.school ?? ""} onChange={(e) => change({ school: e.target.value || undefined })}>
              <option value="">Every school</option>
              <option value="district">Asked for all schools</option>
              {schools.map((s) => (
                <option key={s.slug} value={s.slug}>
                  {s.name}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="queue-topic" className="block font-bold">
              Topic
            </label>
            <select id="queue-topic" className={SELECT} value={query.topic ?? ""} onChange={(e) => change({ topic: (e.target.value || undefined) as QueueQuery["topic"] })}>
              <option value="">Every topic</option>
              {QUESTION_TOPICS.map((t) => (
                <option key={t} value={t}>
                  {TOPIC_LABELS[t] ?? t}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="queue-technical" className="block font-bold">
              Facilities check
            </label>
            <select
              id="queue-technical"
              className={SELECT}
              value={query.technical ?? ""}
              onChange={(e) => change({ technical: (e.target.value || undefined) as QueueQuery["technical"] })}
            >
              <option value="">Needed or not</option>
              <option value="yes">Needed (technical)</option>
              <option value="no">Not needed</option>
            </select>
          </div>
          <div>
            <label htmlFor="queue-page-size" className="block font-bold">
              Rows a page
            </label>
            <select id="queue-page-size" className={SELECT} value={String(query.pageSize)} onChange={(e) => change({ pageSize: Number(e.target.value) })}>
              {PAGE_SIZES.map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
              {PAGE_SIZES.some((n) => n === query.pageSize) ? null : <option value={query.pageSize}>{query.pageSize}</option>}
            </select>
          </div>
        </div>
        {filtered ? (
          <p className="mt-3">
            <button
              type="button"
              className="min-h-11 font-bold text-harbour underline underline-offset-4"
              onClick={() => {
                setWords("");
                setWordsFor("");
                go({ ...QUEUE_DEFAULTS, sort: query.sort, dir: query.dir, pageSize: query.pageSize });
              }}
            >
              Clear the filters
            </button>
          </p>
        ) : null}
      </form>

      <div className="mt-6 flex flex-wrap items-baseline justify-between gap-2">
        <h2 ref={resultsHeading} tabIndex={-1} id="queue-results" className="text-xl focus:outline-none focus-visible:outline-3">
          Questions
        </h2>
        <p className="text-sm text-ink-soft">
          {queue.isFetching && !queue.isPending ? "Checking for new questions…" : `Refreshes every ${Math.round(refreshMs / 1000)} seconds.`}
        </p>
      </div>
      <p role="status" aria-live="polite" className="mt-1 font-bold" data-testid="queue-summary">
        {summary}
      </p>
      {queue.isError ? <LoadError message={queue.error.message} onRetry={() => queue.refetch()} /> : null}

      {data && data.items.length > 0 ? (
        <div className="mt-3 overflow-x-auto rounded-plate border-2 border-paper-line bg-white" role="region" aria-labelledby="queue-caption" tabIndex={0} aria-busy={queue.isPlaceholderData || undefined}>
          <table className="w-full min-w-[60rem] border-collapse text-left text-sm" data-testid="queue-table">
            <caption id="queue-caption" className="sr-only">
              Questions from families, sorted by {COLUMNS.find((c) => c.sort === query.sort)?.label.toLowerCase() ?? query.sort},{" "}
              {query.dir === "asc" ? "ascending" : "descending"}. Page {page} of {lastPage}.
            </caption>
            <thead>
              <tr className="border-b-2 border-harbour align-bottom">
                {COLUMNS.map((c) => {
                  const active = c.sort !== undefined && c.sort === query.sort;
                  return (
                    <th
                      key={c.key}
                      scope="col"
                      className="px-3 py-2"
                      aria-sort={active ? (query.dir === "asc" ? "ascending" : "descending") : c.sort ? "none" : undefined}
                    >
                      {c.sort ? (
                        <button
                          type="button"
                          onClick={() => sortBy(c.sort!)}
                          className="inline-flex min-h-11 items-center gap-1 font-bold text-harbour-deep underline-offset-4 hover:underline"
                        >
                          {c.label}
                          <span aria-hidden="true" className="inline-block w-4 text-center">
                            {active ? (query.dir === "asc" ? "▲" : "▼") : "↕"}
                          </span>
                        </button>
                      ) : (
                        c.label
                      )}
                    </th>
                  );
                })}
              </tr>
            </thead>
            <tbody>
              {data.items.map((item) => (
                <QueueRow key={item.id} item={item} timeZone={timeZone} />
              ))}
            </tbody>
          </table>
        </div>
      ) : null}

      {data && total > 0 && lastPage > 1 ? (
        <nav aria-label="Pages of questions" className="mt-4">
          <ul className="flex flex-wrap items-center gap-1">
            <li>
              {page > 1 ? (
                <a href={hrefFor(page - 1)} onClick={(e) => toPage(e, page - 1)} className="inline-flex min-h-11 items-center rounded-plate px-3 font-bold">
                  <span aria-hidden="true">←&nbsp;</span>Previous
                </a>
              ) : (
                <span aria-disabled="true" className="inline-flex min-h-11 items-center px-3 text-ink-soft">
                  <span aria-hidden="true">←&nbsp;</span>Previous
                </span>
              )}
            </li>
            {pageWindow(page, lastPage).map((p, i) =>
              p === "gap" ? (
                <li key={`gap-${i}`} aria-hidden="true" className="px-1 text-ink-soft">
                  …
                </li>
              ) : (
                <li key={p}>
                  <a
                    href={hrefFor(p)}
                    onClick={(e) => toPage(e, p)}
                    aria-current={p === page ? "page" : undefined}
                    aria-label={`Page ${p}`}
                    className={`inline-flex min-h-11 min-w-11 items-center justify-center rounded-plate border-2 px-2 font-bold no-underline ${
                      p === page ? "border-harbour bg-harbour text-paper" : "border-transparent text-harbour hover:border-harbour-line"
                    }`}
                  >
                    {p}
                  </a>
                </li>
              ),
            )}
            <li>
              {page < lastPage ? (
                <a href={hrefFor(page + 1)} onClick={(e) => toPage(e, page + 1)} className="inline-flex min-h-11 items-center rounded-plate px-3 font-bold">
                  Next<span aria-hidden="true">&nbsp;→</span>
                </a>
              ) : (
                <span aria-disabled="true" className="inline-flex min-h-11 items-center px-3 text-ink-soft">
                  Next<span aria-hidden="true">&nbsp;→</span>
                </span>
              )}
            </li>
          </ul>
        </nav>
      ) : null}
    </div>
  );
}

function QueueRow({ item, timeZone }: { item: QueueItem; timeZone: string }) {
  const urgency = urgencyOf(item.schoolDaysLeft);
  return (
    <tr className="border-b border-paper-line align-top" data-testid="queue-row" data-reference={item.reference}>
      <td className="max-w-[22rem] px-3 py-2">
        <Link href={`/staff/desk/${item.id}`} className="font-bold">
          {item.reference}
        </Link>
        <p className="mt-0.5 line-clamp-2 text-ink-soft">{item.excerpt}</p>
      </td>
      <td className="px-3 py-2 whitespace-nowrap">{formatDateTime(item.receivedAt, timeZone)}</td>
      <td className="px-3 py-2">{item.school?.name ?? "All schools"}</td>
      <td className="px-3 py-2">{TOPIC_LABELS[item.topic] ?? item.topic}</td>
      <td className="px-3 py-2">
        <StateBadge state={item.state} />
      </td>
      <td className="px-3 py-2">{item.assignee ? item.assignee.name : <span className="text-ink-soft">Nobody yet</span>}</td>
      <td className={`px-3 py-2 whitespace-nowrap ${URGENCY_CLASS[urgency]}`}>
        {URGENCY_MARK[urgency] ? (
          <span aria-hidden="true" className="mr-1">
            {URGENCY_MARK[urgency]}
          </span>
        ) : null}
        {schoolDaysLeftLabel(item.schoolDaysLeft)}
      </td>
      <td className="px-3 py-2">{item.technical ? "Needed" : <span className="text-ink-soft">Not needed</span>}</td>
    </tr>
  );
}
