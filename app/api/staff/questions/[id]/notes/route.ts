import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { staffRoute } from "@/lib/http/staff-route";
import { deskStep, type IdContext } from "@/lib/questions/desk/respond";
import { addNote } from "@/lib/questions/desk/workflow";
import { noteSchema } from "@/lib/validation/desk";

export const dynamic = "force-dynamic";

/** An internal note: staff only, never sent or published. */
export const POST = staffRoute<IdContext>(STAFF_PAGE_ROLES.question, (request, context, user) =>
  deskStep({ request, context, user, schema: noteSchema, act: (id, input, options) => addNote(db(), id, input.body, user, options) }),
);
