// Import and summarise 1,000,000 CO2 readings through the same path as an upload:
// a multipart body streamed through the multipart reader, the CSV reader and the
// import service, into a fresh SQLite file. Target on the 2-core reference machine:
// under 20 s and under 300 MB peak resident memory.
import { createReadStream, createWriteStream, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Readable } from "node:stream";
import { once } from "node:events";
import { openDatabase } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";
import { importCo2Csv } from "@/lib/co2/import";
import { csvRecordBatches } from "@/lib/csv/parse";
import { readMultipartFile } from "@/lib/http/multipart";
import { putSetting } from "@/lib/settings/repository";

const READINGS = Number(process.env.BENCH_CO2_READINGS ?? 1_000_000);
const ROOMS = 50;
const STEP_MINUTES = 2;
const START_MS = Date.UTC(2026, 9, 1, 4, 0); // 2026-10-01 00:00 in New York (UTC−4)
const DST_END_MS = Date.UTC(2026, 10, 1, 6, 0); // 2026-11-01 02:00 EDT → 01:00 EST
const SCHOOLS = ["tamsin-creek", "corrow-ridge", "eastmere"];
const BOUNDARY = "----clearhallBench";

function localStamp(ms: number): string {
  const offsetHours = ms < DST_END_MS ? -4 : -5;
  const local = new Date(ms + offsetHours * 3_600_000).toISOString().slice(0, 19);
  return `${local}-0${-offsetHours}:00`;
}

async function writeFile(path: string): Promise<void> {
  const out = createWriteStream(path);
  out.write(`school,room,timestamp,co2_ppm\r\n`);
  const perRoom = Math.ceil(READINGS / ROOMS);
  let written = 0;
  let chunk = "";
  for (let step = 0; step < perRoom && written < READINGS; step += 1) {
    const ms = START_MS + step * STEP_MINUTES * 60_000;
    const stamp = localStamp(ms);
    const hour = (new Date(ms).getUTCHours() + 19) % 24;
    for (let r = 0; r < ROOMS && written < READINGS; r += 1) {
      const inClass = hour >= 8 && hour < 15;
      const ppm = Math.round(420 + (inClass ? 350 + ((r * 37 + step * 11) % 700) : (step * 7 + r) % 60));
      chunk += `${SCHOOLS[r % 3]},Room ${100 + r},${stamp},${ppm}\r\n`;
      written += 1;
    }
    if (chunk.length > 1_000_000) {
      if (!out.write(chunk)) await once(out, "drain");
      chunk = "";
    }
  }
  out.end(chunk);
  await once(out, "finish");
}

/** The file wrapped as a browser would send it, read from disk as it goes. */
function multipartBody(path: string): ReadableStream<Uint8Array> {
  async function* parts() {
    yield Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="readings.csv"\r\nContent-Type: text/csv\r\n\r\n`);
    for await (const chunk of createReadStream(path, { highWaterMark: 64 * 1024 })) yield chunk as Buffer;
    yield Buffer.from(`\r\n--${BOUNDARY}--\r\n`);
  }
  return Readable.toWeb(Readable.from(parts())) as ReadableStream<Uint8Array>;
}

async function main(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), "clearhall-bench-"));
  try {
    const csvPath = join(dir, "readings.csv");
    let started = performance.now();
    await writeFile(csvPath);
    const sizeMb = statSync(csvPath).size / 1_048_576;
    console.log(`generated ${READINGS.toLocaleString("en-US")} readings for ${ROOMS} rooms (${sizeMb.toFixed(1)} MB) in ${((performance.now() - started) / 1000).toFixed(1)} s`);

    const db = openDatabase(join(dir, "bench.db"));
    await migrateToLatest(db);
    await putSetting(db, "district_time_zone", "America/New_York");
    await putSetting(db, "district_holidays", ["2026-10-12", "2026-11-03", "2026-11-11", "2026-11-26", "2026-11-27"]);
    for (const [i, slug] of SCHOOLS.entries()) {
      await db.insertInto("schools").values({ slug, name: slug, level: "middle", grades: "6–8", address: "-", phone: "555-0100" }).execute();
      void i;
    }
    const schools = await db.selectFrom("schools").select(["id", "slug"]).execute();
    const idOf = new Map(schools.map((s) => [s.slug, s.id]));
    for (let r = 0; r < ROOMS; r += 1) {
      await db
        .insertInto("rooms")
        .values({ school_id: idOf.get(SCHOOLS[r % 3]!)!, name: `Room ${100 + r}`, use: "classroom_9_plus", length_ft: 30, width_ft: 30, ceiling_ft: 9, occupancy: 25, updated_at: new Date().toISOString() })
        .execute();
    }

    const rssBefore = process.memoryUsage().rss;
    started = performance.now();
    const file = await readMultipartFile({ headers: new Headers({ "content-type": `multipart/form-data; boundary=${BOUNDARY}` }), body: multipartBody(csvPath) }, "file", 200 * 1_048_576);
    const result = await importCo2Csv(db, csvRecordBatches(file.body), { fileName: file.filename, actorId: null, now: new Date("2026-12-01T12:00:00Z") });
    const seconds = (performance.now() - started) / 1000;
    const peakRssMb = process.resourceUsage().maxRSS / 1024;
    if (!result.ok) throw new Error(`import failed: ${JSON.stringify(result.fileErrors.concat(result.errors.map((e) => e.message)).slice(0, 5))}`);

    console.log(`imported ${result.rowsAdded.toLocaleString("en-US")} readings, summarised ${result.roomDays.toLocaleString("en-US")} room-days in ${seconds.toFixed(1)} s (${Math.round(result.rowsRead / seconds).toLocaleString("en-US")} readings/s)`);
    console.log(`peak RSS ${peakRssMb.toFixed(0)} MB (process before the import: ${(rssBefore / 1_048_576).toFixed(0)} MB)`);
    console.log(`targets: < 20 s ${seconds < 20 ? "met" : "MISSED"}; < 300 MB ${peakRssMb < 300 ? "met" : "MISSED"}`);

    started = performance.now();
    const again = await importCo2Csv(
      db,
      csvRecordBatches((await readMultipartFile({ headers: new Headers({ "content-type": `multipart/form-data; boundary=${BOUNDARY}` }), body: multipartBody(csvPath) }, "file", 200 * 1_048_576)).body),
      { fileName: "again.csv", actorId: null, now: new Date("2026-12-01T12:00:00Z") },
    );
    console.log(`the same file again: ${again.duplicates.toLocaleString("en-US")} duplicates ignored, ${again.rowsAdded} added, in ${((performance.now() - started) / 1000).toFixed(1)} s`);
    await db.destroy();
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
