import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { seed } from "@/db/seed";
import { getPublishedAnswer, listPublishedAnswers, toAnswerSuggestion } from "@/lib/answers/repository";
import { createSmtpTransport, deliverDueMail } from "@/lib/mail";
import { questionStatusByToken } from "@/lib/questions/status";
import { hashStatusToken } from "@/lib/questions/status-token";
import { CONFIRMATION_MAIL_KIND, submitQuestion, type SubmitOptions } from "@/lib/questions/submit";
import { startSmtpCatcher, type SmtpCatcher } from "../support/smtp-catcher";
import { createTestDb, type TestDb } from "../support/test-db";

const APP_URL = "https://reopening.example.org";
// Tuesday 1 December 2026, 3 p.m. in the district (America/New_York).
const NOW = new Date("2026-12-01T20:00:00.000Z");

let t: TestDb;
let smtp: SmtpCatcher;

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  smtp = await startSmtpCatcher();
});
afterAll(async () => {
  await smtp.stop();
  await t.cleanup();
});
beforeEach(async () => {
  // Each test starts with the seeded questions only and an empty outbox and rate-limit log.
  await t.db.deleteFrom("questions").where("reference", ">", "Q-2026-0006").execute();
  await t.db.deleteFrom("outbox").execute();
  await t.db.deleteFrom("submission_attempts").execute();
  smtp.messages.length = 0;
});

function options(overrides: Partial<SubmitOptions> = {}): SubmitOptions {
  return {
    ip: "203.0.113.10",
    secret: "integration-secret-integration-secret",
    appUrl: APP_URL,
    rateLimit: { count: 5, windowMinutes: 10 },
    via: "api",
    now: NOW,
    ...overrides,
  };
}

const valid = {
  school: "tamsin-creek",
  topic: "air",
  room: "Room 104",
  question: "Does my son's classroom get fresh air from outside? The windows always look closed.",
  name: "Ada Quillfeather",
  email: "ada.quillfeather@example.net",
  language: "es",
};

async function counts() {
  const n = async (table: "questions" | "question_events" | "outbox" | "submission_attempts") =>
    Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll().as("n")).executeTakeFirstOrThrow()).n);
  return { questions: await n("questions"), events: await n("question_events"), outbox: await n("outbox"), attempts: await n("submission_attempts") };
}

async function deliver() {
  return deliverDueMail(t.db, createSmtpTransport(`smtp://127.0.0.1:${smtp.port}`), {
    from: "Wrenmoor Valley Schools <reopening@example.org>",
    maxAttempts: 3,
    now: new Date(NOW.getTime() + 1_000),
  });
}

