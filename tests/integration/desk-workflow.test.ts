import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import type { StaffUser } from "@/lib/auth/authenticate";
import { seed } from "@/db/seed";
import { getQuestionDetail, listChecks } from "@/lib/questions/desk/detail";
import { DeskError } from "@/lib/questions/desk/errors";
import { listQueue } from "@/lib/questions/desk/queue";
import {
  addNote,
  assignQuestion,
  declineQuestion,
  mergeQuestion,
  publishAnswer,
  requestCheck,
  reviewAnswer,
  saveDraft,
  sendReply,
  setTechnical,
  unpublishAnswer,
} from "@/lib/questions/desk/workflow";
import { questionStatusByToken } from "@/lib/questions/status";
import { queueQuerySchema } from "@/lib/validation/desk";
import { createTestDb, type TestDb } from "../support/test-db";

const APP = { appUrl: "http://localhost:3000" };
let t: TestDb;
let comms: StaffUser;
let facilities: StaffUser;
let admin: StaffUser;

async function staff(role: StaffUser["role"]): Promise<StaffUser> {
  const u = await t.db.selectFrom("users").select(["id", "email", "name", "role"]).where("role", "=", role).executeTakeFirstOrThrow();
  return u;
}

async function questionId(reference: string): Promise<number> {
  return (await t.db.selectFrom("questions").select("id").where("reference", "=", reference).executeTakeFirstOrThrow()).id;
}

async function state(id: number): Promise<string> {
  return (await t.db.selectFrom("questions").select("state").where("id", "=", id).executeTakeFirstOrThrow()).state;
}

async function eventKinds(id: number): Promise<string[]> {
  return (await t.db.selectFrom("question_events").select("kind").where("question_id", "=", id).orderBy("id").execute()).map((e) => e.kind);
}

async function outboxTo(address: string, kind?: string) {
  let q = t.db.selectFrom("outbox").selectAll().where("to_address", "=", address);
  if (kind) q = q.where("kind", "=", kind);
  return q.orderBy("id").execute();
}

/** Expects a desk step to be refused with this status, and the question's state and history to be unchanged. */
async function expectRefused(id: number, status: number, step: () => Promise<unknown>) {
  const before = { state: await state(id), events: (await eventKinds(id)).length, outbox: (await t.db.selectFrom("outbox").select("id").execute()).length };
  const error = await step().then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(DeskError);
  expect((error as DeskError).status).toBe(status);
  expect(await state(id)).toBe(before.state);
  expect((await eventKinds(id)).length).toBe(before.events);
  expect((await t.db.selectFrom("outbox").select("id").execute()).length).toBe(before.outbox);
  return error as DeskError;
}

const draft = (bodyMarkdown: string, publicQuestion = "") => ({ bodyMarkdown, publicQuestion });

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  comms = await staff("communications");
  facilities = await staff("facilities");
  admin = await staff("admin");
});
afterAll(async () => t.cleanup());

