import { sql, type Kysely } from "kysely";

// What each room gets in the way of air: outdoor air from its unit ventilator or air
// handler (cfm), portable air cleaners (how many, and the clean air delivery rate of
// each, cfm), the filter rating (MERV 1–16, null when unknown) and whether its windows
// open. Stored in US units; metric input is converted on the way in.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable("rooms")
    .addColumn("outdoor_air_cfm", "real", (c) => c.notNull().defaultTo(0).check(sql`outdoor_air_cfm >= 0`))
    .execute();
  await db.schema
    .alterTable("rooms")
    .addColumn("air_cleaners", "integer", (c) => c.notNull().defaultTo(0).check(sql`air_cleaners >= 0`))
    .execute();
  await db.schema
    .alterTable("rooms")
    .addColumn("cadr_cfm_each", "real", (c) => c.notNull().defaultTo(0).check(sql`cadr_cfm_each >= 0`))
    .execute();
  await db.schema
    .alterTable("rooms")
    .addColumn("merv", "integer", (c) => c.check(sql`merv between 1 and 16`))
    .execute();
  await db.schema
    .alterTable("rooms")
    .addColumn("windows_open", "integer", (c) => c.notNull().defaultTo(0).check(sql`windows_open in (0, 1)`))
    .execute();
  await db.schema
    .alterTable("rooms")
    .addColumn("updated_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const column of ["updated_by", "windows_open", "merv", "cadr_cfm_each", "air_cleaners", "outdoor_air_cfm"]) {
    await db.schema.alterTable("rooms").dropColumn(column).execute();
  }
}
