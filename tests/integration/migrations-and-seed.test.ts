import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateToLatest } from "@/db/migrate";
import { seed } from "@/db/seed";
import { SEED_PUBLISHED_ANSWERS, SEED_SCHOOLS, SEED_USERS } from "@/db/seed-data";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
});
afterAll(async () => t.cleanup());

async function snapshot() {
  const tables = [
    "schools",
    "rooms",
    "users",
    "questions",
    "question_events",
    "settings",
    "building_projects",
    "published_answers",
    "answer_votes",
    "submission_attempts",
    "question_replies",
    "co2_readings",
    "co2_daily",
    "question_drafts",
    "question_notes",
    "reply_snippets",
  ] as const;
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
    expect(summary.publishedAnswers).toBe(SEED_PUBLISHED_ANSWERS.length);
    expect(summary.publishedAnswers).toBeGreaterThanOrEqual(12);
  });

  it("publishes answers across every school and the district, on each topic families ask about", async () => {
    const rows = await t.db
      .selectFrom("published_answers")
      .leftJoin("schools", "schools.id", "published_answers.school_id")
      .select(["schools.slug", "published_answers.topic", "published_answers.question_text", "published_answers.answer_markdown"])
      .execute();
    expect(new Set(rows.map((r) => r.slug ?? "district"))).toEqual(new Set(["district", ...SEED_SCHOOLS.map((s) => s.slug)]));
    for (const topic of ["air", "building", "cleaning", "signs", "distancing", "cases"]) {
      expect(rows.some((r) => r.topic === topic), topic).toBe(true);
    }
    const text = rows.map((r) => `${r.question_text}\n${r.answer_markdown}`).join("\n");
    for (const subject of [/ventilat/i, /air conditioning/i, /generator/i, /quaternary ammonium/i, /sign/i, /feet apart/i]) {
      expect(text).toMatch(subject);
    }
    // Public words: no e-mail addresses, no raw HTML.
    expect(text).not.toMatch(/@/);
    expect(text).not.toMatch(/<[a-z]/i);
  });

  it("run twice leaves the same data", async () => {
    const first = await snapshot();
    await seed(t.db);
    expect(await snapshot()).toEqual(first);
  });
});
