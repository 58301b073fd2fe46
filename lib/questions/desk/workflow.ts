import type { Transaction } from "kysely";
import type { DB } from "@/db/connection";
import type { Database } from "@/db/types";
import type { StaffUser } from "@/lib/auth/authenticate";
import { enqueueMail, messageIdHost } from "@/lib/mail/outbox";
import { districtName } from "@/lib/settings/district";
import type { DeclineInput, DraftInput, MergeInput, PublishInput, ReviewInput, SnippetInput } from "@/lib/validation/desk";
import { findPersonalDetails } from "../personal-details";
import { assertTransition, IllegalTransitionError, isQuestionState, isTechnicalTopic, isTerminalState, type QuestionState } from "../state-machine";
import { newStatusToken, statusPath } from "../status-token";
import { conflict, DeskError, fromIllegalTransition, notFound } from "./errors";
import { declineMail, replyMail, staffNoticeMail } from "./mail";

type Trx = Transaction<Database>;

export interface DeskOptions {
  /** The public address links in e-mails start with. */
  appUrl: string;
  now?: Date;
}

/** Who may write answers and be assigned questions. */
export const ANSWERING_ROLES = ["communications", "admin"] as const;

export const REPLY_MAIL_KIND = "question-reply";
export const DECLINE_MAIL_KIND = "question-declined";
export const CHECK_WAITING_MAIL_KIND = "check-waiting";
export const CHECK_DONE_MAIL_KIND = "check-done";

async function loadQuestion(trx: Trx, id: number) {
  const row = await trx.selectFrom("questions").selectAll().where("id", "=", id).executeTakeFirst();
  if (!row) throw notFound();
  if (!isQuestionState(row.state)) throw conflict(`The question is in an unknown state (${row.state}).`);
  return { ...row, state: row.state as QuestionState };
}

type QuestionRow = Awaited<ReturnType<typeof loadQuestion>>;

/** A question needs a facilities check when its topic is technical or staff marked it. */
export function needsCheck(q: { topic: string; technical: number }): boolean {
  return q.technical === 1 || isTechnicalTopic(q.topic);
}

async function latestDraft(trx: Trx, questionId: number) {
  return trx
    .selectFrom("question_drafts")
    .selectAll()
    .where("question_id", "=", questionId)
    .orderBy("id", "desc")
    .limit(1)
    .executeTakeFirst();
}

async function recordEvent(
  trx: Trx,
  e: { questionId: number; actorId: number | null; kind: string; from?: QuestionState | null; to?: QuestionState | null; detail?: Record<string, unknown>; at: string },
) {
  await trx
    .insertInto("question_events")
    .values({
      question_id: e.questionId,
      actor_id: e.actorId,
      kind: e.kind,
      from_state: e.from ?? null,
      to_state: e.to ?? null,
      detail: e.detail ? JSON.stringify(e.detail) : null,
      created_at: e.at,
    })
    .execute();
}

/** Checks the state machine, then moves the question; an illegal step throws 409 and changes nothing. */
function checkTransition(q: QuestionRow, to: QuestionState) {
  try {
    assertTransition(q.state, to, { technical: needsCheck(q) });
  } catch (error) {
    if (error instanceof IllegalTransitionError) throw fromIllegalTransition(error);
    throw error;
  }
}

async function setState(trx: Trx, q: QuestionRow, to: QuestionState, at: string, extra: { approved_draft_id?: number | null; merged_into_id?: number | null } = {}) {
  const result = await trx
    .updateTable("questions")
    .set({ state: to, updated_at: at, ...extra })
    .where("id", "=", q.id)
    .where("state", "=", q.state) // a concurrent step that moved it first makes this change nothing
    .executeTakeFirst();
  if (Number(result.numUpdatedRows) !== 1) throw conflict("Someone else changed this question a moment ago. Reload it and try again.");
}

function run<T>(db: DB, work: (trx: Trx) => Promise<T>): Promise<T> {
  return db.transaction().execute(work);
}

function deskUrl(appUrl: string, id: number): string {
  return new URL(`/staff/desk/${id}`, appUrl).toString();
}

function ensureOpen(q: QuestionRow, what: string) {
  if (isTerminalState(q.state)) throw conflict(`This question is ${q.state}; ${what} is no longer possible.`);
}

// ---- assignment, notes, technical flag -------------------------------------------------------

