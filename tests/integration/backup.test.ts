import { execFile, spawn } from "node:child_process";
import { copyFileSync, existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import SQLite from "better-sqlite3";
import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { backupDatabase, defaultBackupPath } from "@/db/backup";
import { openDatabase } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";
import { seed } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";

const run = promisify(execFile);

let t: TestDb;
let dir: string;

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  // Some bulk, so the copy has thousands of pages to move while the writer works.
  await sql`create table backup_probe (id integer primary key, written_at text not null, pad text not null)`.execute(t.db);
  await sql`
    with recursive n(i) as (select 1 union all select i + 1 from n where i < 20000)
    insert into backup_probe (written_at, pad) select 'before', hex(randomblob(100)) from n
  `.execute(t.db);
  dir = mkdtempSync(join(tmpdir(), "clearhall-backup-"));
});
afterAll(async () => {
  await t.cleanup();
  rmSync(dir, { recursive: true, force: true });
});

/** Another process that commits one row at a time into backup_probe until it is told to stop. */
function startWriter(path: string) {
  const code = `
    const db = new (require("better-sqlite3"))(process.argv[1]);
    db.pragma("busy_timeout = 5000");
    const insert = db.prepare("insert into backup_probe (written_at, pad) values ('during', hex(randomblob(100)))");
    let n = 0, stop = false;
    process.stdin.on("data", () => { stop = true; });
    (function loop() {
      if (stop) { process.stdout.write(String(n)); db.close(); process.exit(0); }
      for (let i = 0; i < 20; i++) { insert.run(); n++; }
      if (n === 200) process.stderr.write("writing\\n");
      setImmediate(loop);
    })();`;
  const child = spawn(process.execPath, ["-e", code, path], { stdio: ["pipe", "pipe", "pipe"] });
  let out = "";
  child.stdout.on("data", (c: Buffer) => (out += c.toString()));
  const writing = new Promise<void>((resolve) => child.stderr.once("data", () => resolve()));
  const stopped = new Promise<number>((resolve, reject) => {
    child.on("error", reject);
    child.on("close", (code) => (code === 0 ? resolve(Number(out)) : reject(new Error(`writer exited with ${code}`))));
  });
  return {
    writing,
    async stop() {
      child.stdin.write("stop\n");
      return stopped;
    },
  };
}

describe("database backup", () => {
  it("names a backup by the UTC time it was taken", () => {
    expect(defaultBackupPath(new Date("2026-12-01T09:05:07.123Z"), "/srv/backups")).toBe("/srv/backups/clearhall-20261201-090507.db");
  });

  it("copies the database while another process writes: the copy is whole, consistent and complete up to a moment", { timeout: 60_000 }, async () => {
    const writer = startWriter(t.path);
    await writer.writing;
    const target = join(dir, "during-writes.db");
    const report = await backupDatabase(t.path, target);
    const written = await writer.stop();
    expect(written).toBeGreaterThan(200);

    expect(report.integrity).toBe("ok");
    expect(report.bytes).toBeGreaterThan(2_000_000);
    // One file, nothing beside it.
    expect(existsSync(`${target}-wal`)).toBe(false);
    expect(existsSync(`${target}-shm`)).toBe(false);

    const copy = new SQLite(target, { readonly: true });
    try {
      expect(copy.pragma("integrity_check", { simple: true })).toBe("ok");
      expect(copy.pragma("foreign_key_check")).toEqual([]);
      const probe = copy.prepare("select count(*) as n, max(id) as last, sum(written_at = 'during') as during from backup_probe").get() as { n: number; last: number; during: number };
      // A snapshot: every row up to the last one copied, with no holes, some written while the copy was made.
      expect(probe.n).toBe(probe.last);
      expect(probe.during).toBeGreaterThan(0);
      expect(probe.n).toBeLessThanOrEqual(20_000 + written);
      for (const table of ["schools", "rooms", "users", "questions", "published_answers", "building_projects"]) {
        const live = Number((await sql<{ n: number }>`select count(*) as n from ${sql.table(table)}`.execute(t.db)).rows[0]?.n);
        expect(live).toBeGreaterThan(0);
        expect(copy.prepare(`select count(*) from ${table}`).pluck().get()).toBe(live);
        expect(report.tables).toContainEqual({ name: table, rows: live });
      }
    } finally {
      copy.close();
    }
  });

  it("refuses to overwrite an existing file, and to back up a database that is not there", async () => {
    const target = join(dir, "taken.db");
    copyFileSync(t.path, target);
    await expect(backupDatabase(t.path, target)).rejects.toThrow(/already exists/);
    await expect(backupDatabase(join(dir, "missing.db"), join(dir, "new.db"))).rejects.toThrow(/no database at/);
    expect(existsSync(join(dir, "missing.db"))).toBe(false);
    expect(existsSync(join(dir, "new.db"))).toBe(false);
  });

  it("npm run db:backup backs up DATABASE_URL and prints the path, size and row counts; the documented restore works", { timeout: 60_000 }, async () => {
    const target = join(dir, "from-script.db");
    const { stdout } = await run("npx", ["tsx", "scripts/db-backup.ts", target], { env: { ...process.env, DATABASE_URL: t.path } });
    expect(stdout).toContain(`written to ${target}`);
    expect(stdout).toMatch(/size [\d,]+ bytes/);
    expect(stdout).toContain("integrity check: ok");
    const questions = Number((await t.db.selectFrom("questions").select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
    expect(stdout).toMatch(new RegExp(`questions\\s+${questions} rows?`));

    // Restore as the README says: the app stopped, the copy put in place, no -wal/-shm left, migrate, start.
    const restored = join(dir, "restored", "clearhall.db");
    const db = openDatabase(restored);
    await db.destroy();
    copyFileSync(target, restored);
    rmSync(`${restored}-wal`, { force: true });
    rmSync(`${restored}-shm`, { force: true });
    const reopened = openDatabase(restored);
    try {
      await migrateToLatest(reopened);
      expect((await sql<{ journal_mode: string }>`pragma journal_mode`.execute(reopened)).rows[0]?.journal_mode).toBe("wal");
      const n = Number((await reopened.selectFrom("questions").select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
      expect(n).toBe(questions);
    } finally {
      await reopened.destroy();
    }
  });
});
