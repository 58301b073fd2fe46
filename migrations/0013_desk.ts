import { sql, type Kysely } from "kysely";

const now = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

// The desk: answer drafts (every revision kept), internal notes, reusable reply snippets,
// extra private status links (one per reply sent), and what a question was merged into
// and which draft facilities approved.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable("questions")
    .addColumn("merged_into_id", "integer", (c) => c.references("questions.id").onDelete("set null"))
    .execute();
  // The draft facilities approved; a later draft needs a new check before it can go out.
  await db.schema.alterTable("questions").addColumn("approved_draft_id", "integer").execute();
  await db.schema.createIndex("questions_merged_into_idx").on("questions").column("merged_into_id").execute();

  await db.schema
    .createTable("question_drafts")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.notNull().references("questions.id").onDelete("cascade"))
    .addColumn("body_markdown", "text", (c) => c.notNull())
    .addColumn("public_question", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("author_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex("question_drafts_question_idx").on("question_drafts").columns(["question_id", "id"]).execute();

  await db.schema
    .createTable("question_notes")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.notNull().references("questions.id").onDelete("cascade"))
    .addColumn("author_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("body", "text", (c) => c.notNull())
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex("question_notes_question_idx").on("question_notes").column("question_id").execute();

  await db.schema
    .createTable("reply_snippets")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("body_markdown", "text", (c) => c.notNull())
    .addColumn("updated_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_at", "text", (c) => c.notNull().defaultTo(now))
    .execute();

  // The first status link's hash stays on questions; each reply e-mail carries a fresh link of its own.
  await db.schema
    .createTable("question_status_tokens")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("question_id", "integer", (c) => c.notNull().references("questions.id").onDelete("cascade"))
    .addColumn("token_hash", "text", (c) => c.notNull().unique())
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(now))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("question_status_tokens").execute();
  await db.schema.dropTable("reply_snippets").execute();
  await db.schema.dropTable("question_notes").execute();
  await db.schema.dropTable("question_drafts").execute();
  await db.schema.dropIndex("questions_merged_into_idx").execute();
  await db.schema.alterTable("questions").dropColumn("approved_draft_id").execute();
  await db.schema.alterTable("questions").dropColumn("merged_into_id").execute();
}
