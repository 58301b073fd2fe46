import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { sendReply } from "@/lib/questions/desk/workflow";

export const dynamic = "force-dynamic";

/** Sends the reply to the asker and every joined asker through the outbox; refused for an unapproved technical answer. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({ request, context, user, act: async (id, _input, options) => ({ ...(await sendReply(db(), id, user, options)) }) }),
);
