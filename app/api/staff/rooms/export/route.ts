import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { jsonError } from "@/lib/http/errors";
import { staffRoute } from "@/lib/http/staff-route";
import { roomCsvHeaderLine, roomCsvLine } from "@/lib/rooms/csv";
import { listRooms } from "@/lib/rooms/repository";
import { getSchoolBySlug } from "@/lib/schools/repository";
import { schoolSlugSchema } from "@/lib/validation/room";

export const dynamic = "force-dynamic";

/** GET ?school=<slug> (or no school, or school=all, for every school): the rooms CSV in US units. */
export const GET = staffRoute(STAFF_PAGE_ROLES.rooms, async (request) => {
  const param = request.nextUrl.searchParams.get("school");
  let slug: string | undefined;
  if (param && param !== "all") {
    const parsed = schoolSlugSchema.safeParse(param);
    const school = parsed.success ? await getSchoolBySlug(db(), parsed.data) : null;
    if (!school) return jsonError(404, "No school has this short name.");
    slug = school.slug;
  }
  const rooms = await listRooms(db(), slug);
  const body = roomCsvHeaderLine() + rooms.map((room) => roomCsvLine(room)).join("");
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="rooms-${slug ?? "all"}.csv"`,
      "cache-control": "no-store",
    },
  });
});
