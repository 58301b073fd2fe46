import { sql } from "kysely";
import type { DB } from "@/db/connection";
import type { StaffUser } from "@/lib/auth/authenticate";
import type { QueueQuery } from "@/lib/validation/desk";
import type { QueueItem, QueuePage } from "../desk-types";
import { TECHNICAL_TOPICS, TERMINAL_STATES, type QuestionState } from "../state-machine";
import { deskCalendar, replyTiming } from "./calendar";

// Due dates follow arrival order (every question has the same school-day target), so
// "due" sorts by arrival; the reference column sorts the same way within a year.
const SORT_COLUMNS = {
  received: "questions.created_at",
  due: "questions.created_at",
  reference: "questions.reference",
  state: "questions.state",
  school: "schools.name",
  topic: "questions.topic",
} as const;

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** One page of the desk's queue, filtered, searched and sorted on the server. */
export async function listQueue(db: DB, query: QueueQuery, viewer: StaffUser, now: Date = new Date()): Promise<QueuePage> {
  let base = db.selectFrom("questions").leftJoin("schools", "schools.id", "questions.school_id").leftJoin("users", "users.id", "questions.assignee_id");

  if (query.state === "open") base = base.where("questions.state", "not in", [...TERMINAL_STATES]);
  else if (query.state !== "all") base = base.where("questions.state", "=", query.state);
  if (query.school) base = query.school === "district" ? base.where("questions.school_id", "is", null) : base.where("schools.slug", "=", query.school);
  if (query.topic) base = base.where("questions.topic", "=", query.topic);
  if (query.technical) {
    const technical = sql<boolean>`(questions.technical = 1 or questions.topic in (${sql.join([...TECHNICAL_TOPICS])}))`;
    base = base.where(query.technical === "yes" ? technical : sql<boolean>`not ${technical}`);
  }
  if (query.assignee === "me") base = base.where("questions.assignee_id", "=", viewer.id);
  else if (query.assignee === "none") base = base.where("questions.assignee_id", "is", null);
  else if (query.assignee) base = base.where("questions.assignee_id", "=", Number(query.assignee));
  if (query.q) {
    // Every word must appear somewhere: reference, question, asker's name or address, room.
    for (const word of query.q.split(/\s+/).filter(Boolean).slice(0, 8)) {
      const like = `%${escapeLike(word.toLowerCase())}%`;
      base = base.where((eb) =>
        eb.or(
          (["questions.reference", "questions.body", "questions.asker_name", "questions.asker_email", "questions.room"] as const).map((c) =>
            eb(sql<string>`lower(coalesce(${sql.ref(c)}, ''))`, "like", sql<string>`${like} escape '\\'`),
          ),
        ),
      );
    }
  }

  const { total } = await base.select((eb) => eb.fn.countAll<number>().as("total")).executeTakeFirstOrThrow();
  const rows = await base
    .select([
      "questions.id",
      "questions.reference",
      "questions.created_at",
      "questions.topic",
      "questions.state",
      "questions.technical",
      "questions.body",
      "schools.id as schoolId",
      "schools.slug as schoolSlug",
      "schools.name as schoolName",
      "users.id as assigneeId",
      "users.name as assigneeName",
    ])
    .orderBy(SORT_COLUMNS[query.sort], query.dir)
    .orderBy("questions.id", query.dir)
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize)
    .execute();

  const cal = await deskCalendar(db, now);
  const items: QueueItem[] = rows.map((r) => ({
    id: r.id,
    reference: r.reference,
    receivedAt: r.created_at,
    school: r.schoolId !== null && r.schoolSlug && r.schoolName ? { id: r.schoolId, slug: r.schoolSlug, name: r.schoolName } : null,
    topic: r.topic,
    state: r.state as QuestionState,
    assignee: r.assigneeId !== null && r.assigneeName ? { id: r.assigneeId, name: r.assigneeName } : null,
    ...replyTiming(r.created_at, r.state, cal),
    technical: r.technical === 1 || TECHNICAL_TOPICS.some((t) => t === r.topic),
    excerpt: r.body.length > 160 ? `${r.body.slice(0, 157).trimEnd()}…` : r.body,
  }));
  return { items, total: Number(total), page: query.page, pageSize: query.pageSize };
}
