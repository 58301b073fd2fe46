import Fuse from "fuse.js";
import type { AnswerSuggestion } from "./repository";
import { foldText } from "./text";

/** Words that say nothing about what a question is about. */
const STOP_WORDS = new Set(
  (
    "a about above after again all also am an and any are as at be because been before being below between both but by can " +
    "could did do does doing done down during each few for from further get gets go goes going had has have having he her " +
    "here hers him his how i if in into is it its just know let like may me might more most much must my no nor not now of " +
    "off on once only or other our ours out over own please same she should so some such than thank thanks that the their " +
    "them then there these they this those through to too under until up us very want was we were what when where which " +
    "while who whom why will with would yes yet you your yours son daughter child children kid kids school schools hi hello " +
    "dear question ask asking wondering wonder tell still really always never ever every"
  ).split(" "),
);

/** Short forms families use, spelled out as the answers write them. */
const SYNONYMS: Record<string, string[]> = {
  ac: ["air", "conditioning"],
  aircon: ["air", "conditioning"],
  hvac: ["ventilation", "air"],
  vent: ["ventilation"],
  vents: ["ventilation"],
  co2: ["co2", "carbon", "dioxide"],
  pickup: ["pick-up"],
  dropoff: ["drop-off", "arrival"],
  covid: ["case", "sick"],
  positive: ["case", "sick"],
  quarantine: ["quarantine", "case"],
  bleach: ["bleach", "disinfect"],
  chemicals: ["products", "disinfect"],
  chemical: ["products", "disinfect"],
  generater: ["generator"],
  power: ["power", "generator"],
  outage: ["power", "generator"],
};

export const MAX_SUGGESTIONS = 3;
/** Fewer significant words than this, and a match says too little to offer. */
const MIN_QUERY_WORDS = 2;
const MIN_SCORE = 0.3;

/** The words of a question worth matching on: lower case, no stop words, short forms spelled out. */
export function significantWords(text: string): string[] {
  const words = foldText(text)
    .replace(/['’]s\b/g, "")
    .match(/[\p{L}\p{N}]+(?:-[\p{L}\p{N}]+)*/gu);
  const out = new Set<string>();
  for (const word of words ?? []) {
    if (STOP_WORDS.has(word)) continue;
    const expanded = SYNONYMS[word] ?? [word];
    for (const w of expanded) if (w.length >= 3) out.add(w);
  }
  return [...out].slice(0, 24);
}

export interface SuggestionIndex {
  suggest(question: string, school?: string): AnswerSuggestion[];
}

/**
 * "Already answered?" matching. Each significant word of the parent's question is looked up
 * fuzzily (so misspellings still match) in the published questions; a word that matches few
 * answers counts for more than one that matches many. An answer is offered when it shares
 * enough of the parent's words and of its own. With a school chosen, that school's answers and
 * the district-wide ones are searched; answers for other schools are not.
 */
export function createSuggestionIndex(answers: readonly AnswerSuggestion[]): SuggestionIndex {
  const fuse = new Fuse(answers, {
    keys: [
      { name: "question", weight: 3 },
      { name: "excerpt", weight: 1 },
    ],
    includeScore: true,
    ignoreLocation: true,
    threshold: 0.25,
    minMatchCharLength: 3,
  });
  const ownWords = new Map(answers.map((a) => [a.id, significantWords(a.question).length]));

  return {
    suggest(question, school) {
      const words = significantWords(question);
      if (words.length < MIN_QUERY_WORDS || answers.length === 0) return [];
      const n = answers.length;
      const matched = new Map<number, { weight: number; words: number }>();
      let total = 0;
      for (const word of words) {
        const hits = fuse.search(word);
        const idf = Math.log(1 + n / Math.max(1, hits.length));
        total += idf;
        for (const hit of hits) {
          const m = matched.get(hit.item.id) ?? { weight: 0, words: 0 };
          m.weight += idf * (1 - (hit.score ?? 1));
          m.words += 1;
          matched.set(hit.item.id, m);
        }
      }
      const inScope = (a: AnswerSuggestion) => !school || school === "district" || a.school === school || a.school === "district";
      return answers
        .filter(inScope)
        .map((a) => {
          const m = matched.get(a.id);
          if (!m || m.words < MIN_QUERY_WORDS) return { a, score: 0 };
          // How much of the parent's question it covers, and how much of its own question the parent's words cover.
          const queryCover = m.weight / total;
          const answerCover = Math.min(1, m.words / Math.max(1, ownWords.get(a.id) ?? 1));
          return { a, score: (2 * queryCover * answerCover) / (queryCover + answerCover) };
        })
        .filter((s) => s.score >= MIN_SCORE)
        .sort((x, y) => y.score - x.score)
        .slice(0, MAX_SUGGESTIONS)
        .map((s) => s.a);
    },
  };
}
