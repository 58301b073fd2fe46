import { describe, expect, it } from "vitest";
import { minutesToRemove, REMOVAL_99, REMOVAL_99_9 } from "@/lib/air/removal";

// CDC, Guidelines for Environmental Infection Control in Health-Care Facilities (2003),
// Appendix B, Table B.1: empty room, no source, perfect mixing; whole minutes.
const CDC_2003_TABLE_B1: ReadonlyArray<{ ach: number; to99: number; to999: number }> = [
  { ach: 2, to99: 138, to999: 207 },
  { ach: 4, to99: 69, to999: 104 },
  { ach: 6, to99: 46, to999: 69 },
  { ach: 8, to99: 35, to999: 52 },
  { ach: 10, to99: 28, to999: 41 },
  { ach: 12, to99: 23, to999: 35 },
  { ach: 15, to99: 18, to999: 28 },
  { ach: 20, to99: 14, to999: 21 },
  { ach: 50, to99: 6, to999: 8 },
];

describe("minutes to remove airborne contaminants (CDC 2003, Appendix B, Table B.1)", () => {
  it.each(CDC_2003_TABLE_B1)("$ach ACH: 99% in $to99 min, 99.9% in $to999 min", ({ ach, to99, to999 }) => {
    expect(Math.round(minutesToRemove(REMOVAL_99, ach) ?? Number.NaN)).toBe(to99);
    expect(Math.round(minutesToRemove(REMOVAL_99_9, ach) ?? Number.NaN)).toBe(to999);
  });

  it("gives null when no air is changed", () => {
    expect(minutesToRemove(REMOVAL_99, 0)).toBeNull();
    expect(minutesToRemove(REMOVAL_99, -1)).toBeNull();
  });

  it("refuses a fraction that can never be reached", () => {
    expect(() => minutesToRemove(1, 6)).toThrow(RangeError);
    expect(() => minutesToRemove(-0.1, 6)).toThrow(RangeError);
  });
});
