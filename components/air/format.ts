// Rounding for display only; every figure is stored and computed unrounded.
const whole = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const one = new Intl.NumberFormat("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const upToOne = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });
const upToTwo = new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 });

export const formatWhole = (n: number): string => whole.format(n);
export const formatOneDecimal = (n: number): string => one.format(n);
export const formatUpToOne = (n: number): string => upToOne.format(n);
export const formatUpToTwo = (n: number): string => upToTwo.format(n);

const dayFormat = new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", timeZone: "UTC" });
const longDayFormat = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "long", day: "numeric", year: "numeric", timeZone: "UTC" });
const weekdayFormat = new Intl.DateTimeFormat("en-US", { weekday: "short", timeZone: "UTC" });

/** A calendar date (YYYY-MM-DD) as "Mon, Nov 30"; read at noon UTC so no zone shifts it. */
export const formatDay = (isoDate: string): string => dayFormat.format(new Date(`${isoDate}T12:00:00Z`));
export const formatLongDay = (isoDate: string): string => longDayFormat.format(new Date(`${isoDate}T12:00:00Z`));
/** "Mon 30": the weekday and the day of the month. */
export const formatShortDay = (isoDate: string): string => `${weekdayFormat.format(new Date(`${isoDate}T12:00:00Z`))} ${Number(isoDate.slice(8, 10))}`;

/** Minutes as "55 min" or "1 h 40 min". */
export function formatMinutes(minutes: number): string {
  const m = Math.round(minutes);
  if (m < 60) return `${m} min`;
  const h = Math.floor(m / 60);
  return m % 60 === 0 ? `${h} h` : `${h} h ${m % 60} min`;
}

export function formatClock(minuteOfDay: number): string {
  const h = Math.floor(minuteOfDay / 60);
  const m = minuteOfDay % 60;
  const hour12 = ((h + 11) % 12) + 1;
  return `${hour12}:${String(m).padStart(2, "0")} ${h < 12 ? "a.m." : "p.m."}`;
}
