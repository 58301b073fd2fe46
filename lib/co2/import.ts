import type { CompiledQuery } from "kysely";
import type { DB } from "@/db/connection";
import { CsvSyntaxError, type CsvRecord } from "@/lib/csv/parse";
import type { RowError } from "@/lib/rooms/csv";
import { loadCo2Context, recomputeRoomDays, type Co2Context, type RoomDay } from "./summaries";
import { localDateFinder } from "./time";
import { parseZonedTimestamp } from "./timestamp";

export const CO2_CSV_COLUMNS = ["school", "room", "timestamp", "co2_ppm"] as const;

/** Readings outside this range are a sensor fault or a unit slip, not room air. */
export const CO2_PPM_RANGE = { min: 150, max: 10_000 } as const;
/** Errors listed in full; the rest are counted. */
export const MAX_LISTED_ERRORS = 50;
const INSERT_BATCH = 2_000;
const PPM = /^\d+(\.\d+)?$/;
const CHUNK_ROWS = 65_536;
/** A reading stamped further ahead than this is a wrong clock or offset. */
const FUTURE_SLACK_MS = 86_400_000;

export interface Co2ImportResult {
  ok: boolean;
  saved: boolean;
  fileErrors: string[];
  errors: RowError[];
  /** Errors beyond the ones listed. */
  moreErrors: number;
  rowsRead: number;
  rowsAdded: number;
  /** Readings already stored (or repeated in the file), ignored. */
  duplicates: number;
  /** Room-days whose figures were recomputed. */
  roomDays: number;
  firstReadingAt: string | null;
  lastReadingAt: string | null;
  schools: string[];
  importId: number | null;
}

/**
 * Readings held between checking the file and writing it, column by column in typed
 * arrays (20 bytes a reading), never as text: a million readings take about 20 MB.
 */
class ReadingBuffer {
  private rooms: Int32Array[] = [];
  private times: Float64Array[] = [];
  private ppms: Float64Array[] = [];
  length = 0;

  push(roomId: number, ms: number, ppm: number): void {
    const chunk = Math.floor(this.length / CHUNK_ROWS);
    const at = this.length % CHUNK_ROWS;
    if (at === 0) {
      this.rooms.push(new Int32Array(CHUNK_ROWS));
      this.times.push(new Float64Array(CHUNK_ROWS));
      this.ppms.push(new Float64Array(CHUNK_ROWS));
    }
    this.rooms[chunk]![at] = roomId;
    this.times[chunk]![at] = ms;
    this.ppms[chunk]![at] = ppm;
    this.length += 1;
  }

  *batches(size: number): Generator<{ room_id: number; measured_at: string; co2_ppm: number }[]> {
    let batch: { room_id: number; measured_at: string; co2_ppm: number }[] = [];
    let lastMs = Number.NaN;
    let lastIso = "";
    for (let i = 0; i < this.length; i += 1) {
      const chunk = Math.floor(i / CHUNK_ROWS);
      const at = i % CHUNK_ROWS;
      const ms = this.times[chunk]![at]!;
      if (ms !== lastMs) {
        lastMs = ms;
        lastIso = new Date(ms).toISOString();
      }
      batch.push({ room_id: this.rooms[chunk]![at]!, measured_at: lastIso, co2_ppm: this.ppms[chunk]![at]! });
      if (batch.length === size) {
        yield batch;
        batch = [];
      }
    }
    if (batch.length) yield batch;
  }
}

function failed(fileErrors: string[], errors: RowError[] = [], moreErrors = 0, rowsRead = 0): Co2ImportResult {
  return {
    ok: false,
    saved: false,
    fileErrors,
    errors,
    moreErrors,
    rowsRead,
    rowsAdded: 0,
    duplicates: 0,
    roomDays: 0,
    firstReadingAt: null,
    lastReadingAt: null,
    schools: [],
    importId: null,
  };
}

