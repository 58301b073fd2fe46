import { dayNumber, type IsoDate } from "./calendar";

const LONG = new Intl.DateTimeFormat("en-US", { weekday: "long", year: "numeric", month: "long", day: "numeric", timeZone: "UTC" });
const IN_YEAR = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "long", day: "numeric", timeZone: "UTC" });

// Formatted at UTC midnight of the day itself, so the weekday and date shown are
// the calendar date's own, wherever the server or browser is.
const instant = (date: IsoDate) => new Date(dayNumber(date) * 86_400_000);

/** "Monday, December 21, 2026". */
export function formatIsoDateLong(date: IsoDate): string {
  return LONG.format(instant(date));
}

/** "Monday, December 21", for a list under its year's heading. */
export function formatIsoDateInYear(date: IsoDate): string {
  return IN_YEAR.format(instant(date));
}