export async function assignQuestion(db: DB, id: number, assigneeId: number | null, actor: StaffUser, options: DeskOptions): Promise<void> {
  const at = (options.now ?? new Date()).toISOString();
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    ensureOpen(q, "assigning it");
    let name: string | null = null;
    if (assigneeId !== null) {
      const user = await trx
        .selectFrom("users")
        .select(["id", "name"])
        .where("id", "=", assigneeId)
        .where("disabled_at", "is", null)
        .where("role", "in", [...ANSWERING_ROLES])
        .executeTakeFirst();
      if (!user) throw new DeskError(400, "Choose someone who answers questions.", { assigneeId: "Choose someone who answers questions." });
      name = user.name;
    }
    if (q.assignee_id === assigneeId) return;
    await trx.updateTable("questions").set({ assignee_id: assigneeId, updated_at: at }).where("id", "=", id).execute();
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: assigneeId === null ? "unassigned" : "assigned", detail: { assigneeId, name }, at });
  });
}

export async function addNote(db: DB, id: number, body: string, actor: StaffUser, options: DeskOptions): Promise<void> {
  const at = (options.now ?? new Date()).toISOString();
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    const { id: noteId } = await trx
      .insertInto("question_notes")
      .values({ question_id: q.id, author_id: actor.id, body, created_at: at })
      .returning("id")
      .executeTakeFirstOrThrow();
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: "note_added", detail: { noteId }, at });
  });
}

export async function setTechnical(db: DB, id: number, technical: boolean, actor: StaffUser, options: DeskOptions): Promise<void> {
  const at = (options.now ?? new Date()).toISOString();
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    ensureOpen(q, "changing whether it needs a check");
    if (!technical && isTechnicalTopic(q.topic)) {
      throw new DeskError(400, "Questions on this topic always need a facilities check.", { technical: "Questions on this topic always need a facilities check." });
    }
    if ((q.technical === 1) === technical) return;
    await trx.updateTable("questions").set({ technical: technical ? 1 : 0, updated_at: at }).where("id", "=", id).execute();
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: technical ? "marked_technical" : "unmarked_technical", at });
  });
}

// ---- drafting and the facilities check -------------------------------------------------------

export interface SaveDraftResult {
  draftId: number;
  warnings: ReturnType<typeof findPersonalDetails>;
}

/**
 * Keeps a new revision of the answer. The first draft moves a new question to drafting; a draft
 * after facilities sent it back, or after they approved it, moves it back to drafting, so what
 * goes out is always what was checked. While the check is under way the answer is locked.
 */
export async function saveDraft(db: DB, id: number, input: DraftInput, actor: StaffUser, options: DeskOptions): Promise<SaveDraftResult> {
  const at = (options.now ?? new Date()).toISOString();
  const warnings = [...findPersonalDetails(input.bodyMarkdown, "answer"), ...findPersonalDetails(input.publicQuestion, "publicQuestion")];
  const draftId = await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    if (q.state === "facilities_check") throw conflict("The answer is with facilities for a check. Wait for their check before you change it.");
    if (q.state !== "drafting") checkTransition(q, "drafting");
    const last = await latestDraft(trx, id);
    if (last && last.body_markdown === input.bodyMarkdown && last.public_question === input.publicQuestion && q.state === "drafting") return last.id;
    const { id: newId } = await trx
      .insertInto("question_drafts")
      .values({ question_id: id, body_markdown: input.bodyMarkdown, public_question: input.publicQuestion, author_id: actor.id, created_at: at })
      .returning("id")
      .executeTakeFirstOrThrow();
    if (q.state !== "drafting") await setState(trx, q, "drafting", at, { approved_draft_id: null });
    // Whoever writes the first draft of an unassigned question takes it.
    if (q.assignee_id === null && ANSWERING_ROLES.some((r) => r === actor.role)) {
      await trx.updateTable("questions").set({ assignee_id: actor.id }).where("id", "=", id).execute();
      await recordEvent(trx, { questionId: id, actorId: actor.id, kind: "assigned", detail: { assigneeId: actor.id, name: actor.name }, at });
    }
    await recordEvent(trx, {
      questionId: id,
      actorId: actor.id,
      kind: "draft_saved",
      from: q.state === "drafting" ? null : q.state,
      to: q.state === "drafting" ? null : "drafting",
      detail: { draftId: newId },
      at,
    });
    return newId;
  });
  return { draftId, warnings };
}

