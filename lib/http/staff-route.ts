import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import type { Role } from "@/db/types";
import { AuthorizationError, requireRole, type StaffUser } from "@/lib/auth/guard";
import { env } from "@/lib/env";
import { jsonError } from "./errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A state-changing request must come from our own pages: a cross-site form or
 * script carrying the staff cookie is refused before any work is done.
 */
export function sameOrigin(request: Request): boolean {
  if (SAFE_METHODS.has(request.method)) return true;
  const origin = request.headers.get("origin");
  if (!origin) return request.headers.get("sec-fetch-site") !== "cross-site";
  const allowed = new Set([new URL(env().APP_URL).origin]);
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  if (host) allowed.add(`${new URL(request.url).protocol}//${host}`);
  return allowed.has(origin);
}

type Handler<C> = (request: NextRequest, context: C, user: StaffUser) => Promise<Response>;

/** Wraps a staff route handler: Origin check, then the role check, then the handler. */
export function staffRoute<C>(roles: readonly Role[], handler: Handler<C>) {
  return async (request: NextRequest, context: C): Promise<Response> => {
    if (!sameOrigin(request)) return jsonError(403, "This request did not come from a Clearhall page.");
    let user: StaffUser;
    try {
      user = await requireRole(roles);
    } catch (error) {
      if (error instanceof AuthorizationError) return jsonError(error.status, error.message);
      throw error;
    }
    return handler(request, context, user);
  };
}

export async function readJson(request: Request): Promise<{ ok: true; body: unknown } | { ok: false; response: NextResponse }> {
  if (!request.headers.get("content-type")?.toLowerCase().startsWith("application/json")) {
    return { ok: false, response: jsonError(415, "Send the body as application/json.") };
  }
  try {
    return { ok: true, body: await request.json() };
  } catch {
    return { ok: false, response: jsonError(400, "The body is not valid JSON.") };
  }
}
