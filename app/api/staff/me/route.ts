import { NextResponse } from "next/server";
import { ROLES } from "@/db/types";
import { staffRoute } from "@/lib/http/staff-route";

export const dynamic = "force-dynamic";

/** Who is signed in, for scripts and the staff pages' client code. */
export const GET = staffRoute(ROLES, async (_request, _context, user) => NextResponse.json({ user }));