describe("a technical answer (topic: air)", () => {
  let id: number;
  beforeEach(async () => {
    id = await questionId("Q-2026-0001");
  });

  it("cannot be sent or published before facilities approve it", async () => {
    await saveDraft(t.db, id, draft("Yes. Room 104's ventilation unit brings in outdoor air all day."), comms, APP);
    expect(await state(id)).toBe("drafting");
    const send = await expectRefused(id, 409, () => sendReply(t.db, id, comms, APP));
    expect(send.message).toMatch(/facilities check/);
    await expectRefused(id, 409, () =>
      publishAnswer(t.db, id, { questionText: "Does Room 104 get outdoor air?", schoolId: null, topic: "air" }, comms, APP),
    );
    expect(await outboxTo("marisol.quenby@example.net", "question-reply")).toHaveLength(0);
  });

  it("goes to facilities, who get an e-mail and see it in their list", async () => {
    await requestCheck(t.db, id, comms, APP);
    expect(await state(id)).toBe("facilities_check");
    const notices = await outboxTo(facilities.email, "check-waiting");
    expect(notices).toHaveLength(1);
    expect(notices[0]!.text_body).toContain(`/staff/desk/${id}`);
    expect(notices[0]!.text_body).not.toContain("marisol");
    expect((await listChecks(t.db)).map((c) => c.reference)).toContain("Q-2026-0001");
  });

  it("is locked while the check is under way, and cannot be approved by its own writer", async () => {
    await expectRefused(id, 409, () => saveDraft(t.db, id, draft("Changed while checking"), comms, APP));
    await expectRefused(id, 409, () => sendReply(t.db, id, comms, APP));
    // comms wrote the draft; the four-eyes rule holds even for a role allowed to review.
    await expectRefused(id, 403, () => reviewAnswer(t.db, id, { decision: "approve", comment: "" }, comms, APP));
  });

  it("sent back with a comment, fixed, checked again and approved", async () => {
    await reviewAnswer(t.db, id, { decision: "changes", comment: "Say it is filtered outdoor air, and give the rate." }, facilities, APP);
    expect(await state(id)).toBe("changes_requested");
    const detail = await getQuestionDetail(t.db, id, comms);
    expect(detail?.events.at(-1)?.comment).toBe("Say it is filtered outdoor air, and give the rate.");
    expect(await outboxTo(comms.email, "check-done")).toHaveLength(1);

    await saveDraft(t.db, id, draft("Yes. Room 104's unit brings in filtered outdoor air, about 15 cfm per person."), comms, APP);
    expect(await state(id)).toBe("drafting");
    await requestCheck(t.db, id, comms, APP);
    await reviewAnswer(t.db, id, { decision: "approve", comment: "" }, facilities, APP);
    expect(await state(id)).toBe("approved");
  });

  it("a change after approval needs a new check", async () => {
    await saveDraft(t.db, id, draft("Yes. Filtered outdoor air, about 15 cfm per person, all school day."), comms, APP);
    expect(await state(id)).toBe("drafting");
    await expectRefused(id, 409, () => sendReply(t.db, id, comms, APP));
    await requestCheck(t.db, id, comms, APP);
    await reviewAnswer(t.db, id, { decision: "approve", comment: "" }, facilities, APP);
  });

  it("after approval it is published and sent, with links to the public version and a private status page", async () => {
    const answerId = await publishAnswer(
      t.db,
      id,
      { questionText: "Does Room 104 at Tamsin Creek get outdoor air?", schoolId: null, topic: "air" },
      comms,
      APP,
    );
    const { recipients } = await sendReply(t.db, id, comms, APP);
    expect(recipients).toBe(1);
    expect(await state(id)).toBe("answered");
    const [mail] = await outboxTo("marisol.quenby@example.net", "question-reply");
    expect(mail?.text_body).toContain("all school day");
    expect(mail?.text_body).toContain(`/answers/${answerId}`);
    const token = /\/ask\/status\/([A-Za-z0-9_-]{43})/.exec(mail?.text_body ?? "")?.[1];
    expect(token).toBeDefined();
    const status = await questionStatusByToken(t.db, token!);
    expect(status?.reference).toBe("Q-2026-0001");
    expect(status?.reply?.bodyMarkdown).toContain("all school day");
    const published = await t.db.selectFrom("published_answers").selectAll().where("id", "=", answerId).executeTakeFirstOrThrow();
    expect(published.answer_markdown).toContain("all school day");
  });

  it("wrote a history event for every step", async () => {
    expect(await eventKinds(id)).toEqual([
      "received",
      "assigned",
      "draft_saved",
      "check_requested",
      "changes_requested",
      "draft_saved",
      "check_requested",
      "check_approved",
      "draft_saved",
      "check_requested",
      "check_approved",
      "published",
      "reply_sent",
    ]);
    const detail = await getQuestionDetail(t.db, id, comms);
    expect(detail?.events.every((e) => e.summary.length > 0)).toBe(true);
    expect(detail?.nextStates).toEqual([]);
  });
});

