import { describe, expect, it } from "vitest";
import { roomFigures } from "@/lib/air/room-figures";
import { airChangesPerHour, equivalentAirChangesPerHour, roomVolumeFt3 } from "@/lib/air/ventilation";

// ACH = cfm × 60 / ft³; sources turned into ACH and added (CDC, "Ventilation in
// Buildings", 2023, C2). Worked example from REFERENCES §1 (calc).
describe("air changes per hour, 900 ft² × 9 ft room (calc)", () => {
  const volume = roomVolumeFt3({ lengthFt: 30, widthFt: 30, ceilingFt: 9 });

  it("is 8,100 ft³", () => {
    expect(volume).toBe(8100);
  });

  it("300 cfm of outdoor air → 2.22 ACH", () => {
    expect(airChangesPerHour(300, volume)).toBeCloseTo(2.22, 2);
  });

  it("one air cleaner of CADR 400 cfm adds 2.96 → 5.19 equivalent ACH", () => {
    expect(airChangesPerHour(400, volume)).toBeCloseTo(2.96, 2);
    expect(equivalentAirChangesPerHour({ outdoorAirCfm: 300, volumeFt3: volume, airCleaners: 1, cadrCfmEach: 400 })).toBeCloseTo(5.19, 2);
  });

  it("roomFigures gives the same, unrounded, with removal times at the equivalent ACH", () => {
    const figures = roomFigures({
      lengthFt: 30,
      widthFt: 30,
      ceilingFt: 9,
      occupancy: 25,
      use: "classroom_5_8",
      outdoorAirCfm: 300,
      airCleaners: 1,
      cadrCfmEach: 400,
    });
    expect(figures.floorAreaFt2).toBe(900);
    expect(figures.volumeFt3).toBe(8100);
    expect(figures.airChangesPerHour).toBeCloseTo(300 / 135, 12);
    expect(figures.equivalentAirChangesPerHour).toBeCloseTo(700 / 135, 12);
    // ASHRAE 62.1 Table 6-1 (C2): 10 × 25 + 0.12 × 900 = 358 cfm, more than the 300 supplied.
    expect(figures.requiredOutdoorAirCfm).toBeCloseTo(358, 9);
    expect(figures.meetsOutdoorAirRate).toBe(false);
    // CDC 2003 Table B.1 formula: ln(100) / (700/135) × 60 ≈ 53.3 min.
    expect(figures.minutesTo99).toBeCloseTo((Math.log(100) / (700 / 135)) * 60, 9);
    expect(figures.minutesTo999).toBeCloseTo((Math.log(1000) / (700 / 135)) * 60, 9);
  });
});
