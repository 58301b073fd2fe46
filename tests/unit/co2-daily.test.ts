import { describe, expect, it } from "vitest";
import {
  Co2ReadingsOutOfOrderError,
  createCo2DailyAccumulator,
  summariseCo2Days,
  timeZoneClock,
  type Co2Reading,
} from "@/lib/air/co2-daily";

// The district in these tests keeps UTC−5.
const OFFSET = -300;

/** An instant at a local wall-clock time in UTC−5. */
function at(date: string, hh: number, mm: number): Date {
  return new Date(Date.parse(`${date}T00:00:00Z`) + ((hh - OFFSET / 60) * 60 + mm) * 60_000);
}

/** Readings every `step` minutes from `from` (inclusive) to `to` (exclusive), local minutes. */
function series(date: string, from: number, to: number, step: number, ppm: (minute: number) => number): Co2Reading[] {
  const readings: Co2Reading[] = [];
  for (let m = from; m < to; m += step) readings.push({ timestamp: at(date, Math.floor(m / 60), m % 60), ppm: ppm(m) });
  return readings;
}

function feed(readings: Co2Reading[], options: Parameters<typeof createCo2DailyAccumulator>[0]) {
  const accumulator = createCo2DailyAccumulator(options);
  for (const r of readings) accumulator.add(r);
  return accumulator.finish();
}

