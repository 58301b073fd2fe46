// Distanced seating: seat centres are points that must keep spacingFt from each
// other and stay inside the usable rectangle. Coordinates are feet from the room's
// front-left corner: x runs across the width, y from the front wall to the back.

export const SPACING_PRESETS_FT = [6, 3] as const;
/** Common practice: a walkway between the walls and the nearest seat centre. */
export const DEFAULT_WALL_CLEARANCE_FT = 2;
/** Common practice: the depth kept clear at the front for the teacher, measured from the front wall. */
export const DEFAULT_TEACHER_ZONE_FT = 6;

export type SeatLayout = "grid" | "staggered";
/** Staggered rows either run across the room (facing the front) or along its length. */
export type StaggerOrientation = "rows_across" | "rows_along";

export interface Seat {
  x: number;
  y: number;
}

export interface UsableRectangle {
  x: number;
  y: number;
  widthFt: number;
  lengthFt: number;
}

export interface SeatingInput {
  lengthFt: number;
  widthFt: number;
  spacingFt: number;
  wallClearanceFt?: number;
  teacherZoneFt?: number;
}

export interface SeatingLayout {
  count: number;
  layout: SeatLayout;
  /** Set when layout is "staggered". */
  orientation: StaggerOrientation | null;
  seats: Seat[];
  usable: UsableRectangle;
  spacingFt: number;
  /** Seat counts of the best grid and best staggered layouts, to show the choice. */
  alternatives: { grid: number; staggered: number };
}

// Counting tolerance: a row that fits to within a millionth of a foot fits.
const FIT_EPSILON = 1e-9;
const ROW_STEP_FACTOR = Math.sqrt(3) / 2;

/** Floor area each seat takes in an unbounded layout: s² for a grid, s²·√3/2 for staggered rows. */
export function areaPerSeatFt2(spacingFt: number, layout: SeatLayout): number {
  return layout === "grid" ? spacingFt ** 2 : spacingFt ** 2 * ROW_STEP_FACTOR;
}

export function usableRectangle(input: SeatingInput): UsableRectangle {
  const clearance = input.wallClearanceFt ?? DEFAULT_WALL_CLEARANCE_FT;
  const teacherZone = input.teacherZoneFt ?? DEFAULT_TEACHER_ZONE_FT;
  // The front wall's clearance lies inside the teacher zone unless the zone is shallower.
  const front = Math.max(clearance, teacherZone);
  return {
    x: clearance,
    y: front,
    widthFt: input.widthFt - 2 * clearance,
    lengthFt: input.lengthFt - front - clearance,
  };
}

function seatsAlong(lengthFt: number, spacingFt: number): number {
  return lengthFt < -FIT_EPSILON ? 0 : Math.floor(lengthFt / spacingFt + FIT_EPSILON) + 1;
}

/** Rows of seats across a w × h area (local axes), the block centred in it. */
function placeRows(w: number, h: number, spacing: number, staggered: boolean): Seat[] {
  if (w < -FIT_EPSILON || h < -FIT_EPSILON) return [];
  const rowStep = staggered ? spacing * ROW_STEP_FACTOR : spacing;
  const rows = seatsAlong(h, rowStep);
  const fullRow = seatsAlong(w, spacing);
  const offsetRow = staggered ? seatsAlong(w - spacing / 2, spacing) : fullRow;
  const fullExtent = (fullRow - 1) * spacing;
  const offsetExtent = offsetRow > 0 ? (staggered ? spacing / 2 : 0) + (offsetRow - 1) * spacing : 0;
  const blockWidth = rows > 1 ? Math.max(fullExtent, offsetExtent) : fullExtent;
  const x0 = Math.max(0, (w - blockWidth) / 2);
  const y0 = Math.max(0, (h - (rows - 1) * rowStep) / 2);
  const seats: Seat[] = [];
  for (let row = 0; row < rows; row += 1) {
    const isOffset = staggered && row % 2 === 1;
    const count = isOffset ? offsetRow : fullRow;
    const shift = isOffset ? spacing / 2 : 0;
    for (let i = 0; i < count; i += 1) seats.push({ x: x0 + shift + i * spacing, y: y0 + row * rowStep });
  }
  return seats;
}

export function gridSeats(usable: UsableRectangle, spacingFt: number): Seat[] {
  return placeRows(usable.widthFt, usable.lengthFt, spacingFt, false).map((s) => ({ x: usable.x + s.x, y: usable.y + s.y }));
}

export function staggeredSeats(usable: UsableRectangle, spacingFt: number, orientation: StaggerOrientation): Seat[] {
  if (orientation === "rows_across") {
    return placeRows(usable.widthFt, usable.lengthFt, spacingFt, true).map((s) => ({ x: usable.x + s.x, y: usable.y + s.y }));
  }
  return placeRows(usable.lengthFt, usable.widthFt, spacingFt, true).map((s) => ({ x: usable.x + s.y, y: usable.y + s.x }));
}

/**
 * The most seats that fit at a spacing, trying a square grid and staggered
 * (hexagonal) rows in both orientations. A tie goes to the grid, then to rows
 * across the room: rows facing the front are what a class is taught in.
 */
export function seatsThatFit(input: SeatingInput): SeatingLayout {
  if (!(input.spacingFt > 0)) throw new RangeError(`spacing must be positive, got ${input.spacingFt}`);
  if (!(input.lengthFt >= 0 && input.widthFt >= 0)) throw new RangeError("room sides must not be negative");
  const usable = usableRectangle(input);
  const grid = gridSeats(usable, input.spacingFt);
  const across = staggeredSeats(usable, input.spacingFt, "rows_across");
  const along = staggeredSeats(usable, input.spacingFt, "rows_along");
  const staggered = along.length > across.length ? { seats: along, orientation: "rows_along" as const } : { seats: across, orientation: "rows_across" as const };
  const alternatives = { grid: grid.length, staggered: staggered.seats.length };
  if (staggered.seats.length > grid.length) {
    return { count: staggered.seats.length, layout: "staggered", orientation: staggered.orientation, seats: staggered.seats, usable, spacingFt: input.spacingFt, alternatives };
  }
  return { count: grid.length, layout: "grid", orientation: null, seats: grid, usable, spacingFt: input.spacingFt, alternatives };
}
