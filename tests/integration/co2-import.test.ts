import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { importCo2Csv } from "@/lib/co2/import";
import { loadCo2Context, recomputeAllCo2Daily } from "@/lib/co2/summaries";
import { latestCo2Days } from "@/lib/rooms/figures";
import { saveAirSettings, DEFAULT_AIR_SETTINGS } from "@/lib/settings/air";
import { putSetting } from "@/lib/settings/repository";
import { recordsOf } from "../support/csv";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
let roomId = 0;
const NOW = new Date("2026-12-01T12:00:00.000Z");

beforeAll(async () => {
  t = await createTestDb();
  const { id: schoolId } = await t.db
    .insertInto("schools")
    .values({ slug: "tamsin-creek", name: "Tamsin Creek Elementary School", level: "elementary", grades: "K–5", address: "x", phone: "555-0100" })
    .returning("id")
    .executeTakeFirstOrThrow();
  const room = await t.db
    .insertInto("rooms")
    .values({ school_id: schoolId, name: "Room 101", use: "classroom_5_8", length_ft: 30, width_ft: 30, ceiling_ft: 9.5, occupancy: 22, updated_at: NOW.toISOString() })
    .returning("id")
    .executeTakeFirstOrThrow();
  roomId = room.id;
  await t.db
    .insertInto("rooms")
    .values({ school_id: schoolId, name: "Room 102", use: "classroom_5_8", length_ft: 30, width_ft: 30, ceiling_ft: 9.5, occupancy: 22, updated_at: NOW.toISOString() })
    .execute();
  await putSetting(t.db, "district_time_zone", "America/New_York");
  await putSetting(t.db, "district_holidays", ["2026-11-26"]);
});
afterAll(async () => t.cleanup());

const HEADER = "school,room,timestamp,co2_ppm";

