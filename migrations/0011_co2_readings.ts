import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>): Promise<void> {
  // One row per sensor reading. The key is the room and the instant (ISO 8601 in UTC,
  // so the same reading written with another offset is still a duplicate). WITHOUT
  // ROWID keeps a million-row table to one B-tree instead of a table plus an index.
  await db.schema
    .createTable("co2_readings")
    .addColumn("room_id", "integer", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("measured_at", "text", (c) => c.notNull())
    .addColumn("co2_ppm", "real", (c) => c.notNull().check(sql`co2_ppm > 0`))
    .addPrimaryKeyConstraint("co2_readings_pk", ["room_id", "measured_at"])
    .modifyEnd(sql`without rowid`)
    .execute();

  // Daily figures per room and school day, recomputed from the readings after each import,
  // so public pages read a small table. The threshold they were counted against is kept.
  await db.schema
    .createTable("co2_daily")
    .addColumn("room_id", "integer", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("day", "text", (c) => c.notNull())
    .addColumn("readings", "integer", (c) => c.notNull())
    .addColumn("covered_minutes", "real", (c) => c.notNull())
    .addColumn("mean_ppm", "real", (c) => c.notNull())
    .addColumn("peak_ppm", "real", (c) => c.notNull())
    .addColumn("minutes_above", "real", (c) => c.notNull())
    .addColumn("threshold_ppm", "real", (c) => c.notNull())
    .addColumn("steady_state_ppm", "real")
    .addColumn("computed_at", "text", (c) => c.notNull())
    .addPrimaryKeyConstraint("co2_daily_pk", ["room_id", "day"])
    .execute();
  await db.schema.createIndex("co2_daily_day").on("co2_daily").column("day").execute();

  // Who uploaded what, and what it did.
  await db.schema
    .createTable("co2_imports")
    .addColumn("id", "integer", (c) => c.primaryKey().autoIncrement())
    .addColumn("file_name", "text", (c) => c.notNull())
    .addColumn("uploaded_by", "integer", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("rows_read", "integer", (c) => c.notNull())
    .addColumn("rows_added", "integer", (c) => c.notNull())
    .addColumn("duplicates", "integer", (c) => c.notNull())
    .addColumn("room_days", "integer", (c) => c.notNull())
    .addColumn("first_reading_at", "text")
    .addColumn("last_reading_at", "text")
    .addColumn("created_at", "text", (c) => c.notNull())
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("co2_imports").execute();
  await db.schema.dropTable("co2_daily").execute();
  await db.schema.dropTable("co2_readings").execute();
}
