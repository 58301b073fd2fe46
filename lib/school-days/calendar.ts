// School days on calendar dates, written YYYY-MM-DD in the district's own time
// zone. Dates are never turned into instants: arithmetic runs on whole days from
// 1970-01-01, so a server in another zone cannot shift a date by one.

export type IsoDate = string;

export interface SchoolCalendar {
  /** Dates with no school (holidays, breaks, staff days), YYYY-MM-DD. */
  holidays: readonly IsoDate[];
  /** Days of the week with no school, 0 = Sunday … 6 = Saturday; default [0, 6]. */
  weekendDays?: readonly number[];
}

const DAY_MS = 86_400_000;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

export class InvalidIsoDateError extends RangeError {
  readonly value: string;
  constructor(value: string) {
    super(`not a calendar date in YYYY-MM-DD form: ${JSON.stringify(value)}`);
    this.name = "InvalidIsoDateError";
    this.value = value;
  }
}

/** Whole days since 1970-01-01 for a YYYY-MM-DD date; throws on anything else (2021-02-30 included). */
export function dayNumber(date: IsoDate): number {
  const match = ISO_DATE.exec(date);
  if (!match) throw new InvalidIsoDateError(date);
  const [, y, m, d] = match.map(Number);
  const ms = Date.UTC(y ?? NaN, (m ?? NaN) - 1, d ?? NaN);
  if (Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== date) throw new InvalidIsoDateError(date);
  return ms / DAY_MS;
}

export function isoDateFromDayNumber(day: number): IsoDate {
  return new Date(day * DAY_MS).toISOString().slice(0, 10);
}

export function isIsoDate(value: string): boolean {
  try {
    dayNumber(value);
    return true;
  } catch {
    return false;
  }
}

export function addCalendarDays(date: IsoDate, days: number): IsoDate {
  return isoDateFromDayNumber(dayNumber(date) + days);
}

/** 0 = Sunday … 6 = Saturday. */
export function dayOfWeek(date: IsoDate): number {
  // 1970-01-01 was a Thursday.
  return (((dayNumber(date) + 4) % 7) + 7) % 7;
}

interface PreparedCalendar {
  holidays: ReadonlySet<number>;
  weekendDays: ReadonlySet<number>;
}

function prepare(cal: SchoolCalendar): PreparedCalendar {
  const weekendDays = new Set(cal.weekendDays ?? [0, 6]);
  if ([0, 1, 2, 3, 4, 5, 6].every((d) => weekendDays.has(d))) {
    throw new RangeError("a calendar with every day of the week off has no school days");
  }
  return { holidays: new Set(cal.holidays.map(dayNumber)), weekendDays };
}

function isSchoolDayNumber(day: number, cal: PreparedCalendar): boolean {
  return !cal.weekendDays.has((((day + 4) % 7) + 7) % 7) && !cal.holidays.has(day);
}

export function isSchoolDay(date: IsoDate, cal: SchoolCalendar): boolean {
  return isSchoolDayNumber(dayNumber(date), prepare(cal));
}

/**
 * The date n school days after start (before it when n < 0). The start day itself
 * never counts, school day or not; n = 0 returns start unchanged.
 */
export function addSchoolDays(start: IsoDate, n: number, cal: SchoolCalendar): IsoDate {
  if (!Number.isInteger(n)) throw new RangeError(`school days must be a whole number, got ${n}`);
  const prepared = prepare(cal);
  const step = n < 0 ? -1 : 1;
  let day = dayNumber(start);
  for (let left = Math.abs(n); left > 0; ) {
    day += step;
    if (isSchoolDayNumber(day, prepared)) left -= 1;
  }
  return isoDateFromDayNumber(day);
}

/**
 * School days from `from` until `to`: the school days after `from` up to and
 * including `to`. Positive while a due date is ahead (1 = due on the next school
 * day), 0 on the due date, negative once it has passed (−1 = one school day overdue).
 */
export function schoolDaysBetween(from: IsoDate, to: IsoDate, cal: SchoolCalendar): number {
  const prepared = prepare(cal);
  const a = dayNumber(from);
  const b = dayNumber(to);
  const [low, high, sign] = a <= b ? [a, b, 1] : [b, a, -1];
  let count = 0;
  for (let day = low + 1; day <= high; day += 1) if (isSchoolDayNumber(day, prepared)) count += 1;
  return sign * count;
}

/**
 * When a reply is due: targetSchoolDays school days after the day of receipt. The
 * day of receipt does not count, whether or not it is a school day: a question in
 * on Monday with a 2-day target is due Wednesday; one in on Saturday is due Tuesday.
 * So schoolDaysBetween(received, replyDueDate(received, n)) is always n.
 */
export function replyDueDate(receivedDate: IsoDate, targetSchoolDays: number, cal: SchoolCalendar): IsoDate {
  if (!(Number.isInteger(targetSchoolDays) && targetSchoolDays >= 0)) {
    throw new RangeError(`reply target must be a whole number of school days, got ${targetSchoolDays}`);
  }
  return addSchoolDays(receivedDate, targetSchoolDays, cal);
}

/** School days left until a reply is due, from today's date; negative when overdue. */
export function schoolDaysUntil(dueDate: IsoDate, today: IsoDate, cal: SchoolCalendar): number {
  return schoolDaysBetween(today, dueDate, cal);
}

/** The calendar date an instant falls on in a time zone ("today" for the district). */
export function isoDateInTimeZone(instant: Date, timeZone: string): IsoDate {
  const parts = new Intl.DateTimeFormat("en-US", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(instant);
  const part = (type: string): string => parts.find((p) => p.type === type)?.value ?? "";
  return `${part("year").padStart(4, "0")}-${part("month")}-${part("day")}`;
}
