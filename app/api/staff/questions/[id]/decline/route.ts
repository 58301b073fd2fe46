import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { declineQuestion } from "@/lib/questions/desk/workflow";
import { declineSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Declines with a reason; the asker is told politely by e-mail. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, schema: declineSchema, act: (id, input, options) => declineQuestion(db(), id, input, user, options) }),
);
