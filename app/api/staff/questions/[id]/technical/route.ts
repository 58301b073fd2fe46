import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { setTechnical } from "@/lib/questions/desk/workflow";
import { technicalSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Marks a question as needing a facilities check (or not, unless its topic always does). */
export const PUT = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, schema: technicalSchema, act: (id, input, options) => setTechnical(db(), id, input.technical, user, options) }),
);
