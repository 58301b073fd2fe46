import Fuse from "fuse.js";
import { DISTRICT, MAX_QUERY_LENGTH } from "./constants";
import { forEachTerm, STOP_WORDS, stem, termsOf, wordSpans, words, type WordSpan } from "./text";

/**
 * The answers search: one pure module, run in the browser while a parent types and on the
 * server for the same URL without JavaScript and for GET /api/answers. Both build the engine
 * from the same compact index (SearchIndexPayload), so they rank alike.
 *
 * How it works: every answer and every section of the MDX pages is a document whose words are
 * reduced to terms (lower case, no accents, plurals folded, no stop words). A query is split
 * into concepts: a word, or a phrase from the synonym list together with its synonyms. Each
 * word is matched against the vocabulary of terms — exactly, as the start of a longer term
 * ("genera" → "generator"), or fuzzily with Fuse.js ("ventilaton" → "ventilation") — and a
 * document scores by where the matched terms stand (question or heading above body above school
 * and topic names) and how rare they are. Every concept must match; when no document has them
 * all, the documents with the most are shown, and the result says so.
 */

export { DISTRICT, MAX_QUERY_LENGTH };

export const SEARCH_INDEX_FORMAT = 1;
/** How much of an answer or section is shown under its title, in characters. */
export const EXCERPT_LENGTH = 170;
const MAX_CONCEPTS = 12;
export const DEFAULT_SECTION_LIMIT = 6;

/** [id, question, school, topic, published day (YYYY-MM-DD, district time), excerpt]; newest first. */
export type IndexedAnswer = [id: number, question: string, school: number, topic: number, day: string, excerpt: string];
/** [title, url, school, topics, updated day]. */
export type IndexedPage = [title: string, url: string, school: number, topics: number[], day: string];
/** [page, heading (the page title for the words before the first heading), anchor ("" for those), excerpt]. */
export type IndexedSection = [page: number, heading: string, anchor: string, excerpt: string];

/**
 * What the browser downloads. Schools and topics are listed once and referred to by position
 * (-1: every school). Questions, headings and excerpts travel as text; the rest of each text
 * travels only as its distinct search terms, inverted: `terms` (sorted) and, for each term,
 * the documents that have it (answers first, then sections, by position) as gaps in base 36,
 * space-separated. Inverted lists compress far better than per-answer word lists, and the full
 * wording of long answers never travels.
 */
export interface SearchIndexPayload {
  format: typeof SEARCH_INDEX_FORMAT;
  version: string;
  schools: [slug: string, name: string][];
  topics: [code: string, label: string][];
  synonyms: string[][];
  answers: IndexedAnswer[];
  pages: IndexedPage[];
  sections: IndexedSection[];
  terms: string[];
  postings: string[];
}

export interface SearchIndexInput {
  version: string;
  schools: { slug: string; name: string }[];
  topics: { code: string; label: string }[];
  synonyms: string[][];
  /** Newest first; `text` is the answer as plain text. */
  answers: { id: number; question: string; school: string | null; topic: string; day: string; text: string }[];
  pages: {
    title: string;
    url: string;
    school: string | null;
    topics: string[];
    day: string;
    sections: { heading: string; anchor: string; text: string }[];
  }[];
}

/** The opening words of a plain text, cut at a word boundary. */
export function excerptOf(text: string, max = EXCERPT_LENGTH): string {
  const flat = text.replace(/\s+/g, " ").trim();
  if (flat.length <= max) return flat;
  const cut = flat.slice(0, max - 1);
  const space = cut.lastIndexOf(" ");
  return `${(space > max / 2 ? cut.slice(0, space) : cut).replace(/[\s,;:.]+$/, "")}…`;
}

/** The terms of `text` that `head` (the title and excerpt, sent as text) does not already have. */
function furtherTerms(head: string, text: string): string[] {
  const seen = new Set(termsOf(head));
  return termsOf(text).filter((t) => !seen.has(t));
}

