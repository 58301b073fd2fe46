import SQLite from "better-sqlite3";
import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runReliabilityChild } from "../support/child-process";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;

beforeAll(async () => {
  t = await createTestDb();
});
afterAll(async () => t.cleanup());

describe("concurrent submissions from several processes", () => {
  it("all land, each with its own reference and confirmation, none refused as busy", { timeout: 90_000 }, async () => {
    const PROCESSES = 4;
    const EACH = 40;
    const startAt = Date.now() + 4_000;
    const runs = await Promise.all(
      Array.from({ length: PROCESSES }, (_, w) => runReliabilityChild(["submit", t.path, String(w + 1), String(EACH), String(startAt)])),
    );

    for (const run of runs) {
      expect(run.stderr).toBe("");
      expect(run.code).toBe(0);
    }
    const results = runs.map((r) => r.lines[0] as { references: string[]; errors: string[] });
    expect(results.flatMap((r) => r.errors)).toEqual([]);
    const references = results.flatMap((r) => r.references);
    expect(references).toHaveLength(PROCESSES * EACH);
    expect(new Set(references).size).toBe(PROCESSES * EACH);

    const stored = await t.db.selectFrom("questions").select(["id", "reference"]).execute();
    expect(stored).toHaveLength(PROCESSES * EACH);
    expect(new Set(stored.map((q) => q.reference))).toEqual(new Set(references));
    // Numbered without gaps: each reference was taken inside its own write transaction.
    const sequences = stored.map((q) => Number(q.reference.split("-")[2])).sort((a, b) => a - b);
    expect(sequences).toEqual(Array.from({ length: PROCESSES * EACH }, (_, i) => i + 1));
    const outbox = await t.db.selectFrom("outbox").select(["kind", "status"]).execute();
    expect(outbox).toHaveLength(PROCESSES * EACH);
    const events = await t.db.selectFrom("question_events").select("question_id").execute();
    expect(new Set(events.map((e) => e.question_id)).size).toBe(PROCESSES * EACH);
  });
});

describe("openDatabase transactions", () => {
  it("take the write lock when they begin, so a writer elsewhere waits instead of breaking a half-done transaction", async () => {
    const other = new SQLite(t.path);
    other.pragma("busy_timeout = 0");
    try {
      await t.db.transaction().execute(async (trx) => {
        // Nothing written yet, but the lock is already held: a deferred BEGIN would not hold it here.
        await sql`select count(*) from questions`.execute(trx);
        expect(() => other.prepare("insert into settings (key, value, updated_at) values ('probe', '1', '2026-12-01')").run()).toThrow(/database is locked/);
      });
      // Once committed, the other connection writes normally.
      other.prepare("insert into settings (key, value, updated_at) values ('probe', '1', '2026-12-01')").run();
      other.prepare("delete from settings where key = 'probe'").run();
    } finally {
      other.close();
    }
  });
});
