import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { toAnswerSuggestion } from "@/lib/answers/repository";
import { getAnswersSearch } from "@/lib/answers/search-index";

export const dynamic = "force-dynamic";

/** Every published answer in compact form, for matching while a parent types. Public words only. */
export async function GET(request: Request): Promise<Response> {
  const state = await getAnswersSearch(db());
  const etag = `"s-${state.version}"`;
  // Checked with the server on every use (a 304 while nothing changed), so an answer taken down is never offered again.
  const headers = { "cache-control": "public, no-cache", etag };
  if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  return NextResponse.json({ answers: [...state.answers.values()].map(toAnswerSuggestion) }, { headers });
}
