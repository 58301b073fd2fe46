import type { DB } from "@/db/connection";
import { CsvSyntaxError, type CsvRecord } from "@/lib/csv/parse";
import type { RoomRecord, UnitSystem } from "@/lib/validation/room";
import { parseRoomCsvHeader, parseRoomCsvRow, type RoomCsvHeader, type RowError } from "./csv";
import { roomColumns } from "./repository";

/** A rooms file is a list a person keeps; more rows than this is a wrong file. */
export const MAX_ROOM_ROWS = 5_000;

export type RoomImportAction = "new" | "update" | "unchanged";

export interface RoomImportRow {
  line: number;
  school: string | null;
  room: string | null;
  /** null when the row has errors. */
  action: RoomImportAction | null;
  errors: RowError[];
}

export interface RoomImportResult {
  /** True when every row is good; only then is anything saved. */
  ok: boolean;
  /** True when this call wrote the rows (not a dry run, and ok). */
  saved: boolean;
  units: UnitSystem | null;
  /** Problems with the file as a whole (empty, header, too many rows, broken quotes). */
  fileErrors: string[];
  rows: RoomImportRow[];
  counts: Record<RoomImportAction, number> & { rows: number; withErrors: number };
  /** Schools whose rooms this file touches, for revalidation. */
  schools: string[];
}

// Numbers equal to a thousandth are the same room: an export rounds to three decimals.
const SAME = 1e-3;

function sameRoom(a: RoomRecord, b: RoomRecord): boolean {
  const close = (x: number, y: number) => Math.abs(x - y) <= SAME;
  return (
    a.use === b.use &&
    close(a.lengthFt, b.lengthFt) &&
    close(a.widthFt, b.widthFt) &&
    close(a.ceilingFt, b.ceilingFt) &&
    a.occupancy === b.occupancy &&
    close(a.outdoorAirCfm, b.outdoorAirCfm) &&
    a.airCleaners === b.airCleaners &&
    close(a.cadrCfmEach, b.cadrCfmEach) &&
    a.merv === b.merv &&
    a.windowsOpen === b.windowsOpen
  );
}

function emptyResult(fileErrors: string[], units: UnitSystem | null = null, rows: RoomImportRow[] = []): RoomImportResult {
  return {
    ok: false,
    saved: false,
    units,
    fileErrors,
    rows,
    counts: { new: 0, update: 0, unchanged: 0, rows: rows.length, withErrors: rows.filter((r) => r.errors.length).length },
    schools: [],
  };
}

/**
 * Reads a rooms CSV, checks every row, and, only when all are good and this is not
 * a dry run, writes them in one transaction: a row whose (school, room) exists
 * updates it, any other adds a room. Rooms not in the file are left as they are.
 */
