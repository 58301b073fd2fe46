import { afterEach, describe, expect, it } from "vitest";
import { createSmtpTransport, deliverDueMail, enqueueMail, InvalidMailError, type MailTransport } from "@/lib/mail";
import { startSmtpCatcher, type SmtpCatcher } from "../support/smtp-catcher";
import { outboxTestDb } from "../support/outbox-db";

const FROM = "Clearhall Test Desk <desk@example.org>";
const HOST = "portal.example.org";
const HOUR = 60 * 60_000;

const t = outboxTestDb();
let catcher: SmtpCatcher | undefined;

afterEach(async () => {
  await catcher?.stop();
  catcher = undefined;
});

function message(n = 1) {
  return {
    kind: "question-received",
    to: `parent${n}@example.net`,
    subject: `We received your question (${n})`,
    text: `Thank you for writing. Reference ${n}.`,
    html: `<p>Thank you for writing. Reference <strong>${n}</strong>.</p>`,
  };
}

function smtpTo(port: number): MailTransport {
  return createSmtpTransport(`smtp://127.0.0.1:${port}`);
}

/** A port where nothing listens: a catcher's, once it has stopped. */
async function deadPort(): Promise<number> {
  const probe = await startSmtpCatcher();
  await probe.stop();
  return probe.port;
}

const outboxRow = (id: number) => t.db.selectFrom("outbox").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
const attemptsOf = (id: number) =>
  t.db.selectFrom("outbox_attempts").selectAll().where("outbox_id", "=", id).orderBy("id").execute();

describe("enqueueMail", () => {
  it("writes nothing when the caller's transaction rolls back", async () => {
    await expect(
      t.db.transaction().execute(async (trx) => {
        await enqueueMail(trx, message(), new Date(), { host: HOST });
        throw new Error("the change that caused the mail failed");
      }),
    ).rejects.toThrow("the change that caused the mail failed");
    expect(await t.db.selectFrom("outbox").selectAll().execute()).toEqual([]);
  });

  it("stores a pending row, due now, with a Message-ID on the given host", async () => {
    const now = new Date("2031-08-25T07:30:00.000Z");
    const id = await t.db.transaction().execute((trx) => enqueueMail(trx, message(), now, { host: HOST }));
    const row = await outboxRow(id);
    expect(row).toMatchObject({
      kind: "question-received",
      to_address: "parent1@example.net",
      status: "pending",
      attempts: 0,
      next_attempt_at: now.toISOString(),
      created_at: now.toISOString(),
      claimed_at: null,
      sent_at: null,
    });
    expect(row.message_id).toMatch(/^<[0-9a-f-]{36}@portal\.example\.org>$/);
  });

  it("rejects a malformed address without repeating it", async () => {
    const bad = { ...message(), to: "not-an-address.example.net" };
    const attempt = enqueueMail(t.db, bad, new Date(), { host: HOST });
    await expect(attempt).rejects.toBeInstanceOf(InvalidMailError);
    await expect(attempt).rejects.toThrow(/to is not a valid e-mail address/);
    await expect(attempt).rejects.not.toThrow(/not-an-address/);
    expect(await t.db.selectFrom("outbox").selectAll().execute()).toEqual([]);
  });
});

