import { mkdirSync } from "node:fs";
import { dirname } from "node:path";
import SQLite from "better-sqlite3";
import { Kysely, SqliteDialect } from "kysely";
import type { Database } from "./types";

export type DB = Kysely<Database>;

/** Turns `DATABASE_URL` (a path, or `file:` URL) into a file path better-sqlite3 accepts. */
export function databasePath(url: string): string {
  if (url === ":memory:") return url;
  return url.startsWith("file:") ? url.slice("file:".length).replace(/^\/\/(?=\/)/, "") : url;
}

/**
 * Opens the SQLite file with the settings every process needs: WAL so readers
 * never block the writer, foreign keys enforced, and a busy timeout so a second
 * writer waits instead of failing with SQLITE_BUSY.
 */
export function openDatabase(url: string): DB {
  const path = databasePath(url);
  if (path !== ":memory:") mkdirSync(dirname(path), { recursive: true });
  const sqlite = new SQLite(path);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  sqlite.pragma("busy_timeout = 5000");
  sqlite.pragma("synchronous = NORMAL");
  return new Kysely<Database>({ dialect: new SqliteDialect({ database: sqlite }) });
}
