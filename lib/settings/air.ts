import { z } from "zod";
import type { DB } from "@/db/connection";
import type { Role } from "@/db/types";
import {
  DEFAULT_CO2_THRESHOLD_PPM,
  DEFAULT_OCCUPIED_END_MINUTE,
  DEFAULT_OCCUPIED_START_MINUTE,
} from "@/lib/air/co2-daily";
import { getSetting } from "./repository";

/**
 * District choices behind the public air and seating figures. None of them is a
 * limit from a standard: no standard sets an indoor CO2 limit (CDC 2023: above
 * 800 ppm suggests more outdoor air may be needed), so the threshold is the
 * district's own line for counting minutes.
 */
export interface AirSettings {
  /** Minutes above this level are counted each school day; default 1,000 ppm. */
  co2ThresholdPpm: number;
  /** Outdoor CO2 assumed for the steady-state estimate; default 420 ppm (common practice, from memory). */
  co2OutdoorPpm: number;
  /** Occupied hours, minutes from local midnight; default 08:00–15:00. */
  occupiedStartMinute: number;
  occupiedEndMinute: number;
  /** Spacing of the public seat counts, ft centre to centre; default 6 ft. */
  seatingSpacingFt: number;
  /** Zone air distribution effectiveness Ez (ASHRAE 62.1); default 1.0. */
  zoneAirDistributionEffectiveness: number;
}

/** District settings are the administrator's. */
export const AIR_SETTINGS_ROLES = ["admin"] as const satisfies readonly Role[];

export const AIR_SETTING_KEYS = {
  co2ThresholdPpm: "co2_threshold_ppm",
  co2OutdoorPpm: "co2_outdoor_ppm",
  occupiedStartMinute: "co2_occupied_start_minute",
  occupiedEndMinute: "co2_occupied_end_minute",
  seatingSpacingFt: "seating_spacing_ft",
  zoneAirDistributionEffectiveness: "zone_air_distribution_effectiveness",
} as const satisfies Record<keyof AirSettings, string>;

export const DEFAULT_AIR_SETTINGS: AirSettings = {
  co2ThresholdPpm: DEFAULT_CO2_THRESHOLD_PPM,
  co2OutdoorPpm: 420,
  occupiedStartMinute: DEFAULT_OCCUPIED_START_MINUTE,
  occupiedEndMinute: DEFAULT_OCCUPIED_END_MINUTE,
  seatingSpacingFt: 6,
  zoneAirDistributionEffectiveness: 1,
};

const minute = z.number().int().min(0).max(1440);

export const AIR_SETTING_SCHEMAS = {
  co2ThresholdPpm: z.number().min(400).max(5000),
  co2OutdoorPpm: z.number().min(300).max(600),
  occupiedStartMinute: minute,
  occupiedEndMinute: minute,
  seatingSpacingFt: z.number().min(1).max(20),
  zoneAirDistributionEffectiveness: z.number().min(0.5).max(1.2),
} as const satisfies Record<keyof AirSettings, z.ZodType<number>>;

export async function airSettings(db: DB): Promise<AirSettings> {
  const entries = await Promise.all(
    (Object.keys(AIR_SETTING_KEYS) as (keyof AirSettings)[]).map(
      async (name) => [name, await getSetting(db, AIR_SETTING_KEYS[name], AIR_SETTING_SCHEMAS[name], DEFAULT_AIR_SETTINGS[name])] as const,
    ),
  );
  const settings = Object.fromEntries(entries) as unknown as AirSettings;
  // A pair that no longer makes sense (start after end) falls back as a pair.
  if (!(settings.occupiedStartMinute < settings.occupiedEndMinute)) {
    settings.occupiedStartMinute = DEFAULT_AIR_SETTINGS.occupiedStartMinute;
    settings.occupiedEndMinute = DEFAULT_AIR_SETTINGS.occupiedEndMinute;
  }
  return settings;
}

export async function saveAirSettings(db: DB, settings: AirSettings, now = new Date().toISOString()): Promise<void> {
  await db.transaction().execute(async (trx) => {
    for (const name of Object.keys(AIR_SETTING_KEYS) as (keyof AirSettings)[]) {
      const value = JSON.stringify(settings[name]);
      await trx
        .insertInto("settings")
        .values({ key: AIR_SETTING_KEYS[name], value, updated_at: now })
        .onConflict((oc) => oc.column("key").doUpdateSet({ value, updated_at: now }))
        .execute();
    }
  });
}
