import { describe, expect, it } from "vitest";
import { seatsThatFit, type SeatingLayout } from "@/lib/seating/layout";
import { describePlan, seatingPlan } from "@/lib/seating/plan-svg";

// Seats may sit on the usable rectangle's edge and exactly one spacing apart; the
// staggered rows' diagonal is s only up to float rounding.
const TOLERANCE_FT = 1e-9;

function closestPair(plan: SeatingLayout): number {
  let closest = Infinity;
  for (let i = 0; i < plan.seats.length; i += 1) {
    for (let j = i + 1; j < plan.seats.length; j += 1) {
      const a = plan.seats[i];
      const b = plan.seats[j];
      if (a && b) closest = Math.min(closest, Math.hypot(a.x - b.x, a.y - b.y));
    }
  }
  return closest;
}

function desksOverlapAnywhere(plan: SeatingLayout): boolean {
  const { widthFt: dw, depthFt: dd } = plan.desk;
  for (let i = 0; i < plan.seats.length; i += 1) {
    for (let j = i + 1; j < plan.seats.length; j += 1) {
      const a = plan.seats[i];
      const b = plan.seats[j];
      if (a && b && Math.abs(a.x - b.x) < dw - TOLERANCE_FT && Math.abs(a.y - b.y) < dd - TOLERANCE_FT) return true;
    }
  }
  return false;
}

const rooms: Array<{ lengthFt: number; widthFt: number; spacingFt: number; deskWidthFt?: number; deskDepthFt?: number }> = [];
for (let lengthFt = 6; lengthFt <= 44; lengthFt += 1.9) {
  for (let widthFt = 4; widthFt <= 42; widthFt += 2.3) {
    for (const spacingFt of [6, 3, 4.5]) {
      rooms.push({ lengthFt, widthFt, spacingFt });
      rooms.push({ lengthFt, widthFt, spacingFt, deskWidthFt: 0, deskDepthFt: 0 });
    }
  }
}

describe("seatsThatFit over many room sizes", () => {
  it(`keeps every pair of seats a spacing apart and every seat in the usable area (${rooms.length} rooms)`, () => {
    // Collect failures and assert once: an expect per seat makes this slow.
    const failures: string[] = [];
    for (const room of rooms) {
      const plan = seatsThatFit(room);
      const u = plan.usable;
      const name = `${room.widthFt}×${room.lengthFt} at ${room.spacingFt}${room.deskWidthFt === 0 ? " (points)" : ""}`;
      if (plan.count !== plan.seats.length) failures.push(`${name}: count ${plan.count} ≠ ${plan.seats.length} seats`);
      if (plan.count !== Math.max(plan.alternatives.grid, plan.alternatives.staggered)) failures.push(`${name}: not the better layout`);
      if (plan.count > 1 && closestPair(plan) < room.spacingFt - TOLERANCE_FT) failures.push(`${name}: seats ${closestPair(plan)} ft apart`);
      if (desksOverlapAnywhere(plan)) failures.push(`${name}: desks overlap`);
      for (const seat of plan.seats) {
        const inUsable =
          seat.x >= u.x - TOLERANCE_FT &&
          seat.x <= u.x + u.widthFt + TOLERANCE_FT &&
          seat.y >= u.y - TOLERANCE_FT &&
          seat.y <= u.y + u.lengthFt + TOLERANCE_FT;
        // Never in the 6 ft teacher zone or within 2 ft of a wall.
        const clear =
          seat.y >= 6 - TOLERANCE_FT &&
          seat.x >= 2 - TOLERANCE_FT &&
          seat.x <= room.widthFt - 2 + TOLERANCE_FT &&
          seat.y <= room.lengthFt - 2 + TOLERANCE_FT;
        if (!inUsable || !clear) failures.push(`${name}: seat at (${seat.x}, ${seat.y})`);
        // The whole desk stands inside the desk area.
        const a = plan.deskArea;
        const { widthFt: dw, depthFt: dd } = plan.desk;
        const deskInside =
          seat.x - dw / 2 >= a.x - TOLERANCE_FT &&
          seat.x + dw / 2 <= a.x + a.widthFt + TOLERANCE_FT &&
          seat.y - dd / 2 >= a.y - TOLERANCE_FT &&
          seat.y + dd / 2 <= a.y + a.lengthFt + TOLERANCE_FT;
        if (!deskInside) failures.push(`${name}: desk at (${seat.x}, ${seat.y}) leaves the desk area`);
      }
    }
    expect(failures).toEqual([]);
    expect(rooms.length).toBeGreaterThan(1000);
  });

  it("seats more at 3 ft than at 6 ft", () => {
    const at6 = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6 }).count;
    const at3 = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 3 }).count;
    expect(at3).toBeGreaterThan(at6 * 3);
  });

  it("seats nobody when the room is smaller than its clearances, and one in a usable point", () => {
    expect(seatsThatFit({ lengthFt: 7, widthFt: 10, spacingFt: 6 }).count).toBe(0);
    expect(seatsThatFit({ lengthFt: 3, widthFt: 3, spacingFt: 6 }).seats).toEqual([]);
    const points = { deskWidthFt: 0, deskDepthFt: 0 };
    expect(seatsThatFit({ lengthFt: 8, widthFt: 4, spacingFt: 6, ...points }).seats).toEqual([{ x: 2, y: 6 }]);
    // The same room cannot take a 2 × 2.5 ft desk: it leaves a point, not a desk's room.
    expect(seatsThatFit({ lengthFt: 8, widthFt: 4, spacingFt: 6 }).seats).toEqual([]);
    // Exactly one desk's room: 2 ft clearance either side of a 2 ft desk, 2.5 ft behind the teacher zone.
    expect(seatsThatFit({ lengthFt: 10.5, widthFt: 6, spacingFt: 6 }).seats).toEqual([{ x: 3, y: 7.25 }]);
  });

  it("honours other clearances", () => {
    const plan = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6, wallClearanceFt: 3, teacherZoneFt: 8 });
    expect(plan.deskArea).toEqual({ x: 3, y: 8, widthFt: 24, lengthFt: 19 });
    expect(plan.usable).toEqual({ x: 4, y: 9.25, widthFt: 22, lengthFt: 16.5 });
  });

  it("never lets desks overlap: too close a spacing seats nobody", () => {
    // 2 × 2.5 ft desks 2.4 ft apart centre to centre would overlap in every layout.
    expect(seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 2.4 }).count).toBe(0);
    // At 2.5 ft a square grid just fits (desks touch front to back); points fit at any spacing.
    expect(seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 2.5 }).alternatives.grid).toBeGreaterThan(0);
    expect(seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 1, deskWidthFt: 0, deskDepthFt: 0 }).count).toBeGreaterThan(0);
  });

  it("refuses a spacing that is not positive", () => {
    expect(() => seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 0 })).toThrow(RangeError);
  });
});