describe("submitQuestion", () => {
  it("stores the question as received, with its first event, and e-mails a status link that works", async () => {
    const before = await counts();
    const result = await submitQuestion(t.db, valid, options());
    expect(result).toEqual({ ok: true, reference: "Q-2026-0007", state: "received", statusUrl: expect.stringMatching(/^https:\/\/reopening\.example\.org\/ask\/status\/[A-Za-z0-9_-]{43}$/) });
    if (!result.ok) throw new Error("not stored");
    // The answer names nothing personal.
    expect(JSON.stringify(result)).not.toMatch(/ada|quillfeather|example\.net/i);

    const stored = await t.db.selectFrom("questions").selectAll().where("reference", "=", "Q-2026-0007").executeTakeFirstOrThrow();
    expect(stored).toMatchObject({
      topic: "air",
      room: "Room 104",
      body: valid.question,
      asker_name: "Ada Quillfeather",
      asker_email: "ada.quillfeather@example.net",
      language: "es",
      state: "received",
      technical: 1,
      created_at: NOW.toISOString(),
    });
    const token = result.statusUrl.split("/").pop()!;
    expect(stored.status_token_hash).toBe(hashStatusToken(token));
    expect(JSON.stringify(await t.db.selectFrom("questions").selectAll().execute())).not.toContain(token);
    const events = await t.db.selectFrom("question_events").selectAll().where("question_id", "=", stored.id).execute();
    expect(events).toEqual([expect.objectContaining({ kind: "received", from_state: null, to_state: "received", detail: '{"via":"api"}' })]);
    expect(await counts()).toEqual({
      questions: before.questions + 1,
      events: before.events + 1,
      outbox: before.outbox + 1,
      attempts: before.attempts + 1,
    });

    // The confirmation, delivered over real SMTP.
    expect((await deliver()).sent).toBe(1);
    expect(smtp.messages).toHaveLength(1);
    const mail = smtp.messages[0]!;
    expect(mail.to && !Array.isArray(mail.to) ? mail.to.text : "").toBe("ada.quillfeather@example.net");
    expect(mail.subject).toBe("We received your question (Q-2026-0007)");
    expect(mail.text).toContain(valid.question);
    expect(mail.text).toContain("by Friday, December 4, 2026");
    expect(mail.html).toContain(`href="${result.statusUrl}"`);
    const link = /https:\/\/reopening\.example\.org\/ask\/status\/\S+/.exec(mail.text ?? "")?.[0];
    expect(link).toBe(result.statusUrl);
    const outbox = await t.db.selectFrom("outbox").selectAll().executeTakeFirstOrThrow();
    expect(outbox.kind).toBe(CONFIRMATION_MAIL_KIND);

    // The link opens the asker's question: their words and its state, never their name or address.
    const view = await questionStatusByToken(t.db, new URL(link!).pathname.split("/").pop()!);
    expect(view).toMatchObject({
      reference: "Q-2026-0007",
      schoolName: "Tamsin Creek Elementary School",
      topicLabel: "Air and ventilation",
      room: "Room 104",
      question: valid.question,
      state: "received",
      status: { label: "Received" },
      replyBy: "2026-12-04",
      reply: null,
    });
    expect(JSON.stringify(view)).not.toMatch(/ada|quillfeather|example\.net/i);
  });

  it("numbers references per year inside the transaction", async () => {
    const first = await submitQuestion(t.db, valid, options());
    const second = await submitQuestion(t.db, { ...valid, email: "other.parent@example.net" }, options({ ip: "203.0.113.11" }));
    const nextYear = await submitQuestion(
      t.db,
      { ...valid, email: "third.parent@example.net" },
      options({ ip: "203.0.113.12", now: new Date("2027-01-04T15:00:00.000Z") }),
    );
    expect([first, second, nextYear].map((r) => (r.ok ? r.reference : r.reason))).toEqual(["Q-2026-0007", "Q-2026-0008", "Q-2027-0001"]);
  });

  it("counts the reply target in school days, skipping the district's holidays", async () => {
    // Wednesday 25 November 2026: Thanksgiving and the Friday after are holidays, so the 3 school days are Monday 30, Tuesday 1 and Wednesday 2 December.
    const result = await submitQuestion(t.db, valid, options({ now: new Date("2026-11-25T15:00:00.000Z") }));
    if (!result.ok) throw new Error("not stored");
    expect((await questionStatusByToken(t.db, result.statusUrl.split("/").pop()!))?.replyBy).toBe("2026-12-02");
  });

  const refusals: [string, unknown, string][] = [
    ["a missing e-mail", { ...valid, email: undefined }, "email"],
    ["a 5-character question", { ...valid, question: "Air??" }, "question"],
    ["a filled honeypot", { ...valid, website: "https://spam.example.com" }, "website"],
    ["an unknown school", { ...valid, school: "no-such-school" }, "school"],
    ["a control character", { ...valid, question: "Is the air \u0000 fresh in Room 104?" }, "question"],
    ["an invalid language tag", { ...valid, language: "!!" }, "language"],
    ["something that is not an object", "Is the air fresh?", "_form"],
  ];
  for (const [what, input, field] of refusals) {
    it(`refuses ${what} field by field, storing and sending nothing`, async () => {
      const before = await counts();
      const result = await submitQuestion(t.db, input, options());
      expect(result).toMatchObject({ ok: false, reason: "invalid", errors: { [field]: expect.any(String) } });
      expect(await counts()).toEqual(before);
      expect((await deliver()).sent).toBe(0);
    });
  }

  it("reports an unknown school together with the other problems", async () => {
    const result = await submitQuestion(t.db, { ...valid, school: "no-such-school", question: "Hi" }, options());
    expect(result).toMatchObject({ ok: false, errors: { school: expect.any(String), question: expect.any(String) } });
  });

  it("accepts five questions from one address in ten minutes and refuses the sixth, storing nothing", async () => {
    for (let i = 1; i <= 5; i += 1) {
      const r = await submitQuestion(t.db, { ...valid, email: `parent${i}@example.net` }, options({ now: new Date(NOW.getTime() + i * 1_000) }));
      expect(r.ok).toBe(true);
    }
    const before = await counts();
    const sixth = await submitQuestion(t.db, { ...valid, email: "parent6@example.net" }, options({ now: new Date(NOW.getTime() + 6_000) }));
    expect(sixth).toEqual({ ok: false, reason: "rate_limited", retryAfterSeconds: 595 });
    expect(await counts()).toEqual(before);
    // Once the first one leaves the window, one more gets in.
    const later = await submitQuestion(t.db, { ...valid, email: "parent6@example.net" }, options({ now: new Date(NOW.getTime() + 601_001) }));
    expect(later.ok).toBe(true);
  });

  it("also limits one e-mail address across many IP addresses", async () => {
    for (let i = 1; i <= 5; i += 1) expect((await submitQuestion(t.db, valid, options({ ip: `198.51.100.${i}` }))).ok).toBe(true);
    const sixth = await submitQuestion(t.db, { ...valid, email: " ADA.Quillfeather@example.net " }, options({ ip: "198.51.100.99" }));
    expect(sixth).toMatchObject({ ok: false, reason: "rate_limited" });
  });

  it("keeps the limit in the database, as keyed hashes, so a restart does not reset it and no address is stored", async () => {
    for (let i = 1; i <= 5; i += 1) await submitQuestion(t.db, { ...valid, email: `p${i}@example.net` }, options({ ip: "192.0.2.44" }));
    const rows = await t.db.selectFrom("submission_attempts").selectAll().execute();
    expect(JSON.stringify(rows)).not.toMatch(/192\.0\.2\.44|example\.net/);
    expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.ip_hash) && /^[0-9a-f]{64}$/.test(r.email_hash))).toBe(true);
    // A fresh options object stands for a restarted server: the rows are still there.
    expect(await submitQuestion(t.db, { ...valid, email: "p6@example.net" }, options({ ip: "192.0.2.44" }))).toMatchObject({ reason: "rate_limited" });
    // Old rows are pruned by the next accepted question.
    await submitQuestion(t.db, { ...valid, email: "p7@example.net" }, options({ ip: "192.0.2.45", now: new Date(NOW.getTime() + 3_600_000) }));
    expect(await t.db.selectFrom("submission_attempts").selectAll().execute()).toHaveLength(1);
  });

  it("puts every asker without a trusted address in one shared 'unknown' bucket", async () => {
    for (let i = 1; i <= 5; i += 1) await submitQuestion(t.db, { ...valid, email: `u${i}@example.net` }, options({ ip: "unknown" }));
    expect(await submitQuestion(t.db, { ...valid, email: "u6@example.net" }, options({ ip: "unknown" }))).toMatchObject({ reason: "rate_limited" });
    expect((await submitQuestion(t.db, { ...valid, email: "u6@example.net" }, options({ ip: "203.0.113.200" }))).ok).toBe(true);
  });

  it("loses nothing when storing fails half-way: the whole transaction is undone", async () => {
    const before = await counts();
    // An APP_URL that is not a URL makes the status link fail after validation, before anything is written.
    await expect(submitQuestion(t.db, valid, options({ appUrl: "not a url" }))).rejects.toThrow();
    await t.db.schema.alterTable("outbox").renameTo("outbox_away").execute();
    try {
      await expect(submitQuestion(t.db, valid, options())).rejects.toThrow(/outbox/);
    } finally {
      await t.db.schema.alterTable("outbox_away").renameTo("outbox").execute();
    }
    expect(await counts()).toEqual(before);
  });
});

