import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("users")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("email", "text", (c) => c.notNull().unique())
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("role", "text", (c) => c.notNull().check(sql`role in ('communications', 'facilities', 'admin')`))
    .addColumn("password_hash", "text", (c) => c.notNull())
    .addColumn("disabled_at", "text")
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .addColumn("updated_at", "text", (c) => c.notNull())
    .execute();

  // Who changed which account, and how: accounts are never edited silently.
  await db.schema
    .createTable("staff_events")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("actor_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("subject_user_id", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("detail", "text")
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("staff_events").execute();
  await db.schema.dropTable("users").execute();
}
