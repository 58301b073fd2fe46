import type { DB } from "@/db/connection";
import type { Role } from "@/db/types";
import { hashPassword } from "@/lib/auth/password";
import type { NewStaffAccount, StaffAccountUpdate } from "@/lib/validation/staff-account";

export interface StaffAccount {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabledAt: string | null;
  createdAt: string;
}

export class StaffAccountError extends Error {
  constructor(
    readonly code: "email_taken" | "not_found" | "last_admin" | "self",
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = "StaffAccountError";
  }
}

export async function listStaffAccounts(db: DB): Promise<StaffAccount[]> {
  const rows = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role", "disabled_at", "created_at"])
    .orderBy("disabled_at", "asc")
    .orderBy("name", "asc")
    .execute();
  return rows.map((r) => ({ id: r.id, email: r.email, name: r.name, role: r.role, disabledAt: r.disabled_at, createdAt: r.created_at }));
}

export async function createStaffAccount(db: DB, input: NewStaffAccount, actorId: number): Promise<StaffAccount> {
  const passwordHash = await hashPassword(input.password);
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const taken = await trx.selectFrom("users").select("id").where("email", "=", input.email).executeTakeFirst();
    if (taken) throw new StaffAccountError("email_taken", "A staff account with this e-mail address already exists.", "email");
    const row = await trx
      .insertInto("users")
      .values({ email: input.email, name: input.name, role: input.role, password_hash: passwordHash, created_at: now, updated_at: now })
      .returning(["id", "email", "name", "role", "disabled_at", "created_at"])
      .executeTakeFirstOrThrow();
    await trx
      .insertInto("staff_events")
      .values({ actor_id: actorId, subject_user_id: row.id, kind: "account_created", detail: JSON.stringify({ role: row.role }), created_at: now })
      .execute();
    return { id: row.id, email: row.email, name: row.name, role: row.role, disabledAt: row.disabled_at, createdAt: row.created_at };
  });
}

/**
 * Changes a role or disables/re-enables an account. Refuses to leave the
 * district without an active administrator, and refuses to let an admin lock
 * themselves out, so the accounts page can always be reached.
 */
export async function updateStaffAccount(db: DB, id: number, change: StaffAccountUpdate, actorId: number): Promise<StaffAccount> {
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const user = await trx.selectFrom("users").selectAll().where("id", "=", id).executeTakeFirst();
    if (!user) throw new StaffAccountError("not_found", "No staff account has this id.");
    const nextRole = change.role ?? user.role;
    const nextDisabled = change.disabled ?? user.disabled_at !== null;
    const losesAdmin = user.role === "admin" && user.disabled_at === null && (nextRole !== "admin" || nextDisabled);
    if (losesAdmin) {
      if (id === actorId) {
        throw new StaffAccountError("self", "You cannot remove your own administrator access. Ask another administrator.");
      }
      const others = await trx
        .selectFrom("users")
        .select((eb) => eb.fn.countAll<number>().as("n"))
        .where("role", "=", "admin")
        .where("disabled_at", "is", null)
        .where("id", "!=", id)
        .executeTakeFirstOrThrow();
      if (Number(others.n) === 0) {
        throw new StaffAccountError("last_admin", "This is the last active administrator. Make someone else an administrator first.");
      }
    }
    const disabledAt = nextDisabled ? (user.disabled_at ?? now) : null;
    const row = await trx
      .updateTable("users")
      .set({ role: nextRole, disabled_at: disabledAt, updated_at: now })
      .where("id", "=", id)
      .returning(["id", "email", "name", "role", "disabled_at", "created_at"])
      .executeTakeFirstOrThrow();
    const events: { kind: string; detail: unknown }[] = [];
    if (nextRole !== user.role) events.push({ kind: "role_changed", detail: { from: user.role, to: nextRole } });
    if (nextDisabled !== (user.disabled_at !== null)) events.push({ kind: nextDisabled ? "account_disabled" : "account_enabled", detail: null });
    for (const e of events) {
      await trx
        .insertInto("staff_events")
        .values({ actor_id: actorId, subject_user_id: id, kind: e.kind, detail: e.detail ? JSON.stringify(e.detail) : null, created_at: now })
        .execute();
    }
    return { id: row.id, email: row.email, name: row.name, role: row.role, disabledAt: row.disabled_at, createdAt: row.created_at };
  });
}
