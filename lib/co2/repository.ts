import type { DB } from "@/db/connection";

export interface Co2WeekRoom {
  room: string;
  days: Map<string, { meanPpm: number; peakPpm: number; minutesAbove: number }>;
}

export interface Co2Week {
  /** The school's most recent school days with figures, oldest first (up to five). */
  days: string[];
  rooms: Co2WeekRoom[];
  thresholdPpm: number | null;
}

/** Daily figures of a school's rooms over its last school week with readings. */
export async function schoolCo2Week(db: DB, slug: string, maxDays = 5): Promise<Co2Week> {
  const dayRows = await db
    .selectFrom("co2_daily")
    .innerJoin("rooms", "rooms.id", "co2_daily.room_id")
    .innerJoin("schools", "schools.id", "rooms.school_id")
    .where("schools.slug", "=", slug)
    .select("co2_daily.day")
    .distinct()
    .orderBy("co2_daily.day", "desc")
    .limit(maxDays)
    .execute();
  const days = dayRows.map((d) => d.day).sort();
  if (days.length === 0) return { days, rooms: [], thresholdPpm: null };
  const rows = await db
    .selectFrom("co2_daily")
    .innerJoin("rooms", "rooms.id", "co2_daily.room_id")
    .innerJoin("schools", "schools.id", "rooms.school_id")
    .where("schools.slug", "=", slug)
    .where("co2_daily.day", "in", days)
    .select(["rooms.name", "co2_daily.day", "co2_daily.mean_ppm", "co2_daily.peak_ppm", "co2_daily.minutes_above", "co2_daily.threshold_ppm"])
    .orderBy("rooms.name")
    .execute();
  const rooms = new Map<string, Co2WeekRoom>();
  for (const r of rows) {
    const room = rooms.get(r.name) ?? { room: r.name, days: new Map() };
    room.days.set(r.day, { meanPpm: r.mean_ppm, peakPpm: r.peak_ppm, minutesAbove: r.minutes_above });
    rooms.set(r.name, room);
  }
  const latest = rows.filter((r) => r.day === days[days.length - 1]);
  return { days, rooms: [...rooms.values()], thresholdPpm: latest[0]?.threshold_ppm ?? rows[0]?.threshold_ppm ?? null };
}

export interface RoomCo2History {
  day: string;
  readings: number;
  coveredMinutes: number;
  meanPpm: number;
  peakPpm: number;
  minutesAbove: number;
  thresholdPpm: number;
  steadyStatePpm: number | null;
}

export async function roomCo2History(db: DB, roomId: number, limit = 10): Promise<RoomCo2History[]> {
  const rows = await db
    .selectFrom("co2_daily")
    .selectAll()
    .where("room_id", "=", roomId)
    .orderBy("day", "desc")
    .limit(limit)
    .execute();
  return rows.map((r) => ({
    day: r.day,
    readings: r.readings,
    coveredMinutes: r.covered_minutes,
    meanPpm: r.mean_ppm,
    peakPpm: r.peak_ppm,
    minutesAbove: r.minutes_above,
    thresholdPpm: r.threshold_ppm,
    steadyStatePpm: r.steady_state_ppm,
  }));
}

export async function recentCo2Imports(db: DB, limit = 10) {
  return db
    .selectFrom("co2_imports")
    .leftJoin("users", "users.id", "co2_imports.uploaded_by")
    .select([
      "co2_imports.id",
      "co2_imports.file_name as fileName",
      "users.name as uploadedBy",
      "co2_imports.rows_read as rowsRead",
      "co2_imports.rows_added as rowsAdded",
      "co2_imports.duplicates",
      "co2_imports.room_days as roomDays",
      "co2_imports.first_reading_at as firstReadingAt",
      "co2_imports.last_reading_at as lastReadingAt",
      "co2_imports.created_at as createdAt",
    ])
    .orderBy("co2_imports.id", "desc")
    .limit(limit)
    .execute();
}

export async function co2Totals(db: DB): Promise<{ readings: number; roomDays: number }> {
  const [readings, days] = await Promise.all([
    db.selectFrom("co2_readings").select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow(),
    db.selectFrom("co2_daily").select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow(),
  ]);
  return { readings: Number(readings.n), roomDays: Number(days.n) };
}
