import { describe, expect, it } from "vitest";
import { multipartBoundary, readMultipartFile, UploadError } from "@/lib/http/multipart";

const BOUNDARY = "----clearhallBoundary7MA4YWxk";

function body(parts: { name: string; filename?: string; content: string }[], boundary = BOUNDARY): Uint8Array {
  let text = "";
  for (const p of parts) {
    text += `--${boundary}\r\nContent-Disposition: form-data; name="${p.name}"${p.filename !== undefined ? `; filename="${p.filename}"` : ""}\r\n`;
    if (p.filename !== undefined) text += "Content-Type: text/csv\r\n";
    text += `\r\n${p.content}\r\n`;
  }
  return new TextEncoder().encode(`${text}--${boundary}--\r\n`);
}

function streamOf(bytes: Uint8Array, chunkSize: number): ReadableStream<Uint8Array> {
  let offset = 0;
  return new ReadableStream({
    pull(controller) {
      if (offset >= bytes.length) return controller.close();
      controller.enqueue(bytes.slice(offset, offset + chunkSize));
      offset += chunkSize;
    },
  });
}

function request(bytes: Uint8Array, chunkSize = 7, contentType = `multipart/form-data; boundary=${BOUNDARY}`) {
  return { headers: new Headers({ "content-type": contentType }), body: streamOf(bytes, chunkSize) };
}

async function text(iterable: AsyncIterable<Uint8Array>): Promise<string> {
  const decoder = new TextDecoder();
  let out = "";
  for await (const chunk of iterable) out += decoder.decode(chunk, { stream: true });
  return out + decoder.decode();
}

describe("streaming multipart reader", () => {
  const csv = "school,room\r\ntamsin-creek,Room 101\r\n--not-a-boundary\r\n";
  const bytes = body([
    { name: "note", content: "hello" },
    { name: "file", filename: "rooms.csv", content: csv },
  ]);

  it("reads the boundary from the content type, quoted or not", () => {
    expect(multipartBoundary(`multipart/form-data; boundary=${BOUNDARY}`)).toBe(BOUNDARY);
    expect(multipartBoundary('multipart/form-data; boundary="a b"')).toBe("a b");
    expect(multipartBoundary("application/json")).toBeNull();
  });

  it("returns the file field's bytes exactly, whatever the chunk size", async () => {
    for (const size of [1, 2, 3, 5, 16, 41, 1000]) {
      const file = await readMultipartFile(request(bytes, size), "file", 1_000_000);
      expect(file.filename).toBe("rooms.csv");
      expect(file.contentType).toBe("text/csv");
      expect(await text(file.body)).toBe(csv);
    }
  });

  it("refuses a body that is not multipart, has no file field, or is too large", async () => {
    await expect(readMultipartFile(request(bytes, 10, "text/csv"), "file", 1e6)).rejects.toMatchObject({ status: 415 });
    await expect(readMultipartFile(request(body([{ name: "note", content: "x" }])), "file", 1e6)).rejects.toMatchObject({ status: 400 });
    await expect(readMultipartFile(request(body([{ name: "file", content: "x" }])), "file", 1e6)).rejects.toThrow(/must be a file/);
    const big = body([{ name: "file", filename: "big.csv", content: "x".repeat(5000) }]);
    const file = await readMultipartFile(request(big, 100), "file", 2000);
    await expect(text(file.body)).rejects.toBeInstanceOf(UploadError);
  });

  it("refuses an upload that stops in the middle of the file", async () => {
    const cut = bytes.slice(0, bytes.length - 30);
    const file = await readMultipartFile(request(cut), "file", 1e6);
    await expect(text(file.body)).rejects.toThrow(/ended before the file did/);
  });
});
