import { describe, expect, it } from "vitest";
import { breathingZoneOutdoorAir, meetsOutdoorAirRate, OUTDOOR_AIR_RATES, zoneOutdoorAir } from "@/lib/air/ventilation";

// ANSI/ASHRAE Standard 62.1, Table 6-1 (minimum ventilation rates in breathing zone).
// Status C2: read from the 2016 edition; that later editions are unchanged is U.
describe("ASHRAE 62.1 Table 6-1 rates (C2)", () => {
  it.each([
    ["classroom_5_8", 10, 0.12, 25],
    ["classroom_9_plus", 10, 0.12, 35],
    ["lecture", 7.5, 0.06, 65],
    ["science_lab", 10, 0.18, 25],
  ] as const)("%s: Rp %s cfm/person, Ra %s cfm/ft², %s people per 1000 ft²", (use, rp, ra, density) => {
    const rate = OUTDOOR_AIR_RATES[use];
    expect(rate.rpCfmPerPerson).toBe(rp);
    expect(rate.raCfmPerFt2).toBe(ra);
    expect(rate.defaultOccupantsPer1000Ft2).toBe(density);
    expect(rate.basis).toBe("ashrae_62_1_table_6_1");
  });

  it("marks the gym and office rates as from memory (U), and other as classroom age 9 plus", () => {
    // From memory, U: gym Rp 20, Ra 0.18; office Rp 5, Ra 0.06.
    expect(OUTDOOR_AIR_RATES.gym).toMatchObject({ rpCfmPerPerson: 20, raCfmPerFt2: 0.18, basis: "from_memory" });
    expect(OUTDOOR_AIR_RATES.office).toMatchObject({ rpCfmPerPerson: 5, raCfmPerFt2: 0.06, basis: "from_memory" });
    expect(OUTDOOR_AIR_RATES.other).toMatchObject({ rpCfmPerPerson: 10, raCfmPerFt2: 0.12, basis: "as_classroom_9_plus" });
  });
});

describe("Vbz = Rp·Pz + Ra·Az and Voz = Vbz / Ez (ASHRAE 62.1, calc from REFERENCES §2)", () => {
  const vbz = breathingZoneOutdoorAir({ use: "classroom_9_plus", people: 35, floorAreaFt2: 1000 });

  it("1,000 ft², 35 occupants, age 9 plus: Vbz = 350 + 120 = 470 cfm (calc)", () => {
    expect(vbz).toBeCloseTo(470, 9);
  });

  it("Voz = 470 cfm at Ez 1.0 (ceiling supply of cool air, C2)", () => {
    expect(zoneOutdoorAir(vbz)).toBeCloseTo(470, 9);
    expect(zoneOutdoorAir(vbz, 1.0)).toBeCloseTo(470, 9);
  });

  it("Voz = 587.5 cfm at Ez 0.8 (ceiling supply of warm air, ceiling return: U)", () => {
    expect(zoneOutdoorAir(vbz, 0.8)).toBeCloseTo(587.5, 9);
  });

  it("a supply equal to the requirement meets it; a cfm less does not", () => {
    expect(meetsOutdoorAirRate(470, vbz)).toBe(true);
    expect(meetsOutdoorAirRate(469, vbz)).toBe(false);
  });
});
