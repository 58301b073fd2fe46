// Daily CO2 figures for one room, fed one reading at a time so a large import never
// holds all its rows. Each reading stands for the air from its timestamp until the
// next reading, capped at maxGapMinutes so a dead sensor does not stretch one value
// over hours; that span is clipped to the occupied hours of its local day.

export interface Co2Reading {
  /** A Date, or an ISO 8601 string with Z or a ±hh:mm offset (naive local strings are refused). */
  timestamp: Date | string;
  ppm: number;
}

/** Calendar date (YYYY-MM-DD) and minutes since local midnight (fractional) of an instant. */
export type LocalClock = (instantMs: number) => { date: string; minuteOfDay: number };

export interface Co2DailyOptions {
  /** A LocalClock, a fixed UTC offset in minutes (−300 for UTC−5), or an IANA zone ("America/Chicago"). */
  localTime: LocalClock | number | string;
  /** Minutes from local midnight; default 480 (08:00). */
  occupiedStartMinute?: number;
  /** Minutes from local midnight, exclusive; default 900 (15:00). */
  occupiedEndMinute?: number;
  /** Default 1000 ppm: the district's choice; no standard sets an indoor CO2 limit. */
  thresholdPpm?: number;
  /** Longest span one reading may stand for; default 15 minutes. */
  maxGapMinutes?: number;
  /** Length of the plateau used for the steady-state estimate; default 30 minutes. */
  plateauMinutes?: number;
  /** Which local dates are occupied at all (school days); default every date. */
  isOccupiedDate?: (date: string) => boolean;
}

export interface Co2DaySummary {
  date: string;
  /** Readings whose span falls at least partly in occupied hours. */
  readings: number;
  /** Occupied minutes the readings cover. */
  coveredMinutes: number;
  /** Time-weighted mean over the covered occupied minutes. */
  meanPpm: number;
  peakPpm: number;
  /** Covered occupied minutes with a reading strictly above the threshold. */
  minutesAboveThreshold: number;
  /** Highest plateau mean (see below); null when no plateau window was covered well enough. */
  steadyStatePpm: number | null;
}

export interface Co2DailyResult {
  days: Co2DaySummary[];
  /** Readings refused: bad timestamp, naive timestamp string, or ppm not a positive number. */
  skippedReadings: number;
}

export interface Co2DailyAccumulator {
  add(reading: Co2Reading): void;
  finish(): Co2DailyResult;
}

export class Co2ReadingsOutOfOrderError extends Error {
  readonly previousMs: number;
  readonly receivedMs: number;
  constructor(previousMs: number, receivedMs: number) {
    super(
      `CO2 readings must be fed in time order: ${new Date(receivedMs).toISOString()} came after ${new Date(previousMs).toISOString()}`,
    );
    this.name = "Co2ReadingsOutOfOrderError";
    this.previousMs = previousMs;
    this.receivedMs = receivedMs;
  }
}

export const DEFAULT_OCCUPIED_START_MINUTE = 8 * 60;
export const DEFAULT_OCCUPIED_END_MINUTE = 15 * 60;
export const DEFAULT_CO2_THRESHOLD_PPM = 1000;
export const DEFAULT_MAX_GAP_MINUTES = 15;
export const DEFAULT_PLATEAU_MINUTES = 30;
// A plateau window counts when readings cover at least this share of it, so one
// missed reading does not void a day but a half-empty window does not pass as a level.
const PLATEAU_MIN_COVERAGE = 0.8;

const MINUTE_MS = 60_000;
const DAY_MS = 86_400_000;
const MINUTES_PER_DAY = 1440;
const QUARTER_HOUR_MS = 15 * MINUTE_MS;

// Formatting a date is the slowest step per reading; a sorted stream repeats the day.
let cachedDayNumber = Number.NaN;
let cachedIsoDate = "";

function isoDateFromDayNumber(dayNumber: number): string {
  if (dayNumber !== cachedDayNumber) {
    cachedIsoDate = new Date(dayNumber * DAY_MS).toISOString().slice(0, 10);
    cachedDayNumber = dayNumber;
  }
  return cachedIsoDate;
}

function nextIsoDate(date: string): string {
  return isoDateFromDayNumber(Math.round(Date.parse(`${date}T00:00:00Z`) / DAY_MS) + 1);
}

function localFromShiftedMs(shiftedMs: number): { date: string; minuteOfDay: number } {
  const dayNumber = Math.floor(shiftedMs / DAY_MS);
  return { date: isoDateFromDayNumber(dayNumber), minuteOfDay: (shiftedMs - dayNumber * DAY_MS) / MINUTE_MS };
}

export function fixedOffsetClock(utcOffsetMinutes: number): LocalClock {
  const offsetMs = utcOffsetMinutes * MINUTE_MS;
  return (instantMs) => localFromShiftedMs(instantMs + offsetMs);
}

/**
 * A clock for an IANA time zone. The zone's UTC offset is looked up once per UTC
 * quarter hour (offsets only change on quarter-hour boundaries) and reused, so a
 * sorted stream calls Intl rarely.
 */
