import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { parseAnswersQuery } from "@/lib/answers/query";
import { toApiResults } from "@/lib/answers/api";
import { getAnswersSearch } from "@/lib/answers/search-index";

export const dynamic = "force-dynamic";

/**
 * GET /api/answers?q=&school=&topic= — published answers, best match first (newest first
 * without q), ranked exactly as the answers page ranks them. Public words only.
 */
export async function GET(request: Request): Promise<Response> {
  const state = await getAnswersSearch(db());
  const schools = state.payload.schools.map(([slug]) => slug);
  const parsed = parseAnswersQuery(new URL(request.url).searchParams, schools);
  if (!parsed.ok) return NextResponse.json({ errors: parsed.errors }, { status: 400 });
  const etag = `"${createHash("sha256").update(JSON.stringify([state.version, parsed.query])).digest("base64url").slice(0, 27)}"`;
  // Always checked with the server (no-cache), so an answer taken down disappears at once; unchanged results cost a 304.
  const headers = { "cache-control": "public, no-cache", etag };
  if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  const found = state.engine.search(parsed.query);
  return NextResponse.json({ results: toApiResults(found.answers, state.answers) }, { headers });
}
