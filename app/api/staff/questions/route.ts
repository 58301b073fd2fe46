import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { validationError } from "@/lib/http/errors";
import { staffRoute } from "@/lib/http/staff-route";
import { listQueue } from "@/lib/questions/desk/queue";
import { queueQuerySchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** The desk's queue: GET /api/staff/questions?state=&school=&topic=&technical=&assignee=&q=&sort=&dir=&page=&pageSize= */
export const GET = staffRoute(STAFF_PAGE_ROLES.desk, async (request, _context, user) => {
  const params = Object.fromEntries(request.nextUrl.searchParams);
  const parsed = queueQuerySchema.safeParse(params);
  if (!parsed.success) return validationError(parsed.error);
  return NextResponse.json(await listQueue(db(), parsed.data, user), { headers: { "Cache-Control": "no-store" } });
});
