import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { jsonError, validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { revalidateSchoolAir } from "@/lib/rooms/publish";
import { deleteRoom, getRoom, RoomNameTakenError, updateRoom } from "@/lib/rooms/repository";
import { roomIdSchema, roomInputSchema } from "@/lib/validation/room";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

async function find(params: Context["params"]) {
  const id = roomIdSchema.safeParse((await params).id);
  return id.success ? getRoom(db(), id.data) : null;
}

export const GET = staffRoute<Context>(STAFF_PAGE_ROLES.rooms, async (_request, { params }) => {
  const room = await find(params);
  return room ? NextResponse.json({ room }) : jsonError(404, "No room has this id.");
});

/** PATCH the whole room: { name, use, units, length, width, ceiling, occupancy, outdoorAir, airCleaners, cadrEach, merv, windowsOpen }. */
export const PATCH = staffRoute<Context>(STAFF_PAGE_ROLES.rooms, async (request, { params }, actor) => {
  const room = await find(params);
  if (!room) return jsonError(404, "No room has this id.");
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = roomInputSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  try {
    const updated = await updateRoom(db(), room.id, parsed.data, actor.id);
    revalidateSchoolAir(room.schoolSlug);
    return NextResponse.json({ room: updated });
  } catch (error) {
    if (error instanceof RoomNameTakenError) return NextResponse.json({ errors: { name: error.message } }, { status: 409 });
    throw error;
  }
});

/** DELETE the room with its CO2 readings and day summaries; answers what was removed. */
export const DELETE = staffRoute<Context>(STAFF_PAGE_ROLES.rooms, async (_request, { params }) => {
  const id = roomIdSchema.safeParse((await params).id);
  const removed = id.success ? await deleteRoom(db(), id.data) : null;
  if (!removed) return jsonError(404, "No room has this id.");
  revalidateSchoolAir(removed.schoolSlug);
  return NextResponse.json({ removed });
});
