import { roomInputSchema, schoolSlugSchema, type RoomInputField, type RoomRecord, type UnitSystem } from "@/lib/validation/room";
import { csvLine } from "@/lib/csv/write";

// The rooms file: one row a room, a header naming the columns. The header says the
// units: *_ft and *_cfm columns (US), or *_m and *_ls columns (metric), never a mix.
export const ROOM_CSV_COLUMNS = {
  us: ["school", "room", "use", "length_ft", "width_ft", "ceiling_ft", "occupancy", "outdoor_air_cfm", "air_cleaners", "cadr_cfm_each", "merv", "windows_open"],
  metric: ["school", "room", "use", "length_m", "width_m", "ceiling_m", "occupancy", "outdoor_air_ls", "air_cleaners", "cadr_ls_each", "merv", "windows_open"],
} as const satisfies Record<UnitSystem, readonly string[]>;

/** Which field of the room input each column fills, by position in ROOM_CSV_COLUMNS. */
const FIELDS: readonly (RoomInputField | "school")[] = [
  "school",
  "name",
  "use",
  "length",
  "width",
  "ceiling",
  "occupancy",
  "outdoorAir",
  "airCleaners",
  "cadrEach",
  "merv",
  "windowsOpen",
];

export interface RoomCsvHeader {
  units: UnitSystem;
  /** Index of each column in the file's rows, in ROOM_CSV_COLUMNS order. */
  positions: number[];
}

export interface RowError {
  /** Line of the file the row starts on. */
  line: number;
  /** Column name, or null for the row as a whole. */
  column: string | null;
  message: string;
}

/** Reads the header row, or explains what is wrong with it. */
export function parseRoomCsvHeader(fields: readonly string[]): { ok: true; header: RoomCsvHeader } | { ok: false; message: string } {
  const names = fields.map((f) => f.trim().toLowerCase());
  const seen = new Set<string>();
  for (const name of names) {
    if (seen.has(name)) return { ok: false, message: `The column “${name}” appears twice in the header.` };
    seen.add(name);
  }
  const hasUs = names.some((n) => n.endsWith("_ft") || n.endsWith("_cfm") || n === "cadr_cfm_each");
  const hasMetric = names.some((n) => n.endsWith("_m") || n.endsWith("_ls") || n === "cadr_ls_each");
  if (hasUs && hasMetric) {
    return { ok: false, message: "The header mixes US columns (_ft, _cfm) with metric ones (_m, _ls). Use one system for the whole file." };
  }
  const units: UnitSystem = hasMetric ? "metric" : "us";
  const expected = ROOM_CSV_COLUMNS[units];
  const missing = expected.filter((c) => !names.includes(c));
  const unknown = names.filter((n) => !(expected as readonly string[]).includes(n));
  if (missing.length || unknown.length) {
    const parts = [];
    if (missing.length) parts.push(`missing ${missing.join(", ")}`);
    if (unknown.length) parts.push(`unknown ${unknown.map((u) => u || "(empty)").join(", ")}`);
    return { ok: false, message: `The header must name these columns: ${expected.join(",")}. This file's header has ${parts.join("; ")}.` };
  }
  return { ok: true, header: { units, positions: expected.map((c) => names.indexOf(c)) } };
}

export type ParsedRoomRow =
  | { ok: true; line: number; school: string; room: RoomRecord }
  | { ok: false; line: number; school: string | null; roomName: string | null; errors: RowError[] };

/** Validates one data row against the header; messages name the row's line and column. */
export function parseRoomCsvRow(fields: readonly string[], line: number, header: RoomCsvHeader): ParsedRoomRow {
  const columns = ROOM_CSV_COLUMNS[header.units];
  const rawSchool = fields[header.positions[0] ?? 0]?.trim() ?? "";
  const rawName = fields[header.positions[1] ?? 1]?.trim() ?? "";
  if (fields.length !== columns.length) {
    return {
      ok: false,
      line,
      school: rawSchool || null,
      roomName: rawName || null,
      errors: [{ line, column: null, message: `This row has ${fields.length} values; the header has ${columns.length}. (Is a comma missing, or a name with a comma not in quotes?)` }],
    };
  }
  const input: Record<string, string> = { units: header.units };
  FIELDS.forEach((field, i) => {
    input[field] = fields[header.positions[i] ?? i] ?? "";
  });
  const errors: RowError[] = [];
  const school = schoolSlugSchema.safeParse(input.school);
  if (!school.success) errors.push({ line, column: "school", message: "Enter the school's short name, like tamsin-creek." });
  const room = roomInputSchema.safeParse(input);
  if (!room.success) {
    const seen = new Set<string>();
    for (const issue of room.error.issues) {
      const field = String(issue.path[0] ?? "");
      const index = FIELDS.indexOf(field as RoomInputField);
      const column = index >= 0 ? (columns[index] ?? null) : null;
      const key = column ?? "";
      if (seen.has(key)) continue;
      seen.add(key);
      errors.push({ line, column, message: issue.message });
    }
  }
  if (errors.length || !school.success || !room.success) {
    return { ok: false, line, school: rawSchool || null, roomName: rawName || null, errors };
  }
  return { ok: true, line, school: school.data, room: room.data };
}

// Exported files are for people and spreadsheets: three decimals are finer than any
// tape measure or flow hood, and a metric file read back in comes out the same.
function exportNumber(value: number): string {
  return String(Number(value.toFixed(3)));
}

export interface ExportRoom {
  schoolSlug: string;
  name: string;
  use: string;
  lengthFt: number;
  widthFt: number;
  ceilingFt: number;
  occupancy: number;
  outdoorAirCfm: number;
  airCleaners: number;
  cadrCfmEach: number;
  merv: number | null;
  windowsOpen: boolean;
}

export function roomCsvHeaderLine(): string {
  return csvLine(ROOM_CSV_COLUMNS.us);
}

export function roomCsvLine(room: ExportRoom): string {
  return csvLine([
    room.schoolSlug,
    room.name,
    room.use,
    exportNumber(room.lengthFt),
    exportNumber(room.widthFt),
    exportNumber(room.ceilingFt),
    room.occupancy,
    exportNumber(room.outdoorAirCfm),
    room.airCleaners,
    exportNumber(room.cadrCfmEach),
    room.merv ?? "",
    room.windowsOpen ? "yes" : "no",
  ]);
}
