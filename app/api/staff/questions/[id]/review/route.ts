import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { reviewAnswer } from "@/lib/questions/desk/workflow";
import { reviewSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Facilities approve the answer, or send it back with a comment. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.check, (request, context, user) =>
  deskStep({ request, context, user, schema: reviewSchema, act: (id, input, options) => reviewAnswer(db(), id, input, user, options) }),
);
