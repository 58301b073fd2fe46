import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("questions")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("reference", "text", (c) => c.notNull().unique())
    .addColumn("school_id", "integer", (c) => c.references("schools.id").onDelete("restrict"))
    .addColumn("topic", "text", (c) => c.notNull())
    .addColumn("room", "text")
    .addColumn("body", "text", (c) => c.notNull())
    .addColumn("asker_name", "text")
    .addColumn("asker_email", "text", (c) => c.notNull())
    .addColumn("language", "text", (c) => c.notNull().defaultTo("en"))
    .addColumn("state", "text", (c) => c.notNull().defaultTo("received"))
    .addColumn("technical", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("assignee_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("status_token_hash", "text", (c) => c.unique())
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .addColumn("updated_at", "text", (c) => c.notNull())
    .execute();
  await db.schema.createIndex("questions_state_idx").on("questions").columns(["state", "created_at"]).execute();
  await db.schema.createIndex("questions_asker_idx").on("questions").column("asker_email").execute();

  await db.schema
    .createTable("question_events")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.notNull().references("questions.id").onDelete("cascade"))
    .addColumn("actor_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("from_state", "text")
    .addColumn("to_state", "text")
    .addColumn("detail", "text")
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .execute();
  await db.schema.createIndex("question_events_question_idx").on("question_events").column("question_id").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("question_events").execute();
  await db.schema.dropTable("questions").execute();
}
