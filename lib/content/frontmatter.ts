import { z } from "zod";

export const CONTENT_TOPICS = ["cleaning", "air", "building", "signs", "distancing", "cases", "other"] as const;
export const REVIEWERS = ["facilities", "communications", "nurse"] as const;

export const frontmatterSchema = z.object({
  title: z.string().min(3).max(90),
  summary: z.string().min(20).max(160, "Keep the summary under 160 characters: it is shown in search results and link previews."),
  updated: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Write the updated date as YYYY-MM-DD, in quotes."),
  reviewedBy: z.enum(REVIEWERS),
  topics: z.array(z.enum(CONTENT_TOPICS)).min(1),
});

export type Frontmatter = z.infer<typeof frontmatterSchema>;

export const REVIEWER_LABELS: Record<Frontmatter["reviewedBy"], string> = {
  facilities: "the facilities office",
  communications: "the communications office",
  nurse: "the district nurse",
};
