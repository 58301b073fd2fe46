import { co2GenerationLps, cfmToLitresPerSecond, type Co2AgeBand } from "@/lib/air";
import { loadCo2Context, recomputeRoomDays, type RoomDay } from "@/lib/co2/summaries";
import { zonedInstantMs } from "@/lib/co2/time";
import { addCalendarDays, isSchoolDay, type SchoolCalendar } from "@/lib/school-days/calendar";
import type { DB } from "./connection";
import { SEED_CO2_COMPUTED_AT, SEED_CO2_LAST_DAY, SEED_CO2_ROOMS, SEED_CO2_SCHOOL_DAYS } from "./seed-air";
import { SEED_SETTINGS } from "./seed-data";
import type { SchoolLevel } from "./types";

// Invented readings, made by a simple well-mixed room model so they agree with each
// room's recorded outdoor air: during class CO2 rises toward Co + N·G / Q with the
// outdoor-air change rate, and falls back toward outdoor air when the room empties.
// A seeded pseudo-random stream makes every run produce exactly the same readings.

const OUTDOOR_PPM = 420;
const STEP_MINUTES = 5;
const FIRST_MINUTE = 7 * 60 + 30;
const LAST_MINUTE = 15 * 60 + 30;
/** In class 08:10–11:30 and 12:15–14:50; lunch and after school the room is empty. */
const OCCUPIED: [number, number][] = [
  [8 * 60 + 10, 11 * 60 + 30],
  [12 * 60 + 15, 14 * 60 + 50],
];

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function hash(text: string): number {
  let h = 2166136261;
  for (let i = 0; i < text.length; i += 1) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h >>> 0;
}

const AGE_BAND: Record<SchoolLevel, Co2AgeBand> = { elementary: "6_to_11", middle: "11_to_16", high: "11_to_16" };

/** The school days the demo readings cover, oldest first. */
export function seedCo2Days(calendar: SchoolCalendar): string[] {
  const days: string[] = [];
  for (let day = SEED_CO2_LAST_DAY; days.length < SEED_CO2_SCHOOL_DAYS; day = addCalendarDays(day, -1)) {
    if (isSchoolDay(day, calendar)) days.unshift(day);
  }
  return days;
}

export interface SeedReading {
  room_id: number;
  measured_at: string;
  co2_ppm: number;
}

/** The demo readings of one room on one day. */
export function modelDay(input: {
  roomId: number;
  key: string;
  day: string;
  timeZone: string;
  volumeFt3: number;
  outdoorAirCfm: number;
  occupancy: number;
  ageBand: Co2AgeBand;
}): SeedReading[] {
  const random = mulberry32(hash(`${input.key}|${input.day}`));
  // Some days the outdoor-air damper runs further closed (a cold morning, a fault).
  const damper = 0.65 + random() * 0.45;
  const present = Math.max(1, input.occupancy - Math.floor(random() * 3));
  const generationLps = co2GenerationLps({ ageBand: input.ageBand, met: 1.2, temperatureC: 22 });
  const adultLps = co2GenerationLps({ ageBand: "30_to_40", met: 1.2, temperatureC: 22 });
  const outdoorLps = Math.max(1, cfmToLitresPerSecond(input.outdoorAirCfm * damper));
  const rise = (((present - 1) * generationLps + adultLps) / outdoorLps) * 1e6;
  const changesPerMinute = (input.outdoorAirCfm * damper) / input.volumeFt3;
  const decay = Math.exp(-changesPerMinute * STEP_MINUTES);
  const readings: SeedReading[] = [];
  let ppm = OUTDOOR_PPM + 10 + random() * 20;
  for (let minute = FIRST_MINUTE; minute <= LAST_MINUTE; minute += STEP_MINUTES) {
    const occupied = OCCUPIED.some(([from, to]) => minute > from && minute <= to);
    const target = OUTDOOR_PPM + (occupied ? rise : 0);
    ppm = target + (ppm - target) * decay;
    const noisy = Math.round(ppm + (random() - 0.5) * 24);
    readings.push({ room_id: input.roomId, measured_at: new Date(zonedInstantMs(input.day, minute, input.timeZone)).toISOString(), co2_ppm: noisy });
  }
  return readings;
}

/**
 * Adds the demo CO2 week (idempotent: a reading already stored is kept) and
 * recomputes the daily figures of any room-day that gained readings.
 */
export async function seedCo2(db: DB): Promise<void> {
  const ctx = await loadCo2Context(db);
  const holidays = Array.isArray(SEED_SETTINGS.district_holidays) ? (SEED_SETTINGS.district_holidays as string[]) : [];
  const days = seedCo2Days({ holidays });
  const changed: RoomDay[] = [];
  await db.transaction().execute(async (trx) => {
    for (const [school, names] of Object.entries(SEED_CO2_ROOMS)) {
      const rooms = await trx
        .selectFrom("rooms")
        .innerJoin("schools", "schools.id", "rooms.school_id")
        .select(["rooms.id", "rooms.name", "rooms.length_ft", "rooms.width_ft", "rooms.ceiling_ft", "rooms.occupancy", "rooms.outdoor_air_cfm", "schools.level"])
        .where("schools.slug", "=", school)
        .where("rooms.name", "in", names)
        .execute();
      for (const room of rooms) {
        for (const day of days) {
          const readings = modelDay({
            roomId: room.id,
            key: `${school}|${room.name}`,
            day,
            timeZone: ctx.timeZone,
            volumeFt3: room.length_ft * room.width_ft * room.ceiling_ft,
            outdoorAirCfm: room.outdoor_air_cfm,
            occupancy: room.occupancy,
            ageBand: AGE_BAND[room.level],
          });
          const [result] = await trx
            .insertInto("co2_readings")
            .values(readings)
            .onConflict((oc) => oc.columns(["room_id", "measured_at"]).doNothing())
            .execute();
          if (Number(result?.numInsertedOrUpdatedRows ?? 0) > 0) changed.push({ roomId: room.id, day });
        }
      }
    }
    await recomputeRoomDays(trx, changed, ctx, SEED_CO2_COMPUTED_AT);
  });
}