function compareStrings(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Builds the compact index from published answers and content pages. Pure: the server calls it after reading the database. */
export function buildSearchIndexPayload(input: SearchIndexInput): SearchIndexPayload {
  const schoolIndex = new Map(input.schools.map((s, i) => [s.slug, i]));
  const topicIndex = new Map(input.topics.map((t, i) => [t.code, i]));
  const schoolOf = (slug: string | null) => (slug === null ? -1 : (schoolIndex.get(slug) ?? -1));
  const topicOf = (code: string) => topicIndex.get(code) ?? -1;
  const further: string[][] = [];
  const answers = input.answers.map((a): IndexedAnswer => {
    const excerpt = excerptOf(a.text);
    further.push(furtherTerms(`${a.question} ${excerpt}`, a.text));
    return [a.id, a.question, schoolOf(a.school), topicOf(a.topic), a.day, excerpt];
  });
  const pages: IndexedPage[] = [];
  const sections: IndexedSection[] = [];
  for (const page of input.pages) {
    const p = pages.push([page.title, page.url, schoolOf(page.school), page.topics.map(topicOf).filter((t) => t >= 0), page.day]) - 1;
    for (const s of page.sections) {
      const excerpt = excerptOf(s.text);
      if (!excerpt && !s.anchor) continue;
      further.push(furtherTerms(`${s.heading} ${excerpt}`, s.text));
      sections.push([p, s.heading, s.anchor, excerpt]);
    }
  }
  const docsOf = new Map<string, number[]>();
  further.forEach((terms, d) => {
    for (const t of terms) {
      const list = docsOf.get(t);
      if (list) list.push(d);
      else docsOf.set(t, [d]);
    }
  });
  const terms = [...docsOf.keys()].sort(compareStrings);
  const postings = terms.map((t) => {
    let previous = -1;
    return docsOf
      .get(t)!
      .map((d) => {
        const gap = d - previous;
        previous = d;
        return gap.toString(36);
      })
      .join(" ");
  });
  return {
    format: SEARCH_INDEX_FORMAT,
    version: input.version,
    schools: input.schools.map((s) => [s.slug, s.name]),
    topics: input.topics.map((t) => [t.code, t.label]),
    synonyms: input.synonyms,
    answers,
    pages,
    sections,
    terms,
    postings,
  };
}

export interface SearchQuery {
  q?: string;
  /** A school slug (that school's answers and those for every school) or "district" (only those for every school). */
  school?: string;
  topic?: string;
}

export interface SearchOptions {
  /** How many answers to return (all by default); totals count every match. */
  answerLimit?: number;
  sectionLimit?: number;
}

/** A text with the character ranges to mark, [start, end) in UTF-16 units. */
export interface HighlightedText {
  text: string;
  marks: [number, number][];
}

export interface AnswerHit {
  kind: "answer";
  id: number;
  url: string;
  question: HighlightedText;
  excerpt: HighlightedText;
  school: string;
  schoolName: string;
  topic: string;
  topicLabel: string;
  day: string;
}

export interface SectionHit {
  kind: "section";
  url: string;
  heading: HighlightedText;
  excerpt: HighlightedText;
  pageTitle: string;
  school: string;
  schoolName: string;
  topicLabels: string[];
}

export interface SearchResult {
  /** The query as searched, trimmed; school and topic only when known. */
  query: { q: string; school: string; topic: string };
  /** Whether the query had any words to search for. */
  searched: boolean;
  /** False when no document matched every word and the closest are shown instead. */
  matchedAll: boolean;
  answers: AnswerHit[];
  sections: SectionHit[];
  totalAnswers: number;
  totalSections: number;
}

export interface AnswerSearch {
  version: string;
  search(query: SearchQuery, options?: SearchOptions): SearchResult;
  /** Other published answers on much the same subject, most alike first. */
  related(answerId: number, limit?: number): AnswerHit[];
  hasAnswer(answerId: number): boolean;
}

// Where a term stands in a document, and how much that counts.
const TITLE_WEIGHT = 3;
const BODY_WEIGHT = 1;
const META_WEIGHT = 0.5;
// How much a matched term counts against an exact one.
const PREFIX_BASE = 0.6;
const PREFIX_SPAN = 0.3;
const FUZZY_FACTOR = 0.8;
/** A synonym counts a little less than the word the parent typed, so literal matches come first among equals. */
const SYNONYM_FACTOR = 0.9;
/** Prefix matches for a synonym (plurals and endings only) may add this many letters. */
const SYNONYM_PREFIX_EXTRA = 3;

type MatchMode = "fuzzy" | "variant";
interface Alternative {
  words: string[];
  factor: number;
  mode: MatchMode;
  /** The words the parent typed, as against a synonym of them. */
  literal: boolean;
}
interface Concept {
  alternatives: Alternative[];
}

/** Damerau–Levenshtein distance (optimal string alignment), for spotting a misspelt synonym. */
function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array(rows * cols).fill(0);
  for (let i = 0; i < rows; i += 1) d[i * cols] = i;
  for (let j = 0; j < cols; j += 1) d[j] = j;
  for (let i = 1; i < rows; i += 1) {
    for (let j = 1; j < cols; j += 1) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(d[(i - 1) * cols + j]! + 1, d[i * cols + j - 1]! + 1, d[(i - 1) * cols + j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, d[(i - 2) * cols + j - 2]! + 1);
      d[i * cols + j] = v;
    }
  }
  return d[rows * cols - 1]!;
}

