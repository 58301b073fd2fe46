import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { jsonError, validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { StaffAccountError, updateStaffAccount } from "@/lib/staff/accounts";
import { staffAccountUpdateSchema, staffIdSchema } from "@/lib/validation/staff-account";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

const STATUS: Record<StaffAccountError["code"], number> = { not_found: 404, email_taken: 409, last_admin: 409, self: 409 };

export const PATCH = staffRoute<Context>(["admin"], async (request, { params }, actor) => {
  const id = staffIdSchema.safeParse((await params).id);
  if (!id.success) return jsonError(404, "No staff account has this id.");
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = staffAccountUpdateSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  try {
    return NextResponse.json({ user: await updateStaffAccount(db(), id.data, parsed.data, actor.id) });
  } catch (error) {
    if (error instanceof StaffAccountError) return jsonError(STATUS[error.code], error.message, { code: error.code });
    throw error;
  }
});
