import type { DB } from "@/db/connection";
import { loadCo2Context, recomputeAllCo2Daily, recomputeRoomDays, type RoomDay } from "@/lib/co2/summaries";
import { addCalendarDays, type IsoDate } from "@/lib/school-days/calendar";

// The daily CO2 figures count school days only, so a change to the calendar or the
// district's clock recounts the days it touches.

/**
 * Recounts each room's figures for the given dates (after holidays are added or
 * removed), only where the room has readings around that date; returns how many
 * room-days were recounted, 0 when none had readings.
 */
export async function recountCo2Days(db: DB, dates: readonly IsoDate[]): Promise<number> {
  if (dates.length === 0) return 0;
  const spans = await db
    .selectFrom("co2_readings")
    .select((eb) => ["room_id", eb.fn.min("measured_at").as("first"), eb.fn.max("measured_at").as("last")])
    .groupBy("room_id")
    .execute();
  // Readings are stored in UTC; a day away either side covers any district time zone.
  const roomDays: RoomDay[] = spans.flatMap((s) => {
    const from = addCalendarDays(String(s.first).slice(0, 10), -1);
    const to = addCalendarDays(String(s.last).slice(0, 10), 1);
    return dates.filter((day) => day >= from && day <= to).map((day) => ({ roomId: s.room_id, day }));
  });
  if (roomDays.length === 0) return 0;
  const ctx = await loadCo2Context(db);
  await db.transaction().execute((trx) => recomputeRoomDays(trx, roomDays, ctx));
  return roomDays.length;
}

/** Recounts all figures (after the time zone changes, every day's hours move). */
export async function recountAllCo2Days(db: DB): Promise<number> {
  return recomputeAllCo2Daily(db, await loadCo2Context(db));
}