export async function requestCheck(db: DB, id: number, actor: StaffUser, options: DeskOptions): Promise<void> {
  const now = options.now ?? new Date();
  const at = now.toISOString();
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    checkTransition(q, "facilities_check");
    const draft = await latestDraft(trx, id);
    if (!draft) throw conflict("Write and save the answer before you send it for a check.");
    await setState(trx, q, "facilities_check", at);
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: "check_requested", from: q.state, to: "facilities_check", detail: { draftId: draft.id }, at });
    const reviewers = await trx.selectFrom("users").select(["email"]).where("role", "=", "facilities").where("disabled_at", "is", null).execute();
    const notice = staffNoticeMail({
      reference: q.reference,
      deskUrl: deskUrl(options.appUrl, id),
      subject: `A technical answer is waiting for your check: ${q.reference}`,
      lines: [`${actor.name} has written an answer to ${q.reference} and asks facilities to check its technical details before it goes to the family.`],
    });
    for (const r of reviewers) {
      await enqueueMail(trx, { kind: CHECK_WAITING_MAIL_KIND, to: r.email, ...notice }, now, { host: messageIdHost(options.appUrl) });
    }
  });
}

export async function reviewAnswer(db: DB, id: number, input: ReviewInput, actor: StaffUser, options: DeskOptions): Promise<void> {
  const now = options.now ?? new Date();
  const at = now.toISOString();
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    const to: QuestionState = input.decision === "approve" ? "approved" : "changes_requested";
    checkTransition(q, to);
    const draft = await latestDraft(trx, id);
    if (!draft) throw conflict("There is no answer to check yet.");
    if (draft.author_id === actor.id) {
      throw new DeskError(403, "Someone other than the answer's writer must check it.");
    }
    await setState(trx, q, to, at, { approved_draft_id: to === "approved" ? draft.id : null });
    await recordEvent(trx, {
      questionId: id,
      actorId: actor.id,
      kind: to === "approved" ? "check_approved" : "changes_requested",
      from: q.state,
      to,
      detail: { draftId: draft.id, ...(input.comment ? { comment: input.comment } : {}) },
      at,
    });
    // Tell the person answering, so the question does not wait unseen.
    const writerId = q.assignee_id ?? draft.author_id;
    const writer = writerId ? await trx.selectFrom("users").select(["email"]).where("id", "=", writerId).where("disabled_at", "is", null).executeTakeFirst() : undefined;
    if (writer) {
      const notice = staffNoticeMail({
        reference: q.reference,
        deskUrl: deskUrl(options.appUrl, id),
        subject: to === "approved" ? `Facilities approved the answer to ${q.reference}` : `Facilities asked for changes to ${q.reference}`,
        lines:
          to === "approved"
            ? [`${actor.name} checked the answer to ${q.reference} and approved it. It can be sent now.`]
            : [`${actor.name} checked the answer to ${q.reference} and asked for changes:`, input.comment],
      });
      await enqueueMail(trx, { kind: CHECK_DONE_MAIL_KIND, to: writer.email, ...notice }, now, { host: messageIdHost(options.appUrl) });
    }
  });
}

// ---- replies, declines, merges ---------------------------------------------------------------

async function livePublication(trx: Trx, questionId: number) {
  return trx
    .selectFrom("published_answers")
    .select(["id"])
    .where("question_id", "=", questionId)
    .where("unpublished_at", "is", null)
    .orderBy("id", "desc")
    .executeTakeFirst();
}

async function mergedAskers(trx: Trx, id: number) {
  return trx.selectFrom("questions").selectAll().where("merged_into_id", "=", id).where("state", "=", "merged").orderBy("id").execute();
}

/** A private status link for a reply; the token is only ever in the e-mail, the hash in the database. */
async function freshStatusUrl(trx: Trx, questionId: number, appUrl: string, at: string): Promise<string> {
  const { token, hash } = newStatusToken();
  await trx.insertInto("question_status_tokens").values({ question_id: questionId, token_hash: hash, created_at: at }).execute();
  return new URL(statusPath(token), appUrl).toString();
}

/**
 * Sends the reply: to the asker and to everyone whose question was joined to this one, each with a
 * private status link, through the outbox in the same transaction. A question that needs a check
 * goes out only with the very draft facilities approved, whatever the client asks.
 */
