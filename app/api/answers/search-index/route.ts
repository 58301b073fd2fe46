import { db } from "@/db/client";
import { getAnswersSearch } from "@/lib/answers/search-index";

export const dynamic = "force-dynamic";

/**
 * GET /api/answers/search-index[?v=<version>] — the compact index the answers page searches
 * in the browser. Its ETag is the index version, which changes whenever an answer is
 * published, changed or taken down (or the synonyms, schools or pages change). Asked for by
 * its current version (`?v=`, as the page does) it may be kept for a year; without it, or with
 * an old version, it is checked with the server on every use.
 */
export async function GET(request: Request): Promise<Response> {
  const state = await getAnswersSearch(db());
  const etag = `"${state.version}"`;
  const asked = new URL(request.url).searchParams.get("v");
  const headers = {
    "content-type": "application/json; charset=utf-8",
    "cache-control": asked === state.version ? "public, max-age=31536000, immutable" : "public, no-cache",
    etag,
  };
  if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  return new Response(state.json, { headers });
}
