// A consistent copy of the live database, taken with SQLite's online backup API while the app
// keeps running, then checked. Used by `npm run db:backup` (scripts/db-backup.ts).
import { existsSync, mkdirSync, statSync } from "node:fs";
import { dirname, resolve } from "node:path";
import SQLite from "better-sqlite3";

/** backups/clearhall-YYYYMMDD-HHMMSS.db, in UTC so two servers' names sort the same way. */
export function defaultBackupPath(now: Date, dir = "backups"): string {
  const stamp = now.toISOString().replace(/\.\d{3}Z$/, "").replace(/-|:/g, "").replace("T", "-");
  return resolve(dir, `clearhall-${stamp}.db`);
}

export interface BackupReport {
  path: string;
  bytes: number;
  integrity: string;
  /** Rows per table of the copy, application tables only. */
  tables: { name: string; rows: number }[];
}

/** Copies the database at `sourcePath` to `targetPath` and checks the copy. Refuses to overwrite a file. */
export async function backupDatabase(sourcePath: string, targetPath: string): Promise<BackupReport> {
  if (!existsSync(sourcePath)) throw new Error(`There is no database at ${sourcePath}; check DATABASE_URL.`);
  if (existsSync(targetPath)) throw new Error(`${targetPath} already exists; choose another name (nothing was written).`);
  mkdirSync(dirname(targetPath), { recursive: true });

  const source = new SQLite(sourcePath, { fileMustExist: true });
  try {
    source.pragma("busy_timeout = 5000");
    // All remaining pages in one step: a step reads one consistent snapshot, so writers
    // elsewhere (WAL) go on and the copy never restarts because of them.
    await source.backup(targetPath, { progress: () => 0x7fffffff });
  } finally {
    source.close();
  }

  const copy = new SQLite(targetPath, { fileMustExist: true });
  try {
    // One self-contained file, with no -wal or -shm beside it, to store or copy anywhere;
    // the app turns WAL back on when it opens a restored copy.
    copy.pragma("journal_mode = DELETE");
    const integrity = (copy.pragma("integrity_check") as { integrity_check: string }[]).map((r) => r.integrity_check).join("; ");
    const names = copy
      .prepare("select name from sqlite_schema where type = 'table' and name not like 'sqlite_%' and name not like 'kysely_%' order by name")
      .pluck()
      .all() as string[];
    const tables = names.map((name) => ({
      name,
      rows: Number(copy.prepare(`select count(*) from "${name.replace(/"/g, '""')}"`).pluck().get()),
    }));
    return { path: targetPath, bytes: statSync(targetPath).size, integrity, tables };
  } finally {
    copy.close();
  }
}
