import type { PersonalDetailWarning } from "./desk-types";

// Finds words in an answer, or in the public version of a question, that look like a person's
// details: e-mail addresses, phone numbers, a child's name after "my son" / "our daughter", and
// health words said about someone in particular. A heuristic that warns; staff decide. Pure: the
// desk's editor runs it as staff type and the server runs it again when a draft is saved.

type Field = PersonalDetailWarning["field"];

interface Found {
  at: number;
  warning: PersonalDetailWarning;
}

const EMAIL = /[A-Za-z0-9._%+-]+@[A-Za-z0-9-]+(?:\.[A-Za-z0-9-]+)*\.[A-Za-z]{2,}/g;

// North American numbers: 555-123-4567, (555) 123-4567, 555.123.4567, 555 123 4567, +1 555 123 4567,
// 1-555-123-4567, 5551234567, with an optional extension. No digit may touch either end, so a
// reference such as Q-2026-0001 or a date is not a phone number.
const PHONE_10 = /(?<![\d-])(?:\+?1[\s.-]?)?(?:\(\d{3}\)\s?|\d{3}[\s.-]?)\d{3}[\s.-]?\d{4}(?:\s?(?:x|ext\.?)\s?\d{1,5})?(?!\d)/gi;
// Seven digits (555-1234) only count after a word that says it is a number to call.
const PHONE_7 = /\b(?:call|phone|text|cell|mobile|tel|telephone|number|reach (?:me|us) at)\b[^.\n\d]{0,20}(?<![\d-])(\d{3}[.-]\d{4})(?![\d-])/gi;

const RELATION =
  "son|daughter|child|kid|boy|girl|stepson|stepdaughter|grandson|granddaughter|grandchild|nephew|niece|twins?|kids|children|sons|daughters";
const POSSESSIVE = "my|our|his|her|their|your";
const AGE = String.raw`(?:\d{1,2}|[a-z]+)[- ]year[- ]old`;
const DESCRIBER = `(?:${AGE}|little|young|younger|youngest|older|oldest|eldest|middle|first|second|third|fourth|fifth|sixth|seventh|eighth|ninth|tenth|eleventh|twelfth|[a-z]+-grade|grade \\d{1,2})`;
// "my son Jamie", "my daughter, Priya,", "our 7-year-old son (Jamie)", "my son's name is Jamie",
// "my daughter named Priya", "my twins Ada and Lev". The name is read case-sensitively below.
const CHILD_NAME = new RegExp(
  String.raw`\b(?:${POSSESSIVE})\s+(?:${DESCRIBER}\s+){0,2}(?:${RELATION})\b(?:,?\s*(?:who is\s+)?(?:named|called)|'s name is|’s name is)?\s*[,(:—-]?\s*([^\s,.;:!?()"“”]+)`,
  "gi",
);

// Capitalised words that follow "my son" without being a name.
const NOT_A_NAME = new Set(
  [
    "I", "I'm", "I’m", "I've", "I’ve", "I'd", "I’d", "A", "An", "The", "And", "But", "Or", "So", "If", "When", "While", "Who", "Which", "That", "This",
    "Is", "Was", "Has", "Had", "Does", "Did", "Will", "Can", "Could", "Would", "Should", "Might", "May", "Must", "In", "At", "On", "To", "From",
    "With", "For", "Of", "By", "Says", "Said", "Told", "He", "She", "They", "We", "You", "Also", "Too", "Now", "Still", "Just", "Goes", "Attends",
    "Room", "Grade", "Class", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday", "Mr", "Mrs", "Ms", "Dr",
  ].map((w) => w.toLowerCase()),
);

// Health words that point at a condition or its treatment. "nurse", "health" and "office" alone do not.
const HEALTH =
  /\b(asthma|asthmatic|diabetes|diabetic|allerg(?:y|ies|ic)|anaphyla(?:xis|ctic)|diagnos(?:ed|is|es)|inhalers?|epi-?pens?|immuno-?compromised|immune[- ]?compromised|immunosuppressed|immune system|epilep(?:sy|tic)|seizures?|autis(?:m|tic)|adhd|cancer|chemotherapy|leuka?emia|cystic fibrosis|sickle[- ]cell|heart condition|lung condition|pregnan(?:t|cy)|disabilit(?:y|ies)|medications?|prescriptions?|tested positive|covid-positive)\b/gi;

