// Distanced seating: seat centres are points that must keep spacingFt from each
// other and stay inside the usable rectangle. Coordinates are feet from the room's
// front-left corner: x runs across the width, y from the front wall to the back.

export const SPACING_PRESETS_FT = [6, 3] as const;
/** Common practice: a walkway between the walls and the nearest seat centre. */
export const DEFAULT_WALL_CLEARANCE_FT = 2;
/** Common practice: the depth kept clear at the front for the teacher, measured from the front wall. */
export const DEFAULT_TEACHER_ZONE_FT = 6;
/**
 * Common practice: a student desk is about 2 ft wide and 2.5 ft deep. Spacing is
 * measured centre to centre, but the whole desk must stand inside the area left
 * by the wall clearance and the teacher zone, and no two desks may overlap. Without
 * a footprint (0 × 0) seats are points, which overstates what a real room holds.
 */
export const DEFAULT_DESK_WIDTH_FT = 2;
export const DEFAULT_DESK_DEPTH_FT = 2.5;

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
  /** Desk footprint across the room (x); default 2 ft, 0 for point seats. */
  deskWidthFt?: number;
  /** Desk footprint front to back (y); default 2.5 ft, 0 for point seats. */
  deskDepthFt?: number;
}

export interface SeatingLayout {
  count: number;
  layout: SeatLayout;
  /** Set when layout is "staggered". */
  orientation: StaggerOrientation | null;
  seats: Seat[];
  /** Where seat centres may go: the desk area less half a desk on every side. */
  usable: UsableRectangle;
  /** Where desks may stand: the room less the wall clearance and the teacher zone. */
  deskArea: UsableRectangle;
  desk: { widthFt: number; depthFt: number };
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

function deskOf(input: SeatingInput): { widthFt: number; depthFt: number } {
  return { widthFt: input.deskWidthFt ?? DEFAULT_DESK_WIDTH_FT, depthFt: input.deskDepthFt ?? DEFAULT_DESK_DEPTH_FT };
}

/** The room less the wall clearance and the teacher zone: where desks may stand. */
export function deskAreaRectangle(input: SeatingInput): UsableRectangle {
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

/** Where seat (desk) centres may go: the desk area less half a desk on every side. */
export function usableRectangle(input: SeatingInput): UsableRectangle {
  const area = deskAreaRectangle(input);
  const desk = deskOf(input);
  return {
    x: area.x + desk.widthFt / 2,
    y: area.y + desk.depthFt / 2,
    widthFt: area.widthFt - desk.widthFt,
    lengthFt: area.lengthFt - desk.depthFt,
  };
}

/**
 * Offsets from one seat to its nearest neighbours in each lattice. Desks face the
 * front in every layout, so two desks overlap when some neighbour is closer than a
 * desk width across and a desk depth front to back at once.
 */
function neighbourOffsets(layout: SeatLayout, orientation: StaggerOrientation | null, s: number): [number, number][] {
  const h = s * ROW_STEP_FACTOR;
  if (layout === "grid") return [[s, 0], [0, s], [s, s]];
  if (orientation === "rows_across") return [[s, 0], [s / 2, h], [0, 2 * h]];
  return [[0, s], [h, s / 2], [2 * h, 0]];
}

export function desksOverlap(
  layout: SeatLayout,
  orientation: StaggerOrientation | null,
  spacingFt: number,
  desk: { widthFt: number; depthFt: number },
): boolean {
  return neighbourOffsets(layout, orientation, spacingFt).some(
    ([dx, dy]) => dx < desk.widthFt - FIT_EPSILON && dy < desk.depthFt - FIT_EPSILON,
  );
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
export interface SeatingOptions {
  /** The better of the two; a tie goes to straight rows. */
  best: SeatingLayout;
  grid: SeatingLayout;
  staggered: SeatingLayout;
}

/** Both layouts at a spacing, and the better one, for a plan that lets people compare. */
export function seatingOptions(input: SeatingInput): SeatingOptions {
  const best = seatsThatFit(input);
  const other = (layout: SeatLayout): SeatingLayout => {
    if (best.layout === layout) return best;
    const s = input.spacingFt;
    if (layout === "grid") {
      const seats = desksOverlap("grid", null, s, best.desk) ? [] : gridSeats(best.usable, s);
      return { ...best, layout: "grid", orientation: null, seats, count: seats.length };
    }
    const across = desksOverlap("staggered", "rows_across", s, best.desk) ? [] : staggeredSeats(best.usable, s, "rows_across");
    const along = desksOverlap("staggered", "rows_along", s, best.desk) ? [] : staggeredSeats(best.usable, s, "rows_along");
    const [seats, orientation] = along.length > across.length ? [along, "rows_along" as const] : [across, "rows_across" as const];
    return { ...best, layout: "staggered", orientation, seats, count: seats.length };
  };
  return { best, grid: other("grid"), staggered: other("staggered") };
}

export function seatsThatFit(input: SeatingInput): SeatingLayout {
  if (!(input.spacingFt > 0)) throw new RangeError(`spacing must be positive, got ${input.spacingFt}`);
  if (!(input.lengthFt >= 0 && input.widthFt >= 0)) throw new RangeError("room sides must not be negative");
  const desk = deskOf(input);
  if (!(desk.widthFt >= 0 && desk.depthFt >= 0)) throw new RangeError("desk sides must not be negative");
  const usable = usableRectangle(input);
  const deskArea = deskAreaRectangle(input);
  const s = input.spacingFt;
  // A layout whose desks would overlap at this spacing seats nobody.
  const fits = (layout: SeatLayout, orientation: StaggerOrientation | null, seats: () => Seat[]): Seat[] =>
    desksOverlap(layout, orientation, s, desk) ? [] : seats();
  const grid = fits("grid", null, () => gridSeats(usable, s));
  const across = fits("staggered", "rows_across", () => staggeredSeats(usable, s, "rows_across"));
  const along = fits("staggered", "rows_along", () => staggeredSeats(usable, s, "rows_along"));
  const staggered = along.length > across.length ? { seats: along, orientation: "rows_along" as const } : { seats: across, orientation: "rows_across" as const };
  const alternatives = { grid: grid.length, staggered: staggered.seats.length };
  const common = { usable, deskArea, desk, spacingFt: s, alternatives };
  if (staggered.seats.length > grid.length) {
    return { count: staggered.seats.length, layout: "staggered", orientation: staggered.orientation, seats: staggered.seats, ...common };
  }
  return { count: grid.length, layout: "grid", orientation: null, seats: grid, ...common };
}
