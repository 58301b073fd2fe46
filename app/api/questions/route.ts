import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { jsonError } from "@/lib/http/errors";
import { readLimitedJson } from "@/lib/http/limited-json";
import {
  deliverConfirmationSoon,
  publicSubmitOptions,
  QUESTION_BODY_MAX_BYTES,
  rateLimitMessage,
  STORE_FAILED_MESSAGE,
} from "@/lib/questions/public-intake";
import { submitQuestion } from "@/lib/questions/submit";

export const dynamic = "force-dynamic";

const NO_STORE = { "cache-control": "no-store" };

/** A parent's question from any client. Answers with the reference and the asker's own status link, never their details. */
export async function POST(request: Request): Promise<Response> {
  const read = await readLimitedJson(request, QUESTION_BODY_MAX_BYTES);
  if (!read.ok) return read.response;
  let result: Awaited<ReturnType<typeof submitQuestion>>;
  try {
    result = await submitQuestion(db(), read.body, publicSubmitOptions(request.headers, "api"));
  } catch (error) {
    console.error("[ask] storing a question failed:", error instanceof Error ? error.message : error);
    return jsonError(500, STORE_FAILED_MESSAGE);
  }
  if (!result.ok) {
    if (result.reason === "invalid") return NextResponse.json({ errors: result.errors }, { status: 400, headers: NO_STORE });
    return NextResponse.json(
      { error: rateLimitMessage(result.retryAfterSeconds) },
      { status: 429, headers: { ...NO_STORE, "retry-after": String(result.retryAfterSeconds) } },
    );
  }
  deliverConfirmationSoon();
  return NextResponse.json(
    { reference: result.reference, state: result.state, statusUrl: result.statusUrl },
    { status: 201, headers: NO_STORE },
  );
}
