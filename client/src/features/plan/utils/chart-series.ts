import type { DesignSkyId, KitEvaluation, SunPath } from '../api/types';
import { clockTime, minutesOfDay } from './local-time';

const msPerHour = 3_600_000;
export const hoursPerDay = 24;

/** One row of the stored-energy chart: hours since the trip began, and Wh stored in each sky shown. */
export type StoredRow = { elapsedH: number } & Partial<Record<DesignSkyId, number>>;

/** When the trip's first day begins (the first step of the first sun path), ms since the epoch. */
const tripStartMs = (evaluation: Pick<KitEvaluation, 'sunPaths' | 'storedSeries'>): number | null => {
  const first = evaluation.sunPaths[0]?.points[0]?.t;
  if (first) return Date.parse(first);
  const points = evaluation.storedSeries[0]?.points ?? [];
  const [a, b] = points;
  if (!a) return null;
  const stepMs = b ? Date.parse(b.t) - Date.parse(a.t) : msPerHour;
  return Date.parse(a.t) - stepMs;
};

/**
 * The stored-energy chart's rows: each sky's series on one time axis (hours since the first day began), starting
 * from the ledger's stored energy at the start of day 1 so the line begins full.
 */
export const storedRows = (evaluation: Pick<KitEvaluation, 'sunPaths' | 'storedSeries' | 'ledgers'>): StoredRow[] => {
  const startMs = tripStartMs(evaluation);
  if (startMs === null) return [];
  const rows = new Map<number, StoredRow>();
  const row = (elapsedH: number) => {
    const key = Math.round(elapsedH * 1000) / 1000;
    const existing = rows.get(key) ?? { elapsedH: key };
    rows.set(key, existing);
    return existing;
  };
  for (const ledger of evaluation.ledgers) {
    const first = ledger.days[0];
    if (first) row(0)[ledger.skyId] = first.storedStartWh;
  }
  for (const series of evaluation.storedSeries)
    for (const point of series.points) row((Date.parse(point.t) - startMs) / msPerHour)[series.skyId] = point.storedWh;
  return [...rows.values()].sort((a, b) => a.elapsedH - b.elapsedH);
};

/** The local clock at which the first day begins (the walking window's start), in minutes, or null. */
export const dayStartMinutes = (evaluation: Pick<KitEvaluation, 'sunPaths'>): number | null => {
  const first = evaluation.sunPaths[0]?.points[0]?.localTime;
  return first ? minutesOfDay(first) : null;
};

/** "Day 2, 14:30" for a point on the stored-energy chart's axis. */
export const elapsedLabel = (elapsedH: number, startMinutes: number | null): string => {
  const day = Math.floor(elapsedH / hoursPerDay);
  const clock = startMinutes === null ? '' : `, ${clockTime(startMinutes + (elapsedH - day * hoursPerDay) * 60)}`;
  return `Day ${day + 1}${clock}`;
};

/** One point of a sun path on a clock axis: minutes since local midnight and the sun's altitude, °. */
export interface SunRow {
  minutes: number;
  altitudeDeg: number;
}

/** A day's sun path ordered by the local clock (a trip day runs from the morning over midnight to the next morning). */
export const sunRows = (path: SunPath): SunRow[] =>
  path.points
    .map((p) => ({ minutes: minutesOfDay(p.localTime), altitudeDeg: p.altitudeDeg }))
    .sort((a, b) => a.minutes - b.minutes);

/** The sun's highest point of a day: altitude and the local clock. */
export const sunPeak = (path: SunPath): { altitudeDeg: number; localTime: string } | null =>
  path.points.reduce<{ altitudeDeg: number; localTime: string } | null>(
    (best, p) =>
      !best || p.altitudeDeg > best.altitudeDeg ? { altitudeDeg: p.altitudeDeg, localTime: p.localTime } : best,
    null,
  );

/** Daylight hours of a path: how many of its steps have the sun above the horizon, at the path's step. */
export const daylightHours = (path: SunPath): number => {
  const rows = sunRows(path);
  const [a, b] = rows;
  const stepH = a && b ? (b.minutes - a.minutes) / 60 : 1;
  return rows.filter((r) => r.altitudeDeg > 0).length * stepH;
};

/** Round steps for an energy axis from 0 to at least `maxWh`: 1, 2, 2.5 or 5 × a power of ten, about five of them. */
export function niceTicks(maxWh: number): number[] {
  if (!(maxWh > 0)) return [0, 1];
  const rough = maxWh / 5;
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = ([1, 2, 2.5, 5, 10].find((m) => m * power >= rough) ?? 10) * power;
  return Array.from({ length: Math.ceil(maxWh / step) + 1 }, (_, i) => Math.round(i * step * 100) / 100);
}
