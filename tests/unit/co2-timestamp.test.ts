import { describe, expect, it } from "vitest";
import { localDateFinder, zonedInstantMs } from "@/lib/co2/time";
import { parseZonedTimestamp } from "@/lib/co2/timestamp";
import { airSettingsFormSchema } from "@/lib/validation/air-settings";

describe("sensor timestamps", () => {
  it("reads ISO 8601 with Z or an offset, to the millisecond", () => {
    expect(parseZonedTimestamp("2026-11-30T08:05:00-05:00")).toBe(Date.UTC(2026, 10, 30, 13, 5));
    expect(parseZonedTimestamp("2026-11-30T13:05Z")).toBe(Date.UTC(2026, 10, 30, 13, 5));
    expect(parseZonedTimestamp("2026-11-30 08:05:00.250+01:00")).toBe(Date.UTC(2026, 10, 30, 7, 5, 0, 250));
    expect(parseZonedTimestamp("2026-11-30T08:05:00+0530")).toBe(Date.UTC(2026, 10, 30, 2, 35));
  });

  it("refuses a timestamp without an offset and dates that do not exist", () => {
    for (const bad of ["2026-11-30T08:05:00", "2026-02-30T08:00:00Z", "2026-11-30T24:00:00Z", "2026-13-01T08:00:00Z", "30/11/2026 08:05", "", "2026-11-30T08:00:00+19:00"]) {
      expect(parseZonedTimestamp(bad), bad).toBeNaN();
    }
    expect(parseZonedTimestamp("2028-02-29T08:00:00Z")).toBe(Date.UTC(2028, 1, 29, 8));
  });

  it("finds local dates and local times across a daylight-saving change (America/New_York)", () => {
    const date = localDateFinder("America/New_York");
    expect(date(Date.UTC(2026, 10, 1, 3, 59))).toBe("2026-10-31"); // 23:59 EDT
    expect(date(Date.UTC(2026, 10, 1, 4, 0))).toBe("2026-11-01");
    expect(date(Date.UTC(2026, 10, 30, 4, 59))).toBe("2026-11-29"); // 23:59 EST
    expect(zonedInstantMs("2026-10-30", 8 * 60, "America/New_York")).toBe(Date.UTC(2026, 9, 30, 12));
    expect(zonedInstantMs("2026-11-30", 8 * 60, "America/New_York")).toBe(Date.UTC(2026, 10, 30, 13));
  });
});

describe("district air choices form", () => {
  const good = { co2ThresholdPpm: "1000", co2OutdoorPpm: "420", occupiedStart: "08:00", occupiedEnd: "15:00", seatingSpacingFt: "6", zoneAirDistributionEffectiveness: "1" };

  it("parses the form into minutes and numbers", () => {
    expect(airSettingsFormSchema.parse(good)).toEqual({
      co2ThresholdPpm: 1000,
      co2OutdoorPpm: 420,
      occupiedStartMinute: 480,
      occupiedEndMinute: 900,
      seatingSpacingFt: 6,
      zoneAirDistributionEffectiveness: 1,
    });
  });

  it("refuses out-of-range values and a day that ends before it starts", () => {
    const result = airSettingsFormSchema.safeParse({ ...good, co2ThresholdPpm: "90", occupiedEnd: "07:00", zoneAirDistributionEffectiveness: "" });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path[0]);
    expect(paths).toContain("co2ThresholdPpm");
    expect(paths).toContain("zoneAirDistributionEffectiveness");
    const backwards = airSettingsFormSchema.safeParse({ ...good, occupiedEnd: "07:00" });
    expect(backwards.error?.issues.map((i) => [i.path[0], i.message])).toEqual([["occupiedEnd", "The school day must end after it starts."]]);
  });
});
