import type { DB } from "@/db/connection";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { markdownExcerpt } from "@/lib/markdown/parse";

/** A published answer as the public sees it: no asker, no staff member, no link to the private question. */
export interface PublicAnswer {
  id: number;
  question: string;
  answerMarkdown: string;
  school: { slug: string; name: string } | null;
  topic: string;
  topicLabel: string;
  publishedAt: string;
  updatedAt: string;
}

/** The compact form the ask page searches while a parent types. */
export interface AnswerSuggestion {
  id: number;
  question: string;
  /** A school slug, or "district". */
  school: string;
  schoolName: string;
  topic: string;
  topicLabel: string;
  excerpt: string;
  url: string;
}

export const DISTRICT_WIDE_LABEL = "All schools";

function livePublishedAnswers(db: DB, now: Date) {
  return db
    .selectFrom("published_answers")
    .leftJoin("schools", "schools.id", "published_answers.school_id")
    .select([
      "published_answers.id",
      "published_answers.question_text",
      "published_answers.answer_markdown",
      "published_answers.topic",
      "published_answers.published_at",
      "published_answers.updated_at",
      "schools.slug as schoolSlug",
      "schools.name as schoolName",
    ])
    .where("published_answers.unpublished_at", "is", null)
    .where("published_answers.published_at", "<=", now.toISOString());
}

type Row = Awaited<ReturnType<ReturnType<typeof livePublishedAnswers>["executeTakeFirstOrThrow"]>>;

function toPublicAnswer(r: Row): PublicAnswer {
  return {
    id: r.id,
    question: r.question_text,
    answerMarkdown: r.answer_markdown,
    school: r.schoolSlug && r.schoolName ? { slug: r.schoolSlug, name: r.schoolName } : null,
    topic: r.topic,
    topicLabel: TOPIC_LABELS[r.topic] ?? r.topic,
    publishedAt: r.published_at,
    updatedAt: r.updated_at,
  };
}

/** Every answer that is published now, newest first. */
export async function listPublishedAnswers(db: DB, now: Date = new Date()): Promise<PublicAnswer[]> {
  const rows = await livePublishedAnswers(db, now)
    .orderBy("published_answers.published_at", "desc")
    .orderBy("published_answers.id", "desc")
    .execute();
  return rows.map(toPublicAnswer);
}

/** One published answer; null when there is none with this id or it has been taken down. */
export async function getPublishedAnswer(db: DB, id: number, now: Date = new Date()): Promise<PublicAnswer | null> {
  const row = await livePublishedAnswers(db, now).where("published_answers.id", "=", id).executeTakeFirst();
  return row ? toPublicAnswer(row) : null;
}

export function answerPath(id: number): string {
  return `/answers/${id}`;
}

export function toAnswerSuggestion(a: PublicAnswer): AnswerSuggestion {
  return {
    id: a.id,
    question: a.question,
    school: a.school?.slug ?? "district",
    schoolName: a.school?.name ?? DISTRICT_WIDE_LABEL,
    topic: a.topic,
    topicLabel: a.topicLabel,
    excerpt: markdownExcerpt(a.answerMarkdown),
    url: answerPath(a.id),
  };
}
