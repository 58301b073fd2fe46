import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { csvUpload, MB, uploadErrorResponse } from "@/lib/http/upload";
import { staffRoute } from "@/lib/http/staff-route";
import { importRoomsCsv } from "@/lib/rooms/import";
import { revalidateSchoolAir } from "@/lib/rooms/publish";

export const dynamic = "force-dynamic";

const MAX_BYTES = 5 * MB;

/**
 * POST a rooms CSV as multipart field `file`. `?dryRun=1` checks it and answers the
 * preview; otherwise a file whose every row is good is saved in one transaction.
 * 200 with the preview or the result; 422 with the same body when a row or the file
 * is wrong (nothing saved).
 */
export const POST = staffRoute(STAFF_PAGE_ROLES.rooms, async (request, _context, actor) => {
  const dryRun = ["1", "true"].includes(request.nextUrl.searchParams.get("dryRun") ?? "");
  const upload = await csvUpload(request, MAX_BYTES);
  if (!upload.ok) return upload.response;
  try {
    const result = await importRoomsCsv(db(), upload.batches, { dryRun, actorId: actor.id });
    if (result.saved) for (const school of result.schools) revalidateSchoolAir(school);
    return NextResponse.json({ fileName: upload.fileName, dryRun, ...result }, { status: result.ok ? 200 : 422 });
  } catch (error) {
    const response = uploadErrorResponse(error);
    if (response) return response;
    throw error;
  }
});
