import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { jsonError } from "@/lib/http/errors";
import { staffRoute } from "@/lib/http/staff-route";
import { parseId, questionJson, type IdContext } from "@/lib/questions/desk/respond";

export const dynamic = "force-dynamic";

export const GET = staffRoute<IdContext>(STAFF_PAGE_ROLES.question, async (_request, { params }, user) => {
  const id = parseId((await params).id);
  if (id === null) return jsonError(404, "No question has this id.");
  return questionJson(id, user);
});
