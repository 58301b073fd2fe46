import { co2GenerationLps, outdoorAirPerPersonFromCo2, type Co2AgeBand } from "@/lib/air/co2";
import { litresPerSecondToCfm } from "@/lib/air/units";
import type { RoomUse } from "@/lib/air/ventilation";
import type { SchoolLevel } from "@/db/types";

/**
 * Which row of Persily & de Jonge (2017) stands for a room's occupants. Ages 5–8 sit
 * in the 6 to <11 band (the table starts at 6); high-school students (14–18) are
 * given the 11 to <16 band, the oldest students' row the table has; offices, adults.
 * Gyms are left out: activity there is far above the table's 1.0–1.4 met.
 */
export function co2AgeBandFor(use: RoomUse, level: SchoolLevel): Co2AgeBand | null {
  if (use === "gym") return null;
  if (use === "office") return "30_to_40";
  if (use === "classroom_5_8") return "6_to_11";
  return level === "elementary" ? "6_to_11" : "11_to_16";
}

/** Common practice: seated class work is about 1.2 met. Rooms at about 22 °C. */
export const CLASSROOM_MET = 1.2;
export const ROOM_TEMPERATURE_C = 22;

export interface OutdoorAirEstimate {
  lpsPerPerson: number;
  cfmPerPerson: number;
  generationLps: number;
}

/**
 * Outdoor air per person from a day's steady-state CO2, Vo = G / (Cs − Co) (ASTM
 * D6245). An estimate only: it holds when CO2 levelled off with steady occupancy.
 */
export function outdoorAirEstimate(input: { use: RoomUse; level: SchoolLevel; steadyStatePpm: number | null; outdoorPpm: number }): OutdoorAirEstimate | null {
  const band = co2AgeBandFor(input.use, input.level);
  if (!band || input.steadyStatePpm === null) return null;
  const generationLps = co2GenerationLps({ ageBand: band, met: CLASSROOM_MET, temperatureC: ROOM_TEMPERATURE_C });
  const lps = outdoorAirPerPersonFromCo2({ generationLps, indoorPpm: input.steadyStatePpm, outdoorPpm: input.outdoorPpm });
  if (lps === null) return null;
  return { lpsPerPerson: lps, cfmPerPerson: litresPerSecondToCfm(lps), generationLps };
}
