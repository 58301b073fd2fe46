import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { jsonError, validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { getSnippet } from "@/lib/questions/desk/detail";
import { parseId, type IdContext } from "@/lib/questions/desk/respond";
import { deleteSnippet, updateSnippet } from "@/lib/questions/desk/workflow";
import { snippetSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

const NO_SNIPPET = "No reply snippet has this id.";

export const PATCH = staffRoute<IdContext>(STAFF_PAGE_ROLES.snippets, async (request, { params }, user) => {
  const id = parseId((await params).id);
  if (id === null) return jsonError(404, NO_SNIPPET);
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = snippetSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  if (!(await updateSnippet(db(), id, parsed.data, user))) return jsonError(404, NO_SNIPPET);
  return NextResponse.json({ snippet: await getSnippet(db(), id) });
});

export const DELETE = staffRoute<IdContext>(STAFF_PAGE_ROLES.snippets, async (_request, { params }) => {
  const id = parseId((await params).id);
  if (id === null || !(await deleteSnippet(db(), id))) return jsonError(404, NO_SNIPPET);
  return new NextResponse(null, { status: 204 });
});
