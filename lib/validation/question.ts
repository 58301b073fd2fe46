import { z } from "zod";
import { canonicalLanguageTag, DEFAULT_REPLY_LANGUAGE } from "@/lib/questions/languages";
import { QUESTION_TOPICS } from "@/lib/questions/state-machine";
import { NAME_MAX_LENGTH, QUESTION_MAX_LENGTH, QUESTION_MIN_LENGTH, ROOM_MAX_LENGTH } from "./question-limits";

export { DISTRICT_WIDE, NAME_MAX_LENGTH, QUESTION_MAX_LENGTH, QUESTION_MIN_LENGTH, ROOM_MAX_LENGTH } from "./question-limits";

// Control characters other than tab and line breaks, and lone UTF-16 surrogates (broken text).
const CONTROL_IN_TEXT = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]|\p{Cs}/u;
// One-line fields also refuse tabs and every kind of line break.
const CONTROL_IN_LINE = /[\u0000-\u001F\u007F-\u009F\u2028\u2029]|\p{Cs}/u;

const HIDDEN_CHARACTERS = "contains hidden control characters, perhaps from copying and pasting. Please type it again.";

function optionalLine(max: number, tooLong: string, field: string) {
  return z
    .string(`${field} must be text.`)
    .trim()
    .max(max, tooLong)
    .refine((v) => !CONTROL_IN_LINE.test(v), `${field} ${HIDDEN_CHARACTERS}`)
    .nullish()
    .transform((v) => (v ? v : undefined));
}

/**
 * A parent's question, as the JSON API and the form's server action both receive it.
 * `website` is the honeypot: people never see it, so a value means a script filled the form in.
 */
export const questionSchema = z.object(
  {
    school: z
      .string("Choose your child's school, or the whole district.")
      .trim()
      .min(1, "Choose your child's school, or the whole district.")
      .max(60, "Choose your child's school, or the whole district.")
      .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Choose your child's school, or the whole district."),
    // A string first, so a form that has not chosen yet ("") has the schema's input type.
    topic: z.string("Choose what your question is about.").pipe(z.enum(QUESTION_TOPICS, "Choose what your question is about.")),
    room: optionalLine(ROOM_MAX_LENGTH, `Keep the room or grade under ${ROOM_MAX_LENGTH} characters.`, "The room or grade"),
    question: z
      .string("Write your question.")
      .trim()
      .min(QUESTION_MIN_LENGTH, `Write your question in at least ${QUESTION_MIN_LENGTH} characters, so we can understand it.`)
      .max(QUESTION_MAX_LENGTH, "Keep your question to 2,000 characters or fewer. You can send a second question for the rest.")
      .refine((v) => !CONTROL_IN_TEXT.test(v), `Your question ${HIDDEN_CHARACTERS}`),
    name: optionalLine(NAME_MAX_LENGTH, `Keep your name under ${NAME_MAX_LENGTH} characters.`, "Your name"),
    email: z
      .string("Enter your e-mail address, so we can send you the reply.")
      .trim()
      .toLowerCase()
      .min(1, "Enter your e-mail address, so we can send you the reply.")
      .max(254, "That e-mail address is too long. Check it and try again.")
      .pipe(z.email("Enter your whole e-mail address, like name@example.org.")),
    language: z
      .string("Choose the language for our reply.")
      .trim()
      .max(35, "Choose the language for our reply.")
      .nullish()
      .transform((v, ctx) => {
        if (!v) return DEFAULT_REPLY_LANGUAGE;
        const tag = canonicalLanguageTag(v);
        if (tag) return tag;
        ctx.addIssue({ code: "custom", message: "Choose the language for our reply (a language tag such as en, es or zh-Hans)." });
        return z.NEVER;
      }),
    website: z
      .string()
      .nullish()
      .refine((v) => !v, "Leave this field empty. It is there to catch automated messages.")
      .transform(() => undefined),
  },
  "Send the question as a JSON object with at least school, topic, question and email.",
);

/** The form adds the consent tick box, which the server action checks too. */
export const askFormSchema = questionSchema.extend({
  consent: z
    .boolean("Tick the box to agree, so we can keep your question and reply to you.")
    .pipe(z.literal(true, "Tick the box to agree, so we can keep your question and reply to you.")),
});

export type QuestionInput = z.input<typeof questionSchema>;
export type QuestionSubmission = z.output<typeof questionSchema>;
export type AskFormInput = z.input<typeof askFormSchema>;
export type AskFormValues = z.output<typeof askFormSchema>;

/** The form's fields as the browser posts them (also without JavaScript); a ticked box arrives as "on". */
export function askFormFromFormData(form: FormData): Record<keyof AskFormInput, string | boolean | undefined> {
  const text = (key: string) => {
    const value = form.get(key);
    return typeof value === "string" ? value : undefined;
  };
  return {
    school: text("school"),
    topic: text("topic"),
    room: text("room"),
    question: text("question"),
    name: text("name"),
    email: text("email"),
    language: text("language"),
    website: text("website"),
    consent: form.get("consent") === "on",
  };
}
