// Changes to the search synonym list, as plain functions on the list. Each refuses
// a change that would make the list ambiguous and says why, in words for staff.

import type { SynonymGroup } from "./synonyms";

export class SynonymListError extends Error {
  constructor(
    message: string,
    /** The form field the message belongs to. */
    readonly field: "words" | "_form" = "words",
  ) {
    super(message);
    this.name = "SynonymListError";
  }
}

/** "AC, Air  Conditioning ,,cooling" → ["ac", "air conditioning", "cooling"]: trimmed, lower case, no repeats. */
export function parseSynonymWords(text: string): string[] {
  const words = text
    .split(",")
    .map((w) => w.trim().replace(/\s+/g, " ").toLowerCase())
    .filter((w) => w !== "");
  return [...new Set(words)];
}

/** The same words, in any order. */
export function sameSynonymGroup(a: readonly string[], b: readonly string[]): boolean {
  if (a.length !== b.length) return false;
  const set = new Set(a);
  return b.every((w) => set.has(w));
}

const quoteGroup = (group: readonly string[]) => group.join(", ");

/** A word may be in one group only, or a search could not say which group it means. */
function checkNoOverlap(groups: readonly SynonymGroup[], group: readonly string[], skip: number): void {
  for (const [i, other] of groups.entries()) {
    if (i === skip) continue;
    const shared = group.find((w) => other.includes(w));
    if (shared !== undefined) {
      throw new SynonymListError(`“${shared}” is already in the group “${quoteGroup(other)}”. A word can be in one group only: add the other words to that group instead.`);
    }
  }
}

function indexOfGroup(groups: readonly SynonymGroup[], original: readonly string[]): number {
  const index = groups.findIndex((g) => sameSynonymGroup(g, original));
  if (index === -1) throw new SynonymListError("That group is no longer on the list; someone may have changed it. Reload the page to see the list as it is.", "_form");
  return index;
}

export function addSynonymGroup(groups: readonly SynonymGroup[], group: readonly string[]): SynonymGroup[] {
  checkNoOverlap(groups, group, -1);
  return [...groups.map((g) => [...g]), [...group]];
}

/** Replaces the group that has exactly the words `original` (the list as the page showed it). */
export function replaceSynonymGroup(groups: readonly SynonymGroup[], original: readonly string[], group: readonly string[]): SynonymGroup[] {
  const index = indexOfGroup(groups, original);
  checkNoOverlap(groups, group, index);
  return groups.map((g, i) => (i === index ? [...group] : [...g]));
}

export function removeSynonymGroup(groups: readonly SynonymGroup[], original: readonly string[]): SynonymGroup[] {
  const index = indexOfGroup(groups, original);
  return groups.filter((_, i) => i !== index).map((g) => [...g]);
}
