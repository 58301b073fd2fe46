/**
 * The words of a text as the search sees them. Pure and framework-free: the answers page
 * runs it in the browser and on the server, and the ask form's suggestions use it too.
 */

/** Lower case with accents removed, so "Ventilación" and "ventilacion" are the same word. */
export function foldText(text: string): string {
  const lower = text.toLowerCase();
  // Most text is plain ASCII, which has nothing to fold; NFKD is the slow part.
  return ASCII.test(lower) ? lower : lower.normalize("NFKD").replace(/\p{M}/gu, "");
}

const ASCII = /^[\x00-\x7f]*$/;

/** A run of letters and digits, with apostrophes inside ("child's") but not hyphens. */
const WORD = /[\p{L}\p{N}]+(?:['’][\p{L}\p{N}]+)*/gu;

/** Function words: they say nothing about what a question is about. */
export const STOP_WORDS: ReadonlySet<string> = new Set(
  (
    "a about after again all also am an and any are as at be because been before being both but by can could did do does " +
    "doing done during each for from further get gets got had has have having he her here hers him his how i if in into is " +
    "it its just me might more most much must my no nor not now of off on once only or other our ours out over own please " +
    "same she should so some such than that the their them then there these they this those through to too under until up " +
    "us very was we were what when where which while who whom why will with would yes yet you your yours hi hello dear"
  ).split(" "),
);

/**
 * Harman's S-stemmer ("How effective is suffixing?", JASIS 42(1), 1991): plurals fold to
 * their singular ("masks" → "mask", "batteries" → "battery"), nothing more. Words under
 * four letters are left alone, so "gas" and "bus" stay whole.
 */
export function stem(word: string): string {
  if (word.length < 4) return word;
  if (word.endsWith("ies") && !word.endsWith("eies") && !word.endsWith("aies")) return `${word.slice(0, -3)}y`;
  if (word.endsWith("es") && !word.endsWith("aes") && !word.endsWith("ees") && !word.endsWith("oes")) return word.slice(0, -1);
  if (word.endsWith("s") && !word.endsWith("us") && !word.endsWith("ss")) return word.slice(0, -1);
  return word;
}

/** A folded word with its possessive and inner apostrophes gone: "Child's" → "child", "don't" → "dont". */
export function normalizeWord(raw: string): string {
  return foldText(raw)
    .replace(/['’]s$/, "")
    .replace(/['’]/g, "");
}

/** The words of a text, folded, in order; stop words kept (phrases may need them). */
export function words(text: string): string[] {
  const found = foldText(text).match(WORD);
  if (!found) return [];
  const out: string[] = [];
  for (const w of found) {
    const word = w.includes("'") || w.includes("’") ? normalizeWord(w) : w;
    if (word) out.push(word);
  }
  return out;
}

/** What a word is indexed and looked up as: normalised and stemmed. */
export function termOf(raw: string): string {
  return stem(normalizeWord(raw));
}

function indexable(word: string): boolean {
  return !STOP_WORDS.has(word) && (word.length >= 2 || /^\d+$/.test(word));
}

/**
 * Calls `visit` with each search term of a text, in order, repeats included: stemmed words
 * without stop words, and after each hyphenated compound the compound written solid
 * ("pick-up" → "pick", "pickup"), so families who type it either way find it. One pass, no
 * arrays: the browser runs this over every question and excerpt when it builds the index.
 */
export function forEachTerm(text: string, visit: (term: string) => void): void {
  const folded = foldText(text);
  WORD_STEP.lastIndex = 0;
  let compound = "";
  let compoundParts = 0;
  let previousEnd = -1;
  for (let m = WORD_STEP.exec(folded); m !== null; m = WORD_STEP.exec(folded)) {
    const raw = m[0];
    const word = raw.includes("'") || raw.includes("’") ? normalizeWord(raw) : raw;
    const joined = m.index === previousEnd + 1 && folded[previousEnd] === "-";
    if (joined) {
      compound += word;
      compoundParts += 1;
    } else {
      if (compoundParts > 1 && indexable(compound)) visit(stem(compound));
      compound = word;
      compoundParts = 1;
    }
    previousEnd = m.index + raw.length;
    if (word && indexable(word)) visit(stem(word));
  }
  if (compoundParts > 1 && indexable(compound)) visit(stem(compound));
}

const WORD_STEP = new RegExp(WORD.source, "gu");

/** The distinct search terms of a text (see forEachTerm). */
export function termsOf(text: string): string[] {
  const out = new Set<string>();
  forEachTerm(text, (t) => out.add(t));
  return [...out];
}

export interface WordSpan {
  start: number;
  end: number;
  /** The word's search term (normalised and stemmed). */
  term: string;
}

/** Each word of a text with where it stands in the original string, for highlighting. */
export function wordSpans(text: string): WordSpan[] {
  const out: WordSpan[] = [];
  // Lower-casing ASCII keeps every character in place, so positions carry over; other text is folded word by word.
  const ascii = ASCII.test(text);
  const source = ascii ? text.toLowerCase() : text;
  for (const m of source.matchAll(WORD)) {
    const raw = m[0];
    const term = ascii && !raw.includes("'") ? stem(raw) : termOf(raw);
    out.push({ start: m.index, end: m.index + raw.length, term });
  }
  return out;
}
