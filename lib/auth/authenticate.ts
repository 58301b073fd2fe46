import type { DB } from "@/db/connection";
import type { Role } from "@/db/types";
import { randomBytes } from "node:crypto";
import { hashPassword, verifyPassword } from "./password";

export interface StaffUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

// Verifying against a real hash when the account is unknown keeps the answer time the same,
// so sign-in cannot be used to learn which staff e-mail addresses exist.
let dummyHash: Promise<string> | undefined;
function unknownAccountHash(): Promise<string> {
  dummyHash ??= hashPassword(randomBytes(24).toString("base64url"));
  return dummyHash;
}

/** The account for an e-mail and password, or null; a disabled account never signs in. */
export async function authenticateStaff(db: DB, email: string, password: string): Promise<StaffUser | null> {
  const user = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role", "password_hash", "disabled_at"])
    .where("email", "=", email.trim().toLowerCase())
    .executeTakeFirst();
  const ok = await verifyPassword(user?.password_hash ?? (await unknownAccountHash()), password);
  if (!user || !ok || user.disabled_at) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

/** The live account behind a session: role changes and disabling take effect on the next request. */
export async function activeStaffById(db: DB, id: number): Promise<StaffUser | null> {
  const user = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role"])
    .where("id", "=", id)
    .where("disabled_at", "is", null)
    .executeTakeFirst();
  return user ?? null;
}
