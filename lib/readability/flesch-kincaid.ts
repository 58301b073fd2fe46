// Flesch–Kincaid grade level and Flesch Reading Ease (Kincaid, Fishburne, Rogers &
// Chissom, Research Branch Report 8-75, 1975). The formulas are exact; counting
// syllables in English is not, so every counter differs a little from every other.

/** EPA, "Readability for Developing and Pretesting…" (2021): not above 7th–8th grade. */
export const PLAIN_LANGUAGE_TARGET_GRADE = 8;
/** Same source: 4th–6th grade for critical information. */
export const CRITICAL_INFORMATION_TARGET_GRADE = 6;

export interface TextCounts {
  words: number;
  sentences: number;
  syllables: number;
}

function checkCounts(counts: TextCounts): void {
  if (!(counts.words > 0 && counts.sentences > 0)) {
    throw new RangeError(`readability needs at least one word and one sentence, got ${counts.words} and ${counts.sentences}`);
  }
}

/** 0.39·(words/sentences) + 11.8·(syllables/words) − 15.59 */
export function fleschKincaidGrade(counts: TextCounts): number {
  checkCounts(counts);
  return 0.39 * (counts.words / counts.sentences) + 11.8 * (counts.syllables / counts.words) - 15.59;
}

/** 206.835 − 1.015·(words/sentences) − 84.6·(syllables/words) */
export function fleschReadingEase(counts: TextCounts): number {
  checkCounts(counts);
  return 206.835 - 1.015 * (counts.words / counts.sentences) - 84.6 * (counts.syllables / counts.words);
}

/**
 * Syllables in one word by vowel groups, less a silent final e / es / ed. A
 * heuristic: "recipe" comes out at 2, not 3. Digits count one syllable each,
 * roughly how short numbers are read aloud.
 */
export function countSyllables(word: string): number {
  let total = 0;
  for (const part of word.toLowerCase().split(/[^a-z0-9]+/)) {
    if (part === "") continue;
    if (/^\d+$/.test(part)) {
      total += part.length;
      continue;
    }
    total += syllablesOfLetters(part.replace(/\d/g, ""));
  }
  return total;
}

function syllablesOfLetters(w: string): number {
  if (w.length === 0) return 0;
  if (w.length <= 3) return 1;
  let groups = (w.match(/[aeiouy]+/g) ?? []).length;
  // Vowel pairs usually read as two syllables: "radio", "media", "ammonium", "idea",
  // "being", "beyond", "science" (not "-tion", "-cial", "-gion", "patience").
  for (const split of [/[^ctsxg]io/, /[^cts]ia/, /iu/, /ea$/, /[aeiouy]ing$/, /[aeiou]y[aeiou](?![ds]$)/, /[^t]ience/]) {
    if (split.test(w)) groups += 1;
  }
  const consonantBefore = (suffixLength: number): string => w.charAt(w.length - suffixLength - 1);
  const isConsonant = (c: string): boolean => c !== "" && !"aeiouy".includes(c);
  if (w.endsWith("e") && !w.endsWith("ee") && !w.endsWith("ye")) {
    // -le after a consonant is a syllable of its own ("table", "people").
    const silent = !(w.endsWith("le") && isConsonant(consonantBefore(2)));
    if (silent && isConsonant(consonantBefore(1))) groups -= 1;
  } else if (w.endsWith("es")) {
    const before = consonantBefore(2);
    const sounded = "sxzcg".includes(before) || /(sh|ch)es$/.test(w) || (w.endsWith("les") && isConsonant(consonantBefore(3)));
    if (isConsonant(before) && !sounded) groups -= 1;
  } else if (w.endsWith("ed")) {
    const before = consonantBefore(2);
    if (isConsonant(before) && before !== "t" && before !== "d") groups -= 1;
  }
  return Math.max(1, groups);
}

const WORD = /[A-Za-z0-9]+(?:['’.\-][A-Za-z0-9]+)*/g;

// Markdown link targets and bare URLs are not prose.
function prose(text: string): string {
  return text.replace(/\]\([^)]*\)/g, "]").replace(/\bhttps?:\/\/\S+/gi, " ").replace(/\b[\w.+-]+@[\w-]+(\.[\w-]+)+\b/g, " ");
}

export function splitWords(text: string): string[] {
  return prose(text).match(WORD) ?? [];
}

// After these a full stop never ends a sentence ("Dr. Ortiz", "e.g. masks").
const NEVER_ENDS = new Set(["mr", "mrs", "ms", "dr", "st", "e.g", "i.e", "vs", "prof"]);
// After these it ends one only when the next word starts with a capital ("at 8 a.m. Doors open").
const ENDS_BEFORE_CAPITAL = new Set(["a.m", "p.m", "etc"]);

/**
 * Sentences: split after . ! ? (with closing quotes or brackets), at blank lines
 * and before list items, so headings and bullets count as sentences of their own.
 */
export function splitSentences(text: string): string[] {
  const sentences: string[] = [];
  const blocks = prose(text).split(/\n\s*\n|\n(?=\s*(?:[-*•+]|\d+[.)])\s)/);
  for (const block of blocks) {
    const chunks = block.split(/\s+/).filter((c) => c !== "");
    let current: string[] = [];
    chunks.forEach((chunk, i) => {
      current.push(chunk);
      const ending = /[.!?]+["'”’)\]]*$/.exec(chunk);
      if (!ending) return;
      if (/^\.+["'”’)\]]*$/.test(ending[0])) {
        const stem = chunk.replace(/^["'“‘(\[]+/, "").replace(/\.["'”’)\]]*$/, "").toLowerCase();
        if (NEVER_ENDS.has(stem) || /^[a-z]$/.test(stem)) return;
        const next = chunks[i + 1];
        if (ENDS_BEFORE_CAPITAL.has(stem) && next !== undefined && !/^["'“‘(\[]*[A-Z]/.test(next)) return;
      }
      sentences.push(current.join(" "));
      current = [];
    });
    if (current.length > 0) sentences.push(current.join(" "));
  }
  return sentences.filter((s) => splitWords(s).length > 0);
}

export function textCounts(text: string): TextCounts {
  const words = splitWords(text);
  return {
    words: words.length,
    sentences: splitSentences(text).length,
    syllables: words.reduce((sum, w) => sum + countSyllables(w), 0),
  };
}

/** null for text without a word in it. */
export function fleschKincaidGradeOfText(text: string): number | null {
  const counts = textCounts(text);
  return counts.words > 0 && counts.sentences > 0 ? fleschKincaidGrade(counts) : null;
}

/** null for text without a word in it. */
export function fleschReadingEaseOfText(text: string): number | null {
  const counts = textCounts(text);
  return counts.words > 0 && counts.sentences > 0 ? fleschReadingEase(counts) : null;
}

export interface SentenceGrade {
  sentence: string;
  grade: number;
  words: number;
  syllables: number;
}

/** The sentence with the highest grade (the first of equals), or null for text without words. */
export function hardestSentence(text: string): SentenceGrade | null {
  let hardest: SentenceGrade | null = null;
  for (const sentence of splitSentences(text)) {
    const words = splitWords(sentence);
    const syllables = words.reduce((sum, w) => sum + countSyllables(w), 0);
    const grade = fleschKincaidGrade({ words: words.length, sentences: 1, syllables });
    if (hardest === null || grade > hardest.grade) hardest = { sentence, grade, words: words.length, syllables };
  }
  return hardest;
}
