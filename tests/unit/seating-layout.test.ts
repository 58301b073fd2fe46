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

const rooms: Array<{ lengthFt: number; widthFt: number; spacingFt: number }> = [];
for (let lengthFt = 6; lengthFt <= 44; lengthFt += 1.9) {
  for (let widthFt = 4; widthFt <= 42; widthFt += 2.3) {
    for (const spacingFt of [6, 3, 4.5]) rooms.push({ lengthFt, widthFt, spacingFt });
  }
}

describe("seatsThatFit over many room sizes", () => {
  it(`keeps every pair of seats a spacing apart and every seat in the usable area (${rooms.length} rooms)`, () => {
    // Collect failures and assert once: an expect per seat makes this slow.
    const failures: string[] = [];
    for (const room of rooms) {
      const plan = seatsThatFit(room);
      const u = plan.usable;
      const name = `${room.widthFt}×${room.lengthFt} at ${room.spacingFt}`;
      if (plan.count !== plan.seats.length) failures.push(`${name}: count ${plan.count} ≠ ${plan.seats.length} seats`);
      if (plan.count !== Math.max(plan.alternatives.grid, plan.alternatives.staggered)) failures.push(`${name}: not the better layout`);
      if (plan.count > 1 && closestPair(plan) < room.spacingFt - TOLERANCE_FT) failures.push(`${name}: seats ${closestPair(plan)} ft apart`);
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
    expect(seatsThatFit({ lengthFt: 8, widthFt: 4, spacingFt: 6 }).seats).toEqual([{ x: 2, y: 6 }]);
  });

  it("honours other clearances", () => {
    const plan = seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 6, wallClearanceFt: 3, teacherZoneFt: 8 });
    expect(plan.usable).toEqual({ x: 3, y: 8, widthFt: 24, lengthFt: 19 });
  });

  it("refuses a spacing that is not positive", () => {
    expect(() => seatsThatFit({ lengthFt: 30, widthFt: 30, spacingFt: 0 })).toThrow(RangeError);
  });
});

describe("seating plan drawing", () => {
  const input = { lengthFt: 30, widthFt: 30, spacingFt: 6 };

  it("draws the room, teacher zone, usable area and one seat and spacing circle per seat", () => {
    const drawing = seatingPlan(input);
    expect(drawing.viewBox).toBe("0 0 30 30");
    expect(drawing.shapes[0]).toEqual({ kind: "rect", role: "room", x: 0, y: 0, width: 30, height: 30 });
    expect(drawing.shapes[1]).toEqual({ kind: "rect", role: "teacher_zone", x: 0, y: 0, width: 30, height: 6 });
    expect(drawing.shapes.filter((s) => s.role === "seat")).toHaveLength(24);
    expect(drawing.shapes.filter((s) => s.role === "spacing")).toHaveLength(24);
  });

  it("describes the plan in words", () => {
    expect(describePlan(input)).toBe(
      "Room 30 feet wide and 30 feet long, with a teacher zone 6 feet deep at the front. 24 seats in staggered rows running front to back, each at least 6 feet from the next; straight rows would seat 20.",
    );
    expect(describePlan({ lengthFt: 20, widthFt: 16, spacingFt: 6 })).toMatch(/9 seats in straight rows/);
    expect(describePlan({ lengthFt: 5, widthFt: 5, spacingFt: 6 })).toMatch(/No seats fit/);
  });
});