export function timeZoneClock(timeZone: string): LocalClock {
  const format = new Intl.DateTimeFormat("en-US", {
    timeZone,
    hourCycle: "h23",
    year: "numeric",
    month: "numeric",
    day: "numeric",
    hour: "numeric",
    minute: "numeric",
    second: "numeric",
  });
  const offsetMsAt = (instantMs: number): number => {
    const parts: Record<string, number> = {};
    for (const part of format.formatToParts(new Date(instantMs))) {
      if (part.type !== "literal") parts[part.type] = Number(part.value);
    }
    const wallClockAsUtc = Date.UTC(
      parts.year ?? NaN,
      (parts.month ?? NaN) - 1,
      parts.day ?? NaN,
      parts.hour ?? NaN,
      parts.minute ?? NaN,
      parts.second ?? NaN,
    );
    return wallClockAsUtc - instantMs;
  };
  let cachedQuarter = Number.NaN;
  let cachedOffsetMs = 0;
  return (instantMs) => {
    const quarter = Math.floor(instantMs / QUARTER_HOUR_MS);
    if (quarter !== cachedQuarter) {
      cachedOffsetMs = offsetMsAt(quarter * QUARTER_HOUR_MS);
      cachedQuarter = quarter;
    }
    return localFromShiftedMs(instantMs + cachedOffsetMs);
  };
}

function toLocalClock(localTime: Co2DailyOptions["localTime"]): LocalClock {
  if (typeof localTime === "function") return localTime;
  if (typeof localTime === "number") return fixedOffsetClock(localTime);
  return timeZoneClock(localTime);
}

const ZONED_ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/i;

function instantMs(timestamp: Date | string): number {
  if (timestamp instanceof Date) return timestamp.getTime();
  // A string without an offset would be read in the server's own zone: refuse it.
  if (!ZONED_ISO.test(timestamp)) return Number.NaN;
  return Date.parse(timestamp);
}

interface Segment {
  startMinute: number;
  endMinute: number;
  ppm: number;
}

interface DayState {
  date: string;
  readings: number;
  coveredMinutes: number;
  ppmMinutes: number;
  peakPpm: number;
  minutesAbove: number;
  /** Segments that may still fall in the plateau window; running totals over segments[head…]. */
  window: { segments: Segment[]; head: number; minutes: number; ppmMinutes: number };
  bestPlateauPpm: number | null;
}

function newDay(date: string): DayState {
  return {
    date,
    readings: 0,
    coveredMinutes: 0,
    ppmMinutes: 0,
    peakPpm: Number.NEGATIVE_INFINITY,
    minutesAbove: 0,
    window: { segments: [], head: 0, minutes: 0, ppmMinutes: 0 },
    bestPlateauPpm: null,
  };
}

function summaryOf(day: DayState): Co2DaySummary {
  return {
    date: day.date,
    readings: day.readings,
    coveredMinutes: day.coveredMinutes,
    meanPpm: day.ppmMinutes / day.coveredMinutes,
    peakPpm: day.peakPpm,
    minutesAboveThreshold: day.minutesAbove,
    steadyStatePpm: day.bestPlateauPpm,
  };
}

