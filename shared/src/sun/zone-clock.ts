/**
 * Local clock ↔ UTC in an IANA time zone, with the platform's `Intl` time-zone data only. Offsets are read
 * from `Intl.DateTimeFormat#formatToParts`; formatters are cached per zone because creating one costs far
 * more than using it.
 */
import { msPerDay, msPerMinute } from './time-constants.js';

const formatterCache = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatterCache.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
    formatterCache.set(timeZone, formatter);
  }
  return formatter;
}

/**
 * Whether `timeZone` is an IANA zone name this platform knows.
 * @example isValidTimeZone('Europe/Berlin') // true
 * @example isValidTimeZone('Mars/Olympus') // false
 */
export function isValidTimeZone(timeZone: string): boolean {
  if (typeof timeZone !== 'string' || timeZone.length === 0) return false;
  try {
    formatterFor(timeZone);
    return true;
  } catch {
    return false;
  }
}

/**
 * Offset of the local clock from UTC at an instant, in minutes (local − UTC; +60 for CET in winter).
 * @example zoneOffsetMinutes(Date.UTC(2026, 0, 15), 'Europe/Berlin') // 60
 */
export function zoneOffsetMinutes(utcMs: number, timeZone: string): number {
  const parts = formatterFor(timeZone).formatToParts(utcMs);
  let year = 0;
  let month = 1;
  let day = 1;
  let hour = 0;
  let minute = 0;
  let second = 0;
  for (const part of parts) {
    switch (part.type) {
      case 'year':
        year = Number(part.value);
        break;
      case 'month':
        month = Number(part.value);
        break;
      case 'day':
        day = Number(part.value);
        break;
      case 'hour':
        hour = Number(part.value) % 24;
        break;
      case 'minute':
        minute = Number(part.value);
        break;
      case 'second':
        second = Number(part.value);
        break;
      default:
        break;
    }
  }
  const wallMs = Date.UTC(year, month - 1, day, hour, minute, second);
  const wholeSecondUtcMs = Math.floor(utcMs / 1000) * 1000;
  return Math.round((wallMs - wholeSecondUtcMs) / msPerMinute);
}

/** A calendar date, month 1–12. */
export interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

/**
 * Parses `YYYY-MM-DD` into a calendar date; null when the text is not a real date (e.g. `2026-02-30`).
 * @example parseIsoDate('2026-03-28') // { year: 2026, month: 3, day: 28 }
 */
export function parseIsoDate(text: string): CalendarDate | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!match) return null;
  const year = Number(match[1]);
  const month = Number(match[2]);
  const day = Number(match[3]);
  const check = new Date(Date.UTC(year, month - 1, day));
  if (check.getUTCFullYear() !== year || check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day) return null;
  return { year, month, day };
}

/**
 * Parses `HH:mm` (00:00–23:59) into minutes after local midnight; null when malformed.
 * @example parseClockMinutes('16:30') // 990
 */
export function parseClockMinutes(text: string): number | null {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(text);
  if (!match) return null;
  return Number(match[1]) * 60 + Number(match[2]);
}

/** `YYYY-MM-DD` of the calendar date `days` after `date` (proleptic Gregorian, no time zone involved). */
export function addDaysIso(date: CalendarDate, days: number): string {
  const d = new Date(Date.UTC(date.year, date.month - 1, date.day) + days * msPerDay);
  return d.toISOString().slice(0, 10);
}

/** Milliseconds of the local wall clock `minutesOfDay` on `date`, read as if it were UTC (no offset applied). */
export function wallClockMs(date: CalendarDate, minutesOfDay: number): number {
  return Date.UTC(date.year, date.month - 1, date.day) + minutesOfDay * msPerMinute;
}

/**
 * The UTC instant of a local wall-clock time in an IANA zone. A time that occurs twice (clocks going back)
 * resolves to the earlier occurrence; a time skipped by clocks going forward resolves to the instant the
 * old offset would give, which reads as that time plus the gap on the new clock (as Temporal's
 * `compatible` disambiguation does).
 * @example localToUtcMs({ year: 2026, month: 1, day: 15 }, 8 * 60, 'Europe/Berlin') // Date.UTC(2026, 0, 15, 7)
 */
export function localToUtcMs(date: CalendarDate, minutesOfDay: number, timeZone: string): number {
  const wallMs = wallClockMs(date, minutesOfDay);
  // No zone is more than 14 h from UTC, so these two instants bracket every reading of the wall time.
  const offsetBefore = zoneOffsetMinutes(wallMs - 18 * 60 * msPerMinute, timeZone);
  const offsetAfter = zoneOffsetMinutes(wallMs + 18 * 60 * msPerMinute, timeZone);
  const withBefore = wallMs - offsetBefore * msPerMinute;
  if (offsetBefore === offsetAfter) return withBefore;
  const withAfter = wallMs - offsetAfter * msPerMinute;
  const beforeValid = zoneOffsetMinutes(withBefore, timeZone) === offsetBefore;
  const afterValid = zoneOffsetMinutes(withAfter, timeZone) === offsetAfter;
  if (beforeValid && afterValid) return Math.min(withBefore, withAfter);
  if (beforeValid) return withBefore;
  if (afterValid) return withAfter;
  return withBefore;
}

