import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("building_projects")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("school_id", "integer", (c) => c.notNull().references("schools.id").onDelete("cascade"))
    .addColumn("key", "text", (c) => c.notNull())
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("summary", "text", (c) => c.notNull())
    .addColumn("status", "text", (c) => c.notNull().check(sql`status in ('planned', 'under_way', 'finished')`))
    // The day it finished, or the day it is expected to start or finish; a calendar date.
    .addColumn("status_date", "text", (c) => c.notNull())
    .addColumn("sort_order", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("updated_at", "text", (c) => c.notNull())
    .addColumn("updated_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addUniqueConstraint("building_projects_school_key_unique", ["school_id", "key"])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("building_projects").execute();
}
