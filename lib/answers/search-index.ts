import "server-only";
import { createHash } from "node:crypto";
import type { DB } from "@/db/connection";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { QUESTION_TOPICS } from "@/lib/questions/state-machine";
import { markdownToPlainText } from "@/lib/markdown/parse";
import { districtTimeZone } from "@/lib/settings/district";
import { getSearchSynonyms } from "@/lib/settings/synonyms";
import { listPublishedAnswers, type PublicAnswer } from "./repository";
import { buildSearchIndexPayload, createAnswerSearch, SEARCH_INDEX_FORMAT, type AnswerSearch, type SearchIndexPayload } from "./search";
import { loadContentSections, type PageSections } from "./sections";

/** The search index the server answers with and the browser downloads, and the answers it was built from. */
export interface AnswersSearchState {
  version: string;
  payload: SearchIndexPayload;
  /** The payload as sent: JSON text, built once per version. */
  json: string;
  engine: AnswerSearch;
  answers: ReadonlyMap<number, PublicAnswer>;
}

interface Cache {
  version: string;
  state: Promise<AnswersSearchState>;
}

const globalForSearch = globalThis as unknown as { clearhallAnswersSearch?: Cache | null };

function sha(text: string): string {
  return createHash("sha256").update(text).digest("hex");
}

/**
 * A cheap fingerprint of everything the index is built from, read on every request: the
 * published_answers rows (how many, how many live now, the newest change and id), the synonym
 * list, the schools' names, the district time zone and the content pages. Publishing inserts
 * a row and taking down sets unpublished_at and updated_at, so either changes it; an answer
 * published for a later time changes the live count when its time comes.
 */
async function fingerprint(db: DB, now: Date): Promise<{ key: string; schools: { slug: string; name: string }[]; synonyms: string[][]; timeZone: string }> {
  const nowIso = now.toISOString();
  const [row, schools, synonyms, timeZone] = await Promise.all([
    db
      .selectFrom("published_answers")
      .select((eb) => [
        eb.fn.countAll<number>().as("total"),
        eb.fn.max("updated_at").as("updated"),
        eb.fn.max("id").as("maxId"),
        eb.fn
          .sum<number>(eb.case().when(eb.and([eb("unpublished_at", "is", null), eb("published_at", "<=", nowIso)])).then(1).else(0).end())
          .as("live"),
        eb.fn.max(eb.case().when(eb("published_at", "<=", nowIso)).then(eb.ref("published_at")).else(null).end()).as("lastPublished"),
      ])
      .executeTakeFirstOrThrow(),
    db.selectFrom("schools").select(["slug", "name"]).orderBy("id").execute(),
    getSearchSynonyms(db),
    districtTimeZone(db),
  ]);
  const content = await contentSections(schools.map((s) => s.slug));
  const key = sha(
    JSON.stringify([
      SEARCH_INDEX_FORMAT,
      Number(row.total),
      Number(row.live ?? 0),
      row.updated,
      row.maxId,
      row.lastPublished,
      schools,
      synonyms,
      timeZone,
      contentHash(content),
    ]),
  ).slice(0, 20);
  return { key, schools, synonyms, timeZone };
}

const contentHashes = new WeakMap<PageSections[], string>();
function contentHash(content: PageSections[]): string {
  let hash = contentHashes.get(content);
  if (!hash) {
    hash = sha(JSON.stringify(content));
    contentHashes.set(content, hash);
  }
  return hash;
}

/** The content pages, each parsed again only when its file changes. */
function contentSections(schoolSlugs: string[]): Promise<PageSections[]> {
  return loadContentSections(schoolSlugs);
}

function dayIn(timeZone: string) {
  const format = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" });
  return (iso: string) => format.format(new Date(iso));
}

async function build(db: DB, version: string, facts: Awaited<ReturnType<typeof fingerprint>>, now: Date): Promise<AnswersSearchState> {
  const [answers, pages] = await Promise.all([listPublishedAnswers(db, now), contentSections(facts.schools.map((s) => s.slug))]);
  const day = dayIn(facts.timeZone);
  const payload = buildSearchIndexPayload({
    version,
    schools: facts.schools,
    topics: QUESTION_TOPICS.map((code) => ({ code, label: TOPIC_LABELS[code] ?? code })),
    synonyms: facts.synonyms,
    answers: answers.map((a) => ({
      id: a.id,
      question: a.question,
      school: a.school?.slug ?? null,
      topic: a.topic,
      day: day(a.publishedAt),
      text: markdownToPlainText(a.answerMarkdown),
    })),
    pages,
  });
  return { version, payload, json: JSON.stringify(payload), engine: createAnswerSearch(payload), answers: new Map(answers.map((a) => [a.id, a])) };
}

/**
 * The current search index. Every call reads the fingerprint (a few small queries); the
 * index itself is rebuilt only when the fingerprint differs from the one it was built for,
 * so a publish or take-down by any code path shows on the next request.
 */
export async function getAnswersSearch(db: DB, now: Date = new Date()): Promise<AnswersSearchState> {
  const facts = await fingerprint(db, now);
  const cached = globalForSearch.clearhallAnswersSearch;
  if (cached && cached.version === facts.key) return cached.state;
  const state = build(db, facts.key, facts, now);
  const entry: Cache = { version: facts.key, state };
  globalForSearch.clearhallAnswersSearch = entry;
  state.catch(() => {
    if (globalForSearch.clearhallAnswersSearch === entry) globalForSearch.clearhallAnswersSearch = null;
  });
  return state;
}

/** The version alone, for conditional requests; the same value the index carries. */
export async function answersSearchVersion(db: DB, now: Date = new Date()): Promise<string> {
  return (await fingerprint(db, now)).key;
}

/** Drops the built index, so the next request builds it again whatever the fingerprint says. */
export function forgetAnswersSearch(): void {
  globalForSearch.clearhallAnswersSearch = null;
}
