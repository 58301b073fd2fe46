import { z } from "zod";
import { parseSynonymWords } from "@/lib/settings/synonym-groups";
import { synonymGroupsSchema } from "@/lib/settings/synonyms";

const groupSchema = synonymGroupsSchema.element;
const wordSchema = groupSchema.element;

/** A group typed as words separated by commas; the message names the word that is wrong. */
const wordsField = z
  .string("Enter the words, separated by commas.")
  .max(1000, "That is too long for one group.")
  .transform(parseSynonymWords)
  .superRefine((words, ctx) => {
    for (const word of words) {
      const checked = wordSchema.safeParse(word);
      if (!checked.success) {
        const problem = checked.error.issues[0]?.message ?? "Not a usable word.";
        ctx.addIssue({ code: "custom", message: `“${word}”: ${problem.charAt(0).toLowerCase()}${problem.slice(1)}` });
        return;
      }
    }
    const group = groupSchema.safeParse(words);
    if (!group.success) ctx.addIssue({ code: "custom", message: group.error.issues[0]?.message ?? "Check the words." });
  });

/** The words of a group as the page showed it, to find that group again on the server. */
const originalGroup = z.array(z.string().max(200)).min(1).max(50);

export const synonymGroupAddSchema = z.object({ words: wordsField });
export const synonymGroupEditSchema = z.object({ original: originalGroup, words: wordsField });
export const synonymGroupRemoveSchema = z.object({ original: originalGroup });

export type SynonymGroupAddInput = z.input<typeof synonymGroupAddSchema>;
export type SynonymGroupEditInput = z.input<typeof synonymGroupEditSchema>;