describe("deliverDueMail", () => {
  it("sends a due message over SMTP and records one successful attempt", async () => {
    catcher = await startSmtpCatcher();
    const id = await enqueueMail(t.db, message(), new Date(), { host: HOST });
    const { message_id } = await outboxRow(id);

    const result = await deliverDueMail(t.db, smtpTo(catcher.port), { from: FROM, maxAttempts: 5 });

    expect(result).toMatchObject({ sent: 1, retried: 0, failed: 0, released: 0, problems: [] });
    expect(catcher.messages).toHaveLength(1);
    const received = catcher.messages[0]!;
    expect(received.subject).toBe("We received your question (1)");
    expect(received.text?.trim()).toBe("Thank you for writing. Reference 1.");
    expect(received.html).toContain("<strong>1</strong>");
    expect(received.messageId).toBe(message_id);
    expect(received.from?.text).toContain("desk@example.org");

    const row = await outboxRow(id);
    expect(row).toMatchObject({ status: "sent", attempts: 1, claimed_at: null, last_error: null });
    expect(row.sent_at).not.toBeNull();
    expect(await attemptsOf(id)).toMatchObject([{ ok: 1, error: null }]);
  });

  it("keeps the message when SMTP is down and sends it exactly once when the server is back", async () => {
    const port = await deadPort();
    const transport = smtpTo(port);
    const now = new Date();
    const id = await enqueueMail(t.db, message(), now, { host: HOST });

    const down = await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now });
    expect(down).toMatchObject({ sent: 0, retried: 1, failed: 0 });
    const waiting = await outboxRow(id);
    expect(waiting).toMatchObject({ status: "pending", attempts: 1, claimed_at: null, sent_at: null });
    expect(waiting.last_error).toMatch(/ECONNREFUSED/);
    expect(waiting.last_error).not.toContain("@");
    expect(waiting.next_attempt_at > now.toISOString()).toBe(true);
    const [failedAttempt] = await attemptsOf(id);
    expect(failedAttempt).toMatchObject({ ok: 0, error: waiting.last_error });

    // Not due yet: the same moment sends nothing and spends no attempt.
    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now })).toMatchObject({ retried: 0 });
    expect((await outboxRow(id)).attempts).toBe(1);

    catcher = await startSmtpCatcher(port);
    const later = new Date(now.getTime() + HOUR);
    const back = await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: later });
    expect(back).toMatchObject({ sent: 1, retried: 0, failed: 0 });
    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: new Date(later.getTime() + HOUR) }))
      .toMatchObject({ sent: 0, retried: 0, failed: 0 });

    expect(catcher.messages).toHaveLength(1);
    expect(catcher.messages[0]?.messageId).toBe(waiting.message_id);
    expect(await outboxRow(id)).toMatchObject({ status: "sent", attempts: 2, last_error: null });
    expect((await attemptsOf(id)).map((a) => a.ok)).toEqual([0, 1]);
  });

  it("marks the message failed once maxAttempts is reached, and then leaves it alone", async () => {
    const transport = smtpTo(await deadPort());
    const now = new Date();
    const id = await enqueueMail(t.db, message(), now, { host: HOST });

    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 2, now })).toMatchObject({ retried: 1 });
    const second = await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 2, now: new Date(now.getTime() + HOUR) });
    expect(second).toMatchObject({ retried: 0, failed: 1 });
    expect(second.problems).toEqual([{ outboxId: id, error: expect.stringMatching(/ECONNREFUSED/), final: true }]);
    expect(await outboxRow(id)).toMatchObject({ status: "failed", attempts: 2, claimed_at: null });

    expect(await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 2, now: new Date(now.getTime() + 48 * HOUR) }))
      .toMatchObject({ sent: 0, retried: 0, failed: 0 });
    expect(await attemptsOf(id)).toHaveLength(2);
  });

  it("stops the pass at the first connection error, leaving the other messages untouched", async () => {
    const transport = smtpTo(await deadPort());
    const now = new Date();
    const ids = [];
    for (let n = 1; n <= 3; n++) ids.push(await enqueueMail(t.db, message(n), new Date(now.getTime() + n), { host: HOST }));

    const result = await deliverDueMail(t.db, transport, { from: FROM, maxAttempts: 5, now: new Date(now.getTime() + 10) });
    expect(result).toMatchObject({ sent: 0, retried: 1, failed: 0 });
    const rows = await t.db.selectFrom("outbox").select(["id", "attempts", "status"]).orderBy("id").execute();
    expect(rows).toEqual([
      { id: ids[0], attempts: 1, status: "pending" },
      { id: ids[1], attempts: 0, status: "pending" },
      { id: ids[2], attempts: 0, status: "pending" },
    ]);
  });

  it("releases a claim left by a sender that died mid-send and delivers the message", async () => {
    catcher = await startSmtpCatcher();
    const now = new Date();
    const crashed = await enqueueMail(t.db, message(1), new Date(now.getTime() - HOUR), { host: HOST });
    const busy = await enqueueMail(t.db, message(2), new Date(now.getTime() - HOUR), { host: HOST });
    await t.db
      .updateTable("outbox")
      .set({ status: "sending", claimed_at: new Date(now.getTime() - 10 * 60_000).toISOString() })
      .where("id", "=", crashed)
      .execute();
    // Claimed a minute ago: another sender may still be working on it.
    await t.db
      .updateTable("outbox")
      .set({ status: "sending", claimed_at: new Date(now.getTime() - 60_000).toISOString() })
      .where("id", "=", busy)
      .execute();

    const result = await deliverDueMail(t.db, smtpTo(catcher.port), { from: FROM, maxAttempts: 5, now });

    expect(result).toMatchObject({ released: 1, sent: 1 });
    expect(catcher.messages.map((m) => m.subject)).toEqual(["We received your question (1)"]);
    expect(await outboxRow(crashed)).toMatchObject({ status: "sent", attempts: 1 });
    expect(await outboxRow(busy)).toMatchObject({ status: "sending", attempts: 0 });
  });

  it("delivers each message once when two passes run at the same time", async () => {
    catcher = await startSmtpCatcher();
    const now = new Date();
    const ids = [];
    for (let n = 1; n <= 6; n++) ids.push(await enqueueMail(t.db, message(n), new Date(now.getTime() - 1000 + n), { host: HOST }));
    const options = { from: FROM, maxAttempts: 5, now };

    const [a, b] = await Promise.all([
      deliverDueMail(t.db, smtpTo(catcher.port), options),
      deliverDueMail(t.db, smtpTo(catcher.port), options),
    ]);

    // Both passes did part of the work, so they really overlapped.
    expect(a.sent).toBeGreaterThan(0);
    expect(b.sent).toBeGreaterThan(0);
    expect(a.sent + b.sent).toBe(6);
    expect(catcher.messages).toHaveLength(6);
    expect(new Set(catcher.messages.map((m) => m.messageId)).size).toBe(6);
    const attempts = await t.db.selectFrom("outbox_attempts").select("outbox_id").orderBy("outbox_id").execute();
    expect(attempts.map((r) => r.outbox_id)).toEqual(ids);
  });
});
