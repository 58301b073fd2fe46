import type { Kysely } from "kysely";
import type { Database, OutboxMessage } from "@/db/types";
import { retryDelayMs } from "./backoff";
import type { MailTransport } from "./transport";

export const DEFAULT_BATCH_SIZE = 25;
export const DEFAULT_STALE_CLAIM_MS = 5 * 60_000;
const MAX_ERROR_LENGTH = 500;

/** Errors about the server rather than the message (unreachable, silent, refusing our login): the rest of the batch would fail the same way. */
const SERVER_ERROR_CODES = new Set(["ECONNECTION", "ESOCKET", "ETIMEDOUT", "EDNS", "ETLS", "EAUTH"]);

export interface DeliverOptions {
  from: string;
  maxAttempts: number;
  now?: Date;
  batchSize?: number;
  /** A row left in 'sending' longer than this is taken to belong to a sender that died. */
  staleClaimMs?: number;
  /** For the retry jitter; see retryDelayMs. */
  random?: () => number;
}

export interface DeliveryProblem {
  outboxId: number;
  error: string;
  /** true when the row will not be tried again. */
  final: boolean;
}

export interface DeliveryResult {
  sent: number;
  retried: number;
  failed: number;
  /** Stale claims put back to 'pending' at the start of the pass. */
  released: number;
  problems: DeliveryProblem[];
}

/** The error text stored and logged: SMTP replies can quote addresses, so those are masked. */
export function describeSendError(error: unknown): string {
  const base = error instanceof Error ? error.message : String(error);
  const code = (error as { code?: unknown } | null)?.code;
  const text = typeof code === "string" && !base.includes(code) ? `${code}: ${base}` : base;
  return text.replace(/[^\s<>"'(),;:@]+@[^\s<>"'(),;:@]+/g, "[address]").slice(0, MAX_ERROR_LENGTH);
}

function isServerError(error: unknown): boolean {
  const code = (error as { code?: unknown } | null)?.code;
  return typeof code === "string" && SERVER_ERROR_CODES.has(code);
}

async function releaseStaleClaims(db: Kysely<Database>, now: Date, staleClaimMs: number): Promise<number> {
  const staleBefore = new Date(now.getTime() - staleClaimMs).toISOString();
  const result = await db
    .updateTable("outbox")
    .set({ status: "pending", claimed_at: null, last_error: "sender stopped before finishing; trying again" })
    .where("status", "=", "sending")
    .where((eb) => eb.or([eb("claimed_at", "is", null), eb("claimed_at", "<", staleBefore)]))
    .executeTakeFirst();
  return Number(result.numUpdatedRows);
}

/**
 * Takes the row for this sender. The `attempts` and `next_attempt_at` conditions make the
 * row read earlier still current, so two senders never both send it.
 */
async function claim(db: Kysely<Database>, row: OutboxMessage, at: string): Promise<boolean> {
  const result = await db
    .updateTable("outbox")
    .set({ status: "sending", claimed_at: at })
    .where("id", "=", row.id)
    .where("status", "=", "pending")
    .where("attempts", "=", row.attempts)
    .where("next_attempt_at", "<=", at)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

async function recordSent(db: Kysely<Database>, row: OutboxMessage, at: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    await trx
      .updateTable("outbox")
      .set({ status: "sent", sent_at: at, attempts: row.attempts + 1, claimed_at: null, last_error: null })
      .where("id", "=", row.id)
      .execute();
    await trx.insertInto("outbox_attempts").values({ outbox_id: row.id, attempted_at: at, ok: 1, error: null }).execute();
  });
}

async function recordFailure(
  db: Kysely<Database>,
  row: OutboxMessage,
  now: Date,
  error: string,
  final: boolean,
  random: () => number,
): Promise<void> {
  const at = now.toISOString();
  const attempts = row.attempts + 1;
  await db.transaction().execute(async (trx) => {
    await trx
      .updateTable("outbox")
      .set(
        final
          ? { status: "failed", attempts, claimed_at: null, last_error: error }
          : {
              status: "pending",
              attempts,
              claimed_at: null,
              last_error: error,
              next_attempt_at: new Date(now.getTime() + retryDelayMs(attempts, random)).toISOString(),
            },
      )
      .where("id", "=", row.id)
      .execute();
    await trx.insertInto("outbox_attempts").values({ outbox_id: row.id, attempted_at: at, ok: 0, error }).execute();
  });
}

/**
 * One delivery pass: frees claims left by a crashed sender, then sends the due rows oldest first,
 * recording every attempt. A send error is recorded on its row and never thrown; a database error is.
 * When the server itself fails (unreachable, silent, login refused) the pass stops, leaving the rest for later passes.
 */
export async function deliverDueMail(
  db: Kysely<Database>,
  transport: MailTransport,
  options: DeliverOptions,
): Promise<DeliveryResult> {
  const now = options.now ?? new Date();
  const at = now.toISOString();
  const random = options.random ?? Math.random;
  const result: DeliveryResult = {
    sent: 0,
    retried: 0,
    failed: 0,
    released: await releaseStaleClaims(db, now, options.staleClaimMs ?? DEFAULT_STALE_CLAIM_MS),
    problems: [],
  };

  const due = await db
    .selectFrom("outbox")
    .selectAll()
    .where("status", "=", "pending")
    .where("next_attempt_at", "<=", at)
    .orderBy("created_at", "asc")
    .orderBy("id", "asc")
    .limit(options.batchSize ?? DEFAULT_BATCH_SIZE)
    .execute();

  for (const row of due) {
    if (!(await claim(db, row, at))) continue;
    try {
      await transport.sendMail({
        from: options.from,
        to: row.to_address,
        subject: row.subject,
        text: row.text_body,
        ...(row.html_body === null ? {} : { html: row.html_body }),
        messageId: row.message_id,
      });
    } catch (sendError) {
      const error = describeSendError(sendError);
      const final = row.attempts + 1 >= options.maxAttempts;
      await recordFailure(db, row, now, error, final, random);
      result.problems.push({ outboxId: row.id, error, final });
      if (final) result.failed += 1;
      else result.retried += 1;
      if (isServerError(sendError)) break;
      continue;
    }
    await recordSent(db, row, at);
    result.sent += 1;
  }
  return result;
}
