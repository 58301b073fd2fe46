import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { assignQuestion } from "@/lib/questions/desk/workflow";
import { assignSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Assigns the question to someone who answers questions, or to nobody (assigneeId: null). */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, schema: assignSchema, act: (id, input, options) => assignQuestion(db(), id, input.assigneeId, user, options) }),
);
