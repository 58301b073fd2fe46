import { createHmac } from "node:crypto";
import type { Transaction } from "kysely";
import type { Database } from "@/db/types";

export interface RateLimit {
  /** Accepted questions allowed per IP address, and separately per e-mail address, in the window. */
  count: number;
  windowMinutes: number;
}

export interface SubmitterKeys {
  ipHash: string;
  emailHash: string;
}

/**
 * Keyed hashes of the sender's address and e-mail. With the server's secret as the key, the stored
 * values cannot be reversed by hashing every IPv4 address or a list of e-mail addresses.
 */
export function submitterKeys(ipKey: string, email: string, secret: string): SubmitterKeys {
  const mac = (value: string) => createHmac("sha256", secret).update(value, "utf8").digest("hex");
  return { ipHash: mac(`ip:${ipKey}`), emailHash: mac(`email:${email.trim().toLowerCase()}`) };
}

/**
 * Seconds until one more question would be accepted, or 0 when it would be now. Counts only
 * accepted questions: a refused attempt stores nothing, so it cannot lock anyone else out.
 */
export async function secondsUntilAllowed(
  trx: Transaction<Database>,
  keys: SubmitterKeys,
  limit: RateLimit,
  now: Date,
): Promise<number> {
  const windowMs = limit.windowMinutes * 60_000;
  const since = new Date(now.getTime() - windowMs).toISOString();
  const rows = await trx
    .selectFrom("submission_attempts")
    .select(["ip_hash", "email_hash", "created_at"])
    .where("created_at", ">", since)
    .where((eb) => eb.or([eb("ip_hash", "=", keys.ipHash), eb("email_hash", "=", keys.emailHash)]))
    .orderBy("created_at", "asc")
    .execute();
  let wait = 0;
  for (const group of [rows.filter((r) => r.ip_hash === keys.ipHash), rows.filter((r) => r.email_hash === keys.emailHash)]) {
    if (group.length < limit.count) continue;
    // The window frees a place when the oldest row that keeps the group at its limit leaves it.
    const freesUp = group[group.length - limit.count];
    if (!freesUp) continue;
    const ms = Date.parse(freesUp.created_at) + windowMs - now.getTime();
    wait = Math.max(wait, Math.ceil(ms / 1000), 1);
  }
  return wait;
}

/** Records an accepted question and forgets those that have left the window. */
export async function recordSubmission(trx: Transaction<Database>, keys: SubmitterKeys, limit: RateLimit, now: Date): Promise<void> {
  const since = new Date(now.getTime() - limit.windowMinutes * 60_000).toISOString();
  await trx.deleteFrom("submission_attempts").where("created_at", "<=", since).execute();
  await trx
    .insertInto("submission_attempts")
    .values({ ip_hash: keys.ipHash, email_hash: keys.emailHash, created_at: now.toISOString() })
    .execute();
}
