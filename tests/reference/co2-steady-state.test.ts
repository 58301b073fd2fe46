import { describe, expect, it } from "vitest";
import { co2GenerationLps, outdoorAirPerPersonFromCo2, outdoorAirPerPersonFromCo2Cfm, steadyStateCo2Ppm } from "@/lib/air/co2";

// Persily & de Jonge, Indoor Air 27(5):868–879, 2017, generation rates (C2);
// ASTM D6245-18 steady state Vo = G / (Cs − Co) (relation U: text paywalled).
describe("outdoor air per person from steady-state CO2", () => {
  it("children 6 to <11 at 1.2 met, boys and girls averaged: G = 0.00285 L/s (Persily & de Jonge 2017, C2)", () => {
    expect(co2GenerationLps({ ageBand: "6_to_11", met: 1.2 })).toBeCloseTo(0.00285, 10);
  });

  it("420 ppm outdoors, 1,100 ppm steady indoors → 4.19 L/s, 8.88 cfm per person (calc; ASTM D6245 relation U)", () => {
    const generationLps = co2GenerationLps({ ageBand: "6_to_11", met: 1.2 });
    const input = { generationLps, indoorPpm: 1100, outdoorPpm: 420 };
    expect(outdoorAirPerPersonFromCo2(input)).toBeCloseTo(4.19, 2);
    expect(outdoorAirPerPersonFromCo2Cfm(input)).toBeCloseTo(8.88, 2);
  });

  it("round-trips through the steady-state level (calc)", () => {
    expect(steadyStateCo2Ppm({ generationLps: 0.00285, outdoorAirLpsPerPerson: 0.00285 / 0.00068, outdoorPpm: 420 })).toBeCloseTo(1100, 9);
  });

  it("gives no answer when indoor is not above outdoor", () => {
    expect(outdoorAirPerPersonFromCo2({ generationLps: 0.00285, indoorPpm: 420, outdoorPpm: 420 })).toBeNull();
    expect(outdoorAirPerPersonFromCo2({ generationLps: 0.00285, indoorPpm: 400, outdoorPpm: 420 })).toBeNull();
  });

  it("corrects from 273 K to 22 °C by ×1.0805 (Persily & de Jonge 2017, C2)", () => {
    const at0 = co2GenerationLps({ ageBand: "11_to_16", met: 1.0 });
    const at22 = co2GenerationLps({ ageBand: "11_to_16", met: 1.0, temperatureC: 22 });
    expect(at0).toBeCloseTo((0.0034 + 0.0029) / 2, 10);
    expect(at22 / at0).toBeCloseTo(1.0805, 4);
  });
});

describe("a room's daily outdoor-air estimate", () => {
  it("children's classroom at a 1,100 ppm plateau, 420 ppm outdoors: 4.53 L/s per person at 22 °C (calc from REFERENCES §3)", async () => {
    const { outdoorAirEstimate } = await import("@/lib/co2/estimate");
    const estimate = outdoorAirEstimate({ use: "classroom_5_8", level: "elementary", steadyStatePpm: 1100, outdoorPpm: 420 });
    // G = 0.00285 × (273.15 + 22) / 273.15 = 0.003079 L/s; Vo = 0.003079 / 0.000680 = 4.53 L/s (9.60 cfm).
    expect(estimate?.generationLps).toBeCloseTo(0.00285 * (295.15 / 273.15), 10);
    expect(estimate?.lpsPerPerson).toBeCloseTo(4.53, 2);
    expect(estimate?.cfmPerPerson).toBeCloseTo(9.6, 2);
  });

  it("makes no estimate for a gym, or without a plateau", async () => {
    const { outdoorAirEstimate } = await import("@/lib/co2/estimate");
    expect(outdoorAirEstimate({ use: "gym", level: "high", steadyStatePpm: 1100, outdoorPpm: 420 })).toBeNull();
    expect(outdoorAirEstimate({ use: "lecture", level: "high", steadyStatePpm: null, outdoorPpm: 420 })).toBeNull();
  });
});
