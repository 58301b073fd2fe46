import "server-only";
import { revalidatePath } from "next/cache";
import { answerPath } from "./repository";
import { forgetAnswersSearch } from "./search-index";

/** Every page and route that shows published answers; the search index route is among them. */
export const PUBLISHED_ANSWER_PATHS = ["/answers", "/api/answers", "/api/answers/search-index", "/api/answers/suggestions", "/sitemap.xml"] as const;

/**
 * Call after an answer is published, changed or taken down. The search index would notice on
 * its own (it is rebuilt whenever the database's fingerprint of published answers changes);
 * this drops it at once and clears Next's caches of the pages that list or show the answer.
 * Safe anywhere: outside a request (a script, a test) there is no Next cache, and nothing throws.
 */
export function revalidatePublishedAnswers(answerId: number): void {
  forgetAnswersSearch();
  for (const path of [...PUBLISHED_ANSWER_PATHS, answerPath(answerId)]) {
    try {
      revalidatePath(path);
    } catch {
      // Outside a request Next has no cache to clear (it throws "static generation store missing").
    }
  }
}