export async function sendReply(db: DB, id: number, actor: StaffUser, options: DeskOptions): Promise<{ recipients: number }> {
  const now = options.now ?? new Date();
  const at = now.toISOString();
  const district = await districtName(db);
  return run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    checkTransition(q, "answered");
    const draft = await latestDraft(trx, id);
    if (!draft) throw conflict("Write and save the answer before you send it.");
    if (needsCheck(q) && q.approved_draft_id !== draft.id) {
      throw conflict("This answer needs a facilities check of its latest version before it can be sent.");
    }
    const publication = await livePublication(trx, id);
    const publicUrl = publication ? new URL(`/answers/${publication.id}`, options.appUrl).toString() : null;
    const joined = await mergedAskers(trx, id);
    const sentTo = new Set<string>();
    for (const asker of [q, ...joined]) {
      const statusUrl = await freshStatusUrl(trx, asker.id, options.appUrl, at);
      await trx
        .insertInto("question_replies")
        .values({ question_id: asker.id, body_markdown: draft.body_markdown, sent_at: at, sent_by: actor.id })
        .onConflict((oc) => oc.column("question_id").doUpdateSet({ body_markdown: draft.body_markdown, sent_at: at, sent_by: actor.id }))
        .execute();
      const address = asker.asker_email.toLowerCase();
      if (!sentTo.has(address)) {
        sentTo.add(address);
        const mail = replyMail({
          districtName: district,
          reference: asker.reference,
          askerName: asker.asker_name,
          question: asker.body,
          answerMarkdown: draft.body_markdown,
          publicUrl,
          statusUrl,
          joined: asker.id !== q.id,
        });
        await enqueueMail(trx, { kind: REPLY_MAIL_KIND, to: asker.asker_email, ...mail }, now, { host: messageIdHost(options.appUrl) });
      }
      if (asker.id !== q.id) {
        await recordEvent(trx, { questionId: asker.id, actorId: actor.id, kind: "reply_sent", detail: { via: q.reference, draftId: draft.id }, at });
      }
    }
    await setState(trx, q, "answered", at);
    await recordEvent(trx, {
      questionId: id,
      actorId: actor.id,
      kind: "reply_sent",
      from: q.state,
      to: "answered",
      detail: { draftId: draft.id, recipients: sentTo.size, joined: joined.length },
      at,
    });
    return { recipients: sentTo.size };
  });
}

export async function declineQuestion(db: DB, id: number, input: DeclineInput, actor: StaffUser, options: DeskOptions): Promise<void> {
  const now = options.now ?? new Date();
  const at = now.toISOString();
  const district = await districtName(db);
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    checkTransition(q, "declined");
    const joined = await mergedAskers(trx, id);
    const askUrl = new URL("/ask", options.appUrl).toString();
    for (const asker of [q, ...joined]) {
      const mail = declineMail({ districtName: district, reference: asker.reference, askerName: asker.asker_name, question: asker.body, reason: input.reason, askUrl });
      await enqueueMail(trx, { kind: DECLINE_MAIL_KIND, to: asker.asker_email, ...mail }, now, { host: messageIdHost(options.appUrl) });
      if (asker.id !== q.id) await recordEvent(trx, { questionId: asker.id, actorId: actor.id, kind: "declined_with", detail: { via: q.reference, reason: input.reason }, at });
    }
    await setState(trx, q, "declined", at);
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: "declined", from: q.state, to: "declined", detail: { reason: input.reason }, at });
  });
}

/** Joins a duplicate to another open question: one answer then replies to both askers. */
export async function mergeQuestion(db: DB, id: number, input: MergeInput, actor: StaffUser, options: DeskOptions): Promise<void> {
  const at = (options.now ?? new Date()).toISOString();
  if (input.intoId === id) throw new DeskError(400, "A question cannot be joined to itself.", { intoId: "Choose another question." });
  await run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    let target: QuestionRow;
    try {
      target = await loadQuestion(trx, input.intoId);
    } catch (error) {
      if (error instanceof DeskError && error.status === 404) throw new DeskError(400, "There is no question with that id to join to.", { intoId: "Choose an existing question." });
      throw error;
    }
    if (isTerminalState(target.state)) throw conflict(`${target.reference} is ${target.state}; join this question to one that is still open.`);
    checkTransition(q, "merged");
    // Questions already joined to this one follow it, so nobody is left without a reply.
    const followers = await trx
      .updateTable("questions")
      .set({ merged_into_id: target.id, updated_at: at })
      .where("merged_into_id", "=", id)
      .executeTakeFirst();
    await setState(trx, q, "merged", at, { merged_into_id: target.id });
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: "merged", from: q.state, to: "merged", detail: { intoId: target.id, into: target.reference }, at });
    await recordEvent(trx, {
      questionId: target.id,
      actorId: actor.id,
      kind: "merge_received",
      detail: { fromId: id, from: q.reference, followers: Number(followers.numUpdatedRows) },
      at,
    });
  });
}

// ---- the public version ----------------------------------------------------------------------