export async function importRoomsCsv(
  db: DB,
  batches: AsyncIterable<CsvRecord[]>,
  options: { dryRun: boolean; actorId: number | null; now?: string },
): Promise<RoomImportResult> {
  const schools = new Map((await db.selectFrom("schools").select(["id", "slug"]).execute()).map((s) => [s.slug, s.id]));
  const slugList = [...schools.keys()].join(", ");
  let units: UnitSystem | null = null;
  let header: RoomCsvHeader | null = null;
  const rows: RoomImportRow[] = [];
  const good: { line: number; schoolId: number; school: string; room: RoomRecord; index: number }[] = [];
  const firstLine = new Map<string, number>();

  try {
    for await (const batch of batches) {
      for (const record of batch) {
        if (!header) {
          const read = parseRoomCsvHeader(record.fields);
          if (!read.ok) return emptyResult([`Line ${record.line}: ${read.message}`]);
          header = read.header;
          units = header.units;
          continue;
        }
        if (rows.length >= MAX_ROOM_ROWS) {
          return emptyResult([`The file has more than ${MAX_ROOM_ROWS} rooms. Split it by school and upload each part.`], units);
        }
        const parsed = parseRoomCsvRow(record.fields, record.line, header);
        const row: RoomImportRow = {
          line: record.line,
          school: parsed.school,
          room: parsed.ok ? parsed.room.name : parsed.roomName,
          action: null,
          errors: parsed.ok ? [] : parsed.errors,
        };
        if (parsed.ok) {
          const schoolId = schools.get(parsed.school);
          if (schoolId === undefined) {
            row.errors.push({ line: record.line, column: "school", message: `No school has the short name “${parsed.school}”. Use one of: ${slugList}.` });
          }
          const key = `${parsed.school}\u0000${parsed.room.name}`;
          const earlier = firstLine.get(key);
          if (earlier !== undefined) {
            row.errors.push({ line: record.line, column: "room", message: `This room is already on line ${earlier}; list each room once.` });
          } else {
            firstLine.set(key, record.line);
          }
          if (schoolId !== undefined && row.errors.length === 0) good.push({ line: record.line, schoolId, school: parsed.school, room: parsed.room, index: rows.length });
        }
        rows.push(row);
      }
    }
  } catch (error) {
    if (error instanceof CsvSyntaxError) {
      return emptyResult([error.line > 0 ? `Line ${error.line}: ${error.message.replace(/^line \d+: /, "")}` : error.message], units, rows);
    }
    throw error;
  }

  if (!header) return emptyResult(["The file is empty. The first line must be the header."]);
  if (rows.length === 0) return emptyResult(["The file has a header but no rooms."], units);

  // Compare with what is stored, to show which rows add a room and which change one.
  const existing = new Map<string, RoomRecord & { id: number }>();
  const schoolIds = [...new Set(good.map((g) => g.schoolId))];
  if (schoolIds.length) {
    const stored = await db
      .selectFrom("rooms")
      .selectAll()
      .where("school_id", "in", schoolIds)
      .execute();
    for (const r of stored) {
      existing.set(`${r.school_id}\u0000${r.name}`, {
        id: r.id,
        name: r.name,
        use: r.use as RoomRecord["use"],
        lengthFt: r.length_ft,
        widthFt: r.width_ft,
        ceilingFt: r.ceiling_ft,
        occupancy: r.occupancy,
        outdoorAirCfm: r.outdoor_air_cfm,
        airCleaners: r.air_cleaners,
        cadrCfmEach: r.cadr_cfm_each,
        merv: r.merv,
        windowsOpen: r.windows_open === 1,
      });
    }
  }
  const counts = { new: 0, update: 0, unchanged: 0 };
  for (const g of good) {
    const stored = existing.get(`${g.schoolId}\u0000${g.room.name}`);
    const action: RoomImportAction = !stored ? "new" : sameRoom(stored, g.room) ? "unchanged" : "update";
    const row = rows[g.index];
    if (row) row.action = action;
    counts[action] += 1;
  }

  const withErrors = rows.filter((r) => r.errors.length > 0).length;
  const ok = withErrors === 0;
  const touched = [...new Set(good.filter((g) => rows[g.index]?.action !== "unchanged").map((g) => g.school))];
  const result: RoomImportResult = {
    ok,
    saved: false,
    units,
    fileErrors: [],
    rows,
    counts: { ...counts, rows: rows.length, withErrors },
    schools: touched,
  };
  if (!ok || options.dryRun) return result;

  const now = options.now ?? new Date().toISOString();
  await db.transaction().execute(async (trx) => {
    for (const g of good) {
      if (rows[g.index]?.action === "unchanged") continue;
      const columns = roomColumns(g.room);
      await trx
        .insertInto("rooms")
        .values({ school_id: g.schoolId, ...columns, created_at: now, updated_at: now, updated_by: options.actorId })
        .onConflict((oc) => oc.columns(["school_id", "name"]).doUpdateSet({ ...columns, updated_at: now, updated_by: options.actorId }))
        .execute();
    }
  });
  return { ...result, saved: true };
}
