import { NextResponse } from "next/server";
import type { ZodError } from "zod";
import { fieldErrors } from "@/lib/validation/field-errors";

export { fieldErrors };

export function jsonError(status: number, message: string, extra?: Record<string, unknown>): NextResponse {
  return NextResponse.json({ error: message, ...extra }, { status });
}

export function validationError(error: ZodError): NextResponse {
  return NextResponse.json({ errors: fieldErrors(error) }, { status: 400 });
}
