import { NextResponse } from "next/server";
import type { ZodError } from "zod";

/** `{ errors: { field: message } }`, the first message per field. */
export function fieldErrors(error: ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    out[key] ??= issue.message;
  }
  return out;
}

export function jsonError(status: number, message: string, extra?: Record<string, unknown>): NextResponse {
  return NextResponse.json({ error: message, ...extra }, { status });
}

export function validationError(error: ZodError): NextResponse {
  return NextResponse.json({ errors: fieldErrors(error) }, { status: 400 });
}
