// A streaming reader for multipart/form-data (RFC 7578) that hands over one file
// field's bytes as they arrive, so an upload of any size is never held in memory.
// Fields other than the wanted one are skipped.

export class UploadError extends Error {
  constructor(
    readonly status: 400 | 413 | 415,
    message: string,
  ) {
    super(message);
    this.name = "UploadError";
  }
}

export interface MultipartFile {
  filename: string;
  contentType: string | null;
  /** The file's bytes, in order; iterate once. */
  body: AsyncIterable<Uint8Array>;
}

const CRLF_CRLF = Buffer.from("\r\n\r\n");
const MAX_HEADER_BYTES = 16 * 1024;

export function multipartBoundary(contentType: string | null): string | null {
  if (!contentType || !/^multipart\/form-data\s*;/i.test(contentType)) return null;
  const match = /;\s*boundary=(?:"([^"]{1,70})"|([^;\s]{1,70}))/i.exec(contentType);
  return match?.[1] ?? match?.[2] ?? null;
}

function headerParam(header: string, name: string): string | null {
  const match = new RegExp(`;\\s*${name}="((?:[^"\\\\]|\\\\.)*)"`, "i").exec(header) ?? new RegExp(`;\\s*${name}=([^;\\s]+)`, "i").exec(header);
  return match?.[1]?.replace(/\\(.)/g, "$1") ?? null;
}

async function* counted(stream: ReadableStream<Uint8Array>, maxBytes: number): AsyncGenerator<Buffer> {
  const reader = stream.getReader();
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return;
      total += value.byteLength;
      if (total > maxBytes) throw new UploadError(413, `The file is larger than ${Math.round(maxBytes / 1_048_576)} MB.`);
      yield Buffer.from(value.buffer, value.byteOffset, value.byteLength);
    }
  } finally {
    // Stop reading what is left when the caller stops early (an error, or the file came first).
    await reader.cancel().catch(() => undefined);
    reader.releaseLock();
  }
}

/**
 * Finds the file field `field` in a multipart body and returns its bytes as a stream.
 * Throws UploadError (415 not multipart, 400 malformed or no such field, 413 too large).
 */
export async function readMultipartFile(
  request: { headers: Headers; body: ReadableStream<Uint8Array> | null },
  field: string,
  maxBytes: number,
): Promise<MultipartFile> {
  const boundary = multipartBoundary(request.headers.get("content-type"));
  if (!boundary) throw new UploadError(415, "Send the file as multipart/form-data, in a field named “file”.");
  const declared = Number(request.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > maxBytes) {
    throw new UploadError(413, `The file is larger than ${Math.round(maxBytes / 1_048_576)} MB.`);
  }
  if (!request.body) throw new UploadError(400, "The request has no body.");

  const delimiter = Buffer.from(`\r\n--${boundary}`);
  const source = counted(request.body, maxBytes)[Symbol.asyncIterator]();
  // A CRLF in front lets the first boundary be found like every other one.
  let buf: Buffer = Buffer.from("\r\n");
  let sourceDone = false;

  async function more(): Promise<boolean> {
    if (sourceDone) return false;
    const next = await source.next();
    if (next.done) {
      sourceDone = true;
      return false;
    }
    buf = buf.length ? Buffer.concat([buf, next.value]) : next.value;
    return true;
  }

  /** Consumes up to and including the next delimiter, yielding (or dropping) the bytes before it. */
  async function* untilDelimiter(emit: boolean): AsyncGenerator<Buffer> {
    for (;;) {
      const at = buf.indexOf(delimiter);
      if (at >= 0) {
        if (emit && at > 0) yield buf.subarray(0, at);
        buf = buf.subarray(at + delimiter.length);
        return;
      }
      const safe = buf.length - (delimiter.length - 1);
      if (safe > 0) {
        if (emit) yield buf.subarray(0, safe);
        buf = buf.subarray(safe);
      }
      if (!(await more())) throw new UploadError(400, "The upload ended before the file did. Try again.");
    }
  }

  async function need(bytes: number): Promise<void> {
    while (buf.length < bytes) {
      if (!(await more())) throw new UploadError(400, "The upload ended too early. Try again.");
    }
  }

  async function close(): Promise<void> {
    await source.return?.(undefined);
  }

  try {
    for await (const _ of untilDelimiter(false)) void _;
    for (;;) {
      await need(2);
      if (buf[0] === 0x2d && buf[1] === 0x2d) break; // "--": the closing boundary
      if (!(buf[0] === 0x0d && buf[1] === 0x0a)) throw new UploadError(400, "The upload is not well-formed multipart data.");
      buf = buf.subarray(2);
      let end = buf.indexOf(CRLF_CRLF);
      while (end < 0) {
        if (buf.length > MAX_HEADER_BYTES) throw new UploadError(400, "The upload is not well-formed multipart data.");
        if (!(await more())) throw new UploadError(400, "The upload ended too early. Try again.");
        end = buf.indexOf(CRLF_CRLF);
      }
      const headers = buf.subarray(0, end).toString("utf8").split("\r\n");
      buf = buf.subarray(end + CRLF_CRLF.length);
      const disposition = headers.find((h) => /^content-disposition:/i.test(h)) ?? "";
      const type = headers.find((h) => /^content-type:/i.test(h));
      const name = headerParam(disposition, "name");
      const filename = headerParam(disposition, "filename");
      if (name === field) {
        if (filename === null) throw new UploadError(400, `The field “${field}” must be a file.`);
        const body = (async function* () {
          try {
            yield* untilDelimiter(true);
          } finally {
            await close();
          }
        })();
        return { filename, contentType: type ? type.slice(type.indexOf(":") + 1).trim() : null, body };
      }
      for await (const _ of untilDelimiter(false)) void _;
    }
    throw new UploadError(400, `Choose a file to upload (the form field “${field}” is missing).`);
  } catch (error) {
    await close();
    throw error;
  }
}
