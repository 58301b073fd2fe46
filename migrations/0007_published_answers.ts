import { sql, type Kysely } from "kysely";

// The public version of an answer: a rewritten question with no personal details, and the answer.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("published_answers")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.references("questions.id").onDelete("set null"))
    // null: the answer is for every school.
    .addColumn("school_id", "integer", (c) => c.references("schools.id").onDelete("restrict"))
    .addColumn("topic", "text", (c) => c.notNull())
    .addColumn("question_text", "text", (c) => c.notNull())
    .addColumn("answer_markdown", "text", (c) => c.notNull())
    .addColumn("published_at", "text", (c) => c.notNull())
    .addColumn("unpublished_at", "text")
    .addColumn("published_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .execute();
  await db.schema
    .createIndex("published_answers_live_idx")
    .on("published_answers")
    .columns(["unpublished_at", "published_at"])
    .execute();
  await db.schema.createIndex("published_answers_question_idx").on("published_answers").column("question_id").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("published_answers").execute();
}