/**
 * Imports a CO2 log (school,room,timestamp,co2_ppm). Every row is checked first
 * while the file streams in; if any is bad nothing is written and the first errors
 * are listed by line. Otherwise, in one transaction, the readings are added (a
 * reading already stored for the same room and instant is ignored) and the daily
 * figures of every room-day the file touches are recomputed.
 */
export async function importCo2Csv(
  db: DB,
  batches: AsyncIterable<CsvRecord[]>,
  options: { fileName: string; actorId: number | null; now?: Date; context?: Co2Context },
): Promise<Co2ImportResult> {
  const now = options.now ?? new Date();
  const ctx = options.context ?? (await loadCo2Context(db));
  const rooms = await db.selectFrom("rooms").innerJoin("schools", "schools.id", "rooms.school_id").select(["rooms.id", "rooms.name", "schools.slug"]).execute();
  // school → room name → room id; the last pair looked up is kept, as logs repeat rooms.
  const roomIds = new Map<string, Map<string, number>>();
  for (const r of rooms) {
    const bySchool = roomIds.get(r.slug) ?? new Map<string, number>();
    bySchool.set(r.name, r.id);
    roomIds.set(r.slug, bySchool);
  }
  const localDate = localDateFinder(ctx.timeZone);
  const latestAllowed = now.getTime() + FUTURE_SLACK_MS;

  const buffer = new ReadingBuffer();
  const roomDays = new Map<string, RoomDay>();
  const schoolsTouched = new Set<string>();
  const errors: RowError[] = [];
  let moreErrors = 0;
  let rowsRead = 0;
  let first = Number.POSITIVE_INFINITY;
  let last = Number.NEGATIVE_INFINITY;
  let positions: number[] | null = null;
  let lastSchool = "";
  let lastRoomName = "";
  let lastRoomId: number | undefined;
  let lastStamp = "";
  let lastMs = Number.NaN;
  const error = (e: RowError) => {
    if (errors.length < MAX_LISTED_ERRORS) errors.push(e);
    else moreErrors += 1;
  };

  try {
    for await (const batch of batches) {
      for (const record of batch) {
        if (!positions) {
          const names = record.fields.map((f) => f.trim().toLowerCase());
          const missing = CO2_CSV_COLUMNS.filter((c) => !names.includes(c));
          const unknown = names.filter((n) => !(CO2_CSV_COLUMNS as readonly string[]).includes(n));
          if (missing.length || unknown.length || names.length !== CO2_CSV_COLUMNS.length) {
            return failed([`Line ${record.line}: the header must be ${CO2_CSV_COLUMNS.join(",")} (in any order).`]);
          }
          positions = CO2_CSV_COLUMNS.map((c) => names.indexOf(c));
          continue;
        }
        rowsRead += 1;
        const line = record.line;
        const f = record.fields;
        if (f.length !== CO2_CSV_COLUMNS.length) {
          error({ line, column: null, message: `This row has ${f.length} values; the header has ${CO2_CSV_COLUMNS.length}.` });
          continue;
        }
        const school = f[positions[0]!]!.trim();
        const roomName = f[positions[1]!]!.trim();
        const timestamp = f[positions[2]!]!.trim();
        const ppmText = f[positions[3]!]!.trim();
        let roomId: number | undefined;
        if (school === lastSchool && roomName === lastRoomName) {
          roomId = lastRoomId;
        } else {
          roomId = roomIds.get(school)?.get(roomName);
          lastSchool = school;
          lastRoomName = roomName;
          lastRoomId = roomId;
        }
        let bad = false;
        if (roomId === undefined) {
          bad = true;
          if (!roomIds.has(school)) error({ line, column: "school", message: `No school has the short name “${school}”.` });
          else error({ line, column: "room", message: `${school} has no room named “${roomName}”. Add the room first, or check its name.` });
        }
        // Logs from several sensors repeat each timestamp once per room.
        const ms = timestamp === lastStamp ? lastMs : parseZonedTimestamp(timestamp);
        lastStamp = timestamp;
        lastMs = ms;
        if (Number.isNaN(ms)) {
          bad = true;
          error({ line, column: "timestamp", message: `“${timestamp}” is not a date and time with an offset, like 2026-11-30T08:05:00-05:00.` });
        } else if (ms > latestAllowed) {
          bad = true;
          error({ line, column: "timestamp", message: `${timestamp} is in the future. Check the sensor's clock and offset.` });
        }
        const ppm = PPM.test(ppmText) ? Number(ppmText) : Number.NaN;
        if (!(ppm >= CO2_PPM_RANGE.min && ppm <= CO2_PPM_RANGE.max)) {
          bad = true;
          error({ line, column: "co2_ppm", message: `Enter CO2 in ppm as a number from ${CO2_PPM_RANGE.min} to ${CO2_PPM_RANGE.max.toLocaleString("en-US")}; got “${ppmText}”.` });
        }
        // After the first error, keep checking (to list errors) but stop holding readings.
        if (bad || roomId === undefined || errors.length + moreErrors > 0) continue;
        buffer.push(roomId, ms, ppm);
        const day = localDate(ms);
        const key = `${roomId}|${day}`;
        if (!roomDays.has(key)) {
          roomDays.set(key, { roomId, day });
          schoolsTouched.add(school);
        }
        if (ms < first) first = ms;
        if (ms > last) last = ms;
      }
    }
  } catch (e) {
    if (e instanceof CsvSyntaxError) return failed([e.line > 0 ? `Line ${e.line}: ${e.message.replace(/^line \d+: /, "")}` : e.message], errors, moreErrors, rowsRead);
    throw e;
  }

  if (!positions) return failed(["The file is empty. The first line must be the header school,room,timestamp,co2_ppm."]);
  if (errors.length || moreErrors) return failed([], errors, moreErrors, rowsRead);
  if (rowsRead === 0) return failed(["The file has a header but no readings."]);

  const stamp = now.toISOString();
  const saved = await db.transaction().execute(async (trx) => {
    let added = 0;
    // Kysely compiles a full batch's statement once (in the dialect's own SQL); each
    // full batch then only swaps the parameters. Building a 2,000-row insert anew each
    // time costs more than SQLite takes to run it.
    const insert = (rows: { room_id: number; measured_at: string; co2_ppm: number }[]) =>
      trx.insertInto("co2_readings").values(rows).onConflict((oc) => oc.columns(["room_id", "measured_at"]).doNothing());
    let fullBatch: CompiledQuery | null = null;
    for (const batch of buffer.batches(INSERT_BATCH)) {
      let result;
      if (batch.length === INSERT_BATCH) {
        fullBatch ??= insert(batch).compile();
        const parameters: (number | string)[] = [];
        for (const row of batch) parameters.push(row.room_id, row.measured_at, row.co2_ppm);
        result = await trx.executeQuery({ ...fullBatch, parameters });
      } else {
        result = await trx.executeQuery(insert(batch).compile());
      }
      added += Number(result.numAffectedRows ?? 0);
    }
    // Only days that gained a reading can change.
    const days = added > 0 ? await recomputeRoomDays(trx, roomDays.values(), ctx, stamp) : 0;
    const { id } = await trx
      .insertInto("co2_imports")
      .values({
        file_name: options.fileName.slice(0, 200),
        uploaded_by: options.actorId,
        rows_read: rowsRead,
        rows_added: added,
        duplicates: rowsRead - added,
        room_days: added > 0 ? roomDays.size : 0,
        first_reading_at: new Date(first).toISOString(),
        last_reading_at: new Date(last).toISOString(),
        created_at: stamp,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    return { added, days, id };
  });

  return {
    ok: true,
    saved: true,
    fileErrors: [],
    errors: [],
    moreErrors: 0,
    rowsRead,
    rowsAdded: saved.added,
    duplicates: rowsRead - saved.added,
    roomDays: saved.added > 0 ? roomDays.size : 0,
    firstReadingAt: new Date(first).toISOString(),
    lastReadingAt: new Date(last).toISOString(),
    schools: saved.added > 0 ? [...schoolsTouched] : [],
    importId: saved.id,
  };
}
