import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { saveDraft } from "@/lib/questions/desk/workflow";
import { draftSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Saves a new revision of the answer; answers with the personal-detail warnings found in it. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, schema: draftSchema, act: async (id, input, options) => ({ ...(await saveDraft(db(), id, input, user, options)) }) }),
);