describe("joining a duplicate", () => {
  it("sends one answer to every asker, each with their own status link", async () => {
    const main = await questionId("Q-2026-0008");
    const dup = await questionId("Q-2026-0003");
    await mergeQuestion(t.db, dup, { intoId: main }, comms, APP);
    expect(await state(dup)).toBe("merged");
    await expectRefused(dup, 409, () => saveDraft(t.db, dup, draft("x"), comms, APP));
    await expectRefused(main, 400, () => mergeQuestion(t.db, main, { intoId: main }, comms, APP));

    await saveDraft(t.db, main, draft("The entrance work at Eastmere ends before winter break."), comms, APP);
    await requestCheck(t.db, main, comms, APP);
    await reviewAnswer(t.db, main, { decision: "approve", comment: "" }, facilities, APP);
    const { recipients } = await sendReply(t.db, main, comms, APP);
    expect(recipients).toBe(2);
    expect(await outboxTo("p.calloway@example.net", "question-reply")).toHaveLength(1);
    const [joined] = await outboxTo("jonah.perrault@example.net", "question-reply");
    expect(joined?.text_body).toContain("answered them together");
    expect(joined?.text_body).toContain("Q-2026-0003");
    const reply = await t.db.selectFrom("question_replies").selectAll().where("question_id", "=", dup).executeTakeFirst();
    expect(reply?.body_markdown).toContain("winter break");
    expect(await eventKinds(dup)).toEqual(["received", "merged", "reply_sent"]);
    expect(await eventKinds(main)).toContain("merge_received");
  });

  it("refuses to join a question to one that is already closed", async () => {
    const closed = await questionId("Q-2026-0008");
    const other = await questionId("Q-2026-0012");
    await expectRefused(other, 409, () => mergeQuestion(t.db, other, { intoId: closed }, comms, APP));
  });
});

describe("a non-technical question", () => {
  it("goes out without a check; staff may still mark it technical", async () => {
    const id = await questionId("Q-2026-0010");
    await setTechnical(t.db, id, true, comms, APP);
    await saveDraft(t.db, id, draft("Buses keep their normal times."), comms, APP);
    await expectRefused(id, 409, () => sendReply(t.db, id, comms, APP));
    await setTechnical(t.db, id, false, comms, APP);
    await sendReply(t.db, id, comms, APP);
    expect(await state(id)).toBe("answered");
    expect(await eventKinds(id)).toEqual(["received", "marked_technical", "assigned", "draft_saved", "unmarked_technical", "reply_sent"]);
  });

  it("a technical topic cannot be unmarked", async () => {
    const id = await questionId("Q-2026-0009");
    const error = await expectRefused(id, 400, () => setTechnical(t.db, id, false, comms, APP));
    expect(error.fields?.technical).toMatch(/always need/);
  });
});

describe("declining", () => {
  it("tells the asker politely, with the reason, and closes the question", async () => {
    const id = await questionId("Q-2026-0012");
    await declineQuestion(t.db, id, { reason: "Lunch plans are set by each school's principal; Eastmere's office can tell you." }, comms, APP);
    expect(await state(id)).toBe("declined");
    const [mail] = await outboxTo("k.osei@example.net", "question-declined");
    expect(mail?.text_body).toContain("we are sorry");
    expect(mail?.text_body).toContain("Eastmere's office can tell you");
    await expectRefused(id, 409, () => sendReply(t.db, id, comms, APP));
  });
});

describe("assignment, notes and illegal steps", () => {
  it("assigns only to people who answer questions", async () => {
    const id = await questionId("Q-2026-0011");
    await expectRefused(id, 400, () => assignQuestion(t.db, id, facilities.id, admin, APP));
    await assignQuestion(t.db, id, admin.id, comms, APP);
    await addNote(t.db, id, "Ask the night crew lead which product class they use.", comms, APP);
    const detail = await getQuestionDetail(t.db, id, comms);
    expect(detail?.assignee?.id).toBe(admin.id);
    expect(detail?.notes.map((n) => n.body)).toEqual(["Ask the night crew lead which product class they use."]);
    expect(await eventKinds(id)).toEqual(["received", "assigned", "note_added"]);
  });

  it("a review of a question nobody sent for a check is refused with 409 and changes nothing", async () => {
    const id = await questionId("Q-2026-0011");
    await expectRefused(id, 409, () => reviewAnswer(t.db, id, { decision: "approve", comment: "" }, facilities, APP));
    await expectRefused(id, 409, () => requestCheck(t.db, id, comms, APP)); // no draft yet... and received → check is not a step
  });

  it("an unknown question is 404", async () => {
    await expect(sendReply(t.db, 999_999, comms, APP)).rejects.toMatchObject({ status: 404 });
  });
});

