import { db } from "@/db/client";
import { revalidatePublishedAnswers } from "@/lib/answers/publish";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { publishAnswer } from "@/lib/questions/desk/workflow";
import { publishSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** Publishes the public version (question rewritten by staff, the answer as sent or approved) on the answers page. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({
    request,
    context,
    user,
    schema: publishSchema,
    act: async (id, input, options) => {
      const answerId = await publishAnswer(db(), id, input, user, options);
      revalidatePublishedAnswers(answerId);
      return { answerId };
    },
  }),
);
