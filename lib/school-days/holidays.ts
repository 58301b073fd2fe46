// The district's list of days with no school besides weekends: adding a day or a
// break, removing days, and showing them by year. Pure functions on YYYY-MM-DD
// dates; arithmetic runs on whole UTC days (calendar.ts), so no server time zone
// can move a date.

import { dayNumber, dayOfWeek, isoDateFromDayNumber, type IsoDate } from "./calendar";

export interface DistrictHoliday {
  date: IsoDate;
  /** What the day is, e.g. "Winter break"; null when nobody named it. */
  name: string | null;
}

/** The longest span one entry may cover: a whole school year with room to spare. */
export const MAX_HOLIDAY_RANGE_DAYS = 366;
/** Enough for many years of holidays and breaks. */
export const MAX_DISTRICT_HOLIDAYS = 2000;
export const EARLIEST_HOLIDAY_YEAR = 2000;
export const LATEST_HOLIDAY_YEAR = 2099;
export const DEFAULT_WEEKEND_DAYS: readonly number[] = [0, 6];

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/**
 * Why a typed value is not a usable calendar date, in words for the person who typed
 * it; null when it is one. "2026-02-30" gets "February 2026 has 28 days".
 */
export function isoDateProblem(value: string): string | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!match) return "Write the date as year-month-day, like 2026-12-21.";
  const year = Number(match[1]);
  const month = Number(match[2]);
  const day = Number(match[3]);
  if (month < 1 || month > 12) return `${value} is not a date: there is no month ${month}.`;
  const daysInMonth = new Date(Date.UTC(year, month, 0)).getUTCDate();
  if (day < 1 || day > daysInMonth) {
    return `${value} is not a date: ${MONTHS[month - 1]} ${year} has ${daysInMonth} days.`;
  }
  if (year < EARLIEST_HOLIDAY_YEAR || year > LATEST_HOLIDAY_YEAR) {
    return `Use a year from ${EARLIEST_HOLIDAY_YEAR} to ${LATEST_HOLIDAY_YEAR}.`;
  }
  return null;
}

/** Calendar days from `from` to `to`, both included; 1 for a single day, 0 or less when `to` is earlier. */
export function daysInRange(from: IsoDate, to: IsoDate): number {
  return dayNumber(to) - dayNumber(from) + 1;
}

/**
 * Every weekday from `from` to `to`, both ends included, in order. Weekends (by
 * default Saturday and Sunday) are left out: they are never school days, so they
 * need no entry. Throws a RangeError when `to` is before `from` or the span is longer
 * than MAX_HOLIDAY_RANGE_DAYS.
 */
export function weekdaysInRange(from: IsoDate, to: IsoDate = from, weekendDays: readonly number[] = DEFAULT_WEEKEND_DAYS): IsoDate[] {
  const first = dayNumber(from);
  const last = dayNumber(to);
  if (last < first) throw new RangeError(`the last day (${to}) is before the first (${from})`);
  if (last - first + 1 > MAX_HOLIDAY_RANGE_DAYS) throw new RangeError(`a range may cover at most ${MAX_HOLIDAY_RANGE_DAYS} days`);
  const weekend = new Set(weekendDays);
  const out: IsoDate[] = [];
  for (let day = first; day <= last; day += 1) {
    const date = isoDateFromDayNumber(day);
    if (!weekend.has(dayOfWeek(date))) out.push(date);
  }
  return out;
}

const byDate = (a: DistrictHoliday, b: DistrictHoliday) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0);

/** Sorted by date, one entry per date (the last one given wins). */
export function normaliseHolidays(holidays: readonly DistrictHoliday[]): DistrictHoliday[] {
  const byDay = new Map<IsoDate, DistrictHoliday>();
  for (const h of holidays) byDay.set(h.date, { date: h.date, name: cleanName(h.name) });
  return [...byDay.values()].sort(byDate);
}

function cleanName(name: string | null | undefined): string | null {
  const trimmed = name?.trim().replace(/\s+/g, " ") ?? "";
  return trimmed === "" ? null : trimmed;
}

export interface HolidayMerge {
  holidays: DistrictHoliday[];
  /** Dates that were not on the list before. */
  added: IsoDate[];
  /** Dates already listed whose name changed. */
  renamed: IsoDate[];
  /** Dates already listed and left as they were. */
  unchanged: IsoDate[];
}

/**
 * Adds dates to the list. A date already listed is not repeated; it takes the new
 * name when one is given and keeps its old name otherwise.
 */
export function mergeHolidays(existing: readonly DistrictHoliday[], dates: readonly IsoDate[], name: string | null = null): HolidayMerge {
  const byDay = new Map(normaliseHolidays(existing).map((h) => [h.date, h]));
  const newName = cleanName(name);
  const added: IsoDate[] = [];
  const renamed: IsoDate[] = [];
  const unchanged: IsoDate[] = [];
  for (const date of [...new Set(dates)].sort()) {
    dayNumber(date);
    const before = byDay.get(date);
    if (!before) {
      byDay.set(date, { date, name: newName });
      added.push(date);
    } else if (newName !== null && newName !== before.name) {
      byDay.set(date, { date, name: newName });
      renamed.push(date);
    } else {
      unchanged.push(date);
    }
  }
  return { holidays: [...byDay.values()].sort(byDate), added, renamed, unchanged };
}

export interface HolidayRemoval {
  holidays: DistrictHoliday[];
  removed: IsoDate[];
  /** Dates asked for that were not on the list. */
  missing: IsoDate[];
}

export function removeHolidayDates(existing: readonly DistrictHoliday[], dates: readonly IsoDate[]): HolidayRemoval {
  const drop = new Set(dates);
  const holidays = normaliseHolidays(existing);
  const removed = holidays.filter((h) => drop.has(h.date)).map((h) => h.date);
  const kept = new Set(removed);
  const missing = [...drop].filter((d) => !kept.has(d)).sort();
  return { holidays: holidays.filter((h) => !drop.has(h.date)), removed, missing };
}

export interface HolidayYear {
  year: number;
  /** Days before `today`, oldest first. */
  past: DistrictHoliday[];
  /** `today` and later, soonest first. */
  upcoming: DistrictHoliday[];
}

/** The list by calendar year, oldest year first, each split at `today`. */
export function groupHolidaysByYear(holidays: readonly DistrictHoliday[], today: IsoDate): HolidayYear[] {
  const years = new Map<number, HolidayYear>();
  for (const h of normaliseHolidays(holidays)) {
    const year = Number(h.date.slice(0, 4));
    let group = years.get(year);
    if (!group) {
      group = { year, past: [], upcoming: [] };
      years.set(year, group);
    }
    (h.date < today ? group.past : group.upcoming).push(h);
  }
  return [...years.values()].sort((a, b) => a.year - b.year);
}

/** From the two stored settings: the date list the desk reads and the names kept beside it. */
export function holidaysFromStored(dates: readonly IsoDate[], names: Readonly<Record<string, string>>): DistrictHoliday[] {
  return normaliseHolidays(dates.map((date) => ({ date, name: Object.hasOwn(names, date) ? (names[date] ?? null) : null })));
}

/** Back to the two stored settings; names of dates no longer listed are dropped. */
export function holidaysToStored(holidays: readonly DistrictHoliday[]): { dates: IsoDate[]; names: Record<IsoDate, string> } {
  const list = normaliseHolidays(holidays);
  const names: Record<IsoDate, string> = {};
  for (const h of list) if (h.name !== null) names[h.date] = h.name;
  return { dates: list.map((h) => h.date), names };
}
