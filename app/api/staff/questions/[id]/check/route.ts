import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { requestCheck } from "@/lib/questions/desk/workflow";

export const dynamic = "force-dynamic";

/** Sends the saved answer to facilities for a check; facilities get an e-mail. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, act: (id, _input, options) => requestCheck(db(), id, user, options) }),
);
