import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SEED_CO2_LAST_DAY, SEED_CO2_ROOMS } from "@/db/seed-air";
import { seed } from "@/db/seed";
import { schoolCo2Week } from "@/lib/co2/repository";
import { schoolRoomFigures } from "@/lib/rooms/figures";
import { AIR_SETTING_KEYS, airSettings, DEFAULT_AIR_SETTINGS } from "@/lib/settings/air";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
});
afterAll(async () => t.cleanup());

describe("demo air data", () => {
  it("stores the district's air choices as settings, at their defaults (1,000 ppm threshold)", async () => {
    const keys = (await t.db.selectFrom("settings").select("key").execute()).map((r) => r.key);
    for (const key of Object.values(AIR_SETTING_KEYS)) expect(keys).toContain(key);
    expect(await airSettings(t.db)).toEqual(DEFAULT_AIR_SETTINGS);
    expect(DEFAULT_AIR_SETTINGS.co2ThresholdPpm).toBe(1000);
  });

  it("gives every seeded room outdoor air, classrooms 300–500 cfm, and some rooms air cleaners and MERV ratings", async () => {
    const rooms = await t.db.selectFrom("rooms").selectAll().execute();
    expect(rooms.every((r) => r.outdoor_air_cfm > 0)).toBe(true);
    for (const r of rooms.filter((r) => r.use.startsWith("classroom"))) {
      expect(r.outdoor_air_cfm, r.name).toBeGreaterThanOrEqual(300);
      expect(r.outdoor_air_cfm, r.name).toBeLessThanOrEqual(500);
    }
    const withCleaners = rooms.filter((r) => r.air_cleaners > 0);
    expect(withCleaners.length).toBeGreaterThan(5);
    expect(withCleaners.every((r) => r.cadr_cfm_each >= 250 && r.cadr_cfm_each <= 450)).toBe(true);
    expect(rooms.filter((r) => r.air_cleaners === 0).length).toBeGreaterThan(5);
    expect(new Set(rooms.map((r) => r.merv))).toEqual(new Set([11, 13]));
    expect(new Set(rooms.map((r) => r.windows_open))).toEqual(new Set([0, 1]));
  });

  it("has a school week of CO2 figures for a few rooms per school, ending on the last school day before 2026-12-01", async () => {
    for (const [school, names] of Object.entries(SEED_CO2_ROOMS)) {
      const week = await schoolCo2Week(t.db, school);
      expect(week.days).toEqual(["2026-11-20", "2026-11-23", "2026-11-24", "2026-11-25", SEED_CO2_LAST_DAY]);
      expect(week.rooms.map((r) => r.room).sort()).toEqual([...names].sort());
      expect(week.thresholdPpm).toBe(1000);
      const figures = await schoolRoomFigures(t.db, school);
      for (const room of figures!.rooms.filter((r) => names.includes(r.room))) expect(room.co2?.day, room.room).toBe(SEED_CO2_LAST_DAY);
    }
  });

  it("readings agree with each room's outdoor air: less air per person, higher CO2", async () => {
    const figures = (await schoolRoomFigures(t.db, "corrow-ridge"))!.rooms;
    const room101 = figures.find((r) => r.room === "Room 101")!;
    const room203 = figures.find((r) => r.room === "Room 203")!;
    // 480 cfm for 25 people against 400 cfm for 28.
    expect(room203.co2!.meanPpm).toBeGreaterThan(room101.co2!.meanPpm);
  });
});