describe("questionStatusByToken", () => {
  it("finds nothing for an unknown, altered or malformed token", async () => {
    const result = await submitQuestion(t.db, valid, options());
    if (!result.ok) throw new Error("not stored");
    const token = result.statusUrl.split("/").pop()!;
    expect(await questionStatusByToken(t.db, token)).not.toBeNull();
    const altered = `${token.slice(0, -1)}${token.endsWith("A") ? "B" : "A"}`;
    for (const guess of [altered, "x", "", "../../etc", "a".repeat(5_000), hashStatusToken(token)]) {
      expect(await questionStatusByToken(t.db, guess)).toBeNull();
    }
  });

  it("shows the reply once it is sent, and says answered in plain words", async () => {
    const result = await submitQuestion(t.db, valid, options());
    if (!result.ok) throw new Error("not stored");
    const question = await t.db.selectFrom("questions").select("id").where("reference", "=", result.reference).executeTakeFirstOrThrow();
    await t.db.updateTable("questions").set({ state: "answered" }).where("id", "=", question.id).execute();
    await t.db
      .insertInto("question_replies")
      .values({ question_id: question.id, body_markdown: "Yes. Every classroom gets **outdoor air**.", sent_at: "2026-12-02T15:00:00.000Z" })
      .execute();
    const view = await questionStatusByToken(t.db, result.statusUrl.split("/").pop()!);
    expect(view).toMatchObject({
      state: "answered",
      status: { label: "Answered", step: "answered" },
      replyBy: null,
      reply: { bodyMarkdown: "Yes. Every classroom gets **outdoor air**.", sentAt: "2026-12-02T15:00:00.000Z" },
    });
  });
});

describe("published answers", () => {
  it("lists only what is published now, with nothing personal or internal", async () => {
    const all = await listPublishedAnswers(t.db);
    expect(all.length).toBeGreaterThanOrEqual(12);
    const first = all[0]!;
    expect(Object.keys(first).sort()).toEqual(["answerMarkdown", "id", "publishedAt", "question", "school", "topic", "topicLabel", "updatedAt"]);
    expect(Object.keys(toAnswerSuggestion(first)).sort()).toEqual(["excerpt", "id", "question", "school", "schoolName", "topic", "topicLabel", "url"]);

    await t.db.updateTable("published_answers").set({ unpublished_at: NOW.toISOString() }).where("id", "=", first.id).execute();
    try {
      expect((await listPublishedAnswers(t.db)).map((a) => a.id)).not.toContain(first.id);
      expect(await getPublishedAnswer(t.db, first.id)).toBeNull();
    } finally {
      await t.db.updateTable("published_answers").set({ unpublished_at: null }).where("id", "=", first.id).execute();
    }
    expect(await getPublishedAnswer(t.db, first.id)).toMatchObject({ id: first.id });
    expect(await getPublishedAnswer(t.db, 99_999)).toBeNull();
  });
});