describe("daily CO2 accumulator", () => {
  // Monday: 2,000 ppm before school, 800 / 1,200 / 900 during it, 3,000 after.
  const monday = series("2025-11-24", 7 * 60, 16 * 60 + 5, 5, (m) =>
    m < 480 ? 2000 : m < 600 ? 800 : m < 720 ? 1200 : m < 900 ? 900 : 3000,
  );
  // Tuesday: 1,000 ppm every 10 minutes, nothing from 09:50 until 11:00.
  const tuesday = series("2025-11-25", 8 * 60, 15 * 60, 10, () => 1000).filter((r) => {
    const local = (r.timestamp as Date).getTime() - at("2025-11-25", 0, 0).getTime();
    const minute = local / 60_000;
    return minute < 10 * 60 || minute >= 11 * 60;
  });
  // Wednesday: readings only in the evening.
  const wednesday = series("2025-11-26", 18 * 60, 20 * 60, 5, () => 2500);

  const result = feed([...monday, ...tuesday, ...wednesday], { localTime: OFFSET });

  it("summarises each occupied day and leaves out days with no occupied readings", () => {
    expect(result.days.map((d) => d.date)).toEqual(["2025-11-24", "2025-11-25"]);
    expect(result.skippedReadings).toBe(0);
  });

  it("ignores readings outside 08:00–15:00 for mean, peak and minutes above", () => {
    const day = result.days[0];
    expect(day?.coveredMinutes).toBeCloseTo(420, 9);
    // (120 × 800 + 120 × 1200 + 180 × 900) / 420
    expect(day?.meanPpm).toBeCloseTo(402000 / 420, 9);
    expect(day?.peakPpm).toBe(1200);
    expect(day?.minutesAboveThreshold).toBeCloseTo(120, 9);
    expect(day?.steadyStatePpm).toBeCloseTo(1200, 9);
    expect(day?.readings).toBe(84);
  });

  it("caps a reading at 15 minutes across a gap, and counts only strictly above the threshold", () => {
    const day = result.days[1];
    // 08:00–10:05 (the 09:50 reading stands for 15 min) + 11:00–15:00 (14:50 clipped at 15:00).
    expect(day?.coveredMinutes).toBeCloseTo(125 + 240, 9);
    expect(day?.meanPpm).toBeCloseTo(1000, 9);
    expect(day?.minutesAboveThreshold).toBe(0);
  });

  it("weights readings by the time until the next one", () => {
    const readings: Co2Reading[] = [
      { timestamp: at("2025-12-01", 8, 0), ppm: 600 },
      { timestamp: at("2025-12-01", 8, 1), ppm: 1500 },
      { timestamp: at("2025-12-01", 8, 31), ppm: 600 },
      { timestamp: at("2025-12-01", 8, 36), ppm: 600 },
    ];
    const [day] = feed(readings, { localTime: OFFSET }).days;
    // 1 min at 600, 15 min at 1,500 (capped; 08:16–08:31 uncovered), 5 + 5 min at 600.
    expect(day?.coveredMinutes).toBeCloseTo(26, 9);
    expect(day?.minutesAboveThreshold).toBeCloseTo(15, 9);
    expect(day?.meanPpm).toBeCloseTo((600 * 11 + 1500 * 15) / 26, 9);
    // The gap leaves no 30-minute window 80% covered (the best, ending 08:16, has 16 min).
    expect(day?.steadyStatePpm).toBeNull();
  });

  it("takes the steady state as the highest 30-minute plateau, not a one-reading spike", () => {
    const readings = series("2025-12-02", 8 * 60, 11 * 60, 1, (m) => (m === 600 ? 2500 : m >= 540 && m < 570 ? 1300 : 900));
    const [day] = feed(readings, { localTime: OFFSET }).days;
    expect(day?.peakPpm).toBe(2500);
    expect(day?.steadyStatePpm).toBeCloseTo(1300, 9);
  });

  it("honours another threshold, other occupied hours and a school-day filter", () => {
    const out = feed([...monday, ...tuesday], {
      localTime: OFFSET,
      thresholdPpm: 850,
      occupiedStartMinute: 9 * 60,
      occupiedEndMinute: 12 * 60,
      isOccupiedDate: (date) => date !== "2025-11-25",
    });
    expect(out.days).toHaveLength(1);
    expect(out.days[0]?.coveredMinutes).toBeCloseTo(180, 9);
    // 09:00–10:00 at 800 is under 850; 10:00–12:00 at 1,200 is over.
    expect(out.days[0]?.minutesAboveThreshold).toBeCloseTo(120, 9);
  });

  it("splits a reading's span at local midnight and gives each part to its own day", () => {
    const readings: Co2Reading[] = [
      { timestamp: at("2025-12-03", 23, 55), ppm: 1500 },
      { timestamp: at("2025-12-04", 0, 10), ppm: 700 },
      { timestamp: at("2025-12-04", 0, 20), ppm: 700 },
    ];
    const out = feed(readings, { localTime: OFFSET, occupiedStartMinute: 0, occupiedEndMinute: 60 });
    // 23:55–24:00 falls outside 3 December's 00:00–01:00; 00:00–00:10 counts on 4 December.
    expect(out.days.map((d) => [d.date, d.coveredMinutes, d.minutesAboveThreshold])).toEqual([["2025-12-04", 30, 10]]);
    const lateHours = feed(readings, { localTime: OFFSET, occupiedStartMinute: 23 * 60, occupiedEndMinute: 1440 });
    expect(lateHours.days.map((d) => [d.date, d.coveredMinutes, d.minutesAboveThreshold])).toEqual([["2025-12-03", 5, 5]]);
  });

  it("reads local time in an IANA zone, daylight saving included", () => {
    // Chicago: UTC−6 in January, UTC−5 in July; 14:00Z and 13:00Z are 08:00 local.
    const chicago = timeZoneClock("America/Chicago");
    expect(chicago(Date.parse("2026-01-12T14:00:00Z"))).toEqual({ date: "2026-01-12", minuteOfDay: 480 });
    expect(chicago(Date.parse("2026-07-13T13:00:00Z"))).toEqual({ date: "2026-07-13", minuteOfDay: 480 });
    const out = feed(
      [
        { timestamp: "2026-01-12T13:50:00Z", ppm: 2000 },
        { timestamp: "2026-01-12T14:00:00Z", ppm: 700 },
        { timestamp: "2026-01-12T14:10:00Z", ppm: 700 },
      ],
      { localTime: "America/Chicago" },
    );
    expect(out.days[0]).toMatchObject({ date: "2026-01-12", peakPpm: 700, coveredMinutes: 20 });
  });

  it("skips bad readings and refuses timestamps without an offset", () => {
    const out = feed(
      [
        { timestamp: "2025-12-01T08:00:00", ppm: 900 },
        { timestamp: "not a date", ppm: 900 },
        { timestamp: at("2025-12-01", 8, 0), ppm: Number.NaN },
        { timestamp: at("2025-12-01", 8, 0), ppm: -5 },
        { timestamp: "2025-12-01T13:00:00Z", ppm: 900 },
        { timestamp: "2025-12-01T08:10:00-05:00", ppm: 900 },
      ],
      { localTime: OFFSET },
    );
    expect(out.skippedReadings).toBe(4);
    expect(out.days[0]?.coveredMinutes).toBeCloseTo(20, 9);
  });

  it("throws a typed error when readings arrive out of order; summariseCo2Days sorts them", () => {
    const shuffled = [...monday].reverse();
    expect(() => feed(shuffled, { localTime: OFFSET })).toThrow(Co2ReadingsOutOfOrderError);
    const sorted = summariseCo2Days(shuffled, { localTime: OFFSET });
    expect(sorted.days[0]?.meanPpm).toBeCloseTo(402000 / 420, 9);
  });

  it("summarises a long stream without holding it", () => {
    // 200,000 readings a minute apart (about 139 days), generated lazily.
    const accumulator = createCo2DailyAccumulator({ localTime: OFFSET });
    const start = at("2025-09-01", 0, 0).getTime();
    for (let i = 0; i < 200_000; i += 1) accumulator.add({ timestamp: new Date(start + i * 60_000), ppm: 600 + (i % 60) * 10 });
    const out = accumulator.finish();
    expect(out.days).toHaveLength(139);
    expect(out.days.every((d) => Math.abs(d.coveredMinutes - 420) < 1e-9)).toBe(true);
  });
});
