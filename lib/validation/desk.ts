import { z } from "zod";
import { QUESTION_STATES, QUESTION_TOPICS } from "@/lib/questions/state-machine";

// One schema per desk input, shared by the desk's forms and the route handlers.

export const QUEUE_SORTS = ["received", "due", "reference", "state", "school", "topic"] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .optional()
    .transform((v) => (v ? v : undefined));

/** The queue's query string: every field optional, unknown values refused with a message. */
export const queueQuerySchema = z.object({
  // "open" (default): everything still waiting; "all": every state; or one state.
  state: z.union([z.enum(["open", "all"]), z.enum(QUESTION_STATES)], "Choose a state from the list.").default("open"),
  school: optionalText(80),
  topic: z.enum(QUESTION_TOPICS, "Choose a topic from the list.").optional(),
  technical: z.enum(["yes", "no"], "Choose yes or no.").optional(),
  // "me", "none", or a staff id.
  assignee: z
    .string()
    .regex(/^(me|none|\d{1,9})$/, "Choose someone from the list.")
    .optional(),
  q: optionalText(200),
  sort: z.enum(QUEUE_SORTS, "Choose a sort from the list.").default("due"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  page: z.coerce.number().int().min(1, "Pages start at 1.").max(100_000).default(1),
  pageSize: z.coerce.number().int().min(5).max(100).default(25),
});
export type QueueQuery = z.infer<typeof queueQuerySchema>;

export const assignSchema = z.object({
  assigneeId: z.number().int().positive().nullable(),
});

export const noteSchema = z.object({
  body: z.string().trim().min(1, "Write the note first.").max(4000, "Keep a note under 4,000 characters."),
});

export const draftSchema = z.object({
  bodyMarkdown: z.string().trim().min(1, "Write the answer first.").max(20_000, "Keep the answer under 20,000 characters."),
  // The question as the public will read it, rewritten without personal details. Optional until publishing.
  publicQuestion: z.string().trim().max(1000, "Keep the public question under 1,000 characters.").optional().default(""),
});
export type DraftInput = z.infer<typeof draftSchema>;

export const technicalSchema = z.object({ technical: z.boolean() });

export const reviewSchema = z
  .object({
    decision: z.enum(["approve", "changes"], "Choose approve or send back."),
    comment: z.string().trim().max(4000, "Keep the comment under 4,000 characters.").optional().default(""),
  })
  .refine((v) => v.decision === "approve" || v.comment.length > 0, {
    path: ["comment"],
    message: "Say what needs to change.",
  });
export type ReviewInput = z.infer<typeof reviewSchema>;

export const declineSchema = z.object({
  reason: z.string().trim().min(10, "Give the asker a reason of at least a few words.").max(2000, "Keep the reason under 2,000 characters."),
});
export type DeclineInput = z.infer<typeof declineSchema>;

export const mergeSchema = z.object({
  intoId: z.number().int().positive("Choose the question to join this one to."),
});
export type MergeInput = z.infer<typeof mergeSchema>;

export const publishSchema = z.object({
  questionText: z
    .string()
    .trim()
    .min(10, "Write the question as the public will read it.")
    .max(1000, "Keep the public question under 1,000 characters."),
  // The school the public version belongs to; null: every school.
  schoolId: z.number().int().positive().nullable(),
  topic: z.enum(QUESTION_TOPICS, "Choose a topic from the list."),
});
export type PublishInput = z.infer<typeof publishSchema>;

export const snippetSchema = z.object({
  title: z.string().trim().min(3, "Give the snippet a short title.").max(120, "Keep the title under 120 characters."),
  bodyMarkdown: z.string().trim().min(1, "Write the snippet text.").max(5000, "Keep a snippet under 5,000 characters."),
});
export type SnippetInput = z.infer<typeof snippetSchema>;
