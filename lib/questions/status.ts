import type { DB } from "@/db/connection";
import { isoDateInTimeZone, replyDueDate, type IsoDate } from "@/lib/school-days/calendar";
import { districtCalendar, districtTimeZone, replyTargetSchoolDays } from "@/lib/settings/district";
import { TOPIC_LABELS } from "./labels";
import { parentStatus, type ParentStatus } from "./parent-status";
import { isQuestionState, isTerminalState } from "./state-machine";
import { hashStatusToken } from "./status-token";

/** What the asker's private page shows. Holds nothing about the asker beyond their own words. */
export interface QuestionStatusView {
  reference: string;
  receivedAt: string;
  schoolName: string | null;
  topic: string;
  topicLabel: string;
  room: string | null;
  question: string;
  state: string;
  status: ParentStatus;
  /** When the reply is due, while the question is still open. */
  replyBy: IsoDate | null;
  reply: { bodyMarkdown: string; sentAt: string } | null;
}

/**
 * The question a private status token belongs to, or null. Every token, well-formed or not, is
 * hashed and looked up the same way, so neither the answer nor its timing tells a guess apart.
 */
export async function questionStatusByToken(db: DB, token: string): Promise<QuestionStatusView | null> {
  const row = await db
    .selectFrom("questions")
    .leftJoin("schools", "schools.id", "questions.school_id")
    .leftJoin("question_replies", "question_replies.question_id", "questions.id")
    .select([
      "questions.reference",
      "questions.created_at",
      "schools.name as schoolName",
      "questions.topic",
      "questions.room",
      "questions.body",
      "questions.state",
      "question_replies.body_markdown as replyBody",
      "question_replies.sent_at as replySentAt",
    ])
    .where((eb) => {
      const hash = hashStatusToken(token.slice(0, 200));
      // The link from the confirmation e-mail, or the one from a reply e-mail.
      return eb.or([
        eb("questions.status_token_hash", "=", hash),
        eb("questions.id", "in", eb.selectFrom("question_status_tokens").select("question_id").where("token_hash", "=", hash)),
      ]);
    })
    .executeTakeFirst();
  if (!row) return null;

  const open = !(isQuestionState(row.state) && isTerminalState(row.state));
  let replyBy: IsoDate | null = null;
  if (open) {
    const [target, calendar, timeZone] = await Promise.all([replyTargetSchoolDays(db), districtCalendar(db), districtTimeZone(db)]);
    replyBy = replyDueDate(isoDateInTimeZone(new Date(row.created_at), timeZone), target, calendar);
  }
  return {
    reference: row.reference,
    receivedAt: row.created_at,
    schoolName: row.schoolName,
    topic: row.topic,
    topicLabel: TOPIC_LABELS[row.topic] ?? row.topic,
    room: row.room,
    question: row.body,
    state: row.state,
    status: parentStatus(row.state),
    replyBy,
    reply: row.replyBody && row.replySentAt ? { bodyMarkdown: row.replyBody, sentAt: row.replySentAt } : null,
  };
}
