import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { createStaffAccount, listStaffAccounts, StaffAccountError } from "@/lib/staff/accounts";
import { newStaffAccountSchema } from "@/lib/validation/staff-account";

export const dynamic = "force-dynamic";

export const GET = staffRoute(["admin"], async () => NextResponse.json({ users: await listStaffAccounts(db()) }));

export const POST = staffRoute(["admin"], async (request, _context, actor) => {
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = newStaffAccountSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  try {
    const user = await createStaffAccount(db(), parsed.data, actor.id);
    return NextResponse.json({ user }, { status: 201 });
  } catch (error) {
    if (error instanceof StaffAccountError && error.code === "email_taken") {
      return NextResponse.json({ errors: { email: error.message } }, { status: 409 });
    }
    throw error;
  }
});