describe("unpublishing", () => {
  it("takes the answer off the page and logs it on the question", async () => {
    const id = await questionId("Q-2026-0001");
    const live = await t.db.selectFrom("published_answers").select("id").where("question_id", "=", id).executeTakeFirstOrThrow();
    await unpublishAnswer(t.db, live.id, comms, APP);
    const row = await t.db.selectFrom("published_answers").selectAll().where("id", "=", live.id).executeTakeFirstOrThrow();
    expect(row.unpublished_at).not.toBeNull();
    expect((await eventKinds(id)).at(-1)).toBe("unpublished");
    await expect(unpublishAnswer(t.db, live.id, comms, APP)).rejects.toMatchObject({ status: 409 });
  });

  it("an answer written straight for the page is logged in the staff history", async () => {
    const seeded = await t.db.selectFrom("published_answers").select("id").where("question_id", "is", null).orderBy("id").executeTakeFirstOrThrow();
    await unpublishAnswer(t.db, seeded.id, admin, APP);
    const logged = await t.db.selectFrom("staff_events").selectAll().where("kind", "=", "answer_unpublished").execute();
    expect(logged).toHaveLength(1);
  });
});

describe("the queue", () => {
  const query = (q: Record<string, string>) => queueQuerySchema.parse(q);
  const now = new Date("2026-12-01T15:00:00Z");

  it("lists open questions oldest first with school days left against the district calendar", async () => {
    const page = await listQueue(t.db, query({}), comms, now);
    const refs = page.items.map((i) => i.reference);
    expect(refs).not.toContain("Q-2026-0012"); // declined
    const received = page.items.map((i) => i.receivedAt);
    expect(received).toEqual([...received].sort());
    const q4 = page.items.find((i) => i.reference === "Q-2026-0004")!;
    // In on Monday 2026-11-30 (New York), 3 school days → due Thursday 2026-12-03; on Tuesday 12-01, 2 left.
    expect(q4.dueDate).toBe("2026-12-03");
    expect(q4.schoolDaysLeft).toBe(2);
  });

  it("filters combine, text search matches every word, and pages", async () => {
    const tech = await listQueue(t.db, query({ technical: "yes", state: "all" }), comms, now);
    expect(tech.items.every((i) => i.technical)).toBe(true);
    const school = await listQueue(t.db, query({ school: "tamsin-creek", topic: "air", state: "all" }), comms, now);
    expect(school.items.map((i) => i.reference)).toEqual(["Q-2026-0001", "Q-2026-0007"]);
    const found = await listQueue(t.db, query({ q: "lift library", state: "all" }), comms, now);
    expect(found.items.map((i) => i.reference)).toEqual(["Q-2026-0013"]);
    const paged = await listQueue(t.db, query({ state: "all", pageSize: "5", page: "2", sort: "reference", dir: "desc" }), comms, now);
    expect(paged.total).toBe(13);
    expect(paged.items.map((i) => i.reference)).toEqual(["Q-2026-0008", "Q-2026-0007", "Q-2026-0006", "Q-2026-0005", "Q-2026-0004"]);
    const mine = await listQueue(t.db, query({ assignee: "me", state: "all" }), admin, now);
    expect(mine.items.map((i) => i.reference)).toEqual(["Q-2026-0011"]);
  });

  it("refuses an unknown filter value with a message", () => {
    const parsed = queueQuerySchema.safeParse({ state: "lost" });
    expect(parsed.success).toBe(false);
  });
});
