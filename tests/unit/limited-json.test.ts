import { describe, expect, it } from "vitest";
import { readLimitedJson } from "@/lib/http/limited-json";

const LIMIT = 16 * 1024;

function post(body: BodyInit, headers: Record<string, string>): Request {
  return new Request("http://localhost/api/questions", { method: "POST", body, headers, duplex: "half" } as RequestInit);
}

async function status(request: Request): Promise<number | "ok"> {
  const read = await readLimitedJson(request, LIMIT);
  return read.ok ? "ok" : read.response.status;
}

describe("readLimitedJson", () => {
  it("reads a small JSON body", async () => {
    const read = await readLimitedJson(post('{"a":1}', { "content-type": "application/json; charset=utf-8" }), LIMIT);
    expect(read).toEqual({ ok: true, body: { a: 1 } });
  });

  it("answers 415 for anything but JSON in UTF-8", async () => {
    expect(await status(post("a=1", { "content-type": "application/x-www-form-urlencoded" }))).toBe(415);
    expect(await status(post("{}", { "content-type": "text/plain" }))).toBe(415);
    expect(await status(post("{}", { "content-type": "application/json; charset=iso-8859-1" }))).toBe(415);
    expect(await status(post("{}", {}))).toBe(415);
  });

  it("answers 413 for a 100 kB body, whether or not Content-Length says so", async () => {
    const big = JSON.stringify({ question: "x".repeat(100_000) });
    expect(await status(post(big, { "content-type": "application/json" }))).toBe(413);
    // A stream has no Content-Length: the limit is counted on the bytes read.
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        for (let i = 0; i < 10; i += 1) controller.enqueue(new TextEncoder().encode("x".repeat(10_000)));
        controller.close();
      },
    });
    expect(await status(post(stream, { "content-type": "application/json" }))).toBe(413);
    // A lying Content-Length does not help either.
    expect(await status(post(big, { "content-type": "application/json", "content-length": "10" }))).toBe(413);
  });

  it("answers 400 for broken JSON or broken UTF-8", async () => {
    const bad = await readLimitedJson(post("{oops", { "content-type": "application/json" }), LIMIT);
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.response.status).toBe(400);
      expect(await bad.response.json()).toEqual({ errors: { _form: "The body is not valid JSON." } });
    }
    expect(await status(post(new Uint8Array([0x7b, 0xff, 0x7d]), { "content-type": "application/json" }))).toBe(400);
  });
});
