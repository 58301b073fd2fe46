import type { Kysely } from "kysely";

// The reply as it was sent to the asker, one per question; the asker's status page shows it.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("question_replies")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.notNull().unique().references("questions.id").onDelete("cascade"))
    .addColumn("body_markdown", "text", (c) => c.notNull())
    .addColumn("sent_at", "text", (c) => c.notNull())
    .addColumn("sent_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("question_replies").execute();
}