/** Errors Fuse may allow in a word of this length: none under 4 letters, then about one per four. */
function allowedErrors(length: number): number {
  if (length < 4) return 0;
  if (length < 8) return 1;
  return 2;
}

interface SynonymMember {
  group: number;
  member: number;
  /** The member's words, normalised and stemmed, stop words kept. */
  terms: string[];
}

function prepareSynonyms(groups: string[][]) {
  const members: SynonymMember[][] = groups.map((group, g) =>
    group.map((m, i) => ({ group: g, member: i, terms: words(m).map(stem) })).filter((m) => m.terms.length > 0),
  );
  const byFirst = new Map<string, SynonymMember[]>();
  for (const m of members.flat()) {
    const list = byFirst.get(m.terms[0]!) ?? [];
    list.push(m);
    byFirst.set(m.terms[0]!, list);
  }
  for (const list of byFirst.values()) list.sort((x, y) => y.terms.length - x.terms.length);
  const singles = members.flat().filter((m) => m.terms.length === 1 && m.terms[0]!.length >= 5);
  return { members, byFirst, singles };
}

function alternativesOf(group: SynonymMember[], typed: { member: number } | null, typedTerm: string | null): Alternative[] {
  const out: Alternative[] = [];
  if (typedTerm !== null) out.push({ words: [typedTerm], factor: 1, mode: "fuzzy", literal: true });
  for (const m of group) {
    const meaningful = m.terms.filter((t) => !STOP_WORDS.has(t));
    if (meaningful.length === 0) continue;
    const isTyped = typed !== null && m.member === typed.member;
    out.push({ words: meaningful, factor: isTyped ? 1 : SYNONYM_FACTOR, mode: isTyped ? "fuzzy" : "variant", literal: isTyped });
  }
  return out;
}

