import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { openDatabase, type DB } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";

export interface TestDb {
  db: DB;
  path: string;
  cleanup: () => Promise<void>;
}

/** A fresh SQLite file with every migration applied; one per test file. */
export async function createTestDb(): Promise<TestDb> {
  const dir = mkdtempSync(join(tmpdir(), "clearhall-test-"));
  const path = join(dir, "test.db");
  const db = openDatabase(path);
  await migrateToLatest(db);
  return {
    db,
    path,
    cleanup: async () => {
      await db.destroy();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
