/**
 * Trip days and steps on the local clock. A trip of N nights has N + 1 days; day d runs from its
 * walking-window start (local clock) to the next day's walking-window start, so a day is 23, 24 or 25 h
 * long across DST changes. Steps are `stepMinutes` long from the day's start, cut at the day's end and at
 * every window boundary, so each step lies wholly in one window.
 */
import type { TripSolarInput } from '../schemas/trip-solar.js';
import { msPerHour, msPerMinute } from './time-constants.js';
import type { StepWindow } from './trip-solar-types.js';
import {
  addDaysIso,
  clockLabel,
  localMinutesOfDay,
  localToUtcMs,
  parseClockMinutes,
  parseIsoDate,
  SpanOffsets,
  wallClockMs,
  zoneOffsetMinutes,
  type CalendarDate,
} from './zone-clock.js';

/** One trip day on the clock. */
export interface TimelineDay {
  dayIndex: number;
  date: CalendarDate;
  dateLocal: string;
  startUtcMs: number;
  endUtcMs: number;
  offsets: SpanOffsets;
}

/** One step of the timeline. */
export interface TimelineStep {
  dayIndex: number;
  startUtcMs: number;
  endUtcMs: number;
  midUtcMs: number;
  durationH: number;
  /** Local clock at the step start, `HH:mm`. */
  localTime: string;
  window: StepWindow;
  /** Start instant of the window occurrence this step is in (the re-aim intervals count from it). */
  windowStartUtcMs: number;
}

/** The trip's days and steps, and the local → UTC conversion the rest of the series uses. */
export interface TripTimeline {
  days: TimelineDay[];
  steps: TimelineStep[];
  /** UTC instant of local clock `minutesOfDay` on the date `dateIndex` days after the start (may be −1 or N + 1). */
  localUtc(dateIndex: number, minutesOfDay: number): number;
}

/** Whether local minute `m` lies in the window [start, end), which wraps past midnight when end < start. */
export function inClockWindow(m: number, startMin: number, endMin: number): boolean {
  return startMin < endMin ? m >= startMin && m < endMin : m >= startMin || m < endMin;
}

function toCalendarDate(iso: string): CalendarDate {
  const date = parseIsoDate(iso);
  if (!date) throw new RangeError(`Not a date: ${iso}`);
  return date;
}

function clockMinutes(text: string): number {
  const minutes = parseClockMinutes(text);
  if (minutes === null) throw new RangeError(`Not a clock time: ${text}`);
  return minutes;
}

/**
 * Builds the trip's days and steps from a parsed trip solar input.
 * @example buildTripTimeline(input).days.length // input.nights + 1
 */
export function buildTripTimeline(input: TripSolarInput): TripTimeline {
  const start = toCalendarDate(input.startDate);
  const dayCount = input.nights + 1;
  const walkStart = clockMinutes(input.walkWindow.start);
  const walkEnd = clockMinutes(input.walkWindow.end);
  const campStart = clockMinutes(input.campWindow.start);
  const campEnd = clockMinutes(input.campWindow.end);
  const stepMs = input.stepMinutes * msPerMinute;

  const dates: CalendarDate[] = [];
  for (let d = -1; d <= dayCount + 1; d++) dates.push(toCalendarDate(addDaysIso(start, d)));
  const dateAt = (dateIndex: number): CalendarDate => dates[dateIndex + 1] as CalendarDate;

  // Day boundaries: each is tried with the previous boundary's offset first (one look-up), and solved in
  // full only where the offset changed.
  const boundaries: number[] = [];
  const boundaryOffsets: number[] = [];
  for (let d = 0; d <= dayCount; d++) {
    const previousOffset = boundaryOffsets[d - 1];
    let utcMs: number | null = null;
    let offset = 0;
    if (previousOffset !== undefined) {
      const guess = wallClockMs(dateAt(d), walkStart) - previousOffset * msPerMinute;
      offset = zoneOffsetMinutes(guess, input.timeZone);
      if (offset === previousOffset) utcMs = guess;
    }
    if (utcMs === null) {
      utcMs = localToUtcMs(dateAt(d), walkStart, input.timeZone);
      offset = zoneOffsetMinutes(utcMs, input.timeZone);
    }
    boundaries.push(utcMs);
    boundaryOffsets.push(offset);
  }

  const days: TimelineDay[] = [];
  for (let d = 0; d < dayCount; d++) {
    const startUtcMs = boundaries[d] as number;
    const endUtcMs = boundaries[d + 1] as number;
    const date = dateAt(d);
    days.push({
      dayIndex: d,
      date,
      dateLocal: addDaysIso(date, 0),
      startUtcMs,
      endUtcMs,
      offsets: new SpanOffsets(startUtcMs, endUtcMs, input.timeZone, {
        startOffsetMinutes: boundaryOffsets[d] as number,
        endOffsetMinutes: boundaryOffsets[d + 1] as number,
      }),
    });
  }

  const localUtc = (dateIndex: number, minutesOfDay: number): number => {
    // A local time before the walking start belongs to the previous trip day's span.
    const spanIndex = Math.max(0, Math.min(dayCount - 1, minutesOfDay >= walkStart ? dateIndex : dateIndex - 1));
    return (days[spanIndex] as TimelineDay).offsets.wallToUtc(wallClockMs(dateAt(dateIndex), minutesOfDay));
  };

  const steps: TimelineStep[] = [];
  for (const day of days) {
    const cuts = new Set<number>();
    for (let t = day.startUtcMs; t < day.endUtcMs; t += stepMs) cuts.add(t);
    const windowStarts: number[] = [];
    for (const dateIndex of [day.dayIndex - 1, day.dayIndex, day.dayIndex + 1]) {
      for (const minutes of [walkEnd, campStart, campEnd]) {
        const t = localUtc(dateIndex, minutes);
        if (t > day.startUtcMs && t < day.endUtcMs) cuts.add(t);
      }
      windowStarts.push(localUtc(dateIndex, campStart));
    }
    const sorted = [...cuts].sort((a, b) => a - b);
    for (let i = 0; i < sorted.length; i++) {
      const startUtcMs = sorted[i] as number;
      const endUtcMs = (sorted[i + 1] ?? day.endUtcMs) as number;
      const midUtcMs = (startUtcMs + endUtcMs) / 2;
      const midMinutes = localMinutesOfDay(midUtcMs, day.offsets.offsetAt(midUtcMs));
      const window: StepWindow = inClockWindow(midMinutes, walkStart, walkEnd)
        ? 'walk'
        : inClockWindow(midMinutes, campStart, campEnd)
          ? 'camp'
          : 'none';
      let windowStartUtcMs = day.startUtcMs;
      if (window === 'camp') {
        windowStartUtcMs = Number.NEGATIVE_INFINITY;
        for (const t of windowStarts) {
          if (t <= midUtcMs && t > windowStartUtcMs) windowStartUtcMs = t;
        }
        if (!Number.isFinite(windowStartUtcMs)) windowStartUtcMs = day.startUtcMs;
      }
      steps.push({
        dayIndex: day.dayIndex,
        startUtcMs,
        endUtcMs,
        midUtcMs,
        durationH: (endUtcMs - startUtcMs) / msPerHour,
        localTime: clockLabel(localMinutesOfDay(startUtcMs, day.offsets.offsetAt(startUtcMs))),
        window,
        windowStartUtcMs,
      });
    }
  }
  return { days, steps, localUtc };
}
