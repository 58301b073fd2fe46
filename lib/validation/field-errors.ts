import type { ZodError } from "zod";

/** `{ field: message }`, the first message per field; issues about the whole input go under `_form`. */
export function fieldErrors(error: ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    out[key] ??= issue.message;
  }
  return out;
}
