import type { DB } from "@/db/connection";
import { rateLimitAddressKey } from "@/lib/http/client-ip";
import { enqueueMail, messageIdHost } from "@/lib/mail/outbox";
import { isoDateInTimeZone, replyDueDate } from "@/lib/school-days/calendar";
import { getSchoolBySlug } from "@/lib/schools/repository";
import { districtCalendar, districtName, districtTimeZone, replyTargetSchoolDays } from "@/lib/settings/district";
import { fieldErrors } from "@/lib/validation/field-errors";
import { DISTRICT_WIDE, questionSchema } from "@/lib/validation/question";
import { confirmationMail } from "./confirmation-mail";
import { TOPIC_LABELS } from "./labels";
import { languageName } from "./languages";
import { recordSubmission, secondsUntilAllowed, submitterKeys, type RateLimit } from "./rate-limit";
import { nextQuestionReference } from "./reference";
import { isTechnicalTopic } from "./state-machine";
import { newStatusToken, statusPath } from "./status-token";

export const CONFIRMATION_MAIL_KIND = "question-received";
const UNKNOWN_SCHOOL = "Choose a school from the list, or the whole district.";

export interface SubmitOptions {
  /** The asker's IP address as clientIp() found it, or "unknown". */
  ip: string;
  /** Keys the hashes kept for the rate limit (AUTH_SECRET). */
  secret: string;
  /** The public address the status link starts with. */
  appUrl: string;
  rateLimit: RateLimit;
  via: "api" | "form";
  now?: Date;
}

export type SubmitResult =
  | { ok: true; reference: string; state: "received"; statusUrl: string }
  | { ok: false; reason: "invalid"; errors: Record<string, string> }
  | { ok: false; reason: "rate_limited"; retryAfterSeconds: number };

/**
 * The one way a public question gets in, for the JSON API and the form alike: validate, then in a
 * single transaction check the rate limit, store the question in `received` with its first event,
 * and queue the confirmation e-mail. Anything refused stores nothing and sends nothing.
 */
export async function submitQuestion(db: DB, input: unknown, options: SubmitOptions): Promise<SubmitResult> {
  const parsed = questionSchema.safeParse(input);
  if (!parsed.success) {
    const errors = fieldErrors(parsed.error);
    // Every problem at once: an unknown school is reported with the rest, not after they are fixed.
    const slug = (input as { school?: unknown } | null)?.school;
    if (!errors.school && typeof slug === "string" && slug.trim() !== DISTRICT_WIDE && !(await getSchoolBySlug(db, slug.trim()))) {
      errors.school = UNKNOWN_SCHOOL;
    }
    return { ok: false, reason: "invalid", errors };
  }
  const q = parsed.data;

  const school = q.school === DISTRICT_WIDE ? null : await getSchoolBySlug(db, q.school);
  if (q.school !== DISTRICT_WIDE && !school) return { ok: false, reason: "invalid", errors: { school: UNKNOWN_SCHOOL } };

  const now = options.now ?? new Date();
  const [district, targetSchoolDays, calendar, timeZone] = await Promise.all([
    districtName(db),
    replyTargetSchoolDays(db),
    districtCalendar(db),
    districtTimeZone(db),
  ]);
  const today = isoDateInTimeZone(now, timeZone);
  const replyBy = replyDueDate(today, targetSchoolDays, calendar);
  const keys = submitterKeys(rateLimitAddressKey(options.ip), q.email, options.secret);
  const { token, hash } = newStatusToken();
  const statusUrl = new URL(statusPath(token), options.appUrl).toString();
  const technical = isTechnicalTopic(q.topic);
  const at = now.toISOString();

  return db.transaction().execute(async (trx): Promise<SubmitResult> => {
    const wait = await secondsUntilAllowed(trx, keys, options.rateLimit, now);
    if (wait > 0) return { ok: false, reason: "rate_limited", retryAfterSeconds: wait };

    const reference = await nextQuestionReference(trx, Number(today.slice(0, 4)));
    const { id } = await trx
      .insertInto("questions")
      .values({
        reference,
        school_id: school?.id ?? null,
        topic: q.topic,
        room: q.room ?? null,
        body: q.question,
        asker_name: q.name ?? null,
        asker_email: q.email,
        language: q.language,
        state: "received",
        technical: technical ? 1 : 0,
        status_token_hash: hash,
        created_at: at,
        updated_at: at,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await trx
      .insertInto("question_events")
      .values({ question_id: id, kind: "received", to_state: "received", detail: JSON.stringify({ via: options.via }), created_at: at })
      .execute();
    await recordSubmission(trx, keys, options.rateLimit, now);

    const mail = confirmationMail({
      districtName: district,
      reference,
      question: q.question,
      schoolName: school?.name ?? null,
      topicLabel: TOPIC_LABELS[q.topic] ?? q.topic,
      room: q.room ?? null,
      askerName: q.name ?? null,
      languageName: languageName(q.language),
      technical,
      targetSchoolDays,
      replyBy,
      statusUrl,
    });
    await enqueueMail(trx, { kind: CONFIRMATION_MAIL_KIND, to: q.email, ...mail }, now, { host: messageIdHost(options.appUrl) });
    return { ok: true, reference, state: "received", statusUrl };
  });
}
