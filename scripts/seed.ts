import { openDatabase } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";
import { seed } from "@/db/seed";
import { env } from "@/lib/env";

async function main(): Promise<void> {
  const db = openDatabase(env().DATABASE_URL);
  try {
    await migrateToLatest(db);
    const s = await seed(db);
    console.log(`Demo data in ${env().DATABASE_URL}: ${s.schools} schools, ${s.rooms} rooms, ${s.users} staff accounts, ${s.questions} questions, ${s.publishedAnswers} published answers.`);
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  } finally {
    await db.destroy();
  }
}

void main();
