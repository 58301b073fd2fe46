import { describe, expect, it } from "vitest";
import {
  areaPerSeatFt2,
  DEFAULT_DESK_DEPTH_FT,
  DEFAULT_DESK_WIDTH_FT,
  DEFAULT_TEACHER_ZONE_FT,
  DEFAULT_WALL_CLEARANCE_FT,
  gridSeats,
  seatsThatFit,
  SPACING_PRESETS_FT,
  staggeredSeats,
  usableRectangle,
} from "@/lib/seating/layout";

// Seats here are desk centres, spacing is centre to centre. "Points" means no desk
// footprint (the plain geometric model); the product counts 2 × 2.5 ft desks.
const POINTS = { deskWidthFt: 0, deskDepthFt: 0 } as const;

describe("distanced seating", () => {
  it("spacing presets are 6 ft and 3 ft (CDC K-12 guidance 2020 and March 2021, C2)", () => {
    expect(SPACING_PRESETS_FT).toEqual([6, 3]);
  });

  it("defaults: 2 ft wall clearance, 6 ft teacher zone, 2 × 2.5 ft desk (common practice)", () => {
    expect(DEFAULT_WALL_CLEARANCE_FT).toBe(2);
    expect(DEFAULT_TEACHER_ZONE_FT).toBe(6);
    expect([DEFAULT_DESK_WIDTH_FT, DEFAULT_DESK_DEPTH_FT]).toEqual([2, 2.5]);
  });

  it("area per seat: 36 ft² in a 6 ft grid, 31.2 ft² in staggered rows (REFERENCES §4, calc)", () => {
    expect(areaPerSeatFt2(6, "grid")).toBe(36);
    // 6² × √3/2 = 31.18
    expect(areaPerSeatFt2(6, "staggered")).toBeCloseTo(31.2, 1);
  });

  it("hand-worked grid of points: 16 ft wide × 20 ft long room at 6 ft (calc)", () => {
    // Wall clearance 2 ft and a 6 ft teacher zone leave x 2–14 ft, y 6–18 ft: 12 × 12 ft.
    // Grid: floor(12 / 6) + 1 = 3 seats a row, 3 rows → 9, at x 2, 8, 14 and y 6, 12, 18.
    // Staggered: rows 6·√3/2 = 5.196 ft apart, floor(12 / 5.196) + 1 = 3 rows; an offset
    // row holds floor((12 − 3) / 6) + 1 = 2, so 3 + 2 + 3 = 8 either way: the grid wins.
    const plan = seatsThatFit({ lengthFt: 20, widthFt: 16, spacingFt: 6, ...POINTS });
    expect(plan.usable).toEqual({ x: 2, y: 6, widthFt: 12, lengthFt: 12 });
    expect(plan.layout).toBe("grid");
    expect(plan.count).toBe(9);
    expect(plan.alternatives).toEqual({ grid: 9, staggered: 8 });
    const xs = [...new Set(plan.seats.map((s) => s.x))].sort((a, b) => a - b);
    const ys = [...new Set(plan.seats.map((s) => s.y))].sort((a, b) => a - b);
    expect(xs).toEqual([2, 8, 14]);
    expect(ys).toEqual([6, 12, 18]);
  });

  it("hand-worked grid of 2 × 2.5 ft desks in the same room (calc)", () => {
    // Desks stand in x 2–14, y 6–18. Their centres keep half a desk inside that:
    // x 3–13 (10 ft), y 7.25–16.75 (9.5 ft). Grid: floor(10/6) + 1 = 2 across,
    // floor(9.5/6) + 1 = 2 rows → 4. The block (6 × 6 ft) is centred: x 5, 11; y 9, 15.
    // Staggered: 2 rows of 2 either way → 4, a tie, so straight rows are kept.
    const plan = seatsThatFit({ lengthFt: 20, widthFt: 16, spacingFt: 6 });
    expect(plan.deskArea).toEqual({ x: 2, y: 6, widthFt: 12, lengthFt: 12 });
    expect(plan.usable).toEqual({ x: 3, y: 7.25, widthFt: 10, lengthFt: 9.5 });
    expect(plan.layout).toBe("grid");
    expect(plan.alternatives).toEqual({ grid: 4, staggered: 4 });
    expect(plan.seats).toEqual([
      { x: 5, y: 9 },
      { x: 11, y: 9 },
      { x: 5, y: 15 },
      { x: 11, y: 15 },
    ]);
  });

  it("hand-worked 30 × 30 ft room at 6 ft, points: grid 20, staggered 23 across or 24 along (calc)", () => {
    // Usable 26 ft wide (x 2–28) × 22 ft deep (y 6–28).
    // Grid: (floor(26/6) + 1) × (floor(22/6) + 1) = 5 × 4 = 20.
    // Rows across: floor(22 / 5.196) + 1 = 5 rows of 5, 4, 5, 4, 5 = 23.
    // Rows along: floor(26 / 5.196) + 1 = 6 lines (5 × 5.196 = 25.98 ≤ 26) of 4 each
    // (offset lines: floor((22 − 3) / 6) + 1 = 4) = 24.
    const usable = usableRectangle({ lengthFt: 30, widthFt: 30, spacingFt: 6, ...POINTS });
    expect(gridSeats(usable, 6)).toHaveLength(20);
    expect(staggeredSeats(usable, 6, "rows_across")).toHaveLength(23);
    expect(staggeredSeats(usable, 6, "rows_along")).toHaveLength(24);
  });

  it("hand-worked 30 × 30 ft room at 6 ft with desks: grid 20, staggered 18 (calc)", () => {
    // Desk centres: 24 ft across (x 3–27) × 19.5 ft deep (y 7.25–26.75).
    // Grid: (floor(24/6) + 1) × (floor(19.5/6) + 1) = 5 × 4 = 20.
    // Rows across: floor(19.5 / 5.196) + 1 = 4 rows of 5, 4, 5, 4 = 18.
    // Rows along: floor(24 / 5.196) + 1 = 5 lines of 4, 3, 4, 3, 4 = 18.
    const plan = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6 });
    expect(plan.alternatives).toEqual({ grid: 20, staggered: 18 });
    expect(plan.layout).toBe("grid");
    expect(plan.count).toBe(20);
  });

  it("a ~900 ft² classroom holds roughly 18 desks at 6 ft (common practice)", () => {
    // Common practice (REFERENCES §4): about 18 desks once a teacher zone and wall
    // clearance are kept. With the desk footprint, every 900 ft² shape we try lands in
    // 18–20. As points the same rooms give 21–25: a point model charges nothing for
    // the desk itself, so Clearhall always counts desks.
    const shapes: [number, number][] = [
      [30, 30],
      [25, 36],
      [36, 25],
      [28, 32],
      [32, 28],
    ];
    for (const [widthFt, lengthFt] of shapes) {
      const desks = seatsThatFit({ widthFt, lengthFt, spacingFt: 6 }).count;
      const points = seatsThatFit({ widthFt, lengthFt, spacingFt: 6, ...POINTS }).count;
      expect(desks, `${widthFt} × ${lengthFt} desks`).toBeGreaterThanOrEqual(16);
      expect(desks, `${widthFt} × ${lengthFt} desks`).toBeLessThanOrEqual(20);
      expect(points, `${widthFt} × ${lengthFt} points`).toBeGreaterThan(desks);
    }
  });

  it("3 ft apart (CDC March 2021, C2) seats more than three times as many as 6 ft", () => {
    const at6 = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6 }).count;
    const at3 = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 3 }).count;
    expect(at3).toBeGreaterThan(3 * at6);
  });
});
