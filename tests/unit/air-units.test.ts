import { describe, expect, it } from "vitest";
import {
  cfmToLitresPerSecond,
  cubicFeetToCubicMetres,
  cubicMetresToCubicFeet,
  feetToMetres,
  LITRES_PER_SECOND_PER_CFM,
  litresPerSecondToCfm,
  metresToFeet,
  squareFeetToSquareMetres,
  squareMetresToSquareFeet,
} from "@/lib/air/units";

// The international foot is 0.3048 m exactly (1959 agreement; from memory, a definition).
describe("unit conversion", () => {
  it("feet and metres", () => {
    expect(feetToMetres(1)).toBe(0.3048);
    expect(feetToMetres(10)).toBeCloseTo(3.048, 12);
    expect(metresToFeet(0.3048)).toBe(1);
  });

  it("square feet and square metres: 1 ft² = 0.09290304 m²", () => {
    expect(squareFeetToSquareMetres(1)).toBe(0.09290304);
    expect(squareFeetToSquareMetres(900)).toBeCloseTo(83.612736, 9);
    expect(squareMetresToSquareFeet(squareFeetToSquareMetres(900))).toBeCloseTo(900, 9);
  });

  it("cubic feet and cubic metres: 1 ft³ = 0.028316846592 m³", () => {
    expect(cubicFeetToCubicMetres(1)).toBe(0.028316846592);
    expect(cubicMetresToCubicFeet(cubicFeetToCubicMetres(8100))).toBeCloseTo(8100, 9);
  });

  it("cfm and L/s: 1 cfm = 0.4719474432 L/s (0.47194745 to 8 places)", () => {
    expect(LITRES_PER_SECOND_PER_CFM).toBe(0.4719474432);
    expect(cfmToLitresPerSecond(1)).toBeCloseTo(0.47194745, 7);
    // ASHRAE 62.1 pairs 10 cfm with 5 L/s: the rounding its metric column uses (C2).
    expect(cfmToLitresPerSecond(10)).toBeCloseTo(4.72, 2);
    expect(litresPerSecondToCfm(cfmToLitresPerSecond(470))).toBeCloseTo(470, 9);
  });
});
