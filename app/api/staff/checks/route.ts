import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { listChecks } from "@/lib/questions/desk/detail";

export const dynamic = "force-dynamic";

/** Technical answers waiting for a facilities check, oldest request first. */
export const GET = staffRoute(STAFF_PAGE_ROLES.check, async () =>
  NextResponse.json({ items: await listChecks(db()) }, { headers: { "Cache-Control": "no-store" } }),
);