/** Splits a query into concepts: synonym phrases (longest first), then the remaining meaningful words. */
function parseQuery(q: string, synonyms: ReturnType<typeof prepareSynonyms>): Concept[] {
  const tokens = words(q);
  const terms = tokens.map(stem);
  const concepts: Concept[] = [];
  for (let i = 0; i < terms.length && concepts.length < MAX_CONCEPTS; ) {
    const candidates = synonyms.byFirst.get(terms[i]!) ?? [];
    const phrase = candidates.find((m) => m.terms.every((t, k) => terms[i + k] === t));
    if (phrase) {
      concepts.push({ alternatives: alternativesOf(synonyms.members[phrase.group]!, phrase, null) });
      i += phrase.terms.length;
      continue;
    }
    const word = tokens[i]!;
    const term = terms[i]!;
    i += 1;
    if (STOP_WORDS.has(word) || (term.length < 2 && !/^\d+$/.test(term))) continue;
    // A misspelt synonym ("ventilaton") still brings its group along.
    const near =
      term.length >= 5 ? synonyms.singles.find((m) => m.terms[0]![0] === term[0] && editDistance(term, m.terms[0]!) <= (term.length >= 9 ? 2 : 1)) : undefined;
    if (near) {
      concepts.push({ alternatives: alternativesOf(synonyms.members[near.group]!, null, term) });
      continue;
    }
    concepts.push({ alternatives: [{ words: [term], factor: 1, mode: "fuzzy", literal: true }] });
  }
  return concepts;
}

interface Posting {
  docs: Int32Array;
  weights: Float32Array;
}

interface DocInfo {
  kind: "answer" | "section";
  /** Position in payload.answers or payload.sections. */
  ref: number;
  school: number;
  topics: number[];
}

/** The marks for each word of `text` whose term is in `terms`. */
export function highlight(text: string, terms: ReadonlySet<string>): HighlightedText {
  const marks: [number, number][] = [];
  if (terms.size > 0) {
    for (const span of wordSpans(text)) if (terms.has(span.term)) marks.push([span.start, span.end]);
  }
  return { text, marks };
}

