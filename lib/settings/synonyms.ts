import { z } from "zod";
import type { DB } from "@/db/connection";
import { getSetting, putSetting } from "./repository";

/**
 * Words families use for the same thing. A search for any word of a group also
 * looks for the others, so "AC" finds answers that say "air conditioning".
 * The administrator extends the list in Settings.
 */
export type SynonymGroup = string[];

export const SEARCH_SYNONYMS_KEY = "search_synonyms";

export const DEFAULT_SEARCH_SYNONYMS: SynonymGroup[] = [
  ["ac", "air conditioning", "air conditioner", "cooling"],
  ["hvac", "ventilation", "air handling"],
  ["mask", "face covering", "face mask"],
  ["sanitizer", "disinfectant", "sanitiser"],
];

const term = z
  .string()
  .trim()
  .toLowerCase()
  .min(2, "A word must be at least 2 letters.")
  .max(40, "Keep a word under 40 letters.")
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} '\-]*$/u, "Use letters, numbers, spaces, apostrophes and hyphens only.");

export const synonymGroupsSchema = z
  .array(z.array(term).min(2, "A group needs at least two words.").max(12, "Keep a group to 12 words."))
  .max(100, "Keep the list to 100 groups.");

export function getSearchSynonyms(db: DB): Promise<SynonymGroup[]> {
  return getSetting(db, SEARCH_SYNONYMS_KEY, synonymGroupsSchema, DEFAULT_SEARCH_SYNONYMS);
}

export async function putSearchSynonyms(db: DB, groups: SynonymGroup[]): Promise<void> {
  await putSetting(db, SEARCH_SYNONYMS_KEY, synonymGroupsSchema.parse(groups));
}
