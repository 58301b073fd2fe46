import "server-only";
import { env } from "@/lib/env";
import { openDatabase, type DB } from "./connection";

const globalForDb = globalThis as unknown as { clearhallDb?: DB };

/** One Kysely instance per process; kept on globalThis so hot reload does not open a file per edit. */
export function db(): DB {
  globalForDb.clearhallDb ??= openDatabase(env().DATABASE_URL);
  return globalForDb.clearhallDb;
}
