import { sql } from "kysely";
import { afterEach, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/connection";
import {
  createSmtpTransport,
  deliverDueMail,
  enqueueMail,
  retryDelayMs,
  startMailSender,
  type MailLog,
  type MailSender,
  type MailTransport,
} from "@/lib/mail";
import { DEFAULT_STALE_CLAIM_MS } from "@/lib/mail/sender";
import { submitQuestion } from "@/lib/questions/submit";
import { runReliabilityChild } from "../support/child-process";
import { startSmtpCatcher, type SmtpCatcher } from "../support/smtp-catcher";
import { outboxTestDb } from "../support/outbox-db";

const FROM = "Wrenmoor Valley Schools <reopening@example.org>";
const HOST = "reopening.example.org";
const MINUTE = 60_000;

const t = outboxTestDb();
const catchers: SmtpCatcher[] = [];
let sender: MailSender | undefined;

afterEach(async () => {
  await sender?.stop();
  sender = undefined;
  await Promise.all(catchers.splice(0).map((c) => c.stop()));
});

async function catcherOn(port = 0): Promise<SmtpCatcher> {
  const catcher = await startSmtpCatcher(port);
  catchers.push(catcher);
  return catcher;
}

/** How many times each Message-ID reached any of the catchers. */
function deliveriesById(...received: SmtpCatcher[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const catcher of received) for (const m of catcher.messages) counts.set(m.messageId ?? "", (counts.get(m.messageId ?? "") ?? 0) + 1);
  return counts;
}

const quietLog = (): MailLog & { info: (m: string) => void; lines: string[] } => {
  const lines: string[] = [];
  return { lines, info: (m) => lines.push(m), error: (m) => lines.push(m) };
};

async function waitFor(check: () => Promise<boolean> | boolean, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("condition not met in time");
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

describe("the SMTP server goes down and comes back", () => {
  it("keeps every message, backs off between tries, and delivers each exactly once after the restart", { timeout: 60_000 }, async () => {
    const first = await catcherOn();
    const port = first.port;
    const real = createSmtpTransport(`smtp://127.0.0.1:${port}`, 2_000);
    // The server dies after accepting two messages, between one connection and the next.
    let accepted = 0;
    const transport: MailTransport = {
      async sendMail(mail) {
        if (accepted === 2 && catchers.includes(first)) {
          catchers.splice(catchers.indexOf(first), 1);
          await first.stop();
        }
        const info = await real.sendMail(mail);
        accepted += 1;
        return info;
      },
    };

    const t0 = new Date("2026-12-01T13:00:00.000Z");
    const ids: number[] = [];
    for (let n = 1; n <= 6; n++) {
      ids.push(
        await enqueueMail(t.db, { kind: "question-received", to: `family${n}@example.net`, subject: `Reference ${n}`, text: `Message ${n}.` }, new Date(t0.getTime() + n), { host: HOST }),
      );
    }
    const options = (now: Date) => ({ from: FROM, maxAttempts: 12, now });

    // Ten minutes of the server being down, with the sender looking every 5 seconds.
    let clock = t0.getTime() + 1_000;
    const firstPass = await deliverDueMail(t.db, transport, options(new Date(clock)));
    expect(firstPass).toMatchObject({ sent: 2, retried: 1, failed: 0 });
    const downUntil = t0.getTime() + 10 * MINUTE;
    while (clock < downUntil) {
      clock += 5_000;
      const pass = await deliverDueMail(t.db, transport, options(new Date(clock)));
      expect(pass.sent).toBe(0);
      expect(pass.failed).toBe(0);
      // A dead server ends the pass at its first refusal: at most one attempt is spent per pass.
      expect(pass.retried).toBeLessThanOrEqual(1);
    }

    const waiting = await t.db.selectFrom("outbox").select(["id", "status", "attempts", "sent_at"]).where("status", "!=", "sent").orderBy("id").execute();
    expect(waiting.map((r) => r.id)).toEqual(ids.slice(2));
    for (const row of waiting) {
      expect(row.status).toBe("pending");
      // Backing off from 15 s and doubling, ten minutes allow at most six tries (0, 15, 45, 105, 225, 465 s).
      expect(row.attempts).toBeGreaterThanOrEqual(1);
      expect(row.attempts).toBeLessThanOrEqual(6);
      const tries = await t.db.selectFrom("outbox_attempts").select(["attempted_at", "ok"]).where("outbox_id", "=", row.id).orderBy("id").execute();
      expect(tries.every((a) => a.ok === 0)).toBe(true);
      for (let k = 1; k < tries.length; k++) {
        const gap = Date.parse(tries[k]!.attempted_at) - Date.parse(tries[k - 1]!.attempted_at);
        // The wait after the k-th failure is retryDelayMs(k) less at most 10 % jitter.
        expect(gap).toBeGreaterThanOrEqual(retryDelayMs(k, () => 1));
      }
    }

    // The server comes back on the same port; the sender keeps its 5-second rhythm.
    const second = await catcherOn(port);
    for (let i = 0; i < 12 * 60 && (await t.db.selectFrom("outbox").select("id").where("status", "!=", "sent").execute()).length > 0; i++) {
      clock += 5_000;
      await deliverDueMail(t.db, transport, options(new Date(clock)));
    }
    // And an hour more of passes sends nothing again.
    for (let i = 0; i < 12; i++) {
      clock += 5 * MINUTE;
      expect(await deliverDueMail(t.db, transport, options(new Date(clock)))).toMatchObject({ sent: 0, retried: 0, failed: 0, released: 0 });
    }

    const rows = await t.db.selectFrom("outbox").select(["message_id", "status"]).orderBy("id").execute();
    expect(rows.every((r) => r.status === "sent")).toBe(true);
    const counts = deliveriesById(first, second);
    expect(counts.size).toBe(6);
    for (const row of rows) expect(counts.get(row.message_id)).toBe(1);
    expect(first.messages.map((m) => m.subject)).toEqual(["Reference 1", "Reference 2"]);
    // After the outage each message goes when its own backoff ends, so their order may change.
    expect(second.messages.map((m) => m.subject).sort()).toEqual(["Reference 3", "Reference 4", "Reference 5", "Reference 6"]);
  });

  it("the running sender survives the outage on its own timer and delivers once the server is back", async () => {
    const probe = await startSmtpCatcher();
    await probe.stop();
    const log = quietLog();
    const id = await enqueueMail(t.db, { kind: "question-received", to: "family@example.net", subject: "Timer", text: "Sent by the timer." }, new Date(), { host: HOST });
    sender = startMailSender({ db: t.db, transport: createSmtpTransport(`smtp://127.0.0.1:${probe.port}`, 2_000), from: FROM, intervalMs: 50, maxAttempts: 12, log });

    await waitFor(() => log.lines.some((l) => l.startsWith("[mail] sent 0, retried 1")));
    const failed = await t.db.selectFrom("outbox").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
    expect(failed).toMatchObject({ status: "pending", attempts: 1 });
    const wait = Date.parse(failed.next_attempt_at) - Date.parse((await t.db.selectFrom("outbox_attempts").select("attempted_at").where("outbox_id", "=", id).executeTakeFirstOrThrow()).attempted_at);
    expect(wait).toBeGreaterThanOrEqual(retryDelayMs(1, () => 1));
    expect(wait).toBeLessThanOrEqual(retryDelayMs(1, () => 0));

    // Passes keep running while nothing is due, and spend no attempt.
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect((await t.db.selectFrom("outbox").select("attempts").where("id", "=", id).executeTakeFirstOrThrow()).attempts).toBe(1);

    const back = await catcherOn(probe.port);
    // Rather than wait the 15 s backoff out, move the retry time to now.
    await t.db.updateTable("outbox").set({ next_attempt_at: new Date().toISOString() }).where("id", "=", id).execute();
    await waitFor(() => back.messages.length === 1);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(back.messages).toHaveLength(1);
    expect(back.messages[0]?.messageId).toBe(failed.message_id);
    expect(await t.db.selectFrom("outbox").select(["status", "attempts"]).where("id", "=", id).executeTakeFirstOrThrow()).toEqual({ status: "sent", attempts: 2 });
  });
});

describe("a crash between saving and sending", () => {
  it("stores the question and its confirmation together or not at all", async () => {
    const before = await t.db.selectFrom("questions").select("id").execute();
    const attemptsBefore = await t.db.selectFrom("submission_attempts").selectAll().execute();
    // The database refuses the outbox row, as a full disk or a broken schema would, after the question was inserted.
    await sql`create trigger refuse_outbox before insert on outbox begin select raise(abort, 'outbox refused'); end`.execute(t.db);
    try {
      await expect(
        submitQuestion(t.db, { school: "district", topic: "cases", question: "Who tells us when a case is reported in my child's class?", email: "atomic@example.net" }, {
          ip: "198.51.100.77",
          secret: "reliability-secret-reliability-secret",
          appUrl: "https://reopening.example.org",
          rateLimit: { count: 100, windowMinutes: 10 },
          via: "api",
        }),
      ).rejects.toThrow(/outbox refused/);
    } finally {
      await sql`drop trigger refuse_outbox`.execute(t.db);
    }
    expect(await t.db.selectFrom("questions").select("id").execute()).toEqual(before);
    expect(await t.db.selectFrom("submission_attempts").selectAll().execute()).toEqual(attemptsBefore);
    expect(await t.db.selectFrom("outbox").selectAll().execute()).toEqual([]);
  });

  it("a process killed right after a question is stored loses nothing: a sender started later delivers the confirmation once", { timeout: 60_000 }, async () => {
    const email = `killed.after.save.${Date.now()}@example.net`;
    const run = await runReliabilityChild(["submit-then-die", t.path, email]);
    expect(run.signal).toBe("SIGKILL");
    const reference = run.lines[0]?.reference as string;
    expect(reference).toMatch(/^Q-\d{4}-\d{4}$/);

    const question = await t.db.selectFrom("questions").select(["id", "state"]).where("reference", "=", reference).executeTakeFirstOrThrow();
    expect(question.state).toBe("received");
    const queued = await t.db.selectFrom("outbox").selectAll().where("to_address", "=", email).execute();
    expect(queued).toHaveLength(1);
    expect(queued[0]).toMatchObject({ status: "pending", attempts: 0 });

    // A new server process: its own connection, its own sender.
    const catcher = await catcherOn();
    const restarted = openDatabase(t.path);
    try {
      sender = startMailSender({ db: restarted, transport: createSmtpTransport(`smtp://127.0.0.1:${catcher.port}`), from: FROM, intervalMs: 50, maxAttempts: 12, log: quietLog() });
      await waitFor(() => catcher.messages.length === 1);
      await new Promise((resolve) => setTimeout(resolve, 300));
      await sender.stop();
      sender = undefined;
    } finally {
      await restarted.destroy();
    }
    expect(catcher.messages).toHaveLength(1);
    expect(catcher.messages[0]?.messageId).toBe(queued[0]?.message_id);
    expect(catcher.messages[0]?.subject).toContain(reference);
    expect(catcher.messages[0]?.to).toMatchObject({ value: [{ address: email }] });
  });

  it("a sender killed in the middle of a send leaves a claim that is retried after its lease, and delivered once", { timeout: 60_000 }, async () => {
    const id = await enqueueMail(t.db, { kind: "question-received", to: "lease@example.net", subject: "Lease", text: "Claimed, then the sender died." }, new Date(Date.now() - MINUTE), { host: HOST });
    const run = await runReliabilityChild(["claim-then-die", t.path]);
    expect(run.signal).toBe("SIGKILL");
    const row = await t.db.selectFrom("outbox").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
    expect(run.lines[0]).toEqual({ claimed: row.message_id });
    expect(row.status).toBe("sending");
    expect(row.claimed_at).not.toBeNull();

    const catcher = await catcherOn();
    const transport = createSmtpTransport(`smtp://127.0.0.1:${catcher.port}`);
    const claimedAt = Date.parse(row.claimed_at!);
    // While the lease runs, another sender leaves the row alone: the first one may still be sending.
    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: new Date(claimedAt + DEFAULT_STALE_CLAIM_MS - 1_000) })).toMatchObject({ released: 0, sent: 0 });
    expect(catcher.messages).toHaveLength(0);

    const afterLease = new Date(claimedAt + DEFAULT_STALE_CLAIM_MS + 1_000);
    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: afterLease })).toMatchObject({ released: 1, sent: 1 });
    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: new Date(afterLease.getTime() + 60 * MINUTE) })).toMatchObject({ released: 0, sent: 0 });
    expect(catcher.messages.map((m) => m.messageId)).toEqual([row.message_id]);
    expect(await t.db.selectFrom("outbox").select(["status", "attempts", "claimed_at"]).where("id", "=", id).executeTakeFirstOrThrow()).toEqual({ status: "sent", attempts: 1, claimed_at: null });
  });
});
