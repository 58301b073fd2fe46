// `npm run db:backup [-- <file>]`: copies the database named by DATABASE_URL, while the app keeps
// running, to backups/clearhall-YYYYMMDD-HHMMSS.db (UTC) or <file>, checks the copy and prints its
// size and row counts. Restoring is described in the README, "Backups and restore".
import { resolve } from "node:path";
import { backupDatabase, defaultBackupPath } from "@/db/backup";
import { databasePath } from "@/db/connection";
import { env } from "@/lib/env";

async function main(): Promise<void> {
  try {
    await run();
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  }
}

async function run(): Promise<void> {
  const argument = process.argv[2];
  const target = argument ? resolve(argument) : defaultBackupPath(new Date());
  const source = resolve(databasePath(env().DATABASE_URL));
  const report = await backupDatabase(source, target);
  console.log(`Backup of ${source}`);
  console.log(`  written to ${report.path}`);
  console.log(`  size ${report.bytes.toLocaleString("en-US")} bytes`);
  console.log(`  integrity check: ${report.integrity}`);
  const width = Math.max(...report.tables.map((t) => t.name.length));
  for (const table of report.tables) {
    console.log(`  ${table.name.padEnd(width)}  ${table.rows.toLocaleString("en-US")} ${table.rows === 1 ? "row" : "rows"}`);
  }
  if (report.integrity !== "ok") {
    console.error("The copy failed its integrity check: do not rely on it. Run the backup again.");
    process.exitCode = 1;
  }
}

void main();
