import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { getSnippet, listSnippets } from "@/lib/questions/desk/detail";
import { createSnippet } from "@/lib/questions/desk/workflow";
import { snippetSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

export const GET = staffRoute(STAFF_PAGE_ROLES.snippets, async () => NextResponse.json({ snippets: await listSnippets(db()) }));

export const POST = staffRoute(STAFF_PAGE_ROLES.snippets, async (request, _context, user) => {
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = snippetSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  const id = await createSnippet(db(), parsed.data, user);
  return NextResponse.json({ snippet: await getSnippet(db(), id) }, { status: 201 });
});
