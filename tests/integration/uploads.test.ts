import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { seed } from "@/db/seed";
import { notCsvReason } from "@/lib/http/upload";
import { createTestDb, type TestDb } from "../support/test-db";

// The real route handlers, signed in as facilities: the role check itself is covered by the
// browser tests (tests/e2e/staff-api-guard.spec.ts); here it is the upload checks that answer.
vi.mock("@/lib/auth/guard", () => import("../support/guard-as-facilities"));
// Revalidating pages needs a running Next.js server.
vi.mock("@/lib/rooms/publish", () => ({ revalidateSchoolAir: () => undefined }));

let t: TestDb;
let roomsImport: (request: Request) => Promise<Response>;
let co2Import: (request: Request) => Promise<Response>;

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  process.env.DATABASE_URL = t.path;
  const rooms = await import("@/app/api/staff/rooms/import/route");
  const co2 = await import("@/app/api/staff/co2/import/route");
  roomsImport = (request) => rooms.POST(new NextRequest(request), {});
  co2Import = (request) => co2.POST(new NextRequest(request), {});
});
afterAll(async () => t.cleanup());

const ROOMS_HEADER = "school,room,use,length_ft,width_ft,ceiling_ft,occupancy,outdoor_air_cfm,air_cleaners,cadr_cfm_each,merv,windows_open";
const GOOD_ROOMS = `${ROOMS_HEADER}\r\ntamsin-creek,Room 901,classroom_5_8,30,30,9.5,22,420,0,,13,yes\r\n`;
const GOOD_CO2 = "school,room,timestamp,co2_ppm\r\ntamsin-creek,Room 101,2026-11-30T08:00:00-05:00,700\r\n";

/** A multipart body with one file field, as a browser sends it. */
function multipart(content: Uint8Array | string, fileName: string, type = "text/csv", boundary = "----clearhall-test-boundary") {
  const bytes = typeof content === "string" ? new TextEncoder().encode(content) : content;
  const head = new TextEncoder().encode(
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${fileName}"\r\nContent-Type: ${type}\r\n\r\n`,
  );
  const tail = new TextEncoder().encode(`\r\n--${boundary}--\r\n`);
  const body = new Uint8Array(head.length + bytes.length + tail.length);
  body.set(head, 0);
  body.set(bytes, head.length);
  body.set(tail, head.length + bytes.length);
  return { body, contentType: `multipart/form-data; boundary=${boundary}` };
}

function upload(path: string, content: Uint8Array | string, fileName: string, type?: string, headers: Record<string, string> = {}) {
  const { body, contentType } = multipart(content, fileName, type);
  return new Request(`http://localhost:3000${path}`, { method: "POST", headers: { "content-type": contentType, ...headers }, body });
}

/** A body that arrives in pieces with no Content-Length, as a chunked upload does. */
function streamedUpload(path: string, parts: () => Generator<Uint8Array>) {
  const boundary = "----clearhall-stream-boundary";
  const encoder = new TextEncoder();
  const iterator = (function* () {
    yield encoder.encode(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\nContent-Type: text/csv\r\n\r\n`);
    yield* parts();
    yield encoder.encode(`\r\n--${boundary}--\r\n`);
  })();
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      const next = iterator.next();
      if (next.done) controller.close();
      else controller.enqueue(next.value);
    },
  });
  return new Request(`http://localhost:3000${path}`, {
    method: "POST",
    headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
    body,
    duplex: "half",
  } as RequestInit);
}

async function snapshot() {
  return {
    rooms: await t.db.selectFrom("rooms").selectAll().orderBy("id").execute(),
    readings: await t.db.selectFrom("co2_readings").selectAll().execute(),
    imports: await t.db.selectFrom("co2_imports").selectAll().execute(),
  };
}

// First bytes of files people pick by mistake (each format's published signature).
const PNG = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
const XLSX = Uint8Array.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0x00, 0x00, 0x21, 0x00]);
const PDF = new TextEncoder().encode("%PDF-1.7\n%\u00e2\u00e3\n1 0 obj\n");
// "school,room,…" with "Pièce" written in Windows-1252 (è = 0xE8), not UTF-8.
const LATIN1 = Uint8Array.from([...new TextEncoder().encode(`${ROOMS_HEADER}\r\ntamsin-creek,Pi`), 0xe8, ...new TextEncoder().encode("ce 1,office,10,10,9,2,50,0,,,no\r\n")]);

