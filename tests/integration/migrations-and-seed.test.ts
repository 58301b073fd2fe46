import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateToLatest } from "@/db/migrate";
import { seed } from "@/db/seed";
import { SEED_SCHOOLS, SEED_USERS } from "@/db/seed-data";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
});
afterAll(async () => t.cleanup());

async function snapshot() {
  const tables = ["schools", "rooms", "users", "questions", "question_events", "settings", "building_projects"] as const;
  const out: Record<string, unknown[]> = {};
  for (const table of tables) out[table] = await t.db.selectFrom(table).selectAll().execute();
  return out;
}

describe("migrations", () => {
  it("running them again applies nothing and changes nothing", async () => {
    const before = await t.db.introspection.getTables();
    const again = await migrateToLatest(t.db);
    expect(again.results).toEqual([]);
    expect(await t.db.introspection.getTables()).toEqual(before);
  });

  it("turns on foreign keys and WAL for the connection", async () => {
    await expect(
      t.db.insertInto("rooms").values({
        school_id: 999,
        name: "Orphan",
        use: "other",
        length_ft: 10,
        width_ft: 10,
        ceiling_ft: 9,
        occupancy: 1,
        updated_at: new Date().toISOString(),
      }).execute(),
    ).rejects.toThrow(/FOREIGN KEY/);
  });
});

describe("seed", () => {
  it("loads three schools, a dozen rooms each, one account per role and a handful of questions", async () => {
    const summary = await seed(t.db);
    expect(summary.schools).toBe(3);
    expect(summary.rooms).toBe(SEED_SCHOOLS.reduce((n, s) => n + s.rooms.length, 0));
    for (const school of SEED_SCHOOLS) expect(school.rooms.length).toBeGreaterThanOrEqual(12);
    expect(summary.users).toBe(3);
    const roles = (await t.db.selectFrom("users").select("role").execute()).map((u) => u.role).sort();
    expect(roles).toEqual(["admin", "communications", "facilities"]);
    expect(summary.questions).toBeGreaterThanOrEqual(5);
    expect(SEED_USERS.map((u) => u.email)).toEqual(["comms@example.org", "facilities@example.org", "admin@example.org"]);
  });

  it("run twice leaves the same data", async () => {
    const first = await snapshot();
    await seed(t.db);
    expect(await snapshot()).toEqual(first);
  });
});
