import type { Transaction } from "kysely";
import type { Database } from "@/db/types";

const REFERENCE = /^Q-(\d{4})-(\d{4,})$/;

export function formatQuestionReference(year: number, sequence: number): string {
  return `Q-${year}-${String(sequence).padStart(4, "0")}`;
}

export function isQuestionReference(value: string): boolean {
  return REFERENCE.test(value);
}

/**
 * The next reference for the year, e.g. Q-2026-0042. Run it inside the transaction that inserts
 * the question: SQLite has one writer, and the unique index on `reference` refuses a duplicate.
 */
export async function nextQuestionReference(trx: Transaction<Database>, year: number): Promise<string> {
  const prefix = `Q-${year}-`;
  // Longest first, then highest: as plain text, Q-2026-10000 would sort before Q-2026-9999.
  const latest = await trx
    .selectFrom("questions")
    .select("reference")
    .where("reference", "like", `${prefix}%`)
    .orderBy((eb) => eb.fn("length", ["reference"]), "desc")
    .orderBy("reference", "desc")
    .limit(1)
    .executeTakeFirst();
  const match = latest ? REFERENCE.exec(latest.reference) : null;
  return formatQuestionReference(year, (match ? Number(match[2]) : 0) + 1);
}
