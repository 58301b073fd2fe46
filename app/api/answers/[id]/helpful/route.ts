import { NextResponse, type NextRequest } from "next/server";
import { db } from "@/db/client";
import { answerPath } from "@/lib/answers/repository";
import { readVote } from "@/lib/answers/vote-input";
import { newVoterToken, recordVote, VOTER_COOKIE, VOTER_COOKIE_MAX_AGE, voterHash } from "@/lib/answers/votes";
import { env } from "@/lib/env";
import { jsonError } from "@/lib/http/errors";
import { sameOrigin } from "@/lib/http/staff-route";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

/**
 * POST /api/answers/<id>/helpful — "was this helpful?". One vote per browser, kept by a
 * random id in an httpOnly cookie (stored hashed); voting again changes the vote. A form post
 * (no JavaScript) is sent back to the answer's page; JSON gets the new counts.
 */
export async function POST(request: NextRequest, context: Context): Promise<Response> {
  if (!sameOrigin(request)) return jsonError(403, "This request did not come from a Clearhall page.");
  const { id } = await context.params;
  if (!/^[1-9]\d{0,9}$/.test(id)) return jsonError(404, "There is no published answer with this number.");
  const answerId = Number(id);
  const input = await readVote(request);
  if (!input.ok) return jsonError(input.status, input.message);

  const known = voterHash(request.cookies.get(VOTER_COOKIE)?.value);
  const token = known ? null : newVoterToken();
  const recorded = await recordVote(db(), answerId, known ?? voterHash(token)!, input.vote);
  if (!recorded) return jsonError(404, "There is no published answer with this number.");

  const response =
    input.via === "json"
      ? NextResponse.json({ helpful: recorded.counts.helpful, notHelpful: recorded.counts.notHelpful, vote: recorded.vote }, { headers: { "cache-control": "no-store" } })
      : new NextResponse(null, { status: 303, headers: { location: `${answerPath(answerId)}#helpful`, "cache-control": "no-store" } });
  if (token) {
    response.cookies.set(VOTER_COOKIE, token, {
      httpOnly: true,
      sameSite: "lax",
      secure: env().APP_URL.startsWith("https:"),
      path: "/",
      maxAge: VOTER_COOKIE_MAX_AGE,
    });
  }
  return response;
}
