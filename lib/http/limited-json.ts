import { NextResponse } from "next/server";
import { jsonError } from "./errors";

export type JsonRead = { ok: true; body: unknown } | { ok: false; response: NextResponse };

/**
 * Reads a JSON body of at most `maxBytes`: 415 unless it is application/json (UTF-8), 413 when it
 * is larger. The limit is enforced on the bytes actually read, since Content-Length can be left
 * out or wrong; reading stops as soon as the limit is passed.
 */
export async function readLimitedJson(request: Request, maxBytes: number): Promise<JsonRead> {
  const [mediaType = "", ...params] = (request.headers.get("content-type") ?? "").split(";").map((p) => p.trim().toLowerCase());
  const charset = params.find((p) => p.startsWith("charset="))?.slice("charset=".length).replace(/"/g, "");
  if (mediaType !== "application/json" || (charset && charset !== "utf-8")) {
    return { ok: false, response: jsonError(415, "Send the body as application/json (UTF-8).") };
  }
  const tooLarge = () => ({
    ok: false as const,
    response: jsonError(413, `The body is larger than ${Math.round(maxBytes / 1024)} kB. Shorten the question and send it again.`),
  });
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > maxBytes) return tooLarge();

  const chunks: Uint8Array[] = [];
  let size = 0;
  const reader = request.body?.getReader();
  if (reader) {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > maxBytes) {
        await reader.cancel().catch(() => undefined);
        return tooLarge();
      }
      chunks.push(value);
    }
  }
  const bytes = new Uint8Array(size);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  try {
    return { ok: true, body: JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes)) };
  } catch {
    return { ok: false, response: NextResponse.json({ errors: { _form: "The body is not valid JSON." } }, { status: 400 }) };
  }
}
