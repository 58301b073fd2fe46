import { sql, type Kysely } from "kysely";

// Migrations are frozen in time: they take Kysely<any> and import no app code.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("schools")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("slug", "text", (c) => c.notNull().unique())
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("level", "text", (c) => c.notNull().check(sql`level in ('elementary', 'middle', 'high')`))
    .addColumn("grades", "text", (c) => c.notNull())
    .addColumn("address", "text", (c) => c.notNull())
    .addColumn("phone", "text", (c) => c.notNull())
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .execute();

  await db.schema
    .createTable("rooms")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("school_id", "integer", (c) => c.notNull().references("schools.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("use", "text", (c) => c.notNull())
    .addColumn("length_ft", "real", (c) => c.notNull().check(sql`length_ft > 0`))
    .addColumn("width_ft", "real", (c) => c.notNull().check(sql`width_ft > 0`))
    .addColumn("ceiling_ft", "real", (c) => c.notNull().check(sql`ceiling_ft > 0`))
    .addColumn("occupancy", "integer", (c) => c.notNull().check(sql`occupancy >= 0`))
    .addColumn("created_at", "text", (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .addColumn("updated_at", "text", (c) => c.notNull())
    .addUniqueConstraint("rooms_school_name_unique", ["school_id", "name"])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("rooms").execute();
  await db.schema.dropTable("schools").execute();
}
