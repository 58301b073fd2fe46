import type { DB } from "@/db/connection";

export interface QueueRow {
  id: number;
  reference: string;
  receivedAt: string;
  school: string | null;
  topic: string;
  state: string;
  technical: boolean;
}

/** Questions still waiting for a reply, oldest first. */
export async function listOpenQuestions(db: DB, limit = 50): Promise<QueueRow[]> {
  const rows = await db
    .selectFrom("questions")
    .leftJoin("schools", "schools.id", "questions.school_id")
    .select([
      "questions.id",
      "questions.reference",
      "questions.created_at",
      "schools.name as school",
      "questions.topic",
      "questions.state",
      "questions.technical",
    ])
    .where("questions.state", "not in", ["answered", "declined", "merged"])
    .orderBy("questions.created_at", "asc")
    .limit(limit)
    .execute();
  return rows.map((r) => ({
    id: r.id,
    reference: r.reference,
    receivedAt: r.created_at,
    school: r.school,
    topic: r.topic,
    state: r.state,
    technical: r.technical === 1,
  }));
}

export async function countQuestionsByState(db: DB): Promise<Record<string, number>> {
  const rows = await db
    .selectFrom("questions")
    .select(["state", (eb) => eb.fn.countAll<number>().as("n")])
    .groupBy("state")
    .execute();
  return Object.fromEntries(rows.map((r) => [r.state, Number(r.n)]));
}
