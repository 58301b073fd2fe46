import { afterEach, describe, expect, it } from "vitest";
import { InvalidIsoDateError } from "@/lib/school-days/calendar";
import { formatIsoDateInYear, formatIsoDateLong } from "@/lib/school-days/format";
import {
  groupHolidaysByYear,
  holidaysFromStored,
  holidaysToStored,
  isoDateProblem,
  MAX_HOLIDAY_RANGE_DAYS,
  mergeHolidays,
  removeHolidayDates,
  weekdaysInRange,
  type DistrictHoliday,
} from "@/lib/school-days/holidays";
import { replyDueExample } from "@/lib/school-days/reply-example";
import { canonicalTimeZone } from "@/lib/school-days/time-zone";

// Days of the week below were checked with GNU date on this machine
// (`date -u -d 2026-12-21 +%A` → Monday, 2027-01-01 → Friday, 2026-12-19 → Saturday,
// 2026-12-25 → Friday, 2027-03-14 → Sunday). 2027-03-14 is also the day US daylight
// saving time starts in 2027 (second Sunday of March, 15 U.S.C. § 260a; from memory).

const h = (date: string, name: string | null = null): DistrictHoliday => ({ date, name });

describe("weekdaysInRange", () => {
  it("expands a winter break to its weekdays, both ends included, weekends skipped", () => {
    expect(weekdaysInRange("2026-12-21", "2027-01-01")).toEqual([
      "2026-12-21",
      "2026-12-22",
      "2026-12-23",
      "2026-12-24",
      "2026-12-25",
      "2026-12-28",
      "2026-12-29",
      "2026-12-30",
      "2026-12-31",
      "2027-01-01",
    ]);
  });

  it("keeps a single weekday, and gives nothing for a weekend", () => {
    expect(weekdaysInRange("2026-12-21")).toEqual(["2026-12-21"]);
    expect(weekdaysInRange("2026-12-21", "2026-12-21")).toEqual(["2026-12-21"]);
    expect(weekdaysInRange("2026-12-19", "2026-12-20")).toEqual([]);
  });

  it("crosses a leap day and a month end without losing or repeating a day", () => {
    expect(weekdaysInRange("2024-02-28", "2024-03-01")).toEqual(["2024-02-28", "2024-02-29", "2024-03-01"]);
  });

  it("refuses a range that ends before it starts, one too long, and impossible dates", () => {
    expect(() => weekdaysInRange("2026-12-21", "2026-12-18")).toThrow(RangeError);
    expect(() => weekdaysInRange("2026-01-01", "2027-01-02")).toThrow(/at most 366/);
    expect(weekdaysInRange("2026-01-01", "2027-01-01").length).toBeGreaterThan(250);
    expect(() => weekdaysInRange("2026-02-30", "2026-03-02")).toThrow(InvalidIsoDateError);
    expect(MAX_HOLIDAY_RANGE_DAYS).toBe(366);
  });

  describe("whatever the process time zone", () => {
    const saved = process.env.TZ;
    afterEach(() => {
      if (saved === undefined) delete process.env.TZ;
      else process.env.TZ = saved;
    });
    for (const zone of ["America/New_York", "Pacific/Kiritimati", "Pacific/Pago_Pago"]) {
      it(`gives the same days across the 2027 daylight saving change in ${zone}`, () => {
        process.env.TZ = zone;
        expect(weekdaysInRange("2027-03-12", "2027-03-16")).toEqual(["2027-03-12", "2027-03-15", "2027-03-16"]);
        expect(formatIsoDateLong("2027-03-14")).toBe("Sunday, March 14, 2027");
        expect(formatIsoDateInYear("2026-12-21")).toBe("Monday, December 21");
      });
    }
  });
});

describe("isoDateProblem", () => {
  it("accepts real dates", () => {
    expect(isoDateProblem("2026-12-21")).toBeNull();
    expect(isoDateProblem("2024-02-29")).toBeNull();
  });

  it("names what is wrong with an impossible or mistyped date", () => {
    expect(isoDateProblem("2026-02-30")).toBe("2026-02-30 is not a date: February 2026 has 28 days.");
    expect(isoDateProblem("2025-02-29")).toBe("2025-02-29 is not a date: February 2025 has 28 days.");
    expect(isoDateProblem("2026-04-31")).toBe("2026-04-31 is not a date: April 2026 has 30 days.");
    expect(isoDateProblem("2026-13-01")).toBe("2026-13-01 is not a date: there is no month 13.");
    expect(isoDateProblem("2026-12-00")).toMatch(/December 2026 has 31 days/);
    expect(isoDateProblem("12/21/2026")).toBe("Write the date as year-month-day, like 2026-12-21.");
    expect(isoDateProblem("2026-12-1")).toMatch(/year-month-day/);
    expect(isoDateProblem("0226-12-21")).toBe("Use a year from 2000 to 2099.");
  });
});

