import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seed } from "@/db/seed";
import { authenticateStaff } from "@/lib/auth/authenticate";
import { createStaffAccount, StaffAccountError, updateStaffAccount } from "@/lib/staff/accounts";
import { newStaffAccountSchema } from "@/lib/validation/staff-account";
import { createTestDb, type TestDb } from "../support/test-db";

let t: TestDb;
let adminId: number;
beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  adminId = (await t.db.selectFrom("users").select("id").where("role", "=", "admin").executeTakeFirstOrThrow()).id;
});
afterAll(async () => t.cleanup());

const account = (email: string, role: "communications" | "facilities" | "admin" = "facilities") =>
  newStaffAccountSchema.parse({ name: "Rowan Tessaly", email, role, password: "first-password-123" });

describe("staff sign-in", () => {
  it("accepts the demo password, ignores e-mail case and refuses a wrong password", async () => {
    expect(await authenticateStaff(t.db, "Comms@Example.org", "clearhall-demo")).toMatchObject({ role: "communications" });
    expect(await authenticateStaff(t.db, "comms@example.org", "clearhall-dem0")).toBeNull();
    expect(await authenticateStaff(t.db, "nobody@example.org", "clearhall-demo")).toBeNull();
  });

  it("stores passwords as argon2id hashes, never as given", async () => {
    const row = await t.db.selectFrom("users").select("password_hash").where("email", "=", "comms@example.org").executeTakeFirstOrThrow();
    expect(row.password_hash).toMatch(/^\$argon2id\$/);
    expect(row.password_hash).not.toContain("clearhall-demo");
  });

  it("refuses a disabled account even with the right password, and lets it back in when enabled", async () => {
    const created = await createStaffAccount(t.db, account("rowan.t@example.org"), adminId);
    expect(await authenticateStaff(t.db, created.email, "first-password-123")).not.toBeNull();
    await updateStaffAccount(t.db, created.id, { disabled: true }, adminId);
    expect(await authenticateStaff(t.db, created.email, "first-password-123")).toBeNull();
    await updateStaffAccount(t.db, created.id, { disabled: false }, adminId);
    expect(await authenticateStaff(t.db, created.email, "first-password-123")).not.toBeNull();
  });
});

describe("staff accounts", () => {
  it("refuses a second account with the same e-mail and writes nothing", async () => {
    const before = await t.db.selectFrom("users").select("id").execute();
    await expect(createStaffAccount(t.db, account("COMMS@example.org"), adminId)).rejects.toMatchObject({ code: "email_taken" });
    expect(await t.db.selectFrom("users").select("id").execute()).toHaveLength(before.length);
  });

  it("records who changed a role", async () => {
    const created = await createStaffAccount(t.db, account("role.change@example.org"), adminId);
    await updateStaffAccount(t.db, created.id, { role: "communications" }, adminId);
    const events = await t.db.selectFrom("staff_events").selectAll().where("subject_user_id", "=", created.id).orderBy("id").execute();
    expect(events.map((e) => e.kind)).toEqual(["account_created", "role_changed"]);
    expect(events[1]).toMatchObject({ actor_id: adminId, detail: JSON.stringify({ from: "facilities", to: "communications" }) });
  });

  it("never leaves the district without an active administrator", async () => {
    const second = await createStaffAccount(t.db, account("second.admin@example.org", "admin"), adminId);
    // An admin cannot remove their own access.
    await expect(updateStaffAccount(t.db, adminId, { disabled: true }, adminId)).rejects.toMatchObject({ code: "self" });
    // Another admin may demote the first while a second remains…
    await updateStaffAccount(t.db, adminId, { role: "communications" }, second.id);
    // …but the last one left cannot be disabled or demoted by anyone.
    const lastAttempt = updateStaffAccount(t.db, second.id, { role: "facilities" }, adminId);
    await expect(lastAttempt).rejects.toBeInstanceOf(StaffAccountError);
    await expect(updateStaffAccount(t.db, second.id, { disabled: true }, adminId)).rejects.toMatchObject({ code: "last_admin" });
    const admins = await t.db.selectFrom("users").select("id").where("role", "=", "admin").where("disabled_at", "is", null).execute();
    expect(admins).toEqual([{ id: second.id }]);
  });
});
