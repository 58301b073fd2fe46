import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("outbox")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("to_address", "text", (c) => c.notNull())
    .addColumn("subject", "text", (c) => c.notNull())
    .addColumn("text_body", "text", (c) => c.notNull())
    .addColumn("html_body", "text")
    .addColumn("status", "text", (c) =>
      c.notNull().defaultTo("pending").check(sql`status in ('pending', 'sending', 'sent', 'failed')`),
    )
    .addColumn("attempts", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("next_attempt_at", "text", (c) => c.notNull())
    .addColumn("claimed_at", "text")
    .addColumn("last_error", "text")
    .addColumn("message_id", "text", (c) => c.notNull().unique())
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .addColumn("sent_at", "text")
    .execute();
  await db.schema.createIndex("outbox_due_idx").on("outbox").columns(["status", "next_attempt_at"]).execute();

  await db.schema
    .createTable("outbox_attempts")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("outbox_id", "integer", (c) => c.notNull().references("outbox.id").onDelete("cascade"))
    .addColumn("attempted_at", "text", (c) => c.notNull())
    .addColumn("ok", "integer", (c) => c.notNull())
    .addColumn("error", "text")
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("outbox_attempts").execute();
  await db.schema.dropTable("outbox").execute();
}
