import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import type { ZodType } from "zod";
import { db } from "@/db/client";
import type { StaffUser } from "@/lib/auth/authenticate";
import { env } from "@/lib/env";
import { jsonError, validationError } from "@/lib/http/errors";
import { readJson } from "@/lib/http/staff-route";
import { getQuestionDetail } from "./detail";
import { DeskError } from "./errors";
import type { DeskOptions } from "./workflow";

export type IdContext = { params: Promise<{ id: string }> };

/** A positive id from the URL, or null (answered as 404). */
export function parseId(raw: string): number | null {
  return /^\d{1,9}$/.test(raw) && Number(raw) > 0 ? Number(raw) : null;
}

export function deskErrorResponse(error: DeskError): NextResponse {
  if (error.fields) return NextResponse.json({ error: error.message, errors: error.fields }, { status: error.status });
  return jsonError(error.status, error.message, error.code ? { code: error.code } : undefined);
}

export async function questionJson(id: number, user: StaffUser, extra: Record<string, unknown> = {}, status = 200): Promise<NextResponse> {
  const question = await getQuestionDetail(db(), id, user);
  if (!question) return jsonError(404, "No question has this id.");
  return NextResponse.json({ question, ...extra }, { status });
}

interface StepArgs<T> {
  request: NextRequest;
  context: IdContext;
  user: StaffUser;
  /** The body's schema; without one the step takes no body. */
  schema?: ZodType<T>;
  act: (id: number, input: T, options: DeskOptions) => Promise<Record<string, unknown> | void>;
  /** The question whose detail is answered; defaults to the id in the URL. */
  answerWith?: (id: number, result: Record<string, unknown> | void) => number | null;
}

/**
 * One desk step as a route handler: the id, the body checked against the step's schema (400 with
 * field messages), the step itself (its DeskError as 404/409), then the question as it is now.
 */
export async function deskStep<T>({ request, context, user, schema, act, answerWith }: StepArgs<T>): Promise<Response> {
  const id = parseId((await context.params).id);
  if (id === null) return jsonError(404, "No question has this id.");
  let input = undefined as T;
  if (schema) {
    const read = await readJson(request);
    if (!read.ok) return read.response;
    const parsed = schema.safeParse(read.body);
    if (!parsed.success) return validationError(parsed.error);
    input = parsed.data;
  }
  let result: Record<string, unknown> | void;
  try {
    result = await act(id, input, { appUrl: env().APP_URL });
  } catch (error) {
    if (error instanceof DeskError) return deskErrorResponse(error);
    throw error;
  }
  const questionId = answerWith ? answerWith(id, result) : id;
  if (questionId === null) return NextResponse.json({ question: null, ...(result ?? {}) });
  return questionJson(questionId, user, result ?? {});
}
