import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { fieldErrors } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { revalidateSchoolAir } from "@/lib/rooms/publish";
import { createRoom, RoomNameTakenError } from "@/lib/rooms/repository";
import { getSchoolBySlug } from "@/lib/schools/repository";
import { roomInputSchema, schoolSlugSchema } from "@/lib/validation/room";

export const dynamic = "force-dynamic";

/** POST { school, name, use, units, length, width, … }: adds a room; 201 { room }. */
export const POST = staffRoute(STAFF_PAGE_ROLES.rooms, async (request, _context, actor) => {
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const body = (read.body ?? {}) as Record<string, unknown>;
  const school = schoolSlugSchema.safeParse(body.school);
  const found = school.success ? await getSchoolBySlug(db(), school.data) : null;
  const parsed = roomInputSchema.safeParse(body);
  if (!found || !parsed.success) {
    const errors = parsed.success ? {} : fieldErrors(parsed.error);
    if (!found) errors.school = "Choose a school.";
    return NextResponse.json({ errors }, { status: 400 });
  }
  try {
    const room = await createRoom(db(), found.id, parsed.data, actor.id);
    revalidateSchoolAir(found.slug);
    return NextResponse.json({ room }, { status: 201 });
  } catch (error) {
    if (error instanceof RoomNameTakenError) return NextResponse.json({ errors: { name: error.message } }, { status: 409 });
    throw error;
  }
});
