import { litresPerSecondToCfm } from "./units";

export const CO2_AGE_BANDS = ["6_to_11", "11_to_16", "30_to_40"] as const;
export type Co2AgeBand = (typeof CO2_AGE_BANDS)[number];

export const MET_LEVELS = [1.0, 1.2, 1.4] as const;
export type MetLevel = (typeof MET_LEVELS)[number];

export interface Co2GenerationRow {
  readonly ageBand: Co2AgeBand;
  readonly met: MetLevel;
  readonly maleLps: number;
  readonly femaleLps: number;
}

// Persily & de Jonge, "Carbon dioxide generation rates for building occupants",
// Indoor Air 27(5):868–879, 2017. L/s per person at 273.15 K and 1 atm.
// Age bands are lower-inclusive: "6_to_11" is 6 to <11 years.
export const CO2_GENERATION_LPS: readonly Co2GenerationRow[] = [
  { ageBand: "6_to_11", met: 1.0, maleLps: 0.0025, femaleLps: 0.0023 },
  { ageBand: "6_to_11", met: 1.2, maleLps: 0.003, femaleLps: 0.0027 },
  { ageBand: "6_to_11", met: 1.4, maleLps: 0.0035, femaleLps: 0.0032 },
  { ageBand: "11_to_16", met: 1.0, maleLps: 0.0034, femaleLps: 0.0029 },
  { ageBand: "11_to_16", met: 1.2, maleLps: 0.0041, femaleLps: 0.0035 },
  { ageBand: "11_to_16", met: 1.4, maleLps: 0.0048, femaleLps: 0.0041 },
  { ageBand: "30_to_40", met: 1.0, maleLps: 0.0037, femaleLps: 0.0029 },
  { ageBand: "30_to_40", met: 1.2, maleLps: 0.0046, femaleLps: 0.0035 },
  { ageBand: "30_to_40", met: 1.4, maleLps: 0.0053, femaleLps: 0.0041 },
];

const ZERO_CELSIUS_K = 273.15;

/**
 * CO2 generation per person, male and female averaged (a class of mixed sexes).
 * With temperatureC, corrected from the table's 0 °C to room temperature by the
 * ideal-gas ratio (273.15 + T) / 273.15 (×1.0805 at 22 °C).
 */
export function co2GenerationLps(input: { ageBand: Co2AgeBand; met: MetLevel; temperatureC?: number }): number {
  const row = CO2_GENERATION_LPS.find((r) => r.ageBand === input.ageBand && r.met === input.met);
  if (!row) throw new RangeError(`no CO2 generation rate for ${input.ageBand} at ${input.met} met`);
  const atZeroCelsius = (row.maleLps + row.femaleLps) / 2;
  if (input.temperatureC === undefined) return atZeroCelsius;
  return (atZeroCelsius * (ZERO_CELSIUS_K + input.temperatureC)) / ZERO_CELSIUS_K;
}

/**
 * Steady-state outdoor air per person, Vo = G / (Cs − Co) (ASTM D6245), in L/s.
 * An estimate only: it holds when CO2 has levelled off with steady occupancy.
 * null when indoor is not above outdoor (the relation gives no answer).
 */
export function outdoorAirPerPersonFromCo2(input: {
  generationLps: number;
  indoorPpm: number;
  outdoorPpm: number;
}): number | null {
  const riseFraction = (input.indoorPpm - input.outdoorPpm) * 1e-6;
  if (!(riseFraction > 0)) return null;
  return input.generationLps / riseFraction;
}

export function outdoorAirPerPersonFromCo2Cfm(input: {
  generationLps: number;
  indoorPpm: number;
  outdoorPpm: number;
}): number | null {
  const lps = outdoorAirPerPersonFromCo2(input);
  return lps === null ? null : litresPerSecondToCfm(lps);
}

/** The inverse: the CO2 level a room settles at, Cs = Co + G / Vo, in ppm. */
export function steadyStateCo2Ppm(input: {
  generationLps: number;
  outdoorAirLpsPerPerson: number;
  outdoorPpm: number;
}): number {
  if (!(input.outdoorAirLpsPerPerson > 0)) {
    throw new RangeError(`outdoor air per person must be positive, got ${input.outdoorAirLpsPerPerson}`);
  }
  return input.outdoorPpm + (input.generationLps / input.outdoorAirLpsPerPerson) * 1e6;
}
