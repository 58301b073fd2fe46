import { promises as fs } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { FileMigrationProvider, Migrator, type MigrationResultSet } from "kysely";
import type { DB } from "./connection";

const MIGRATION_FOLDER = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "migrations");

export function migrator(db: DB): Migrator {
  return new Migrator({
    db,
    provider: new FileMigrationProvider({ fs, path, migrationFolder: MIGRATION_FOLDER }),
  });
}

/** Applies every pending migration; throws with the failing migration's name. */
export async function migrateToLatest(db: DB): Promise<MigrationResultSet> {
  const result = await migrator(db).migrateToLatest();
  if (result.error) {
    const failed = result.results?.find((r) => r.status === "Error");
    const cause = result.error instanceof Error ? result.error.message : String(result.error);
    throw new Error(`Migration ${failed?.migrationName ?? "(unknown)"} failed: ${cause}`, { cause: result.error });
  }
  return result;
}