const EMAIL_OR_PHONE = new Set(["email", "phone"]);

/**
 * Publishes (or updates) the public version of a question's answer: the question as staff
 * rewrote it and the answer as it was written (for a technical answer, as approved). Returns
 * the published answer's id.
 */
export async function publishAnswer(db: DB, id: number, input: PublishInput, actor: StaffUser, options: DeskOptions): Promise<number> {
  const at = (options.now ?? new Date()).toISOString();
  const personal = findPersonalDetails(input.questionText, "publicQuestion").filter((w) => EMAIL_OR_PHONE.has(w.kind));
  if (personal.length > 0) {
    const message = "Take the e-mail address or phone number out of the public question.";
    throw new DeskError(400, message, { questionText: message });
  }
  return run(db, async (trx) => {
    const q = await loadQuestion(trx, id);
    if (q.state === "declined" || q.state === "merged") throw conflict(`This question is ${q.state}; it has no answer of its own to publish.`);
    const draft = await latestDraft(trx, id);
    if (!draft) throw conflict("Write and save the answer before you publish it.");
    if (needsCheck(q) && !((q.state === "approved" || q.state === "answered") && q.approved_draft_id === draft.id)) {
      throw conflict("A technical answer can be published only after facilities approve its latest version.");
    }
    if (input.schoolId !== null) {
      const school = await trx.selectFrom("schools").select("id").where("id", "=", input.schoolId).executeTakeFirst();
      if (!school) throw new DeskError(400, "Choose a school from the list, or every school.", { schoolId: "Choose a school from the list, or every school." });
    }
    const live = await livePublication(trx, id);
    const values = { question_text: input.questionText, answer_markdown: draft.body_markdown, school_id: input.schoolId, topic: input.topic, updated_at: at };
    let answerId: number;
    if (live) {
      await trx.updateTable("published_answers").set(values).where("id", "=", live.id).execute();
      answerId = live.id;
    } else {
      const row = await trx
        .insertInto("published_answers")
        .values({ ...values, question_id: id, published_at: at, published_by: actor.id })
        .returning("id")
        .executeTakeFirstOrThrow();
      answerId = row.id;
    }
    await recordEvent(trx, { questionId: id, actorId: actor.id, kind: live ? "publication_updated" : "published", detail: { answerId }, at });
    return answerId;
  });
}

/** Takes a published answer off the answers page; the row stays, with when and by whom. */
export async function unpublishAnswer(db: DB, answerId: number, actor: StaffUser, options: DeskOptions): Promise<{ questionId: number | null }> {
  const at = (options.now ?? new Date()).toISOString();
  return run(db, async (trx) => {
    const row = await trx.selectFrom("published_answers").select(["id", "question_id", "unpublished_at", "question_text"]).where("id", "=", answerId).executeTakeFirst();
    if (!row) throw new DeskError(404, "No published answer has this id.");
    if (row.unpublished_at) throw conflict("This answer is already off the answers page.");
    await trx.updateTable("published_answers").set({ unpublished_at: at, updated_at: at }).where("id", "=", answerId).execute();
    if (row.question_id !== null) {
      await recordEvent(trx, { questionId: row.question_id, actorId: actor.id, kind: "unpublished", detail: { answerId }, at });
    } else {
      // An answer written straight for the page has no question to hold its history.
      await trx
        .insertInto("staff_events")
        .values({ actor_id: actor.id, subject_user_id: null, kind: "answer_unpublished", detail: JSON.stringify({ answerId, question: row.question_text }), created_at: at })
        .execute();
    }
    return { questionId: row.question_id };
  });
}

// ---- reply snippets --------------------------------------------------------------------------

export async function createSnippet(db: DB, input: SnippetInput, actor: StaffUser, now = new Date()): Promise<number> {
  const row = await db
    .insertInto("reply_snippets")
    .values({ title: input.title, body_markdown: input.bodyMarkdown, updated_by: actor.id, updated_at: now.toISOString() })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateSnippet(db: DB, id: number, input: SnippetInput, actor: StaffUser, now = new Date()): Promise<boolean> {
  const r = await db
    .updateTable("reply_snippets")
    .set({ title: input.title, body_markdown: input.bodyMarkdown, updated_by: actor.id, updated_at: now.toISOString() })
    .where("id", "=", id)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}

export async function deleteSnippet(db: DB, id: number): Promise<boolean> {
  const r = await db.deleteFrom("reply_snippets").where("id", "=", id).executeTakeFirst();
  return Number(r.numDeletedRows) === 1;
}
