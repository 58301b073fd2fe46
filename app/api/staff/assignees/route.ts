import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { listAssignees } from "@/lib/questions/desk/detail";

export const dynamic = "force-dynamic";

/** Who a question can be assigned to: active communications staff and administrators. */
export const GET = staffRoute(STAFF_PAGE_ROLES.desk, async () => NextResponse.json({ staff: await listAssignees(db()) }));
