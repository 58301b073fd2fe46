import type { KyselyPlugin } from "kysely";
import { afterEach, describe, expect, it } from "vitest";
import { enqueueMail, startMailSender, type MailLog, type MailSender, type MailTransport, type OutgoingMail } from "@/lib/mail";
import { outboxTestDb } from "../support/outbox-db";

const FROM = "Clearhall Test Desk <desk@example.org>";

const t = outboxTestDb();
let sender: MailSender | undefined;

afterEach(async () => {
  await sender?.stop();
  sender = undefined;
});

/** Records what it is asked to send; each send takes `delayMs`, and `active` shows overlapping sends. */
function fakeTransport(delayMs = 0) {
  const sent: OutgoingMail[] = [];
  let active = 0;
  let maxActive = 0;
  const transport: MailTransport = {
    async sendMail(mail) {
      active += 1;
      maxActive = Math.max(maxActive, active);
      await new Promise((resolve) => setTimeout(resolve, delayMs));
      active -= 1;
      sent.push(mail);
      return { messageId: mail.messageId };
    },
  };
  return { transport, sent, maxActive: () => maxActive };
}

function memoryLog() {
  const info: string[] = [];
  const errors: { message: string; cause: unknown }[] = [];
  const log: MailLog = {
    info: (message) => info.push(message),
    error: (message, cause) => errors.push({ message, cause }),
  };
  return { log, info, errors };
}

async function enqueue(n: number) {
  return enqueueMail(
    t.db,
    { kind: "status-changed", to: `family${n}@example.net`, subject: `Update ${n}`, text: `Update number ${n}.` },
    new Date(Date.now() - 1_000 + n),
    { host: "portal.example.org" },
  );
}

async function waitFor(check: () => Promise<boolean>, timeoutMs = 5_000) {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("condition not met in time");
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

const HOUR = 60 * 60_000;

describe("startMailSender", () => {
  it("delivers on its own timer and logs one summary line, without addresses", async () => {
    const fake = fakeTransport();
    const { log, info } = memoryLog();
    await enqueue(1);
    sender = startMailSender({ db: t.db, transport: fake.transport, from: FROM, intervalMs: 30, maxAttempts: 3, log });

    await waitFor(async () => fake.sent.length === 1);
    await waitFor(async () => info.length === 2);
    expect(info[0]).toMatch(/^\[mail\] sender started/);
    expect(info[1]).toBe("[mail] sent 1, retried 0, failed 0");
    expect(fake.sent[0]).toMatchObject({ from: FROM, to: "family1@example.net", subject: "Update 1" });

    // Idle passes keep running but say nothing.
    await new Promise((resolve) => setTimeout(resolve, 150));
    expect(info).toHaveLength(2);
    expect(info.join(" ")).not.toContain("@");
  });

  it("never runs two passes at once, however often it is asked", async () => {
    const fake = fakeTransport(15);
    for (let n = 1; n <= 4; n++) await enqueue(n);
    sender = startMailSender({ db: t.db, transport: fake.transport, from: FROM, intervalMs: 5, maxAttempts: 3, log: memoryLog().log });

    const results = await Promise.all([sender.runNow(), sender.runNow(), sender.runNow()]);

    expect(results.reduce((n, r) => n + r.sent, 0)).toBe(4);
    expect(fake.sent).toHaveLength(4);
    expect(fake.maxActive()).toBe(1);
  });

  it("logs a failed pass with its cause and keeps going", async () => {
    let failures = 1;
    const flaky: KyselyPlugin = {
      transformQuery(args) {
        if (failures > 0) {
          failures -= 1;
          throw new Error("database is locked");
        }
        return args.node;
      },
      transformResult: async (args) => args.result,
    };
    const fake = fakeTransport();
    const { log, errors } = memoryLog();
    await enqueue(1);
    sender = startMailSender({ db: t.db.withPlugin(flaky), transport: fake.transport, from: FROM, intervalMs: 30, maxAttempts: 3, log });

    await waitFor(async () => fake.sent.length === 1);
    expect(errors).toHaveLength(1);
    expect(errors[0]?.message).toBe("[mail] delivery pass failed: database is locked");
    expect(errors[0]?.cause).toBeInstanceOf(Error);
  });

  it("hands runNow callers the database error", async () => {
    const broken: KyselyPlugin = {
      transformQuery() {
        throw new Error("no such table: outbox");
      },
      transformResult: async (args) => args.result,
    };
    sender = startMailSender({
      db: t.db.withPlugin(broken),
      transport: fakeTransport().transport,
      from: FROM,
      intervalMs: HOUR,
      maxAttempts: 3,
      log: memoryLog().log,
    });
    await expect(sender.runNow()).rejects.toThrow("no such table: outbox");
  });

  it("starts once per process and can start again after stop", async () => {
    const options = { db: t.db, transport: fakeTransport().transport, from: FROM, intervalMs: HOUR, maxAttempts: 3 };
    const second = memoryLog();
    sender = startMailSender({ ...options, log: memoryLog().log });
    expect(startMailSender({ ...options, log: second.log })).toBe(sender);
    expect(second.info).toEqual(["[mail] sender already running in this process; not starting another"]);

    await sender.stop();
    await expect(sender.runNow()).rejects.toThrow("The mail sender is stopped");
    const fresh = startMailSender({ ...options, log: memoryLog().log });
    expect(fresh).not.toBe(sender);
    sender = fresh;
  });

  it("stop waits for the pass in progress, so nothing is left half-sent", async () => {
    const fake = fakeTransport(100);
    const id = await enqueue(1);
    sender = startMailSender({ db: t.db, transport: fake.transport, from: FROM, intervalMs: HOUR, maxAttempts: 3, log: memoryLog().log });

    const pass = sender.runNow();
    await sender.stop();

    expect((await pass).sent).toBe(1);
    const row = await t.db.selectFrom("outbox").select("status").where("id", "=", id).executeTakeFirstOrThrow();
    expect(row.status).toBe("sent");
  });
});
