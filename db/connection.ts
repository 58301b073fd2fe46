import { mkdirSync } from "node:fs";
import { dirname } from "node:path";
import SQLite from "better-sqlite3";
import { CompiledQuery, Kysely, SqliteDialect, SqliteDriver, type DatabaseConnection, type Driver, type SqliteDialectConfig } from "kysely";
import type { Database } from "./types";

export type DB = Kysely<Database>;

/** Turns `DATABASE_URL` (a path, or `file:` URL) into a file path better-sqlite3 accepts. */
export function databasePath(url: string): string {
  if (url === ":memory:") return url;
  return url.startsWith("file:") ? url.slice("file:".length).replace(/^\/\/(?=\/)/, "") : url;
}

/**
 * Kysely begins transactions with a plain (deferred) BEGIN, which takes the write lock only at the
 * first write. When another process commits in between, SQLite cannot upgrade the stale read and
 * answers SQLITE_BUSY at once, without waiting for the busy timeout. BEGIN IMMEDIATE takes the
 * write lock up front, so a second writer waits its turn (busy_timeout) instead of failing.
 */
class ImmediateTransactionDriver extends SqliteDriver {
  override async beginTransaction(connection: DatabaseConnection): Promise<void> {
    await connection.executeQuery(CompiledQuery.raw("begin immediate"));
  }
}

class ClearhallSqliteDialect extends SqliteDialect {
  constructor(private readonly settings: SqliteDialectConfig) {
    super(settings);
  }

  override createDriver(): Driver {
    return new ImmediateTransactionDriver(this.settings);
  }
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
  return new Kysely<Database>({ dialect: new ClearhallSqliteDialect({ database: sqlite }) });
}
