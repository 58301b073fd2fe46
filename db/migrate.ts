import { Migrator, type MigrationResultSet } from "kysely";
import { MIGRATIONS } from "@/migrations";
import type { DB } from "./connection";

export function migrator(db: DB): Migrator {
  return new Migrator({ db, provider: { getMigrations: async () => MIGRATIONS } });
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
