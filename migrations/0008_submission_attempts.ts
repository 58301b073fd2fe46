import type { Kysely } from "kysely";

// Accepted public questions, for the per-address rate limit. Only keyed hashes are kept:
// never the raw IP address or e-mail. Rows older than the window are pruned on each submission.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("submission_attempts")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("ip_hash", "text", (c) => c.notNull())
    .addColumn("email_hash", "text", (c) => c.notNull())
    .addColumn("created_at", "text", (c) => c.notNull())
    .execute();
  await db.schema.createIndex("submission_attempts_ip_idx").on("submission_attempts").columns(["ip_hash", "created_at"]).execute();
  await db.schema
    .createIndex("submission_attempts_email_idx")
    .on("submission_attempts")
    .columns(["email_hash", "created_at"])
    .execute();
  await db.schema.createIndex("submission_attempts_created_idx").on("submission_attempts").column("created_at").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("submission_attempts").execute();
}
