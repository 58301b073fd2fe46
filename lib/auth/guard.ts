import "server-only";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { db } from "@/db/client";
import type { Role } from "@/db/types";
import { activeStaffById, type StaffUser } from "./authenticate";
import { authOptions } from "./options";

export type { StaffUser };

export class AuthorizationError extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
  ) {
    super(message);
    this.name = "AuthorizationError";
  }
}

/** The signed-in, still-active staff member, or null. */
export async function currentStaff(): Promise<StaffUser | null> {
  const session = await getServerSession(authOptions());
  const id = Number(session?.user?.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  return activeStaffById(db(), id);
}

/**
 * The one role check. Every staff route handler and server action calls it;
 * it throws 401 without a session and 403 for a role not in `roles`.
 */
export async function requireRole(roles: readonly Role[]): Promise<StaffUser> {
  const user = await currentStaff();
  if (!user) throw new AuthorizationError(401, "Sign in with a staff account to do this.");
  if (!roles.includes(user.role)) throw new AuthorizationError(403, "Your role does not allow this.");
  return user;
}

/** requireRole for pages: no session goes to sign-in and comes back; a wrong role sees why. */
export async function requireStaffPage(roles: readonly Role[], path: string): Promise<StaffUser> {
  const user = await currentStaff();
  if (!user) redirect(`/signin?callbackUrl=${encodeURIComponent(path)}`);
  if (!roles.includes(user.role)) redirect(`/staff/not-allowed?from=${encodeURIComponent(path)}`);
  return user;
}
