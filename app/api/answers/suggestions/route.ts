import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { listPublishedAnswers, toAnswerSuggestion } from "@/lib/answers/repository";

export const dynamic = "force-dynamic";

/** Every published answer in compact form, for matching while a parent types. Public words only. */
export async function GET(): Promise<Response> {
  const answers = (await listPublishedAnswers(db())).map(toAnswerSuggestion);
  return NextResponse.json(
    { answers },
    // Short, so an answer taken down stops being offered within minutes even where it is cached.
    { headers: { "cache-control": "public, max-age=60, stale-while-revalidate=300" } },
  );
}