export function createCo2DailyAccumulator(options: Co2DailyOptions): Co2DailyAccumulator {
  const clock = toLocalClock(options.localTime);
  const occupiedStart = options.occupiedStartMinute ?? DEFAULT_OCCUPIED_START_MINUTE;
  const occupiedEnd = options.occupiedEndMinute ?? DEFAULT_OCCUPIED_END_MINUTE;
  const threshold = options.thresholdPpm ?? DEFAULT_CO2_THRESHOLD_PPM;
  const maxGapMs = (options.maxGapMinutes ?? DEFAULT_MAX_GAP_MINUTES) * MINUTE_MS;
  const plateauMinutes = options.plateauMinutes ?? DEFAULT_PLATEAU_MINUTES;
  const isOccupiedDate = options.isOccupiedDate ?? (() => true);
  if (!(occupiedStart >= 0 && occupiedStart < occupiedEnd && occupiedEnd <= MINUTES_PER_DAY)) {
    throw new RangeError(`occupied hours must satisfy 0 ≤ start < end ≤ 1440, got ${occupiedStart}–${occupiedEnd}`);
  }
  if (!(maxGapMs > 0)) throw new RangeError("maxGapMinutes must be positive");
  if (!(plateauMinutes > 0)) throw new RangeError("plateauMinutes must be positive");

  const days: Co2DaySummary[] = [];
  let day: DayState | null = null;
  let skipped = 0;
  let pending: { ms: number; ppm: number } | null = null;
  let lastIntervalMs: number | null = null;
  let finished = false;

  function dayFor(date: string): DayState {
    if (day && day.date === date) return day;
    if (day && date < day.date) throw new RangeError(`local date went backwards: ${date} after ${day.date}`);
    if (day && day.coveredMinutes > 0) days.push(summaryOf(day));
    day = newDay(date);
    return day;
  }

  // Steady-state estimate: the highest time-weighted mean over any plateauMinutes
  // window of occupied time (windows ending at each reading's span). An occupied
  // classroom's CO2 climbs toward a level set by occupants and outdoor air and
  // flattens there (the steady state ASTM D6245's Vo = G / (Cs − Co) needs); the
  // highest sustained half hour finds that level while a 30-minute mean ignores
  // brief spikes such as someone breathing on the sensor. A high percentile would
  // mix rising and falling periods and needs the whole day held. It under-reads a
  // room that never levels off (short periods, few air changes): an estimate.
  function updatePlateau(d: DayState, segment: Segment): void {
    const windowEnd = segment.endMinute;
    const windowStart = windowEnd - plateauMinutes;
    const w = d.window;
    w.segments.push(segment);
    w.minutes += segment.endMinute - segment.startMinute;
    w.ppmMinutes += segment.ppm * (segment.endMinute - segment.startMinute);
    for (let front = w.segments[w.head]; front && front.endMinute <= windowStart; front = w.segments[w.head]) {
      w.minutes -= front.endMinute - front.startMinute;
      w.ppmMinutes -= front.ppm * (front.endMinute - front.startMinute);
      w.head += 1;
    }
    if (w.head > 1024) {
      w.segments = w.segments.slice(w.head);
      w.head = 0;
    }
    // Segments follow one another, so only the oldest can start before the window.
    const front = w.segments[w.head];
    const cut = front ? Math.max(0, windowStart - front.startMinute) : 0;
    const covered = w.minutes - cut;
    if (front && covered >= plateauMinutes * PLATEAU_MIN_COVERAGE) {
      const mean = (w.ppmMinutes - front.ppm * cut) / covered;
      if (d.bestPlateauPpm === null || mean > d.bestPlateauPpm) d.bestPlateauPpm = mean;
    }
  }

  function addPart(date: string, fromMinute: number, toMinute: number, ppm: number): void {
    if (!isOccupiedDate(date)) return;
    const start = Math.max(fromMinute, occupiedStart);
    const end = Math.min(toMinute, occupiedEnd);
    if (!(end > start)) return;
    const d = dayFor(date);
    const minutes = end - start;
    d.readings += 1;
    d.coveredMinutes += minutes;
    d.ppmMinutes += ppm * minutes;
    if (ppm > d.peakPpm) d.peakPpm = ppm;
    if (ppm > threshold) d.minutesAbove += minutes;
    updatePlateau(d, { startMinute: start, endMinute: end, ppm });
  }

  function addSpan(startMs: number, durationMs: number, ppm: number): void {
    if (durationMs <= 0) return;
    const local = clock(startMs);
    const endMinute = local.minuteOfDay + durationMs / MINUTE_MS;
    addPart(local.date, local.minuteOfDay, Math.min(endMinute, MINUTES_PER_DAY), ppm);
    if (endMinute > MINUTES_PER_DAY) addPart(nextIsoDate(local.date), 0, endMinute - MINUTES_PER_DAY, ppm);
  }

  return {
    add(reading) {
      if (finished) throw new Error("this accumulator has finished");
      const ms = instantMs(reading.timestamp);
      if (!Number.isFinite(ms) || !Number.isFinite(reading.ppm) || reading.ppm <= 0) {
        skipped += 1;
        return;
      }
      if (pending) {
        if (ms < pending.ms) throw new Co2ReadingsOutOfOrderError(pending.ms, ms);
        lastIntervalMs = ms - pending.ms;
        addSpan(pending.ms, Math.min(lastIntervalMs, maxGapMs), pending.ppm);
      }
      pending = { ms, ppm: reading.ppm };
    },
    finish() {
      if (!finished) {
        finished = true;
        // The last reading has no successor: it stands for as long as the interval before it.
        if (pending) addSpan(pending.ms, Math.min(lastIntervalMs ?? maxGapMs, maxGapMs), pending.ppm);
        const last = day;
        if (last && last.coveredMinutes > 0) days.push(summaryOf(last));
        day = null;
      }
      return { days: [...days], skippedReadings: skipped };
    },
  };
}

/** Convenience for readings already in memory: sorts a copy by time, then feeds the accumulator. */
export function summariseCo2Days(readings: Iterable<Co2Reading>, options: Co2DailyOptions): Co2DailyResult {
  const keyed = [...readings].map((reading) => ({ reading, ms: instantMs(reading.timestamp) }));
  // Unparseable timestamps sort first; the accumulator skips them.
  keyed.sort((a, b) => (Number.isNaN(a.ms) || Number.isNaN(b.ms) ? Number(!Number.isNaN(a.ms)) - Number(!Number.isNaN(b.ms)) : a.ms - b.ms));
  const accumulator = createCo2DailyAccumulator(options);
  for (const { reading } of keyed) accumulator.add(reading);
  return accumulator.finish();
}
