// A GET that reports the body as it came over the wire (still compressed) and decoded.
import { request } from "node:http";
import { brotliDecompressSync, gunzipSync, inflateSync } from "node:zlib";

/** What Chromium sends; `next start` answers with gzip (its compression middleware has no brotli). */
export const BROWSER_ACCEPT_ENCODING = "gzip, deflate, br, zstd";

export interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  /** Content-Encoding as served ("identity" when none). */
  encoding: string;
  /** Body bytes as transferred (compressed, without headers or chunk framing). */
  wireBytes: number;
  /** The decoded body. */
  body: Buffer;
}

export function getRaw(url: string, headers: Record<string, string> = {}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const req = request(url, { method: "GET", headers: { "accept-encoding": BROWSER_ACCEPT_ENCODING, ...headers } }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (chunk: Buffer) => chunks.push(chunk));
      res.on("error", reject);
      res.on("end", () => {
        const raw = Buffer.concat(chunks);
        const encoding = String(res.headers["content-encoding"] ?? "identity");
        try {
          const body =
            encoding === "gzip" ? gunzipSync(raw) : encoding === "br" ? brotliDecompressSync(raw) : encoding === "deflate" ? inflateSync(raw) : raw;
          resolve({ status: res.statusCode ?? 0, headers: res.headers, encoding, wireBytes: raw.length, body });
        } catch (error) {
          reject(new Error(`${url}: could not decode its ${encoding} body: ${error instanceof Error ? error.message : String(error)}`));
        }
      });
    });
    req.setTimeout(30_000, () => req.destroy(new Error(`${url}: no answer within 30 s`)));
    req.on("error", reject);
    req.end();
  });
}

export const kB = (bytes: number) => bytes / 1000;
export const fmtKb = (bytes: number) => `${kB(bytes).toFixed(1)} kB`;