describe("mergeHolidays", () => {
  const existing = [h("2026-11-27", "Thanksgiving break"), h("2026-11-26", "Thanksgiving")];

  it("adds new days in date order and merges duplicates", () => {
    const merge = mergeHolidays(existing, ["2026-12-22", "2026-12-21", "2026-12-21", "2026-11-26"]);
    expect(merge.holidays.map((x) => x.date)).toEqual(["2026-11-26", "2026-11-27", "2026-12-21", "2026-12-22"]);
    expect(merge.added).toEqual(["2026-12-21", "2026-12-22"]);
    expect(merge.unchanged).toEqual(["2026-11-26"]);
    expect(merge.holidays[0]?.name).toBe("Thanksgiving");
  });

  it("gives a listed day the new name when one is given, and keeps its name otherwise", () => {
    const renamed = mergeHolidays(existing, ["2026-11-26"], "  Thanksgiving   Day ");
    expect(renamed.renamed).toEqual(["2026-11-26"]);
    expect(renamed.holidays[0]).toEqual({ date: "2026-11-26", name: "Thanksgiving Day" });
    const same = mergeHolidays(existing, ["2026-11-26"], "");
    expect(same.renamed).toEqual([]);
    expect(same.holidays[0]?.name).toBe("Thanksgiving");
  });

  it("refuses an impossible date", () => {
    expect(() => mergeHolidays(existing, ["2026-02-30"])).toThrow(InvalidIsoDateError);
  });
});

describe("removeHolidayDates", () => {
  it("removes the days asked for and reports those already gone", () => {
    const result = removeHolidayDates([h("2026-12-21"), h("2026-12-22"), h("2026-12-23")], ["2026-12-22", "2026-12-24"]);
    expect(result.holidays.map((x) => x.date)).toEqual(["2026-12-21", "2026-12-23"]);
    expect(result.removed).toEqual(["2026-12-22"]);
    expect(result.missing).toEqual(["2026-12-24"]);
  });
});

describe("groupHolidaysByYear", () => {
  it("groups by year in date order and splits each year at today", () => {
    const years = groupHolidaysByYear([h("2027-01-01"), h("2026-12-21"), h("2025-11-27"), h("2026-11-26"), h("2026-12-01")], "2026-12-01");
    expect(years.map((y) => y.year)).toEqual([2025, 2026, 2027]);
    expect(years[0]).toEqual({ year: 2025, past: [h("2025-11-27")], upcoming: [] });
    expect(years[1]?.past.map((x) => x.date)).toEqual(["2026-11-26"]);
    expect(years[1]?.upcoming.map((x) => x.date)).toEqual(["2026-12-01", "2026-12-21"]);
    expect(years[2]?.upcoming.map((x) => x.date)).toEqual(["2027-01-01"]);
  });
});

describe("stored form", () => {
  it("keeps the desk's setting a sorted array of dates and the names apart", () => {
    const stored = holidaysToStored([h("2026-12-22", "Winter break"), h("2026-11-26", "Thanksgiving"), h("2026-12-21")]);
    expect(stored).toEqual({ dates: ["2026-11-26", "2026-12-21", "2026-12-22"], names: { "2026-11-26": "Thanksgiving", "2026-12-22": "Winter break" } });
    expect(holidaysFromStored(stored.dates, stored.names)).toEqual([h("2026-11-26", "Thanksgiving"), h("2026-12-21"), h("2026-12-22", "Winter break")]);
  });

  it("ignores names of days no longer listed, and names that are not own keys", () => {
    expect(holidaysFromStored(["2026-12-21"], { "2026-12-22": "Gone" })).toEqual([h("2026-12-21")]);
    expect(holidaysFromStored(["2026-12-21"], Object.create({ "2026-12-21": "inherited" }) as Record<string, string>)).toEqual([h("2026-12-21")]);
  });
});

describe("replyDueExample", () => {
  it("counts school days after the day of arrival, skipping weekends and holidays", () => {
    // Tuesday 2026-12-01 with a 3-day target: Wed 2, Thu 3, Fri 4.
    expect(replyDueExample("2026-12-01", 3, [])).toMatchObject({ due: "2026-12-04", weekendDays: 0, holidays: [] });
    // Friday 2026-12-18, 3 days, winter break from Monday 21st: the first school days are Mon 4, Tue 5, Wed 6 January.
    const holidays = weekdaysInRange("2026-12-21", "2027-01-01").map((d) => h(d, "Winter break"));
    const example = replyDueExample("2026-12-18", 3, holidays);
    expect(example.due).toBe("2027-01-06");
    expect(example.weekendDays).toBe(6);
    expect(example.holidays).toHaveLength(10);
    expect(replyDueExample("2026-12-18", 0, holidays).due).toBe("2026-12-18");
  });
});

describe("canonicalTimeZone", () => {
  it("spells IANA names the runtime's way and refuses the rest", () => {
    expect(canonicalTimeZone("America/New_York")).toBe("America/New_York");
    expect(canonicalTimeZone(" america/chicago ")).toBe("America/Chicago");
    expect(canonicalTimeZone("UTC")).toBe("UTC");
    expect(canonicalTimeZone("Mars/Olympus_Mons")).toBeNull();
    expect(canonicalTimeZone("+05:00")).toBeNull();
    expect(canonicalTimeZone("EST")).toBeNull();
    expect(canonicalTimeZone("")).toBeNull();
  });
});
