import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import type { DB } from "@/db/connection";
import { seed } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";

// The Settings page's server actions, called as the page calls them, against a seeded
// database. The session is the only thing replaced: getServerSession returns the id
// of the account under test, and requireRole re-reads that account as it does in a request.
const state = vi.hoisted(() => ({ db: null as DB | null, userId: null as number | null }));
vi.mock("next-auth", () => ({ getServerSession: vi.fn(async () => (state.userId === null ? null : { user: { id: String(state.userId) } })) }));
vi.mock("@/db/client", () => ({ db: () => state.db }));
const revalidatePath = vi.hoisted(() => vi.fn());
vi.mock("next/cache", () => ({ revalidatePath }));

const actions = await import("@/app/(staff)/staff/settings/actions");
const { requireRole } = await import("@/lib/auth/guard");

let t: TestDb;
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  state.db = t.db;
  for (const u of await t.db.selectFrom("users").select(["id", "email"]).execute()) ids[u.email] = u.id;
});
afterAll(async () => t.cleanup());
beforeEach(() => revalidatePath.mockClear());

const signedInAs = (email: string | null) => {
  state.userId = email === null ? null : (ids[email] ?? null);
};

async function snapshot() {
  const [settings, events, co2] = await Promise.all([
    t.db.selectFrom("settings").select(["key", "value"]).orderBy("key").execute(),
    t.db.selectFrom("staff_events").selectAll().orderBy("id").execute(),
    t.db.selectFrom("co2_daily").select(["room_id", "day", "mean_ppm"]).orderBy("room_id").orderBy("day").execute(),
  ]);
  return { settings, events, co2 };
}

const setting = async (key: string) => {
  const row = await t.db.selectFrom("settings").select("value").where("key", "=", key).executeTakeFirst();
  return row ? (JSON.parse(row.value) as unknown) : undefined;
};

const everyAction = () => [
  actions.addHolidaysAction({ from: "2027-04-19", to: "2027-04-23", name: "Spring break" }),
  actions.removeHolidaysAction({ dates: ["2026-11-26"] }),
  actions.saveReplySettingsAction({ replyTargetSchoolDays: "5", timeZone: "America/Chicago" }),
  actions.addSynonymGroupAction({ words: "bus, school bus" }),
  actions.updateSynonymGroupAction({ original: ["mask", "face covering", "face mask"], words: "mask, face covering" }),
  actions.removeSynonymGroupAction({ original: ["mask", "face covering", "face mask"] }),
  actions.resetSynonymsAction(),
];

describe("who may change settings", () => {
  it("requireRole refuses communications and facilities with 403, and no session with 401", async () => {
    signedInAs("comms@example.org");
    await expect(requireRole(["admin"])).rejects.toMatchObject({ status: 403 });
    signedInAs("facilities@example.org");
    await expect(requireRole(["admin"])).rejects.toMatchObject({ status: 403 });
    signedInAs(null);
    await expect(requireRole(["admin"])).rejects.toMatchObject({ status: 401 });
  });

  for (const email of ["comms@example.org", "facilities@example.org", null]) {
    it(`every action refuses ${email ?? "a visitor with no session"} and changes nothing`, async () => {
      signedInAs(email);
      const before = await snapshot();
      for (const result of await Promise.all(everyAction())) {
        expect(result.ok).toBe(false);
        expect(result.message).toBe(email ? "Your role does not allow this." : "Sign in with a staff account to do this.");
      }
      expect(await snapshot()).toEqual(before);
      expect(revalidatePath).not.toHaveBeenCalled();
    });
  }
});