/** Local date and clock time of an instant. */
export interface LocalClock {
  /** `YYYY-MM-DD`. */
  date: string;
  /** `HH:mm`. */
  time: string;
  /** Minutes after local midnight, 0 ≤ m < 1440. */
  minutesOfDay: number;
}

/** `HH:mm` for every minute of the day, built once (formatting is the hot spot of long trips). */
const clockLabels: readonly string[] = Array.from(
  { length: 1440 },
  (_, m) => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`,
);

/** Minutes after local midnight of an instant, given the zone offset in minutes that applies at it. */
export function localMinutesOfDay(utcMs: number, offsetMinutes: number): number {
  const wallMs = utcMs + offsetMinutes * msPerMinute;
  return Math.floor((wallMs - Math.floor(wallMs / msPerDay) * msPerDay) / msPerMinute);
}

/**
 * `HH:mm` of minutes after midnight (0–1439).
 * @example clockLabel(990) // '16:30'
 */
export function clockLabel(minutesOfDay: number): string {
  return clockLabels[minutesOfDay] ?? '00:00';
}

/** Local date and clock of an instant, given the zone offset in minutes that applies at it. */
export function localClockFromOffset(utcMs: number, offsetMinutes: number): LocalClock {
  const wallMs = utcMs + offsetMinutes * msPerMinute;
  const dayStartMs = Math.floor(wallMs / msPerDay) * msPerDay;
  const minutesOfDay = localMinutesOfDay(utcMs, offsetMinutes);
  return { date: new Date(dayStartMs).toISOString().slice(0, 10), time: clockLabel(minutesOfDay), minutesOfDay };
}

/**
 * Local date and clock time of an instant in an IANA zone.
 * @example utcToLocalClock(Date.UTC(2026, 0, 15, 7), 'Europe/Berlin') // { date: '2026-01-15', time: '08:00', minutesOfDay: 480 }
 */
export function utcToLocalClock(utcMs: number, timeZone: string): LocalClock {
  return localClockFromOffset(utcMs, zoneOffsetMinutes(utcMs, timeZone));
}

/**
 * The zone's offset over one span of at most ~26 hours, found with two offset look-ups plus a bisection
 * to the minute when a DST change falls inside. Time zones change offset at most once in such a span.
 */
export class SpanOffsets {
  readonly startOffsetMinutes: number;
  readonly endOffsetMinutes: number;
  /** First instant (UTC ms) with the end offset; equals the span start when the offset does not change. */
  readonly changeUtcMs: number;

  /**
   * @param knownOffsets offsets at the span's start and end when the caller has them already (saves two
   *   look-ups); they must be the zone's offsets at those instants.
   */
  constructor(
    startUtcMs: number,
    endUtcMs: number,
    timeZone: string,
    knownOffsets?: { startOffsetMinutes: number; endOffsetMinutes: number },
  ) {
    this.startOffsetMinutes = knownOffsets?.startOffsetMinutes ?? zoneOffsetMinutes(startUtcMs, timeZone);
    this.endOffsetMinutes = knownOffsets?.endOffsetMinutes ?? zoneOffsetMinutes(endUtcMs, timeZone);
    if (this.startOffsetMinutes === this.endOffsetMinutes) {
      this.changeUtcMs = startUtcMs;
      return;
    }
    let lo = startUtcMs;
    let hi = endUtcMs;
    while (hi - lo > msPerMinute) {
      const mid = Math.floor((lo + hi) / 2 / msPerMinute) * msPerMinute;
      if (mid <= lo || mid >= hi) break;
      if (zoneOffsetMinutes(mid, timeZone) === this.startOffsetMinutes) lo = mid;
      else hi = mid;
    }
    this.changeUtcMs = hi;
  }

  /** Offset in minutes at an instant inside the span. */
  offsetAt(utcMs: number): number {
    return utcMs < this.changeUtcMs ? this.startOffsetMinutes : this.endOffsetMinutes;
  }

  /**
   * The instant of a local wall-clock time (as `wallClockMs`) inside the span, with the same
   * disambiguation as `localToUtcMs`: the earlier of two readings, the old offset inside a gap.
   */
  wallToUtc(wallMs: number): number {
    const beforeChange = wallMs - this.startOffsetMinutes * msPerMinute;
    if (this.startOffsetMinutes === this.endOffsetMinutes || beforeChange < this.changeUtcMs) return beforeChange;
    const afterChange = wallMs - this.endOffsetMinutes * msPerMinute;
    return afterChange >= this.changeUtcMs ? afterChange : beforeChange;
  }
}
