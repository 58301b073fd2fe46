import type { PublicAnswer } from "./repository";
import { DISTRICT, type AnswerHit } from "./search";

/** One result of GET /api/answers: public words only, never anything about the asker or staff. */
export interface ApiAnswer {
  id: number;
  question: string;
  /** The answer in Markdown, as the answer's page shows it. */
  answer: string;
  /** A school slug, or "district" for an answer that is for every school. */
  school: string;
  topic: string;
  publishedAt: string;
  /** The answer's page on this site. */
  url: string;
}

export function toApiResults(hits: readonly AnswerHit[], answers: ReadonlyMap<number, PublicAnswer>): ApiAnswer[] {
  const out: ApiAnswer[] = [];
  for (const hit of hits) {
    const a = answers.get(hit.id);
    if (!a) continue;
    out.push({
      id: a.id,
      question: a.question,
      answer: a.answerMarkdown,
      school: a.school?.slug ?? DISTRICT,
      topic: a.topic,
      publishedAt: a.publishedAt,
      url: hit.url,
    });
  }
  return out;
}
