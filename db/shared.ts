import { env } from "@/lib/env";
import { openDatabase, type DB } from "./connection";

const globalForDb = globalThis as unknown as { clearhallDb?: DB };

/**
 * The process's one Kysely instance, kept on globalThis so hot reload does not
 * open a file per edit. One connection matters: better-sqlite3 waits for
 * SQLite's lock synchronously, so a second connection in the same process
 * could block the event loop, while one instance simply queues the queries.
 */
export function sharedDatabase(): DB {
  globalForDb.clearhallDb ??= openDatabase(env().DATABASE_URL);
  return globalForDb.clearhallDb;
}