/** Builds the search engine from the compact index. Building takes one pass over the index; each search after that is quick. */
export function createAnswerSearch(payload: SearchIndexPayload): AnswerSearch {
  const docs: DocInfo[] = [];
  const termIds = new Map<string, number>();
  const termList: string[] = [];
  const postingDocs: number[][] = [];
  const postingWeights: number[][] = [];
  const lastDoc: number[] = [];

  const termId = (t: string) => {
    let id = termIds.get(t);
    if (id === undefined) {
      id = termList.push(t) - 1;
      termIds.set(t, id);
      postingDocs.push([]);
      postingWeights.push([]);
      lastDoc.push(-1);
    }
    return id;
  };
  /** Documents are added in order, so each posting list stays sorted and a repeat is always its last entry. */
  const post = (d: number, id: number, weight: number) => {
    const weights = postingWeights[id]!;
    if (lastDoc[id] === d) {
      const k = weights.length - 1;
      if (weights[k]! < weight) weights[k] = weight;
      return;
    }
    postingDocs[id]!.push(d);
    weights.push(weight);
    lastDoc[id] = d;
  };
  const idsOf = (text: string) => termsOf(text).map(termId);

  const schoolName = (i: number) => (i >= 0 ? (payload.schools[i]?.[1] ?? "") : "All schools");
  const schoolSlug = (i: number) => (i >= 0 ? (payload.schools[i]?.[0] ?? DISTRICT) : DISTRICT);
  const topicCode = (i: number) => payload.topics[i]?.[0] ?? "other";
  const topicLabel = (i: number) => payload.topics[i]?.[1] ?? "Other";
  const schoolTerms = payload.schools.map(([, name]) => idsOf(name));
  const topicTerms = payload.topics.map(([, label]) => idsOf(label));
  const pageTerms = payload.pages.map(([title]) => idsOf(title));

  // The rest of each text arrives inverted: turn it back into each document's further terms.
  const totalDocs = payload.answers.length + payload.sections.length;
  const further: number[][] = Array.from({ length: totalDocs }, () => []);
  payload.terms.forEach((term, i) => {
    const id = termId(term);
    const gaps = payload.postings[i] ?? "";
    let d = -1;
    let start = 0;
    while (start < gaps.length) {
      let end = gaps.indexOf(" ", start);
      if (end < 0) end = gaps.length;
      d += parseInt(gaps.slice(start, end), 36);
      further[d]?.push(id);
      start = end + 1;
    }
  });

  const addDoc = (info: DocInfo, title: string, excerpt: string, meta: number[][]) => {
    const d = docs.push(info) - 1;
    // A word counts a little more in a short title than in a long one, as a field-length norm does.
    const titleIds = idsOf(title);
    const titleWeight = TITLE_WEIGHT * (1 + 1 / Math.sqrt(Math.max(1, titleIds.length)));
    for (const id of titleIds) post(d, id, titleWeight);
    forEachTerm(excerpt, (t) => post(d, termId(t), BODY_WEIGHT));
    for (const id of further[d] ?? []) post(d, id, BODY_WEIGHT);
    for (const ids of meta) for (const id of ids) post(d, id, META_WEIGHT);
  };

  const answerDoc = new Map<number, number>();
  payload.answers.forEach(([id, question, school, topic, , excerpt], ref) => {
    answerDoc.set(id, docs.length);
    addDoc({ kind: "answer", ref, school, topics: [topic] }, question, excerpt, [schoolTerms[school] ?? [], topicTerms[topic] ?? []]);
  });
  payload.sections.forEach(([page, heading, , excerpt], ref) => {
    const p = payload.pages[page]!;
    addDoc({ kind: "section", ref, school: p[2], topics: p[3] }, heading, excerpt, [pageTerms[page] ?? [], schoolTerms[p[2]] ?? []]);
  });

  const n = docs.length;
  const postings: Posting[] = postingDocs.map((d, i) => ({ docs: Int32Array.from(d), weights: Float32Array.from(postingWeights[i]!) }));
  const idf = Float64Array.from(postings, (p) => Math.log(1 + n / p.docs.length));
  const sorted = termList.map((t, i) => [t, i] as const).sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  const sortedTerms = sorted.map((s) => s[0]);
  const sortedIds = sorted.map((s) => s[1]);

  // Fuse instances per first letter and length, built on first use: a misspelling rarely
  // changes the first letter, and a word with e errors differs in length by at most e.
  const buckets = new Map<string, number[]>();
  termList.forEach((t, i) => {
    const key = `${t[0]!}${t.length}`;
    const list = buckets.get(key);
    if (list) list.push(i);
    else buckets.set(key, [i]);
  });
  const fuses = new Map<string, Fuse<string>>();
  const fuseFor = (key: string) => {
    const ids = buckets.get(key);
    if (!ids) return null;
    let fuse = fuses.get(key);
    if (!fuse) {
      fuse = new Fuse(
        ids.map((i) => termList[i]!),
        { includeScore: true, ignoreLocation: true, ignoreFieldNorm: true, isCaseSensitive: true, shouldSort: false, threshold: 0.34 },
      );
      fuses.set(key, fuse);
    }
    return { fuse, ids };
  };

  const synonyms = prepareSynonyms(payload.synonyms);
  const memo = new Map<string, [number, number][]>();

  /** The vocabulary terms a query word matches, each with how well (1 = exactly). */
  function matchWord(word: string, mode: MatchMode): [number, number][] {
    const key = `${mode}:${word}`;
    const cached = memo.get(key);
    if (cached) return cached;
    const found = new Map<number, number>();
    const exact = termIds.get(word);
    if (exact !== undefined) found.set(exact, 1);
    if (word.length >= 3) {
      let lo = 0;
      let hi = sortedTerms.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (sortedTerms[mid]! < word) lo = mid + 1;
        else hi = mid;
      }
      for (let k = lo; k < sortedTerms.length && sortedTerms[k]!.startsWith(word); k += 1) {
        const term = sortedTerms[k]!;
        if (term === word) continue;
        if (mode === "variant" && term.length - word.length > SYNONYM_PREFIX_EXTRA) continue;
        found.set(sortedIds[k]!, PREFIX_BASE + PREFIX_SPAN * (word.length / term.length));
      }
    }
    const errors = allowedErrors(word.length);
    if (mode === "fuzzy" && errors > 0 && word.length <= 32) {
      for (let length = word.length - errors; length <= word.length + errors; length += 1) {
        const bucket = fuseFor(`${word[0]!}${length}`);
        if (!bucket) continue;
        for (const r of bucket.fuse.search(word)) {
          const id = bucket.ids[r.refIndex]!;
          const score = r.score ?? 1;
          if (found.has(id) || score * word.length > errors + 1e-9) continue;
          found.set(id, FUZZY_FACTOR * (1 - score));
        }
      }
    }
    const list = [...found].sort((a, b) => a[0] - b[0]);
    if (memo.size > 2000) memo.clear();
    memo.set(key, list);
    return list;
  }

  // Typing repeats the words before the last one, so their scores are kept for a while.
  const scoreCache = new Map<string, Float64Array>();
  function wordScores(word: string, mode: MatchMode, matched: Set<number>): Float64Array | null {
    const matches = matchWord(word, mode);
    if (matches.length === 0) return null;
    for (const [t] of matches) matched.add(t);
    const key = `${mode}:${word}`;
    const cached = scoreCache.get(key);
    if (cached) return cached;
    const out = new Float64Array(n);
    for (const [t, quality] of matches) {
      const p = postings[t]!;
      const base = quality * idf[t]!;
      for (let k = 0; k < p.docs.length; k += 1) {
        const d = p.docs[k]!;
        const s = base * p.weights[k]!;
        if (s > out[d]!) out[d] = s;
      }
    }
    if (scoreCache.size >= 48) scoreCache.delete(scoreCache.keys().next().value!);
    scoreCache.set(key, out);
    return out;
  }

  const masks = new Map<string, { mask: Uint8Array; school: string; topic: string }>();
  /** What an alternative's words can score at most: the mean, over its words, of the best quality × idf among the terms each matches. */
  function strength(alt: Alternative): number {
    let sum = 0;
    for (const w of alt.words) {
      let most = 0;
      for (const [t, quality] of matchWord(w, alt.mode)) if (quality * idf[t]! > most) most = quality * idf[t]!;
      sum += most;
    }
    return sum / alt.words.length;
  }

  function eligibility(query: SearchQuery): { mask: Uint8Array; school: string; topic: string } {
    const key = `${query.school ?? ""}|${query.topic ?? ""}`;
    let found = masks.get(key);
    if (!found) {
      found = computeEligibility(query);
      if (masks.size > 64) masks.clear();
      masks.set(key, found);
    }
    return found;
  }

  function computeEligibility(query: SearchQuery): { mask: Uint8Array; school: string; topic: string } {
    const schoolIdx = query.school && query.school !== DISTRICT ? payload.schools.findIndex((s) => s[0] === query.school) : -2;
    const school = query.school === DISTRICT ? DISTRICT : schoolIdx >= 0 ? query.school! : "";
    const topicIdx = query.topic ? payload.topics.findIndex((t) => t[0] === query.topic) : -1;
    const topic = topicIdx >= 0 ? query.topic! : "";
    const mask = new Uint8Array(n);
    for (let d = 0; d < n; d += 1) {
      const doc = docs[d]!;
      const schoolOk = school === "" || (school === DISTRICT ? doc.school === -1 : doc.school === -1 || doc.school === schoolIdx);
      const topicOk = topic === "" || doc.topics.includes(topicIdx);
      mask[d] = schoolOk && topicOk ? 1 : 0;
    }
    return { mask, school, topic };
  }

  function answerHit(ref: number, terms: ReadonlySet<string>): AnswerHit {
    const [id, question, school, topic, day, excerpt] = payload.answers[ref]!;
    return {
      kind: "answer",
      id,
      url: `/answers/${id}`,
      question: mark(question, terms),
      excerpt: mark(excerpt, terms),
      school: schoolSlug(school),
      schoolName: schoolName(school),
      topic: topicCode(topic),
      topicLabel: topicLabel(topic),
      day,
    };
  }

  function sectionHit(ref: number, terms: ReadonlySet<string>): SectionHit {
    const [page, heading, anchor, excerpt] = payload.sections[ref]!;
    const p = payload.pages[page]!;
    return {
      kind: "section",
      url: anchor ? `${p[1]}#${anchor}` : p[1],
      heading: mark(heading, terms),
      excerpt: mark(excerpt, terms),
      pageTitle: p[0],
      school: schoolSlug(p[2]),
      schoolName: schoolName(p[2]),
      topicLabels: p[3].map(topicLabel),
    };
  }

  const none: ReadonlySet<string> = new Set();
  const spanCache = new Map<string, WordSpan[]>();
  /** The marks for each word of `text` whose term matched; a text's words are split once and kept. */
  function mark(text: string, terms: ReadonlySet<string>): HighlightedText {
    if (terms.size === 0) return { text, marks: [] };
    let spans = spanCache.get(text);
    if (!spans) {
      spans = wordSpans(text);
      spanCache.set(text, spans);
    }
    const marks: [number, number][] = [];
    for (const span of spans) if (terms.has(span.term)) marks.push([span.start, span.end]);
    return { text, marks };
  }

  function search(query: SearchQuery, options: SearchOptions = {}): SearchResult {
    const q = (query.q ?? "").replace(/\s+/g, " ").trim().slice(0, MAX_QUERY_LENGTH);
    const { mask, school, topic } = eligibility(query);
    const answerLimit = options.answerLimit ?? Infinity;
    const sectionLimit = options.sectionLimit ?? DEFAULT_SECTION_LIMIT;
    const concepts = parseQuery(q, synonyms);
    const base = { query: { q, school, topic } };

    if (concepts.length === 0) {
      const refs: number[] = [];
      for (let d = 0; d < n; d += 1) if (mask[d] && docs[d]!.kind === "answer") refs.push(docs[d]!.ref);
      return {
        ...base,
        searched: false,
        matchedAll: true,
        answers: refs.slice(0, answerLimit).map((r) => answerHit(r, none)),
        sections: [],
        totalAnswers: refs.length,
        totalSections: 0,
      };
    }

    const matchedTerms = new Set<number>();
    const total = new Float64Array(n);
    const count = new Uint8Array(n);
    for (const concept of concepts) {
      const best = new Float64Array(n);
      // A synonym may not outscore the typed word for being rarer: it is capped at the typed word's weight.
      const literal = concept.alternatives.find((a) => a.literal);
      const literalStrength = literal ? strength(literal) : 0;
      for (const alt of concept.alternatives) {
        const perWord: Float64Array[] = [];
        for (const w of alt.words) {
          const s = wordScores(w, alt.mode, matchedTerms);
          if (!s) break;
          perWord.push(s);
        }
        const k = perWord.length;
        if (k !== alt.words.length) continue;
        let factor = alt.factor;
        if (!alt.literal && literalStrength > 0) factor *= Math.min(1, literalStrength / strength(alt));
        if (k === 1) {
          const only = perWord[0]!;
          for (let d = 0; d < n; d += 1) {
            const v = only[d]! * factor;
            if (v > best[d]!) best[d] = v;
          }
          continue;
        }
        const share = factor / k;
        for (let d = 0; d < n; d += 1) {
          let sum = 0;
          let j = 0;
          for (; j < k; j += 1) {
            const v = perWord[j]![d]!;
            if (v === 0) break;
            sum += v;
          }
          if (j === k && sum * share > best[d]!) best[d] = sum * share;
        }
      }
      for (let d = 0; d < n; d += 1) {
        if (mask[d] && best[d]! > 0) {
          total[d] = total[d]! + best[d]!;
          count[d] = count[d]! + 1;
        }
      }
    }

    let need = concepts.length;
    let matchedAll = true;
    let any = false;
    for (let d = 0; d < n; d += 1) if (count[d] === need) any = true;
    if (!any) {
      matchedAll = false;
      need = 0;
      for (let d = 0; d < n; d += 1) if (count[d]! > need) need = count[d]!;
    }

    const answerDocs: number[] = [];
    const sectionDocs: number[] = [];
    if (need > 0) {
      for (let d = 0; d < n; d += 1) {
        if (count[d] !== need) continue;
        (docs[d]!.kind === "answer" ? answerDocs : sectionDocs).push(d);
      }
    }
    // Best first; among equals the payload's order: newest answer first, pages in reading order.
    const byScore = (a: number, b: number) => total[b]! - total[a]! || a - b;
    answerDocs.sort(byScore);
    sectionDocs.sort(byScore);
    const terms = new Set([...matchedTerms].map((t) => termList[t]!));
    return {
      ...base,
      searched: true,
      matchedAll,
      answers: answerDocs.slice(0, answerLimit).map((d) => answerHit(docs[d]!.ref, terms)),
      sections: sectionDocs.slice(0, sectionLimit).map((d) => sectionHit(docs[d]!.ref, terms)),
      totalAnswers: answerDocs.length,
      totalSections: sectionDocs.length,
    };
  }

  let byDoc: { terms: number[][]; weights: number[][]; norms: Float64Array } | null = null;
  /** Each document's terms and its length as a vector of weighted terms, for cosine similarity; worked out on first use. */
  function documentVectors() {
    if (byDoc) return byDoc;
    const terms: number[][] = Array.from({ length: n }, () => []);
    const weights: number[][] = Array.from({ length: n }, () => []);
    const squares = new Float64Array(n);
    postings.forEach((p, t) => {
      for (let k = 0; k < p.docs.length; k += 1) {
        const d = p.docs[k]!;
        const w = p.weights[k]!;
        terms[d]!.push(t);
        weights[d]!.push(w);
        squares[d] = squares[d]! + (idf[t]! * w) ** 2;
      }
    });
    byDoc = { terms, weights, norms: squares.map(Math.sqrt) };
    return byDoc;
  }

  function related(answerId: number, limit = 3): AnswerHit[] {
    const d = answerDoc.get(answerId);
    if (d === undefined) return [];
    const vectors = documentVectors();
    const own = { terms: vectors.terms[d]!, weights: vectors.weights[d]! };
    const dot = new Float64Array(n);
    own.terms.forEach((t, k) => {
      const w = idf[t]! * own.weights[k]!;
      const p = postings[t]!;
      for (let j = 0; j < p.docs.length; j += 1) dot[p.docs[j]!] = dot[p.docs[j]!]! + w * idf[t]! * p.weights[j]!;
    });
    const norms = vectors.norms;
    const ownNorm = norms[d] || 1;
    const self = docs[d]!;
    const scored: [number, number][] = [];
    for (let o = 0; o < n; o += 1) {
      const doc = docs[o]!;
      if (o === d || doc.kind !== "answer" || dot[o] === 0) continue;
      let sim = dot[o]! / (ownNorm * (norms[o] || 1));
      if (doc.topics[0] === self.topics[0]) sim += 0.15;
      if (doc.school === self.school || doc.school === -1 || self.school === -1) sim += 0.05;
      if (sim >= 0.25) scored.push([o, sim]);
    }
    scored.sort((a, b) => b[1] - a[1] || a[0] - b[0]);
    return scored.slice(0, limit).map(([o]) => answerHit(docs[o]!.ref, none));
  }

  return { version: payload.version, search, related, hasAnswer: (id) => answerDoc.has(id) };
}
