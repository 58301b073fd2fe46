import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { mergeQuestion } from "@/lib/questions/desk/workflow";
import { mergeSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Joins this question to another open one, whose reply then answers both askers. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, schema: mergeSchema, act: (id, input, options) => mergeQuestion(db(), id, input, user, options) }),
);
