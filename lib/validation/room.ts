import { z } from "zod";
import { ROOM_USES, type RoomUse } from "@/lib/air/ventilation";
import { cfmToLitresPerSecond, feetToMetres, litresPerSecondToCfm, metresToFeet } from "@/lib/air/units";

/** Feet and cfm, or metres and litres per second. Everything is stored in feet and cfm. */
export const UNIT_SYSTEMS = ["us", "metric"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** A room as stored: US units, unrounded. */
export interface RoomRecord {
  name: string;
  use: RoomUse;
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

// Upper limits catch a slip (centimetres typed as metres, a stray zero), not real rooms.
export const ROOM_LIMITS = { sideFt: 500, ceilingFt: 100, occupancy: 2000, outdoorAirCfm: 50_000, airCleaners: 50, cadrCfm: 5_000 } as const;

function toNumberInput(value: unknown): unknown {
  if (typeof value === "string") {
    const text = value.trim();
    return text === "" ? undefined : Number(text);
  }
  return value ?? undefined;
}

function numberField(required: string) {
  return z.preprocess(
    toNumberInput,
    z.number({ error: (issue) => (issue.input === undefined ? required : "Enter a number, like 30 or 30.5.") }).refine(Number.isFinite, "Enter a number, like 30 or 30.5."),
  );
}

const positive = (required: string) => numberField(required).refine((v) => v > 0, "Enter a number greater than 0.");
const atLeastZero = (required: string) => numberField(required).refine((v) => v >= 0, "Enter 0 or more.");
const wholeAtLeastZero = (required: string, max: number) =>
  numberField(required)
    .refine((v) => Number.isInteger(v) && v >= 0, "Enter a whole number, 0 or more.")
    .refine((v) => v <= max, `Enter at most ${max}.`);

const YES = new Set(["yes", "y", "true", "1"]);
const NO = new Set(["no", "n", "false", "0"]);

export const windowsOpenSchema = z.preprocess(
  (value) => {
    if (typeof value !== "string") return value;
    const text = value.trim().toLowerCase();
    return YES.has(text) ? true : NO.has(text) ? false : value;
  },
  z.boolean({ error: "Enter yes or no." }),
);

export const mervSchema = z.preprocess(
  (value) => (value === null || value === undefined || (typeof value === "string" && value.trim() === "") ? null : toNumberInput(value)),
  z
    .number({ error: "Enter a MERV rating from 1 to 16, or leave it empty when not known." })
    .int("Enter a MERV rating from 1 to 16, or leave it empty when not known.")
    .min(1, "Enter a MERV rating from 1 to 16, or leave it empty when not known.")
    .max(16, "Enter a MERV rating from 1 to 16, or leave it empty when not known.")
    .nullable(),
);

export const roomNameSchema = z
  .string({ error: "Enter the room's name." })
  .trim()
  .min(1, "Enter the room's name.")
  .max(60, "Keep the room's name to 60 characters.")
  // A name starting with = + - @ would run as a formula when the export is opened in a spreadsheet.
  .regex(/^[\p{L}\p{N}]/u, "Start the room's name with a letter or a digit.");

export const roomUseSchema = z.enum(ROOM_USES, `Choose one of: ${ROOM_USES.join(", ")}.`);

/**
 * One room as a form or a CSV row gives it, in either unit system; parses to a
 * RoomRecord in feet and cfm. The form, the JSON API and the CSV import all use it.
 */
export const roomInputSchema = z
  .object({
    name: roomNameSchema,
    use: roomUseSchema,
    units: z.enum(UNIT_SYSTEMS, "Choose us (feet, cfm) or metric (metres, L/s)."),
    length: positive("Enter the floor length."),
    width: positive("Enter the floor width."),
    ceiling: positive("Enter the ceiling height."),
    occupancy: wholeAtLeastZero("Enter the design occupancy.", ROOM_LIMITS.occupancy),
    outdoorAir: atLeastZero("Enter the outdoor air, or 0 when the room gets none."),
    airCleaners: wholeAtLeastZero("Enter how many portable air cleaners, or 0.", ROOM_LIMITS.airCleaners),
    cadrEach: z.preprocess((v) => (v === null || (typeof v === "string" && v.trim() === "") ? undefined : v), atLeastZero("").optional()),
    merv: mervSchema,
    windowsOpen: windowsOpenSchema,
  })
  .superRefine((room, ctx) => {
    const metric = room.units === "metric";
    const length = metric ? "m" : "ft";
    const flow = metric ? "L/s" : "cfm";
    const side = (ft: number) => (metric ? Number(feetToMetres(ft).toFixed(1)) : ft);
    const toFt = (v: number) => (metric ? metresToFeet(v) : v);
    const toCfm = (v: number) => (metric ? litresPerSecondToCfm(v) : v);
    for (const key of ["length", "width"] as const) {
      if (toFt(room[key]) > ROOM_LIMITS.sideFt) {
        ctx.addIssue({ code: "custom", path: [key], message: `That looks too large: at most ${side(ROOM_LIMITS.sideFt)} ${length}.` });
      }
    }
    if (toFt(room.ceiling) > ROOM_LIMITS.ceilingFt) {
      ctx.addIssue({ code: "custom", path: ["ceiling"], message: `That looks too high: at most ${side(ROOM_LIMITS.ceilingFt)} ${length}.` });
    }
    const flowLimit = (cfm: number) => (metric ? Math.round(cfmToLitresPerSecond(cfm)) : cfm);
    if (toCfm(room.outdoorAir) > ROOM_LIMITS.outdoorAirCfm) {
      ctx.addIssue({ code: "custom", path: ["outdoorAir"], message: `That looks too large: at most ${flowLimit(ROOM_LIMITS.outdoorAirCfm)} ${flow}.` });
    }
    if (room.airCleaners > 0 && !(room.cadrEach !== undefined && room.cadrEach > 0)) {
      ctx.addIssue({ code: "custom", path: ["cadrEach"], message: `Enter each air cleaner's CADR (${flow}), more than 0.` });
    } else if (room.cadrEach !== undefined && toCfm(room.cadrEach) > ROOM_LIMITS.cadrCfm) {
      ctx.addIssue({ code: "custom", path: ["cadrEach"], message: `That looks too large: at most ${flowLimit(ROOM_LIMITS.cadrCfm)} ${flow} each.` });
    }
  })
  .transform(
    (room): RoomRecord => {
      const metric = room.units === "metric";
      const ft = (v: number) => (metric ? metresToFeet(v) : v);
      const cfm = (v: number) => (metric ? litresPerSecondToCfm(v) : v);
      return {
        name: room.name,
        use: room.use,
        lengthFt: ft(room.length),
        widthFt: ft(room.width),
        ceilingFt: ft(room.ceiling),
        occupancy: room.occupancy,
        outdoorAirCfm: cfm(room.outdoorAir),
        airCleaners: room.airCleaners,
        // A CADR with no air cleaner counts for nothing; keep it 0 so figures stay plain.
        cadrCfmEach: room.airCleaners > 0 ? cfm(room.cadrEach ?? 0) : 0,
        merv: room.merv,
        windowsOpen: room.windowsOpen,
      };
    },
  );

export type RoomInput = z.input<typeof roomInputSchema>;
export type RoomInputField = keyof RoomInput;

export const schoolSlugSchema = z.string({ error: "Choose a school." }).trim().regex(/^[a-z0-9-]{1,60}$/, "Choose a school.");

export const roomIdSchema = z.coerce.number().int().positive();
