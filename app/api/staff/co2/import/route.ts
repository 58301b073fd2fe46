import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { importCo2Csv } from "@/lib/co2/import";
import { csvUpload, MB, uploadErrorResponse } from "@/lib/http/upload";
import { staffRoute } from "@/lib/http/staff-route";
import { revalidateSchoolAir } from "@/lib/rooms/publish";

export const dynamic = "force-dynamic";
// A large sensor log takes a while to stream in and store.
export const maxDuration = 300;

const MAX_BYTES = 200 * MB;

/**
 * POST a CO2 log (school,room,timestamp,co2_ppm) as multipart field `file`. The body
 * is read as a stream; nothing is saved unless every row is good. Readings already
 * stored for the same room and instant are ignored; the daily figures of the
 * room-days in the file are recomputed. 200 with counts; 422 with row errors.
 */
export const POST = staffRoute(STAFF_PAGE_ROLES.readings, async (request, _context, actor) => {
  const upload = await csvUpload(request, MAX_BYTES);
  if (!upload.ok) return upload.response;
  try {
    const result = await importCo2Csv(db(), upload.batches, { fileName: upload.fileName, actorId: actor.id });
    for (const school of result.schools) revalidateSchoolAir(school);
    return NextResponse.json({ fileName: upload.fileName, ...result }, { status: result.ok ? 200 : 422 });
  } catch (error) {
    const response = uploadErrorResponse(error);
    if (response) return response;
    throw error;
  }
});
