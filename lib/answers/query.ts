import { z } from "zod";
import { QUESTION_TOPICS } from "@/lib/questions/state-machine";
import { DISTRICT, MAX_QUERY_LENGTH } from "./constants";

export { answersHref } from "./href";

/** What `?q=&school=&topic=` may hold, on the answers page and in GET /api/answers. Empty means "any". */
export const answersQuerySchema = z.object({
  q: z
    .string()
    .max(MAX_QUERY_LENGTH, `Keep the search under ${MAX_QUERY_LENGTH} characters.`)
    .transform((v) => v.replace(/\s+/g, " ").trim())
    .default(""),
  school: z
    .string()
    .trim()
    .regex(/^(?:[a-z0-9]+(?:-[a-z0-9]+)*)?$/, "Use a school's short name, such as tamsin-creek, or district.")
    .default(""),
  topic: z
    .string()
    .trim()
    .refine((v) => v === "" || (QUESTION_TOPICS as readonly string[]).includes(v), `Use one of: ${QUESTION_TOPICS.join(", ")}.`)
    .default(""),
});

export type AnswersQuery = z.infer<typeof answersQuerySchema>;

function one(value: string | string[] | null | undefined): string | undefined {
  if (Array.isArray(value)) return value[0];
  return value ?? undefined;
}

/**
 * Reads the query from URL parameters. An unknown school is an error too (the API says so);
 * the page drops a bad value instead and searches without it.
 */
export function parseAnswersQuery(
  params: URLSearchParams | Record<string, string | string[] | undefined>,
  schoolSlugs: readonly string[],
): { ok: true; query: AnswersQuery } | { ok: false; errors: Record<string, string>; query: AnswersQuery } {
  const get = (key: string) => (params instanceof URLSearchParams ? params.get(key) : one(params[key]));
  const raw = { q: get("q") ?? undefined, school: get("school") ?? undefined, topic: get("topic") ?? undefined };
  const errors: Record<string, string> = {};
  const query: AnswersQuery = { q: "", school: "", topic: "" };
  for (const key of ["q", "school", "topic"] as const) {
    const field = answersQuerySchema.shape[key].safeParse(raw[key]);
    if (field.success) query[key] = field.data;
    else errors[key] = field.error.issues[0]?.message ?? "Not a valid value.";
  }
  if (query.school && query.school !== DISTRICT && !schoolSlugs.includes(query.school)) {
    errors.school = `There is no school "${query.school}". Use ${[...schoolSlugs, DISTRICT].join(", ")}.`;
    query.school = "";
  }
  return Object.keys(errors).length ? { ok: false, errors, query } : { ok: true, query };
}