describe("CSV uploads refuse what is not a CSV file, with a message, and change nothing", () => {
  for (const [route, send] of [
    ["rooms", () => roomsImport],
    ["CO2", () => co2Import],
  ] as const) {
    const path = route === "rooms" ? "/api/staff/rooms/import" : "/api/staff/co2/import";

    it(`${route} import: a picture, a spreadsheet, a PDF or text in another encoding gets 415 and a way to fix it`, async () => {
      const before = await snapshot();
      const cases: [Uint8Array, string, string, RegExp][] = [
        [PNG, "floor-plan.png", "image/png", /“floor-plan\.png” is a PNG picture, not a CSV file\. .*CSV UTF-8/],
        [XLSX, "rooms.xlsx", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", /“rooms\.xlsx” is a spreadsheet or other zipped file/],
        // A spreadsheet renamed .csv is caught by its content, not its name.
        [XLSX, "renamed.csv", "text/csv", /“renamed\.csv” is a spreadsheet or other zipped file/],
        [PDF, "readings.pdf", "application/pdf", /is a PDF document/],
        [LATIN1, "rooms.csv", "text/csv", /“rooms\.csv” is not UTF-8 text .*CSV UTF-8/],
      ];
      for (const [bytes, name, type, message] of cases) {
        const response = await send()(upload(path, bytes, name, type));
        expect(response.status, name).toBe(415);
        expect(((await response.json()) as { error: string }).error).toMatch(message);
      }
      const notMultipart = await send()(
        new Request(`http://localhost:3000${path}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ file: GOOD_ROOMS }) }),
      );
      expect(notMultipart.status).toBe(415);
      expect(await notMultipart.json()).toEqual({ error: "Send the file as multipart/form-data, in a field named “file”." });
      expect(await snapshot()).toEqual(before);
    });

    it(`${route} import: a byte that is not UTF-8 after the first 4 KB is refused with its line, and nothing is stored`, async () => {
      const before = await snapshot();
      // 80 good lines (over 4 KB, past the first look at the file), then line 82 with è in Windows-1252.
      const good = Array.from({ length: 80 }, (_, i) =>
        route === "rooms"
          ? `tamsin-creek,Room ${700 + i},classroom_5_8,30,30,9.5,22,420,0,,13,yes`
          : `tamsin-creek,Room 101,2026-11-30T${String(8 + Math.floor(i / 60)).padStart(2, "0")}:${String(i % 60).padStart(2, "0")}:00-05:00,700`,
      );
      const header = route === "rooms" ? ROOMS_HEADER : "school,room,timestamp,co2_ppm";
      const text = new TextEncoder().encode(`${header}\r\n${good.join("\r\n")}\r\ntamsin-creek,Pi`);
      expect(text.length).toBeGreaterThan(4096);
      const bytes = Uint8Array.from([...text, 0xe8, ...new TextEncoder().encode("ce,1\r\n")]);
      const response = await send()(upload(path, bytes, "late.csv", "text/csv"));
      expect(response.status).toBe(422);
      const body = (await response.json()) as { fileErrors: string[] };
      expect(body.fileErrors).toEqual([expect.stringMatching(/^Line 82: .*not UTF-8.*CSV UTF-8/)]);
      expect(await snapshot()).toEqual(before);
    });

    it(`${route} import: a text file that is not the expected CSV is refused with the header it needs`, async () => {
      const before = await snapshot();
      const response = await send()(upload(path, '{"rooms": []}\n', "rooms.json", "application/json"));
      expect(response.status).toBe(422);
      const body = (await response.json()) as { fileErrors: string[] };
      expect(body.fileErrors.join(" ")).toMatch(/Line 1: /);
      expect(await snapshot()).toEqual(before);
    });
  }

  it("rooms import: a file over 5 MB gets 413, whether the size is declared or only found while reading", { timeout: 30_000 }, async () => {
    const before = await snapshot();
    const declared = await roomsImport(upload("/api/staff/rooms/import", GOOD_ROOMS, "rooms.csv", "text/csv", { "content-length": String(5 * 1_048_576 + 1) }));
    expect(declared.status).toBe(413);
    expect(await declared.json()).toEqual({ error: "The file is larger than 5 MB." });

    // A good header and row, then blank lines (which are no records) until the limit is passed.
    const blank = new TextEncoder().encode("\r\n".repeat(32 * 1024));
    const streamed = await roomsImport(
      streamedUpload("/api/staff/rooms/import", function* () {
        yield new TextEncoder().encode(GOOD_ROOMS);
        for (let i = 0; i < 100; i++) yield blank;
      }),
    );
    expect(streamed.status).toBe(413);
    expect(await streamed.json()).toEqual({ error: "The file is larger than 5 MB." });
    expect(await snapshot()).toEqual(before);
  });

  it("CO2 import: a file declared over 200 MB gets 413 before any of it is read", async () => {
    const before = await snapshot();
    const response = await co2Import(upload("/api/staff/co2/import", GOOD_CO2, "log.csv", "text/csv", { "content-length": String(200 * 1_048_576 + 1) }));
    expect(response.status).toBe(413);
    expect(await response.json()).toEqual({ error: "The file is larger than 200 MB." });
    expect(await snapshot()).toEqual(before);
  });

  it("good files still go through, whatever type the browser declares (Windows calls a .csv application/vnd.ms-excel)", async () => {
    const dryRun = await roomsImport(
      new Request("http://localhost:3000/api/staff/rooms/import?dryRun=1", {
        method: "POST",
        headers: { "content-type": multipart(`\ufeff${GOOD_ROOMS}`, "rooms.csv").contentType },
        body: multipart(`\ufeff${GOOD_ROOMS}`, "rooms.csv", "application/vnd.ms-excel").body,
      }),
    );
    expect(dryRun.status).toBe(200);
    expect(await dryRun.json()).toMatchObject({ ok: true, dryRun: true, saved: false, counts: { new: 1 } });
  });
});

describe("notCsvReason", () => {
  it("lets UTF-8 text through, including a character cut off at the end of the sample", () => {
    const text = new TextEncoder().encode("school,room\r\ntamsin-creek,Salle é");
    expect(notCsvReason(text, "a.csv")).toBeNull();
    expect(notCsvReason(text.subarray(0, text.length - 1), "a.csv")).toBeNull();
    expect(notCsvReason(new Uint8Array(), "empty.csv")).toBeNull();
  });

  it("names what the file is instead", () => {
    expect(notCsvReason(Uint8Array.from([0xff, 0xfe, 0x73, 0x00]), "utf16.csv")).toMatch(/“utf16\.csv” is UTF-16 text, not a CSV file/);
    expect(notCsvReason(Uint8Array.from([0x61, 0x00, 0x62]), "")).toMatch(/^This file is not a text file/);
    expect(notCsvReason(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]), "photo.jpg")).toMatch(/is a JPEG picture/);
  });
});
