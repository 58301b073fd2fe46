import { describe, expect, it } from "vitest";
import {
  addSchoolDays,
  dayOfWeek,
  isIsoDate,
  isoDateInTimeZone,
  isSchoolDay,
  replyDueDate,
  schoolDaysBetween,
  schoolDaysUntil,
  type SchoolCalendar,
} from "@/lib/school-days/calendar";

// An invented calendar. 2025-11-24 is a Monday; 27–28 November are a holiday break.
const cal: SchoolCalendar = { holidays: ["2025-11-27", "2025-11-28"] };

describe("school days", () => {
  it("knows the days of the week", () => {
    expect(dayOfWeek("2025-11-24")).toBe(1);
    expect(dayOfWeek("2025-11-29")).toBe(6);
    expect(dayOfWeek("1969-12-31")).toBe(3);
  });

  it("weekends and holidays are not school days", () => {
    expect(isSchoolDay("2025-11-24", cal)).toBe(true);
    expect(isSchoolDay("2025-11-22", cal)).toBe(false);
    expect(isSchoolDay("2025-11-23", cal)).toBe(false);
    expect(isSchoolDay("2025-11-27", cal)).toBe(false);
  });

  it("other weekend days can be set", () => {
    const fridayOff: SchoolCalendar = { holidays: [], weekendDays: [5, 6] };
    expect(isSchoolDay("2025-11-28", fridayOff)).toBe(false);
    expect(isSchoolDay("2025-11-30", fridayOff)).toBe(true);
    expect(() => isSchoolDay("2025-11-30", { holidays: [], weekendDays: [0, 1, 2, 3, 4, 5, 6] })).toThrow(RangeError);
  });

  it("adds school days over a weekend", () => {
    expect(addSchoolDays("2025-11-21", 1, cal)).toBe("2025-11-24");
    expect(addSchoolDays("2025-11-24", 0, cal)).toBe("2025-11-24");
    expect(addSchoolDays("2025-11-24", -1, cal)).toBe("2025-11-21");
  });

  it("a reply target crossing a holiday: Tuesday + 3 school days skips Thu/Fri and the weekend", () => {
    // Wed 26 (1), Mon 1 Dec (2), Tue 2 Dec (3).
    expect(replyDueDate("2025-11-25", 3, cal)).toBe("2025-12-02");
  });

  it("the day of receipt does not count, even when it is a school day or not one", () => {
    expect(replyDueDate("2025-11-24", 2, cal)).toBe("2025-11-26");
    // Received Saturday: Monday is the first school day after it.
    expect(replyDueDate("2025-11-22", 2, cal)).toBe("2025-11-25");
    expect(replyDueDate("2025-11-24", 0, cal)).toBe("2025-11-24");
    expect(() => replyDueDate("2025-11-24", 1.5, cal)).toThrow(RangeError);
  });

  it("counts school days remaining, zero on the day, negative when overdue", () => {
    const due = replyDueDate("2025-11-25", 3, cal);
    expect(schoolDaysBetween("2025-11-25", due, cal)).toBe(3);
    expect(schoolDaysUntil(due, "2025-11-26", cal)).toBe(2);
    expect(schoolDaysUntil(due, "2025-11-29", cal)).toBe(2);
    expect(schoolDaysUntil(due, "2025-12-02", cal)).toBe(0);
    expect(schoolDaysUntil(due, "2025-12-03", cal)).toBe(-1);
    expect(schoolDaysUntil(due, "2025-12-08", cal)).toBe(-4);
  });

  it("schoolDaysBetween(received, replyDueDate(received, n)) is n for every start in a month", () => {
    for (let d = 1; d <= 30; d += 1) {
      const received = `2025-11-${String(d).padStart(2, "0")}`;
      for (const n of [0, 1, 2, 5, 10]) expect(schoolDaysBetween(received, replyDueDate(received, n, cal), cal)).toBe(n);
    }
  });

  it("refuses dates that are not YYYY-MM-DD calendar dates", () => {
    expect(isIsoDate("2025-02-29")).toBe(false);
    expect(isIsoDate("2024-02-29")).toBe(true);
    expect(isIsoDate("2025-11-24T08:00:00Z")).toBe(false);
    expect(() => isSchoolDay("24/11/2025", cal)).toThrow(RangeError);
    expect(() => isSchoolDay("2025-11-24", { holidays: ["2025-13-01"] })).toThrow(RangeError);
  });

  it("finds the district's date for an instant", () => {
    // 03:30 UTC on 25 Nov is still the evening of 24 Nov in Chicago (UTC−6 in November).
    expect(isoDateInTimeZone(new Date("2025-11-25T03:30:00Z"), "America/Chicago")).toBe("2025-11-24");
    expect(isoDateInTimeZone(new Date("2025-11-25T03:30:00Z"), "UTC")).toBe("2025-11-25");
  });
});
