import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { feetToMetres, cfmToLitresPerSecond } from "@/lib/air/units";
import { importRoomsCsv } from "@/lib/rooms/import";
import { roomCsvHeaderLine, roomCsvLine } from "@/lib/rooms/csv";
import { listRooms } from "@/lib/rooms/repository";
import { recordsOf } from "../support/csv";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
const NOW = "2026-11-30T15:00:00.000Z";

beforeAll(async () => {
  t = await createTestDb();
  await t.db
    .insertInto("schools")
    .values([
      { slug: "tamsin-creek", name: "Tamsin Creek Elementary School", level: "elementary", grades: "K–5", address: "x", phone: "555-0100" },
      { slug: "eastmere", name: "Eastmere High School", level: "high", grades: "9–12", address: "y", phone: "555-0101" },
    ])
    .execute();
});
afterAll(async () => t.cleanup());

beforeEach(async () => {
  await t.db.deleteFrom("rooms").execute();
});

const US_HEADER = "school,room,use,length_ft,width_ft,ceiling_ft,occupancy,outdoor_air_cfm,air_cleaners,cadr_cfm_each,merv,windows_open";
const METRIC_HEADER = "school,room,use,length_m,width_m,ceiling_m,occupancy,outdoor_air_ls,air_cleaners,cadr_ls_each,merv,windows_open";

const GOOD_US = [
  US_HEADER,
  "tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,420,1,350,13,yes",
  'tamsin-creek,"Room 102, reading nook",classroom_5_8,31,29,9.5,21,400,0,,13,no',
  "eastmere,Room A101,classroom_9_plus,34,28,10,28,480,0,0,,yes",
].join("\r\n");

async function roomsSnapshot() {
  return t.db.selectFrom("rooms").selectAll().orderBy("id").execute();
}

