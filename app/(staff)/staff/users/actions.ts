"use server";

import { revalidatePath } from "next/cache";
import { db } from "@/db/client";
import { AuthorizationError, requireRole } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { fieldErrors } from "@/lib/http/errors";
import { createStaffAccount, StaffAccountError, updateStaffAccount } from "@/lib/staff/accounts";
import { newStaffAccountSchema, staffAccountUpdateSchema, staffIdSchema } from "@/lib/validation/staff-account";

export interface ActionResult {
  ok: boolean;
  message: string;
  errors?: Record<string, string>;
}

function refusal(error: unknown): ActionResult {
  if (error instanceof AuthorizationError || error instanceof StaffAccountError) {
    const field = error instanceof StaffAccountError ? error.field : undefined;
    return { ok: false, message: error.message, errors: field ? { [field]: error.message } : undefined };
  }
  throw error;
}

export async function createAccountAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.users);
    const parsed = newStaffAccountSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "Check the fields marked below.", errors: fieldErrors(parsed.error) };
    const account = await createStaffAccount(db(), parsed.data, actor.id);
    revalidatePath("/staff/users");
    return { ok: true, message: `Account for ${account.name} created. Give them their first password in person.` };
  } catch (error) {
    return refusal(error);
  }
}

export async function updateAccountAction(_previous: ActionResult | null, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.users);
    const id = staffIdSchema.safeParse(form.get("id"));
    if (!id.success) return { ok: false, message: "That account no longer exists." };
    const change = staffAccountUpdateSchema.safeParse({
      role: form.get("role") ?? undefined,
      disabled: form.has("disabled") ? form.get("disabled") === "true" : undefined,
    });
    if (!change.success) return { ok: false, message: change.error.issues[0]?.message ?? "Nothing to change." };
    const account = await updateStaffAccount(db(), id.data, change.data, actor.id);
    revalidatePath("/staff/users");
    return { ok: true, message: `${account.name}: saved.` };
  } catch (error) {
    return refusal(error);
  }
}
