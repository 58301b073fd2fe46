import type { DB } from "@/db/connection";
import { answerPath, listPublishedAnswers, toAnswerSuggestion, type AnswerSuggestion } from "@/lib/answers/repository";
import { createSuggestionIndex } from "@/lib/answers/suggest";
import type { StaffUser } from "@/lib/auth/authenticate";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import type { QuestionDetail, QuestionEventView, RelatedQuestion, StaffRef } from "../desk-types";
import { STATE_LABELS } from "../labels";
import { isTechnicalTopic, nextStates, TERMINAL_STATES, type QuestionState } from "../state-machine";
import { deskCalendar, replyTiming } from "./calendar";
import { needsCheck } from "./workflow";

function excerpt(text: string, max = 160): string {
  return text.length > max ? `${text.slice(0, max - 3).trimEnd()}…` : text;
}

function parseDetail(detail: string | null): Record<string, unknown> {
  if (!detail) return {};
  try {
    const value: unknown = JSON.parse(detail);
    return value && typeof value === "object" ? (value as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

const str = (v: unknown): string | null => (typeof v === "string" && v ? v : null);

/** One line of history in plain words, from the event's kind and detail. */
export function eventSummary(kind: string, detail: Record<string, unknown>, toState: string | null): string {
  switch (kind) {
    case "received":
      return detail.via === "api" ? "Question received through the JSON API" : "Question received through the ask form";
    case "assigned":
      return `Assigned to ${str(detail.name) ?? "a staff member"}`;
    case "unassigned":
      return "Assignment removed";
    case "note_added":
      return "Internal note added";
    case "marked_technical":
      return "Marked as needing a facilities check";
    case "unmarked_technical":
      return "No longer marked as needing a facilities check";
    case "draft_saved":
      return toState ? "Answer draft saved; back to being written" : "Answer draft saved";
    case "check_requested":
      return "Sent to facilities for a check";
    case "check_approved":
      return "Facilities approved the answer";
    case "changes_requested":
      return "Facilities sent the answer back for changes";
    case "reply_sent":
      return str(detail.via) ? `Reply sent with the answer to ${str(detail.via)}` : "Reply sent to the asker";
    case "declined":
      return "Declined; the asker was told why by e-mail";
    case "declined_with":
      return `Declined together with ${str(detail.via) ?? "the question it was joined to"}; the asker was told why`;
    case "merged":
      return `Joined to ${str(detail.into) ?? "another question"}; its reply will answer this asker too`;
    case "merge_received":
      return `${str(detail.from) ?? "Another question"} was joined to this one`;
    case "published":
      return "Published on the answers page";
    case "publication_updated":
      return "Public version updated";
    case "unpublished":
      return "Taken off the answers page";
    default:
      return toState ? `Moved to ${STATE_LABELS[toState] ?? toState}` : kind.replace(/_/g, " ");
  }
}

function staffRef(id: number | null, name: string | null): StaffRef | null {
  return id !== null && name ? { id, name } : null;
}

function related(r: { id: number; reference: string; state: string; created_at: string; body: string }): RelatedQuestion {
  return { id: r.id, reference: r.reference, state: r.state as QuestionState, receivedAt: r.created_at, excerpt: excerpt(r.body) };
}

/** Everything the question page shows, for the signed-in staff member; null when there is no such question. */
export async function getQuestionDetail(db: DB, id: number, viewer: StaffUser, now: Date = new Date()): Promise<QuestionDetail | null> {
  const q = await db
    .selectFrom("questions")
    .leftJoin("schools", "schools.id", "questions.school_id")
    .leftJoin("users", "users.id", "questions.assignee_id")
    .selectAll("questions")
    .select(["schools.slug as schoolSlug", "schools.name as schoolName", "users.name as assigneeName"])
    .where("questions.id", "=", id)
    .executeTakeFirst();
  if (!q) return null;
  const state = q.state as QuestionState;

  const [drafts, notes, events, mergedFrom, mergedInto, fromAsker, openQuestions, answers, publications, reply, cal] = await Promise.all([
    db
      .selectFrom("question_drafts")
      .leftJoin("users", "users.id", "question_drafts.author_id")
      .select(["question_drafts.id", "question_drafts.body_markdown", "question_drafts.public_question", "question_drafts.created_at", "users.id as authorId", "users.name as authorName"])
      .where("question_id", "=", id)
      .orderBy("question_drafts.id", "desc")
      .execute(),
    db
      .selectFrom("question_notes")
      .leftJoin("users", "users.id", "question_notes.author_id")
      .select(["question_notes.id", "question_notes.body", "question_notes.created_at", "users.id as authorId", "users.name as authorName"])
      .where("question_id", "=", id)
      .orderBy("question_notes.id", "asc")
      .execute(),
    db
      .selectFrom("question_events")
      .leftJoin("users", "users.id", "question_events.actor_id")
      .select(["question_events.id", "kind", "from_state", "to_state", "detail", "question_events.created_at", "users.id as actorId", "users.name as actorName"])
      .where("question_id", "=", id)
      .orderBy("question_events.id", "asc")
      .execute(),
    db.selectFrom("questions").select(["id", "reference", "state", "created_at", "body"]).where("merged_into_id", "=", id).orderBy("id").execute(),
    q.merged_into_id !== null
      ? db.selectFrom("questions").select(["id", "reference", "state", "created_at", "body"]).where("id", "=", q.merged_into_id).executeTakeFirst()
      : Promise.resolve(undefined),
    db
      .selectFrom("questions")
      .select(["id", "reference", "state", "created_at", "body"])
      .where(({ fn }) => fn("lower", ["asker_email"]), "=", q.asker_email.toLowerCase())
      .where("id", "!=", id)
      .orderBy("id", "desc")
      .limit(20)
      .execute(),
    db
      .selectFrom("questions")
      .leftJoin("schools", "schools.id", "questions.school_id")
      .select(["questions.id", "reference", "state", "questions.created_at", "body", "topic", "schools.slug as schoolSlug", "schools.name as schoolName"])
      .where("state", "not in", [...TERMINAL_STATES])
      .where("questions.id", "!=", id)
      .orderBy("questions.id", "desc")
      .limit(500)
      .execute(),
    listPublishedAnswers(db, now),
    db
      .selectFrom("published_answers")
      .select(["id", "question_text", "school_id", "topic", "published_at", "unpublished_at"])
      .where("question_id", "=", id)
      .orderBy("id", "desc")
      .execute(),
    db
      .selectFrom("question_replies")
      .leftJoin("users", "users.id", "question_replies.sent_by")
      .select(["body_markdown", "sent_at", "users.id as senderId", "users.name as senderName"])
      .where("question_id", "=", id)
      .executeTakeFirst(),
    deskCalendar(db, now),
  ]);

  const schoolScope = q.schoolSlug ?? "district";
  const similarAnswers = createSuggestionIndex(answers.map(toAnswerSuggestion))
    .suggest(q.body, schoolScope)
    .map((a) => ({ id: a.id, question: a.question, school: a.school === "district" ? null : a.schoolName, topic: a.topic, url: answerPath(a.id) }));
  const openAsSuggestions: AnswerSuggestion[] = openQuestions.map((o) => ({
    id: o.id,
    question: o.body,
    school: o.schoolSlug ?? "district",
    schoolName: o.schoolName ?? "",
    topic: o.topic,
    topicLabel: o.topic,
    excerpt: "",
    url: "",
  }));
  const byId = new Map(openQuestions.map((o) => [o.id, o]));
  const similarOpen = createSuggestionIndex(openAsSuggestions)
    .suggest(q.body, schoolScope)
    .map((s) => byId.get(s.id))
    .filter((o): o is NonNullable<typeof o> => o !== undefined)
    .map(related);

  const technical = needsCheck(q);
  const latestDraft = drafts[0];
  const answering = (STAFF_PAGE_ROLES.desk as readonly string[]).includes(viewer.role);
  const reviewing = (STAFF_PAGE_ROLES.check as readonly string[]).includes(viewer.role);
  const approvedLatest = latestDraft !== undefined && q.approved_draft_id === latestDraft.id;
  const open = !TERMINAL_STATES.includes(state);

  const eventViews: QuestionEventView[] = events.map((e) => {
    const detail = parseDetail(e.detail);
    return {
      id: e.id,
      kind: e.kind,
      fromState: (e.from_state as QuestionState | null) ?? null,
      toState: (e.to_state as QuestionState | null) ?? null,
      actor: staffRef(e.actorId, e.actorName),
      summary: eventSummary(e.kind, detail, e.to_state),
      comment: str(detail.comment) ?? str(detail.reason),
      createdAt: e.created_at,
    };
  });

  return {
    id: q.id,
    reference: q.reference,
    receivedAt: q.created_at,
    school: q.school_id !== null && q.schoolSlug && q.schoolName ? { id: q.school_id, slug: q.schoolSlug, name: q.schoolName } : null,
    topic: q.topic,
    room: q.room,
    body: q.body,
    askerName: q.asker_name,
    askerEmail: q.asker_email,
    language: q.language,
    state,
    technical,
    technicalByTopic: isTechnicalTopic(q.topic),
    assignee: staffRef(q.assignee_id, q.assigneeName),
    ...replyTiming(q.created_at, q.state, cal),
    mergedInto: mergedInto ? related(mergedInto) : null,
    mergedFrom: mergedFrom.map(related),
    drafts: drafts.map((d) => ({
      id: d.id,
      bodyMarkdown: d.body_markdown,
      publicQuestion: d.public_question,
      author: staffRef(d.authorId, d.authorName),
      createdAt: d.created_at,
    })),
    notes: notes.map((n) => ({ id: n.id, author: staffRef(n.authorId, n.authorName), body: n.body, createdAt: n.created_at })),
    events: eventViews,
    otherFromAsker: fromAsker.map(related),
    similarOpen,
    similarAnswers,
    publications: publications.map((p) => ({
      id: p.id,
      questionText: p.question_text,
      schoolId: p.school_id,
      topic: p.topic,
      publishedAt: p.published_at,
      unpublishedAt: p.unpublished_at,
      url: answerPath(p.id),
    })),
    reply: reply ? { bodyMarkdown: reply.body_markdown, sentAt: reply.sent_at, sentBy: staffRef(reply.senderId, reply.senderName) } : null,
    nextStates: nextStates(state, { technical }),
    can: {
      edit: answering && open && state !== "facilities_check",
      review: reviewing && state === "facilities_check" && latestDraft !== undefined && latestDraft.authorId !== viewer.id,
      send:
        answering &&
        latestDraft !== undefined &&
        (technical ? state === "approved" && approvedLatest : state === "drafting" || (state === "approved" && approvedLatest)),
      publish:
        answering &&
        latestDraft !== undefined &&
        state !== "declined" &&
        state !== "merged" &&
        (!technical || ((state === "approved" || state === "answered") && approvedLatest)),
    },
  };
}

/** Technical answers waiting for facilities, oldest request first. */
export async function listChecks(db: DB) {
  // Each waiting check joins the latest request for it: who asked for the check and when.
  const rows = await db
    .with("latest_request", (qb) =>
      qb
        .selectFrom("question_events")
        .select(["question_id", (eb) => eb.fn.max("id").as("event_id")])
        .where("kind", "=", "check_requested")
        .groupBy("question_id"),
    )
    .selectFrom("questions")
    .leftJoin("schools", "schools.id", "questions.school_id")
    .leftJoin("latest_request", "latest_request.question_id", "questions.id")
    .leftJoin("question_events as request", "request.id", "latest_request.event_id")
    .leftJoin("users", "users.id", "request.actor_id")
    .select([
      "questions.id",
      "questions.reference",
      "questions.topic",
      "questions.body",
      "schools.id as schoolId",
      "schools.slug as schoolSlug",
      "schools.name as schoolName",
      "request.created_at as submittedAt",
      "request.actor_id as submittedById",
      "users.name as submittedByName",
    ])
    .where("questions.state", "=", "facilities_check")
    .orderBy("request.created_at", "asc")
    .execute();
  return rows.map((r) => ({
    id: r.id,
    reference: r.reference,
    school: r.schoolId !== null && r.schoolSlug && r.schoolName ? { id: r.schoolId, slug: r.schoolSlug, name: r.schoolName } : null,
    topic: r.topic,
    submittedAt: r.submittedAt ?? "",
    submittedBy: staffRef(r.submittedById ?? null, r.submittedByName ?? null),
    excerpt: excerpt(r.body),
  }));
}

export async function listAssignees(db: DB): Promise<StaffRef[]> {
  return db
    .selectFrom("users")
    .select(["id", "name"])
    .where("disabled_at", "is", null)
    .where("role", "in", ["communications", "admin"])
    .orderBy("name")
    .execute();
}

export async function listSnippets(db: DB) {
  const rows = await db
    .selectFrom("reply_snippets")
    .leftJoin("users", "users.id", "reply_snippets.updated_by")
    .select(["reply_snippets.id", "title", "body_markdown", "reply_snippets.updated_at", "users.id as userId", "users.name as userName"])
    .orderBy("title")
    .execute();
  return rows.map((r) => ({ id: r.id, title: r.title, bodyMarkdown: r.body_markdown, updatedAt: r.updated_at, updatedBy: staffRef(r.userId, r.userName) }));
}

export async function getSnippet(db: DB, id: number) {
  return (await listSnippets(db)).find((s) => s.id === id) ?? null;
}
