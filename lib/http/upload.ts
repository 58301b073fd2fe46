import "server-only";
import type { CsvRecord } from "@/lib/csv/parse";
import { csvRecordBatches } from "@/lib/csv/parse";
import { jsonError } from "./errors";
import { readMultipartFile, UploadError } from "./multipart";

export const MB = 1_048_576;

const SAVE_AS_CSV = "Open it in your spreadsheet program, choose Save As (or Download) and “CSV UTF-8”, then upload that file.";

/** Files people pick by mistake, by their first bytes (the formats' published signatures). */
const SIGNATURES: { bytes: number[]; kind: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], kind: "a spreadsheet or other zipped file (.xlsx, .ods, .zip)" },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], kind: "an older Excel (.xls) or Word file" },
  { bytes: [0x25, 0x50, 0x44, 0x46], kind: "a PDF document" },
  { bytes: [0x89, 0x50, 0x4e, 0x47], kind: "a PNG picture" },
  { bytes: [0xff, 0xd8, 0xff], kind: "a JPEG picture" },
  { bytes: [0x47, 0x49, 0x46, 0x38], kind: "a GIF picture" },
  { bytes: [0xff, 0xfe], kind: "UTF-16 text" },
  { bytes: [0xfe, 0xff], kind: "UTF-16 text" },
];

/**
 * Why the start of an upload cannot be CSV text, or null when it may be. The type a browser
 * declares is not used: Windows sends a .csv as application/vnd.ms-excel, and any name can be given.
 */
export function notCsvReason(head: Uint8Array, fileName: string): string | null {
  const name = fileName ? `“${fileName}”` : "This file";
  const match = SIGNATURES.find((s) => s.bytes.length <= head.length && s.bytes.every((b, i) => head[i] === b));
  if (match) return `${name} is ${match.kind}, not a CSV file. ${SAVE_AS_CSV}`;
  if (head.includes(0)) return `${name} is not a text file, so it cannot be CSV. ${SAVE_AS_CSV}`;
  try {
    // stream: true, so a character cut off at the end of the sample is not counted against it.
    new TextDecoder("utf-8", { fatal: true }).decode(head, { stream: true });
  } catch {
    return `${name} is not UTF-8 text (perhaps it was saved as CSV in an older encoding). ${SAVE_AS_CSV}`;
  }
  return null;
}

const SNIFF_BYTES = 4_096;

/** Reads the first bytes of `body` to check them, then hands on the whole stream unchanged. */
async function checkedCsvBody(body: AsyncIterable<Uint8Array>, fileName: string): Promise<AsyncIterable<Uint8Array>> {
  const source = body[Symbol.asyncIterator]();
  const head: Uint8Array[] = [];
  let size = 0;
  let done = false;
  while (size < SNIFF_BYTES) {
    const next = await source.next();
    if (next.done) {
      done = true;
      break;
    }
    head.push(next.value);
    size += next.value.byteLength;
  }
  const sample = Buffer.concat(head);
  const reason = notCsvReason(sample.subarray(0, SNIFF_BYTES), fileName);
  if (reason) {
    await source.return?.(undefined);
    throw new UploadError(415, reason);
  }
  return (async function* () {
    yield* head;
    if (done) return;
    for (;;) {
      const next = await source.next();
      if (next.done) return;
      yield next.value;
    }
  })();
}

/**
 * The CSV in a multipart upload's `file` field, as batches of records read while the
 * body streams in. A failure before the file starts (not multipart, too large, not CSV
 * text by its first bytes) becomes a JSON error response.
 */
export async function csvUpload(
  request: Request,
  maxBytes: number,
): Promise<{ ok: true; fileName: string; batches: AsyncIterable<CsvRecord[]> } | { ok: false; response: Response }> {
  try {
    const file = await readMultipartFile(request, "file", maxBytes);
    const body = await checkedCsvBody(file.body, file.filename);
    return { ok: true, fileName: file.filename, batches: csvRecordBatches(body) };
  } catch (error) {
    if (error instanceof UploadError) return { ok: false, response: jsonError(error.status, error.message) };
    throw error;
  }
}

/** An UploadError raised while the file streams (too large, cut off) as a JSON response, or null. */
export function uploadErrorResponse(error: unknown): Response | null {
  return error instanceof UploadError ? jsonError(error.status, error.message) : null;
}
