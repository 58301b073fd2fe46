import { db } from "@/db/client";
import { revalidatePublishedAnswers } from "@/lib/answers/publish";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { unpublishAnswer } from "@/lib/questions/desk/workflow";

export const dynamic = "force-dynamic";

/** Takes a published answer (this id is the published answer's) off the answers page; logged. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.desk, (request, context, user) =>
  deskStep({
    request,
    context,
    user,
    act: async (answerId, _input, options) => {
      const { questionId } = await unpublishAnswer(db(), answerId, user, options);
      revalidatePublishedAnswers(answerId);
      return { answerId, questionId };
    },
    answerWith: (_answerId, result) => (typeof result?.questionId === "number" ? result.questionId : null),
  }),
);