// A sentence speaks of someone in particular when it has a personal pronoun or possessive, or a
// capitalised name with 's ("Jamie's inhaler").
const PERSONAL_WORD = /\b(?:my|our|his|her|hers|their|he|she|him|i|i'm|i’m|i've|i’ve|me|mine|your|you|yours)\b/i;
const NAME_POSSESSIVE = /(?<![\p{L}])\p{Lu}\p{Ll}+(?:'s|’s)(?![\p{L}])/u;

const SENTENCE = /[^.!?\n]+(?:[.!?]+|\n|$)/g;

function messageFor(kind: PersonalDetailWarning["kind"], field: Field, match: string): string {
  const where = field === "answer" ? "the answer" : "the public question";
  switch (kind) {
    case "email":
      return field === "answer"
        ? `An e-mail address in the answer ("${match}"). Keep it only if it is a district address, never a family's.`
        : `An e-mail address in the public question ("${match}"). Take it out before publishing.`;
    case "phone":
      return field === "answer"
        ? `A phone number in the answer ("${match}"). Keep it only if it is a school or district number, never a family's.`
        : `A phone number in the public question ("${match}"). Take it out before publishing.`;
    case "child_name":
      return `What looks like a child's name in ${where} ("${match}"). Write "my child" or "a student" instead.`;
    case "health":
      return `Health details about someone in ${where} ("${match}"). Say it without pointing at one child, e.g. "children with asthma".`;
  }
}

function warn(kind: PersonalDetailWarning["kind"], field: Field, match: string): PersonalDetailWarning {
  const clean = match.replace(/\s+/g, " ").trim();
  return { kind, field, match: clean, message: messageFor(kind, field, clean) };
}

function looksLikeName(word: string): boolean {
  if (!/^\p{Lu}[\p{L}'’-]*$/u.test(word)) return false;
  const bare = word.replace(/(?:'s|’s)$/, "");
  if (bare.length < 2) return false;
  return !NOT_A_NAME.has(bare.toLowerCase());
}

export function findPersonalDetails(text: string, field: Field): PersonalDetailWarning[] {
  const found: Found[] = [];
  const emailSpans: [number, number][] = [];

  for (const m of text.matchAll(EMAIL)) {
    const at = m.index ?? 0;
    emailSpans.push([at, at + m[0].length]);
    found.push({ at, warning: warn("email", field, m[0]) });
  }
  const insideEmail = (at: number) => emailSpans.some(([start, end]) => at >= start && at < end);

  const phoneSpans: [number, number][] = [];
  for (const m of text.matchAll(PHONE_10)) {
    const at = m.index ?? 0;
    if (insideEmail(at)) continue;
    phoneSpans.push([at, at + m[0].length]);
    found.push({ at, warning: warn("phone", field, m[0]) });
  }
  for (const m of text.matchAll(PHONE_7)) {
    const number = m[1] ?? "";
    const at = (m.index ?? 0) + m[0].lastIndexOf(number);
    if (insideEmail(at) || phoneSpans.some(([start, end]) => at >= start && at < end)) continue;
    found.push({ at, warning: warn("phone", field, number) });
  }

  for (const m of text.matchAll(CHILD_NAME)) {
    const name = m[1] ?? "";
    if (!looksLikeName(name)) continue;
    const at = m.index ?? 0;
    // The relationship words and the name, as written ("my daughter, Priya").
    const words = m[0].replace(/[()]/g, " ").replace(/[\s,:—-]+$/, "").replace(/(?:'s|’s)$/, "");
    found.push({ at, warning: warn("child_name", field, words) });
  }

  for (const s of text.matchAll(SENTENCE)) {
    const sentence = s[0];
    if (!PERSONAL_WORD.test(sentence) && !NAME_POSSESSIVE.test(sentence)) continue;
    for (const h of sentence.matchAll(HEALTH)) {
      found.push({ at: (s.index ?? 0) + (h.index ?? 0), warning: warn("health", field, h[0]) });
    }
  }

  found.sort((a, b) => a.at - b.at);
  const seen = new Set<string>();
  const out: PersonalDetailWarning[] = [];
  for (const { warning } of found) {
    const key = `${warning.kind}:${warning.match.toLowerCase()}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(warning);
  }
  return out;
}
