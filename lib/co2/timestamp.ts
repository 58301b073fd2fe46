// ISO 8601 timestamps with an offset, as sensor logs write them:
// 2026-11-30T08:05:00-05:00, 2026-11-30T13:05Z, 2026-11-30T08:05:00.250+01:00.
// A timestamp without an offset is refused: it would be read in the server's zone.
const ZONED = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?(?:(Z)|([+-])(\d{2}):?(\d{2}))$/i;

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysIn(year: number, month: number): number {
  if (month === 2 && ((year % 4 === 0 && year % 100 !== 0) || year % 400 === 0)) return 29;
  return DAYS_IN_MONTH[month - 1] ?? 0;
}

/** Milliseconds since the epoch, or NaN when the text is not a real zoned timestamp. */
export function parseZonedTimestamp(text: string): number {
  const m = ZONED.exec(text);
  if (!m) return Number.NaN;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const hour = Number(m[4]);
  const minute = Number(m[5]);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  if (month < 1 || month > 12 || day < 1 || day > daysIn(year, month) || hour > 23 || minute > 59 || second > 59) return Number.NaN;
  const fraction = m[7] === undefined ? 0 : Number(`0.${m[7]}`);
  let offsetMinutes = 0;
  if (!m[8]) {
    const oh = Number(m[10]);
    const om = Number(m[11]);
    if (oh > 18 || om > 59) return Number.NaN;
    offsetMinutes = (m[9] === "-" ? -1 : 1) * (oh * 60 + om);
  }
  return Date.UTC(year, month - 1, day, hour, minute, second) + Math.round(fraction * 1000) - offsetMinutes * 60_000;
}