describe("seating plan drawing", () => {
  const input = { lengthFt: 30, widthFt: 30, spacingFt: 6 };

  it("draws the room, teacher zone, desk area and one desk, seat and spacing circle per seat", () => {
    const drawing = seatingPlan(input);
    expect(drawing.viewBox).toBe("0 0 30 30");
    expect(drawing.shapes[0]).toEqual({ kind: "rect", role: "room", x: 0, y: 0, width: 30, height: 30 });
    expect(drawing.shapes[1]).toEqual({ kind: "rect", role: "teacher_zone", x: 0, y: 0, width: 30, height: 6 });
    expect(drawing.shapes[2]).toEqual({ kind: "rect", role: "desk_area", x: 2, y: 6, width: 26, height: 22 });
    expect(drawing.shapes.filter((s) => s.role === "seat")).toHaveLength(20);
    expect(drawing.shapes.filter((s) => s.role === "desk")).toHaveLength(20);
    expect(drawing.shapes.filter((s) => s.role === "spacing")).toHaveLength(20);
    const points = seatingPlan({ ...input, deskWidthFt: 0, deskDepthFt: 0 });
    expect(points.shapes.filter((s) => s.role === "seat")).toHaveLength(24);
    expect(points.shapes.filter((s) => s.role === "desk")).toHaveLength(0);
  });

  it("describes the plan in words", () => {
    expect(describePlan(input)).toBe(
      "Room 30 feet wide and 30 feet long, with a teacher zone 6 feet deep at the front. 20 desks (each 2 by 2.5 feet) in straight rows, each at least 6 feet from the next, centre to centre.",
    );
    expect(describePlan({ ...input, deskWidthFt: 0, deskDepthFt: 0 })).toBe(
      "Room 30 feet wide and 30 feet long, with a teacher zone 6 feet deep at the front. 24 seats in staggered rows running front to back, each at least 6 feet from the next, centre to centre; straight rows would seat 20.",
    );
    expect(describePlan({ lengthFt: 20, widthFt: 16, spacingFt: 6, deskWidthFt: 0, deskDepthFt: 0 })).toMatch(/9 seats in straight rows/);
    expect(describePlan({ lengthFt: 5, widthFt: 5, spacingFt: 6 })).toMatch(/No desks 2 by 2.5 feet fit/);
    expect(describePlan({ lengthFt: 5, widthFt: 5, spacingFt: 6, deskWidthFt: 0, deskDepthFt: 0 })).toMatch(/No seats fit/);
  });
});

describe("seatingOptions", () => {
  it("gives both layouts with the better one, matching seatsThatFit", async () => {
    const { seatingOptions } = await import("@/lib/seating/layout");
    const options = seatingOptions({ lengthFt: 30, widthFt: 30, spacingFt: 6 });
    expect(options.best).toEqual(seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6 }));
    expect(options.grid.count).toBe(20);
    expect(options.staggered.count).toBe(18);
    expect(options.staggered.layout).toBe("staggered");
    expect(options.best.layout).toBe("grid");
    const points = seatingOptions({ lengthFt: 30, widthFt: 30, spacingFt: 6, deskWidthFt: 0, deskDepthFt: 0 });
    expect([points.grid.count, points.staggered.count, points.best.count]).toEqual([20, 24, 24]);
    expect(points.staggered.orientation).toBe("rows_along");
  });
});
