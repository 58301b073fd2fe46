import type { DB } from "@/db/connection";
import { createCo2DailyAccumulator, DEFAULT_MAX_GAP_MINUTES, timeZoneClock, type Co2DaySummary, type LocalClock } from "@/lib/air/co2-daily";
import { isSchoolDay, type SchoolCalendar } from "@/lib/school-days/calendar";
import { airSettings, type AirSettings } from "@/lib/settings/air";
import { districtCalendar, districtTimeZone } from "@/lib/settings/district";
import { zonedInstantMs } from "./time";

/** What daily figures depend on besides the readings: the district's clock, calendar and choices. */
export interface Co2Context {
  timeZone: string;
  calendar: SchoolCalendar;
  settings: AirSettings;
}

export async function loadCo2Context(db: DB): Promise<Co2Context> {
  const [timeZone, calendar, settings] = await Promise.all([districtTimeZone(db), districtCalendar(db), airSettings(db)]);
  return { timeZone, calendar, settings };
}

export interface RoomDay {
  roomId: number;
  day: string;
}

function accumulatorFor(ctx: Co2Context, clock: LocalClock, isOccupiedDate: (date: string) => boolean) {
  return createCo2DailyAccumulator({
    localTime: clock,
    occupiedStartMinute: ctx.settings.occupiedStartMinute,
    occupiedEndMinute: ctx.settings.occupiedEndMinute,
    thresholdPpm: ctx.settings.co2ThresholdPpm,
    isOccupiedDate,
  });
}

function dailyRow(roomId: number, summary: Co2DaySummary, ctx: Co2Context, now: string) {
  return {
    room_id: roomId,
    day: summary.date,
    readings: summary.readings,
    covered_minutes: summary.coveredMinutes,
    mean_ppm: summary.meanPpm,
    peak_ppm: summary.peakPpm,
    minutes_above: summary.minutesAboveThreshold,
    threshold_ppm: ctx.settings.co2ThresholdPpm,
    steady_state_ppm: summary.steadyStatePpm,
    computed_at: now,
  };
}

/**
 * Recomputes the daily figures of the given room-days from the stored readings and
 * writes them (or removes a day left with no occupied readings). Each day reads only
 * its occupied hours, widened by the longest span one reading may stand for.
 */
export async function recomputeRoomDays(db: DB, roomDays: Iterable<RoomDay>, ctx: Co2Context, now = new Date().toISOString()): Promise<number> {
  const clock = timeZoneClock(ctx.timeZone);
  const margin = DEFAULT_MAX_GAP_MINUTES;
  let written = 0;
  for (const { roomId, day } of roomDays) {
    const from = new Date(zonedInstantMs(day, ctx.settings.occupiedStartMinute - margin, ctx.timeZone)).toISOString();
    const to = new Date(zonedInstantMs(day, ctx.settings.occupiedEndMinute + margin, ctx.timeZone)).toISOString();
    const readings = await db
      .selectFrom("co2_readings")
      .select(["measured_at", "co2_ppm"])
      .where("room_id", "=", roomId)
      .where("measured_at", ">=", from)
      .where("measured_at", "<=", to)
      .orderBy("measured_at")
      .execute();
    const schoolDay = isSchoolDay(day, ctx.calendar);
    const accumulator = accumulatorFor(ctx, clock, (date) => schoolDay && date === day);
    for (const r of readings) accumulator.add({ timestamp: r.measured_at, ppm: r.co2_ppm });
    const summary = accumulator.finish().days.find((d) => d.date === day);
    await db.deleteFrom("co2_daily").where("room_id", "=", roomId).where("day", "=", day).execute();
    if (summary) {
      await db.insertInto("co2_daily").values(dailyRow(roomId, summary, ctx, now)).execute();
      written += 1;
    }
  }
  return written;
}

/**
 * Recomputes every room's daily figures from all readings (after the threshold or the
 * occupied hours change). Streams the readings room by room; only summaries are held.
 */
export async function recomputeAllCo2Daily(db: DB, ctx: Co2Context, now = new Date().toISOString()): Promise<number> {
  const clock = timeZoneClock(ctx.timeZone);
  const schoolDays = new Map<string, boolean>();
  const isOccupiedDate = (date: string) => {
    let known = schoolDays.get(date);
    if (known === undefined) {
      known = isSchoolDay(date, ctx.calendar);
      schoolDays.set(date, known);
    }
    return known;
  };
  const rows: ReturnType<typeof dailyRow>[] = [];
  let roomId: number | null = null;
  let accumulator = accumulatorFor(ctx, clock, isOccupiedDate);
  const flush = () => {
    if (roomId !== null) for (const day of accumulator.finish().days) rows.push(dailyRow(roomId, day, ctx, now));
  };
  const stream = db.selectFrom("co2_readings").select(["room_id", "measured_at", "co2_ppm"]).orderBy("room_id").orderBy("measured_at").stream(1000);
  for await (const r of stream) {
    if (r.room_id !== roomId) {
      flush();
      roomId = r.room_id;
      accumulator = accumulatorFor(ctx, clock, isOccupiedDate);
    }
    accumulator.add({ timestamp: r.measured_at, ppm: r.co2_ppm });
  }
  flush();
  await db.transaction().execute(async (trx) => {
    await trx.deleteFrom("co2_daily").execute();
    for (let i = 0; i < rows.length; i += 500) await trx.insertInto("co2_daily").values(rows.slice(i, i + 500)).execute();
  });
  return rows.length;
}
