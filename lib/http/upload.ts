import "server-only";
import type { CsvRecord } from "@/lib/csv/parse";
import { csvRecordBatches } from "@/lib/csv/parse";
import { jsonError } from "./errors";
import { readMultipartFile, UploadError } from "./multipart";

export const MB = 1_048_576;

/**
 * The CSV in a multipart upload's `file` field, as batches of records read while the
 * body streams in. A failure before the file starts becomes a JSON error response.
 */
export async function csvUpload(
  request: Request,
  maxBytes: number,
): Promise<{ ok: true; fileName: string; batches: AsyncIterable<CsvRecord[]> } | { ok: false; response: Response }> {
  try {
    const file = await readMultipartFile(request, "file", maxBytes);
    return { ok: true, fileName: file.filename, batches: csvRecordBatches(file.body) };
  } catch (error) {
    if (error instanceof UploadError) return { ok: false, response: jsonError(error.status, error.message) };
    throw error;
  }
}

/** An UploadError raised while the file streams (too large, cut off) as a JSON response, or null. */
export function uploadErrorResponse(error: unknown): Response | null {
  return error instanceof UploadError ? jsonError(error.status, error.message) : null;
}