/** Local (UTC−5 in late November) readings every 10 minutes from `from` to `to` inclusive. */
function readings(date: string, from: string, to: string, ppm: (hhmm: string) => number, room = "Room 101"): string[] {
  const lines: string[] = [];
  const toMinutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3));
  for (let m = toMinutes(from); m <= toMinutes(to); m += 10) {
    const hhmm = `${String(Math.floor(m / 60)).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;
    lines.push(`tamsin-creek,${room},${date}T${hhmm}:00-05:00,${ppm(hhmm)}`);
  }
  return lines;
}

// Monday 30 November 2026, worked by hand (occupied hours 08:00–15:00, each reading
// standing for the 10 minutes until the next):
//   07:50 500 ppm: its span ends at 08:00, outside occupied hours: not counted
//   08:00–08:50, 6 readings at 800 ppm → 60 min
//   09:00–09:50, 6 readings at 1,100 ppm → 60 min
//   10:00–14:50, 30 readings at 900 ppm → 300 min
//   15:00 600 ppm: starts as the room empties: not counted
// covered 420 min; mean (60·800 + 60·1100 + 300·900) / 420 = 384,000 / 420 = 914.29 ppm;
// peak 1,100; minutes above 1,000 ppm: 60; highest 30-minute plateau 1,100 ppm.
const MONDAY = readings("2026-11-30", "07:50", "15:00", (t) => (t < "08:00" ? 500 : t < "09:00" ? 800 : t < "10:00" ? 1100 : t < "15:00" ? 900 : 600));
// Thursday 26 November is a district holiday and Saturday 28 November a weekend: no figures.
const HOLIDAY = readings("2026-11-26", "08:00", "14:50", () => 1500);
const SATURDAY = readings("2026-11-28", "08:00", "14:50", () => 1500);
const FILE = [HEADER, ...HOLIDAY, ...SATURDAY, ...MONDAY].join("\r\n") + "\r\n";

async function readingCount(): Promise<number> {
  return Number((await t.db.selectFrom("co2_readings").select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
}

describe("CO2 readings import", () => {
  it("refuses a file with a bad row, saving nothing, and names the line and the reason", async () => {
    const bad = [HEADER, ...MONDAY.slice(0, 3), "tamsin-creek,Room 101,2026-11-30 08:31,900", "tamsin-creek,Room 999,2026-11-30T08:32:00-05:00,900", "tamsin-creek,Room 101,2026-11-30T08:33:00-05:00,-4"].join("\n");
    const result = await importCo2Csv(t.db, recordsOf(bad), { fileName: "bad.csv", actorId: null, now: NOW });
    expect(result.ok).toBe(false);
    expect(result.errors).toEqual([
      { line: 5, column: "timestamp", message: "“2026-11-30 08:31” is not a date and time with an offset, like 2026-11-30T08:05:00-05:00." },
      { line: 6, column: "room", message: "tamsin-creek has no room named “Room 999”. Add the room first, or check its name." },
      { line: 7, column: "co2_ppm", message: "Enter CO2 in ppm as a number from 150 to 10,000; got “-4”." },
    ]);
    expect(await readingCount()).toBe(0);
    expect(await t.db.selectFrom("co2_imports").selectAll().execute()).toEqual([]);
  });

  it("refuses a header that is not school,room,timestamp,co2_ppm", async () => {
    const result = await importCo2Csv(t.db, recordsOf("room,time,ppm\r\nRoom 101,2026-11-30T08:00:00Z,800"), { fileName: "x.csv", actorId: null, now: NOW });
    expect(result.fileErrors).toEqual(["Line 1: the header must be school,room,timestamp,co2_ppm (in any order)."]);
  });

  it("imports a good file and its daily figures match the hand-worked day", async () => {
    const result = await importCo2Csv(t.db, recordsOf(FILE, 100), { fileName: "week.csv", actorId: null, now: NOW });
    expect(result).toMatchObject({ ok: true, saved: true, rowsRead: 44 + 42 + 42, rowsAdded: 128, duplicates: 0, roomDays: 3, schools: ["tamsin-creek"] });
    expect(result.firstReadingAt).toBe("2026-11-26T13:00:00.000Z");
    expect(result.lastReadingAt).toBe("2026-11-30T20:00:00.000Z");
    const days = await t.db.selectFrom("co2_daily").selectAll().execute();
    expect(days).toHaveLength(1);
    const day = days[0]!;
    expect(day).toMatchObject({ room_id: roomId, day: "2026-11-30", readings: 42, peak_ppm: 1100, threshold_ppm: 1000 });
    expect(day.covered_minutes).toBeCloseTo(420, 9);
    expect(day.mean_ppm).toBeCloseTo(384000 / 420, 9);
    expect(day.minutes_above).toBeCloseTo(60, 9);
    expect(day.steady_state_ppm).toBeCloseTo(1100, 9);
    expect(await latestCo2Days(t.db, [roomId])).toEqual(new Map([[roomId, { day: "2026-11-30", meanPpm: expect.closeTo(914.2857, 3), peakPpm: 1100, minutesAbove: expect.closeTo(60, 9) }]]));
  });

  it("re-uploading the same file adds no duplicate readings and leaves the figures as they were", async () => {
    const before = await t.db.selectFrom("co2_daily").selectAll().execute();
    const count = await readingCount();
    const result = await importCo2Csv(t.db, recordsOf(FILE, 7), { fileName: "week.csv", actorId: null, now: NOW });
    expect(result).toMatchObject({ ok: true, rowsRead: 128, rowsAdded: 0, duplicates: 128, roomDays: 0 });
    expect(await readingCount()).toBe(count);
    expect(await t.db.selectFrom("co2_daily").selectAll().execute()).toEqual(before);
    // The same instant written with another offset is the same reading.
    const sameInstant = [HEADER, "tamsin-creek,Room 101,2026-11-30T14:00:00Z,800", "tamsin-creek,Room 101,2026-11-30T14:00:00.000+00:00,800"].join("\n");
    const again = await importCo2Csv(t.db, recordsOf(sameInstant), { fileName: "utc.csv", actorId: null, now: NOW });
    expect(again).toMatchObject({ rowsRead: 2, rowsAdded: 0, duplicates: 2 });
    expect(await readingCount()).toBe(count);
  });

  it("a day uploaded in two halves gets the same figures as in one file", async () => {
    const tuesday = readings("2026-12-01", "08:00", "14:50", (t) => (t < "11:00" ? 700 : 1200), "Room 102");
    const first = [HEADER, ...tuesday.slice(0, 20)].join("\n");
    const second = [HEADER, ...tuesday.slice(20)].join("\n");
    await importCo2Csv(t.db, recordsOf(first), { fileName: "am.csv", actorId: null, now: NOW });
    await importCo2Csv(t.db, recordsOf(second), { fileName: "pm.csv", actorId: null, now: NOW });
    const day = await t.db.selectFrom("co2_daily").innerJoin("rooms", "rooms.id", "co2_daily.room_id").selectAll("co2_daily").where("rooms.name", "=", "Room 102").executeTakeFirstOrThrow();
    // 08:00–11:00 at 700 (180 min), 11:00–15:00 at 1,200 (240 min): mean (126,000 + 288,000) / 420.
    expect(day.covered_minutes).toBeCloseTo(420, 9);
    expect(day.mean_ppm).toBeCloseTo(414000 / 420, 9);
    expect(day.minutes_above).toBeCloseTo(240, 9);
    expect(day.readings).toBe(42);
  });

  it("recounts every day when the district changes its threshold", async () => {
    await saveAirSettings(t.db, { ...DEFAULT_AIR_SETTINGS, co2ThresholdPpm: 850 });
    await recomputeAllCo2Daily(t.db, await loadCo2Context(t.db), NOW.toISOString());
    const monday = await t.db.selectFrom("co2_daily").selectAll().where("room_id", "=", roomId).executeTakeFirstOrThrow();
    // Above 850 ppm: the 1,100 hour and the 900 afternoon, 60 + 300 minutes.
    expect(monday.minutes_above).toBeCloseTo(360, 9);
    expect(monday.threshold_ppm).toBe(850);
    expect(monday.mean_ppm).toBeCloseTo(384000 / 420, 9);
    expect(await t.db.selectFrom("co2_daily").selectAll().execute()).toHaveLength(2);
  });

  it("keeps a record of each import", async () => {
    const imports = await t.db.selectFrom("co2_imports").select(["file_name", "rows_read", "rows_added", "duplicates"]).orderBy("id").execute();
    expect(imports[0]).toEqual({ file_name: "week.csv", rows_read: 128, rows_added: 128, duplicates: 0 });
    expect(imports[1]).toEqual({ file_name: "week.csv", rows_read: 128, rows_added: 0, duplicates: 128 });
  });
});
