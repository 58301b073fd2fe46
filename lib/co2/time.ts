// Local dates and times in the district's zone, for CO2 readings. Offsets only
// change on quarter-hour boundaries, so each UTC quarter hour is looked up once.

const MINUTE_MS = 60_000;
const QUARTER_MS = 15 * MINUTE_MS;
const DAY_MS = 86_400_000;

export function utcOffsetMsAt(formatter: Intl.DateTimeFormat, instantMs: number): number {
  const parts: Record<string, number> = {};
  for (const part of formatter.formatToParts(new Date(instantMs))) {
    if (part.type !== "literal") parts[part.type] = Number(part.value);
  }
  const wall = Date.UTC(parts.year ?? NaN, (parts.month ?? NaN) - 1, parts.day ?? NaN, parts.hour ?? NaN, parts.minute ?? NaN, parts.second ?? NaN);
  return wall - Math.floor(instantMs / 1000) * 1000;
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  const known = formatters.get(timeZone);
  if (known) return known;
  const formatter = new Intl.DateTimeFormat("en-US", {
    timeZone,
    hourCycle: "h23",
    year: "numeric",
    month: "numeric",
    day: "numeric",
    hour: "numeric",
    minute: "numeric",
    second: "numeric",
  });
  formatters.set(timeZone, formatter);
  return formatter;
}

/** Local calendar date (YYYY-MM-DD) of instants, in any order, with the offset cached per quarter hour. */
export function localDateFinder(timeZone: string): (instantMs: number) => string {
  const formatter = formatterFor(timeZone);
  const offsets = new Map<number, number>();
  const dates = new Map<number, string>();
  return (instantMs) => {
    const quarter = Math.floor(instantMs / QUARTER_MS);
    let offset = offsets.get(quarter);
    if (offset === undefined) {
      offset = utcOffsetMsAt(formatter, quarter * QUARTER_MS);
      offsets.set(quarter, offset);
    }
    const dayNumber = Math.floor((instantMs + offset) / DAY_MS);
    let date = dates.get(dayNumber);
    if (date === undefined) {
      date = new Date(dayNumber * DAY_MS).toISOString().slice(0, 10);
      dates.set(dayNumber, date);
    }
    return date;
  };
}

/** The instant a local wall-clock time (date plus minutes from midnight) happens in a zone. */
export function zonedInstantMs(date: string, minuteOfDay: number, timeZone: string): number {
  const formatter = formatterFor(timeZone);
  const wall = Date.parse(`${date}T00:00:00Z`) + minuteOfDay * MINUTE_MS;
  // Two rounds settle the offset except inside a DST jump, where the later reading is fine.
  let guess = wall - utcOffsetMsAt(formatter, wall);
  guess = wall - utcOffsetMsAt(formatter, guess);
  return guess;
}
