import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { jsonError } from "@/lib/http/errors";
import { schoolRoomFigures } from "@/lib/rooms/figures";
import { schoolSlugSchema } from "@/lib/validation/room";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ school: string }> };

/** Public: every room's air and seating figures, unrounded. No personal data. */
export async function GET(_request: Request, { params }: Context): Promise<Response> {
  const slug = schoolSlugSchema.safeParse((await params).school);
  const figures = slug.success ? await schoolRoomFigures(db(), slug.data) : null;
  if (!figures) return jsonError(404, "No school has this short name.");
  return NextResponse.json({ school: figures.school.slug, rooms: figures.rooms });
}
