import type { Kysely } from "kysely";
import type { Database } from "@/db/types";
import { deliverDueMail, type DeliveryResult } from "./sender";
import type { MailTransport } from "./transport";

export interface MailLog {
  info(message: string): void;
  error(message: string, cause?: unknown): void;
}

export interface MailSenderOptions {
  db: Kysely<Database>;
  transport: MailTransport;
  from: string;
  intervalMs: number;
  maxAttempts: number;
  batchSize?: number;
  staleClaimMs?: number;
  log?: MailLog;
}

export interface MailSender {
  /** Stops the timer and waits for a pass in progress to finish. */
  stop(): Promise<void>;
  /** Runs a pass now, after the one in progress if there is one. Rejects with a database error. */
  runNow(): Promise<DeliveryResult>;
}

const consoleLog: MailLog = {
  info: (message) => console.info(message),
  error: (message, cause) => console.error(message, cause),
};

const globalForMail = globalThis as unknown as { clearhallMailSender?: MailSender };

/** The sender started in this process, if any: e.g. to run a pass right after queueing mail. */
export function runningMailSender(): MailSender | undefined {
  return globalForMail.clearhallMailSender;
}

/** One line of counts and outbox ids; problems grouped by error so a dead server gives one short line. */
export function summarizeDelivery(result: DeliveryResult): string | undefined {
  if (result.sent + result.retried + result.failed + result.released === 0) return undefined;
  const parts = [`sent ${result.sent}`, `retried ${result.retried}`, `failed ${result.failed}`];
  if (result.released > 0) parts.push(`released ${result.released} stale`);
  const byError = new Map<string, number[]>();
  for (const p of result.problems) byError.set(p.error, [...(byError.get(p.error) ?? []), p.outboxId]);
  const problems = [...byError].map(([error, ids]) => `outbox ${ids.join(", ")}: ${error}`);
  return `[mail] ${parts.join(", ")}${problems.length ? ` (${problems.join("; ")})` : ""}`;
}

/**
 * Polls the outbox every `intervalMs`, one pass at a time; a failed pass is logged and the next
 * one runs on schedule. One sender per process: a second call returns the running one.
 */
export function startMailSender(options: MailSenderOptions): MailSender {
  const log = options.log ?? consoleLog;
  if (globalForMail.clearhallMailSender) {
    log.info("[mail] sender already running in this process; not starting another");
    return globalForMail.clearhallMailSender;
  }

  let stopped = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let inFlight: Promise<DeliveryResult> | undefined;
  let queued: Promise<DeliveryResult> | undefined;

  async function pass(): Promise<DeliveryResult> {
    try {
      const result = await deliverDueMail(options.db, options.transport, {
        from: options.from,
        maxAttempts: options.maxAttempts,
        batchSize: options.batchSize,
        staleClaimMs: options.staleClaimMs,
      });
      const summary = summarizeDelivery(result);
      if (summary) log.info(summary);
      return result;
    } catch (error) {
      log.error(`[mail] delivery pass failed: ${error instanceof Error ? error.message : String(error)}`, error);
      throw error;
    }
  }

  function runNow(): Promise<DeliveryResult> {
    if (stopped) return Promise.reject(new Error("The mail sender is stopped"));
    if (!inFlight) {
      inFlight = pass().finally(() => {
        inFlight = undefined;
      });
      return inFlight;
    }
    // Callers arriving during a pass share one follow-up pass, so mail queued meanwhile is picked up.
    queued ??= inFlight
      .catch(() => undefined)
      .then(() => {
        queued = undefined;
        return runNow();
      });
    return queued;
  }

  function schedule(): void {
    if (stopped) return;
    timer = setTimeout(() => {
      runNow()
        // pass() has already logged the error; the loop goes on.
        .catch(() => undefined)
        .finally(schedule);
    }, options.intervalMs);
    // The sender alone should not keep a process (a script, a test run) alive.
    timer.unref();
  }

  const sender: MailSender = {
    runNow,
    async stop() {
      if (stopped) return;
      stopped = true;
      clearTimeout(timer);
      if (globalForMail.clearhallMailSender === sender) delete globalForMail.clearhallMailSender;
      await Promise.allSettled([inFlight, queued]);
    },
  };
  globalForMail.clearhallMailSender = sender;
  schedule();
  log.info(`[mail] sender started, checking the outbox every ${options.intervalMs} ms`);
  return sender;
}
