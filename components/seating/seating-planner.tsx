"use client";

import { useId, useState } from "react";
import {
  DEFAULT_DESK_DEPTH_FT,
  DEFAULT_DESK_WIDTH_FT,
  DEFAULT_TEACHER_ZONE_FT,
  DEFAULT_WALL_CLEARANCE_FT,
  seatingOptions,
  SPACING_PRESETS_FT,
  type SeatingLayout,
} from "@/lib/seating/layout";
import { seatingPlan } from "@/lib/seating/plan-svg";
import { SeatingPlan } from "./seating-plan";

export interface SeatingPlannerProps {
  roomName: string;
  lengthFt: number;
  widthFt: number;
  designOccupancy: number;
  defaultSpacingFt?: number;
}

type Choice = "best" | "grid" | "staggered";

const FIELD = "mt-1 block w-28 rounded-plate border-2 border-ink-soft bg-white px-2 py-1 text-base aria-[invalid=true]:border-ember";

function parse(text: string, { min, max }: { min: number; max: number }): number | null {
  if (text.trim() === "") return null;
  const value = Number(text);
  return Number.isFinite(value) && value >= min && value <= max ? value : null;
}

function layoutWords(layout: SeatingLayout): string {
  if (layout.layout === "grid") return "straight rows";
  return layout.orientation === "rows_along" ? "staggered rows running front to back" : "staggered rows across the room";
}

const LIMITS = {
  spacingFt: { min: 1, max: 20 },
  wallClearanceFt: { min: 0, max: 10 },
  teacherZoneFt: { min: 0, max: 20 },
  deskWidthFt: { min: 0, max: 8 },
  deskDepthFt: { min: 0, max: 8 },
} as const;
type Key = keyof typeof LIMITS;
type Values = Record<Key, number>;

function parseAll(text: Record<Key, string>): Values | null {
  const out: Partial<Values> = {};
  for (const key of Object.keys(LIMITS) as Key[]) {
    const value = parse(text[key], LIMITS[key]);
    if (value === null) return null;
    out[key] = value;
  }
  return out as Values;
}

export function SeatingPlanner({ roomName, lengthFt, widthFt, designOccupancy, defaultSpacingFt = 6 }: SeatingPlannerProps) {
  const id = useId();
  const [text, setText] = useState<Record<Key, string>>({
    spacingFt: String(defaultSpacingFt),
    wallClearanceFt: String(DEFAULT_WALL_CLEARANCE_FT),
    teacherZoneFt: String(DEFAULT_TEACHER_ZONE_FT),
    deskWidthFt: String(DEFAULT_DESK_WIDTH_FT),
    deskDepthFt: String(DEFAULT_DESK_DEPTH_FT),
  });
  // While a box holds something that is not a number in range, the last good plan stays.
  const [planned, setPlanned] = useState<Values>(() => parseAll(text)!);
  const [choice, setChoice] = useState<Choice>("best");
  const update = (key: Key, value: string) => {
    const next = { ...text, [key]: value };
    setText(next);
    const parsed = parseAll(next);
    if (parsed) setPlanned(parsed);
  };

  const input = { lengthFt, widthFt, ...planned };
  const options = seatingOptions(input);
  const shown = options[choice];
  const drawing = seatingPlan(input, shown);
  const noun = input.deskWidthFt > 0 || input.deskDepthFt > 0 ? "desks" : "seats";
  const invalid = (key: Key) => parse(text[key], LIMITS[key]) === null;

  const field = (key: Key, label: string, hint: string) => (
    <div>
      <label htmlFor={`${id}-${key}`} className="block text-sm font-bold">
        {label}
      </label>
      <input
        id={`${id}-${key}`}
        inputMode="decimal"
        value={text[key]}
        onChange={(e) => update(key, e.target.value)}
        aria-invalid={invalid(key) ? true : undefined}
        aria-describedby={`${id}-${key}-hint`}
        className={FIELD}
      />
      <p id={`${id}-${key}-hint`} className={`text-sm ${invalid(key) ? "font-bold text-ember-deep" : "text-ink-soft"}`}>
        {invalid(key) ? `! Enter ${hint}.` : hint}
      </p>
    </div>
  );

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      <fieldset className="space-y-3">
        <legend className="font-bold">Spacing and room set-up</legend>
        <div className="flex flex-wrap gap-2" role="group" aria-label="Spacing presets">
          {SPACING_PRESETS_FT.map((preset) => (
            <button
              key={preset}
              type="button"
              aria-pressed={planned.spacingFt === preset && !invalid("spacingFt")}
              onClick={() => update("spacingFt", String(preset))}
              className="min-h-11 rounded-plate border-2 border-harbour px-3 font-bold text-harbour-deep aria-pressed:bg-harbour aria-pressed:text-paper"
            >
              {preset} ft apart
            </button>
          ))}
        </div>
        {field("spacingFt", "Spacing, centre to centre (ft)", "1 to 20 ft")}
        {field("wallClearanceFt", "Wall clearance (ft)", "0 to 10 ft from the walls to the desks; default 2")}
        {field("teacherZoneFt", "Teacher zone (ft)", "0 to 20 ft deep from the front wall; default 6")}
        <div className="flex flex-wrap gap-4">
          {field("deskWidthFt", "Desk width (ft)", "0 to 8; default 2")}
          {field("deskDepthFt", "Desk depth (ft)", "0 to 8; default 2.5")}
        </div>
        <fieldset>
          <legend className="text-sm font-bold">Layout shown</legend>
          {(
            [
              ["best", "Whichever seats more"],
              ["grid", "Straight rows"],
              ["staggered", "Staggered rows"],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="flex min-h-11 items-center gap-2">
              <input type="radio" name={`${id}-layout`} value={value} checked={choice === value} onChange={() => setChoice(value)} className="h-5 w-5" />
              {label}
            </label>
          ))}
        </fieldset>
      </fieldset>
      <div>
        <p role="status" aria-live="polite" className="text-lg font-bold" data-testid="seat-count">
          {shown.count} {noun} fit {input.spacingFt} ft apart in {layoutWords(shown)}.
        </p>
        <p className="text-sm text-ink-soft">
          Straight rows: {options.grid.count} · staggered rows: {options.staggered.count}
          {choice === "best" ? ` · kept: ${options.best.layout === "grid" ? "straight rows" : "staggered rows"}` : ""}. Design occupancy:{" "}
          {designOccupancy}.
          {shown.count > designOccupancy ? " More fit than the room is designed for: plan for the design occupancy." : ""}
        </p>
        <div className="mt-3">
          <SeatingPlan drawing={drawing} title={`Seating plan for ${roomName} at ${input.spacingFt} ft`} id={`${id}-plan`} />
        </div>
        <p className="mt-2 text-sm text-ink-soft">
          Front of the room at the top. Shaded: teacher zone. Dashed line: where desks may stand. Each desk sits in a circle half the
          spacing wide, so circles touch but never overlap. Spacing is measured between desk centres.
        </p>
      </div>
    </div>
  );
}
