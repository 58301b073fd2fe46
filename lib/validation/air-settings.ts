import { z } from "zod";
import type { AirSettings } from "@/lib/settings/air";

const number = (message: string, min: number, max: number) =>
  z.preprocess(
    (v) => (typeof v === "string" && v.trim() !== "" ? Number(v) : undefined),
    z.number({ error: message }).refine((n) => Number.isFinite(n) && n >= min && n <= max, message),
  );

const clock = z
  .string({ error: "Enter a time like 08:00." })
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Enter a time like 08:00.")
  .transform((v) => Number(v.slice(0, 2)) * 60 + Number(v.slice(3)));

/** The district's air and seating choices, as the admin's form sends them. */
export const airSettingsFormSchema = z
  .object({
    co2ThresholdPpm: number("Enter a level from 400 to 5,000 ppm.", 400, 5000),
    co2OutdoorPpm: number("Enter outdoor CO2 from 300 to 600 ppm.", 300, 600),
    occupiedStart: clock,
    occupiedEnd: clock,
    seatingSpacingFt: number("Enter a spacing from 1 to 20 ft.", 1, 20),
    zoneAirDistributionEffectiveness: number("Enter Ez from 0.5 to 1.2.", 0.5, 1.2),
  })
  .refine((v) => v.occupiedStart < v.occupiedEnd, { path: ["occupiedEnd"], message: "The school day must end after it starts." })
  .transform(
    (v): AirSettings => ({
      co2ThresholdPpm: v.co2ThresholdPpm,
      co2OutdoorPpm: v.co2OutdoorPpm,
      occupiedStartMinute: v.occupiedStart,
      occupiedEndMinute: v.occupiedEnd,
      seatingSpacingFt: v.seatingSpacingFt,
      zoneAirDistributionEffectiveness: v.zoneAirDistributionEffectiveness,
    }),
  );
