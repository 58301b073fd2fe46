import { openDatabase } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";
import { env } from "@/lib/env";

async function main(): Promise<void> {
  const db = openDatabase(env().DATABASE_URL);
  try {
    const { results = [] } = await migrateToLatest(db);
    if (results.length === 0) console.log(`Database ${env().DATABASE_URL} is up to date.`);
    for (const r of results) console.log(`${r.status === "Success" ? "applied" : r.status}: ${r.migrationName}`);
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  } finally {
    await db.destroy();
  }
}

void main();