describe("the administrator", () => {
  beforeEach(() => signedInAs("admin@example.org"));

  it("adds a break: its weekdays join the date list the desk reads, names are kept apart, and the change is recorded", async () => {
    const result = await actions.addHolidaysAction({ from: "2027-04-16", to: "2027-04-23", name: "Spring break" });
    expect(result).toMatchObject({ ok: true });
    expect(result.message).toContain("Added 6 weekdays from Friday, April 16, 2027 to Friday, April 23, 2027 as “Spring break”.");
    // No room has readings in April 2027, so no CO2 figures needed recounting.
    expect(result.message).not.toContain("CO2");
    const dates = (await setting("district_holidays")) as string[];
    expect(dates).toEqual([...dates].sort());
    expect(dates).toEqual(expect.arrayContaining(["2027-04-16", "2027-04-19", "2027-04-20", "2027-04-21", "2027-04-22", "2027-04-23"]));
    expect(dates).not.toContain("2027-04-17");
    expect(await setting("district_holiday_names")).toMatchObject({ "2027-04-16": "Spring break", "2027-04-23": "Spring break" });
    const event = await t.db.selectFrom("staff_events").selectAll().orderBy("id", "desc").executeTakeFirstOrThrow();
    expect(event).toMatchObject({ actor_id: ids["admin@example.org"], subject_user_id: null, kind: "setting_changed" });
    expect(JSON.parse(event.detail ?? "{}")).toMatchObject({ setting: "district_holidays", added: expect.arrayContaining(["2027-04-19"]) });
    expect(revalidatePath).toHaveBeenCalledWith("/staff", "layout");
    expect(revalidatePath).toHaveBeenCalledWith("/schools/tamsin-creek/air");

    const again = await actions.addHolidaysAction({ from: "2027-04-19", to: "", name: "" });
    expect(again).toEqual({ ok: true, message: "Monday, April 19, 2027 is already on the calendar; nothing changed." });
  });

  it("a holiday on a day with CO2 readings takes that day out of the daily figures, and removing it brings them back", async () => {
    const onDay = () => t.db.selectFrom("co2_daily").select(["room_id", "mean_ppm"]).where("day", "=", "2026-11-30").orderBy("room_id").execute();
    const before = await onDay();
    expect(before.length).toBeGreaterThan(0);
    const added = await actions.addHolidaysAction({ from: "2026-11-30", to: "", name: "Snow day" });
    expect(added.message).toContain("The daily CO2 figures of those days were recounted.");
    expect(await onDay()).toEqual([]);
    const removed = await actions.removeHolidaysAction({ dates: ["2026-11-30"] });
    expect(removed).toMatchObject({ ok: true });
    expect(removed.message).toContain("Removed Monday, November 30, 2026. It counts as a school day again.");
    expect(await onDay()).toEqual(before);
    expect(await setting("district_holiday_names")).not.toHaveProperty("2026-11-30");
  });

  it("saves the reply target and time zone, and refuses 99 or an unknown zone without changing anything", async () => {
    const before = await snapshot();
    const bad = await actions.saveReplySettingsAction({ replyTargetSchoolDays: "99", timeZone: "Wrenmoor/Valley" });
    expect(bad.ok).toBe(false);
    expect(bad.errors).toEqual({
      replyTargetSchoolDays: "Enter a whole number of school days from 0 to 60.",
      timeZone: expect.stringContaining("is not a time zone name"),
    });
    expect(await snapshot()).toEqual(before);

    const good = await actions.saveReplySettingsAction({ replyTargetSchoolDays: "5", timeZone: "America/New_York" });
    expect(good).toEqual({ ok: true, message: "Saved. Replies are due 5 school days after a question arrives, counted in America/New_York." });
    expect(await setting("reply_target_school_days")).toBe(5);
    expect(revalidatePath).toHaveBeenCalledWith("/ask");
    expect(revalidatePath).toHaveBeenCalledWith("/schools/[school]/[topic]", "page");

    const moved = await actions.saveReplySettingsAction({ replyTargetSchoolDays: "3", timeZone: "america/chicago" });
    expect(moved.message).toMatch(/counted in America\/Chicago\. Daily CO2 figures recounted in the new time zone for \d+ room-days\./);
    expect(await setting("district_time_zone")).toBe("America/Chicago");
    const events = await t.db.selectFrom("staff_events").select("detail").where("kind", "=", "setting_changed").execute();
    expect(events.map((e) => JSON.parse(e.detail ?? "{}"))).toContainEqual({ setting: "district_time_zone", from: "America/New_York", to: "America/Chicago" });
    await actions.saveReplySettingsAction({ replyTargetSchoolDays: "3", timeZone: "America/New_York" });
  });

  it("refuses an impossible date or a weekend and changes nothing", async () => {
    const before = await snapshot();
    expect(await actions.addHolidaysAction({ from: "2026-02-30", to: "", name: "" })).toEqual({
      ok: false,
      message: "Nothing was saved. See the message by the field.",
      errors: { from: "2026-02-30 is not a date: February 2026 has 28 days." },
    });
    expect((await actions.addHolidaysAction({ from: "2026-12-19", to: "2026-12-20", name: "" })).errors?.from).toMatch(/no weekdays/);
    expect((await actions.removeHolidaysAction({ dates: [] })).ok).toBe(false);
    expect((await actions.removeHolidaysAction({ dates: ["2030-01-02"] })).ok).toBe(false);
    expect(await snapshot()).toEqual(before);
  });

  it("adds, changes, removes synonym groups and puts back the defaults", async () => {
    expect(await actions.addSynonymGroupAction({ words: "Bus, school bus" })).toEqual({ ok: true, message: "Added the group “bus, school bus”." });
    const overlap = await actions.addSynonymGroupAction({ words: "cooling, chiller" });
    expect(overlap.ok).toBe(false);
    expect(overlap.errors?.words).toMatch(/“cooling” is already in the group/);
    expect(await actions.updateSynonymGroupAction({ original: ["bus", "school bus"], words: "bus, school bus, transportation" })).toMatchObject({ ok: true });
    expect(await setting("search_synonyms")).toContainEqual(["bus", "school bus", "transportation"]);
    const stale = await actions.updateSynonymGroupAction({ original: ["bus", "school bus"], words: "bus, coach" });
    expect(stale.ok).toBe(false);
    expect(await actions.removeSynonymGroupAction({ original: ["mask", "face covering", "face mask"] })).toMatchObject({ ok: true });
    expect(await setting("search_synonyms")).toHaveLength(4);
    expect(revalidatePath).toHaveBeenCalledWith("/answers");
    expect(await actions.resetSynonymsAction()).toMatchObject({ ok: true });
    const { DEFAULT_SEARCH_SYNONYMS } = await import("@/lib/settings/synonyms");
    expect(await setting("search_synonyms")).toEqual(DEFAULT_SEARCH_SYNONYMS);
  });
});
