import { sql, type Kysely } from "kysely";

// "Was this helpful?" on a published answer: one vote per browser, no account. The browser
// holds a random id in a cookie; only its SHA-256 is stored, so the table says nothing about
// who voted. A second vote from the same browser changes its vote instead of adding one.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("answer_votes")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("answer_id", "integer", (c) => c.notNull().references("published_answers.id").onDelete("cascade"))
    .addColumn("voter_hash", "text", (c) => c.notNull())
    // 1: it helped; 0: it did not.
    .addColumn("helpful", "integer", (c) => c.notNull().check(sql`helpful in (0, 1)`))
    .addColumn("created_at", "text", (c) => c.notNull())
    .addColumn("updated_at", "text", (c) => c.notNull())
    .execute();
  await db.schema.createIndex("answer_votes_voter_idx").on("answer_votes").columns(["answer_id", "voter_hash"]).unique().execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("answer_votes").execute();
}