describe("rooms CSV import", () => {
  it("a file with one bad row imports nothing and reports the row and the reason", async () => {
    const bad = [
      US_HEADER,
      "tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,420,1,350,13,yes",
      "tamsin-creek,Room 103,classroom_5_8,30,-4,9.5,22,420,1,350,13,yes",
      "eastmere,Room A101,classroom_9_plus,34,28,10,28,480,0,0,,yes",
    ].join("\r\n");
    const before = await roomsSnapshot();
    const result = await importRoomsCsv(t.db, recordsOf(bad), { dryRun: false, actorId: null, now: NOW });
    expect(result.ok).toBe(false);
    expect(result.saved).toBe(false);
    expect(result.counts).toMatchObject({ rows: 3, withErrors: 1 });
    const wrong = result.rows.filter((r) => r.errors.length > 0);
    expect(wrong).toEqual([
      { line: 3, school: "tamsin-creek", room: "Room 103", action: null, errors: [{ line: 3, column: "width_ft", message: "Enter a number greater than 0." }] },
    ]);
    // The good rows are previewed, but not saved.
    expect(result.rows.map((r) => r.action)).toEqual(["new", null, "new"]);
    expect(await roomsSnapshot()).toEqual(before);
  });

  it("reports every kind of bad value by column, an unknown school and a room listed twice", async () => {
    const bad = [
      US_HEADER,
      "nowhere,Room 1,classroom_5_8,30,30,9.5,22,420,0,,13,yes",
      "tamsin-creek,Room 2,kitchen,30,30,9.5,22,420,0,,13,yes",
      "tamsin-creek,Room 3,classroom_5_8,thirty,30,9.5,22.5,420,2,,17,maybe",
      "tamsin-creek,=HYPERLINK(x),office,10,10,9,2,50,0,,,no",
      "tamsin-creek,Room 5,office,10,10,9,2,50,0,,,no",
      "tamsin-creek,Room 5,office,12,10,9,2,50,0,,,no",
      "tamsin-creek,Room 6,office,10,10",
    ].join("\n");
    const result = await importRoomsCsv(t.db, recordsOf(bad), { dryRun: false, actorId: null, now: NOW });
    expect(result.ok).toBe(false);
    const byLine = Object.fromEntries(result.rows.map((r) => [r.line, r.errors.map((e) => `${e.column}: ${e.message}`)]));
    expect(byLine[2]).toEqual([expect.stringMatching(/^school: No school has the short name “nowhere”/)]);
    expect(byLine[3]).toEqual([expect.stringMatching(/^use: Choose one of: classroom_5_8, classroom_9_plus/)]);
    expect(byLine[4]).toEqual([
      "length_ft: Enter a number, like 30 or 30.5.",
      "occupancy: Enter a whole number, 0 or more.",
      "merv: Enter a MERV rating from 1 to 16, or leave it empty when not known.",
      "windows_open: Enter yes or no.",
    ]);
    expect(byLine[5]).toEqual(["room: Start the room's name with a letter or a digit."]);
    expect(byLine[6]).toEqual([]);
    expect(byLine[7]).toEqual(["room: This room is already on line 6; list each room once."]);
    expect(byLine[8]).toEqual([expect.stringMatching(/^null: This row has 5 values; the header has 12/)]);
    expect(await roomsSnapshot()).toEqual([]);
  });

  it("refuses a bad header, a mix of units and an empty file, saying why", async () => {
    const cases: [string, RegExp][] = [
      ["", /empty/],
      [US_HEADER, /no rooms/],
      ["school,room,use\r\nx,y,z", /missing length_ft/],
      [`${US_HEADER.replace("length_ft", "length_m")}\r\n`, /mixes US columns/],
      [`${US_HEADER},colour\r\n`, /unknown colour/],
      [`${US_HEADER}\r\n"tamsin-creek,Room 1`, /never closed/],
    ];
    for (const [text, message] of cases) {
      const result = await importRoomsCsv(t.db, recordsOf(text), { dryRun: false, actorId: null, now: NOW });
      expect(result.ok, text).toBe(false);
      expect(result.fileErrors.join(" "), text).toMatch(message);
    }
    expect(await roomsSnapshot()).toEqual([]);
  });

  it("a good US file imports every row in one go, and a dry run before it saves nothing", async () => {
    const preview = await importRoomsCsv(t.db, recordsOf(GOOD_US), { dryRun: true, actorId: null, now: NOW });
    expect(preview).toMatchObject({ ok: true, saved: false, units: "us", counts: { new: 3, update: 0, unchanged: 0, rows: 3, withErrors: 0 } });
    expect(await roomsSnapshot()).toEqual([]);

    const result = await importRoomsCsv(t.db, recordsOf(GOOD_US), { dryRun: false, actorId: null, now: NOW });
    expect(result).toMatchObject({ ok: true, saved: true, counts: { new: 3 } });
    expect(result.schools.sort()).toEqual(["eastmere", "tamsin-creek"]);
    const rooms = await listRooms(t.db);
    expect(rooms.map((r) => r.name)).toEqual(["Room 101", "Room 102, reading nook", "Room A101"]);
    expect(rooms[0]).toMatchObject({
      schoolSlug: "tamsin-creek",
      use: "classroom_5_8",
      lengthFt: 30,
      widthFt: 30,
      ceilingFt: 9.5,
      occupancy: 22,
      outdoorAirCfm: 420,
      airCleaners: 1,
      cadrCfmEach: 350,
      merv: 13,
      windowsOpen: true,
    });
    expect(rooms[1]).toMatchObject({ airCleaners: 0, cadrCfmEach: 0, windowsOpen: false });
    expect(rooms[2]).toMatchObject({ merv: null, windowsOpen: true });
  });

  it("upserts by school and room: a changed row updates, an unchanged one is left alone", async () => {
    await importRoomsCsv(t.db, recordsOf(GOOD_US), { dryRun: false, actorId: null, now: NOW });
    const changed = GOOD_US.replace("classroom_5_8,30,30,9.5,22,420", "classroom_5_8,30,30,9.5,22,460");
    const result = await importRoomsCsv(t.db, recordsOf(changed), { dryRun: false, actorId: null, now: "2026-12-01T09:00:00.000Z" });
    expect(result.counts).toMatchObject({ new: 0, update: 1, unchanged: 2 });
    expect(result.schools).toEqual(["tamsin-creek"]);
    const rooms = await t.db.selectFrom("rooms").select(["name", "outdoor_air_cfm", "updated_at"]).orderBy("id").execute();
    expect(rooms).toEqual([
      { name: "Room 101", outdoor_air_cfm: 460, updated_at: "2026-12-01T09:00:00.000Z" },
      { name: "Room 102, reading nook", outdoor_air_cfm: 400, updated_at: NOW },
      { name: "Room A101", outdoor_air_cfm: 480, updated_at: NOW },
    ]);
  });

  it("a good metric file imports every row, converted to feet and cfm", async () => {
    // 9.144 m = 30 ft exactly; 198.2179 L/s ≈ 420 cfm (1 cfm = 0.4719474432 L/s exactly).
    const metric = [
      METRIC_HEADER,
      "tamsin-creek,Room 101,classroom_5_8,9.144,9.144,2.8956,22,198.2179,1,165.18,13,yes",
      "eastmere,Lab,science_lab,12,9,3.3,24,250,0,,13,no",
    ].join("\r\n");
    const result = await importRoomsCsv(t.db, recordsOf(metric), { dryRun: false, actorId: null, now: NOW });
    expect(result).toMatchObject({ ok: true, saved: true, units: "metric", counts: { new: 2 } });
    const [room101, lab] = await listRooms(t.db);
    expect(room101?.lengthFt).toBeCloseTo(30, 9);
    expect(room101?.ceilingFt).toBeCloseTo(9.5, 9);
    expect(room101?.outdoorAirCfm).toBeCloseTo(420, 3);
    expect(room101?.cadrCfmEach).toBeCloseTo(165.18 / 0.4719474432, 9);
    expect(lab?.lengthFt).toBeCloseTo(12 / 0.3048, 9);
    expect(lab?.outdoorAirCfm).toBeCloseTo(250 / 0.4719474432, 9);

    // Exported in US units and read back in, the same rooms are unchanged.
    const rooms = await listRooms(t.db);
    const exported = roomCsvHeaderLine() + rooms.map((r) => roomCsvLine(r)).join("");
    const again = await importRoomsCsv(t.db, recordsOf(exported), { dryRun: true, actorId: null, now: NOW });
    expect(again).toMatchObject({ ok: true, units: "us", counts: { unchanged: 2, new: 0, update: 0 } });
    expect(feetToMetres(room101!.lengthFt)).toBeCloseTo(9.144, 9);
    expect(cfmToLitresPerSecond(lab!.outdoorAirCfm)).toBeCloseTo(250, 9);
  });

  it("a metric value too large for a room is refused in the file's own units", async () => {
    const metric = [METRIC_HEADER, "eastmere,Hall,lecture,900,9,3.3,24,250,0,,13,no"].join("\r\n");
    const result = await importRoomsCsv(t.db, recordsOf(metric), { dryRun: false, actorId: null, now: NOW });
    expect(result.rows[0]?.errors).toEqual([{ line: 2, column: "length_m", message: "That looks too large: at most 152.4 m." }]);
  });
});
