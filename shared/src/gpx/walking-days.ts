import { nightGapH } from './gpx-constants.js';
import { type GeoPoint, haversineDistanceM, initialBearingDeg, interpolatePoint } from './great-circle.js';
import type { GpxPoint } from './parse-gpx.js';

/** One walking day read off a track: where it starts and ends, how far it goes and which way. */
export interface WalkingDay {
  /** 1-based trip day. */
  day: number;
  start: GeoPoint;
  end: GeoPoint;
  /** Distance walked along the track, metres. */
  distanceM: number;
  /**
   * The day's direction of travel, degrees from true north [0, 360): the initial bearing from the day's
   * start to its end (a loop day's line is short and says little: the member can correct it). Null on a day
   * that ends where it began.
   */
  bearingDeg: number | null;
}

/** How the track was cut into days. */
export type DaySplit = 'time' | 'distance';

export interface WalkingDaysResult {
  splitBy: DaySplit;
  /** Why the split is by distance although the track has times (the nights in it do not match), or null. */
  splitNote: string | null;
  days: WalkingDay[];
}

export interface WalkingDaysOptions {
  /** A pause at least this long between timestamped points is a night, hours (default `nightGapH`). */
  nightGapH?: number;
}

/** Milliseconds in an hour (60 × 60 × 1000). */
const millisecondsInHour = 3_600_000;

const legsOf = (points: readonly GeoPoint[]) =>
  points.slice(1).map((to, index) => {
    const from = points[index] as GeoPoint;
    return { from, to, distanceM: haversineDistanceM(from, to) };
  });

const dayOf = (day: number, points: readonly GeoPoint[]): WalkingDay => {
  const first = points[0] as GeoPoint;
  const last = points[points.length - 1] as GeoPoint;
  const start = { latDeg: first.latDeg, lonDeg: first.lonDeg };
  const end = { latDeg: last.latDeg, lonDeg: last.lonDeg };
  const distanceM = legsOf(points).reduce((sum, leg) => sum + leg.distanceM, 0);
  const netM = haversineDistanceM(start, end);
  const bearingDeg = distanceM <= 0 || netM <= 0 ? null : initialBearingDeg(start, end);
  return { day, start, end, distanceM, bearingDeg };
};

/** Cuts the track into `dayCount` pieces of equal walked distance (boundaries interpolated inside a leg). */
const splitByDistance = (points: readonly GeoPoint[], dayCount: number): GeoPoint[][] => {
  const legs = legsOf(points);
  const totalM = legs.reduce((sum, leg) => sum + leg.distanceM, 0);
  const pieces: GeoPoint[][] = [[points[0] as GeoPoint]];
  let walkedM = 0;
  for (const leg of legs) {
    const legEndM = walkedM + leg.distanceM;
    // Cut the leg at every day boundary it crosses (a long leg may cross several).
    while (pieces.length < dayCount && legEndM > (pieces.length * totalM) / dayCount) {
      const boundaryM = (pieces.length * totalM) / dayCount;
      const cut = interpolatePoint(leg.from, leg.to, (boundaryM - walkedM) / leg.distanceM);
      (pieces[pieces.length - 1] as GeoPoint[]).push(cut);
      pieces.push([cut]);
    }
    (pieces[pieces.length - 1] as GeoPoint[]).push(leg.to);
    walkedM = legEndM;
  }
  // A track with no length: every further day stands at the last point.
  while (pieces.length < dayCount) pieces.push([points[points.length - 1] as GeoPoint]);
  return pieces;
};

/** Cuts a timestamped track at its night-long pauses; null when some point has no time or times go back. */
const splitByTime = (points: readonly GpxPoint[], gapH: number): GpxPoint[][] | null => {
  if (points.some((point) => point.timeMs === null)) return null;
  const pieces: GpxPoint[][] = [[points[0] as GpxPoint]];
  for (let index = 1; index < points.length; index++) {
    const point = points[index] as GpxPoint;
    const gapMs = (point.timeMs as number) - ((points[index - 1] as GpxPoint).timeMs as number);
    if (gapMs < 0) return null;
    if (gapMs >= gapH * millisecondsInHour) pieces.push([point]);
    else (pieces[pieces.length - 1] as GpxPoint[]).push(point);
  }
  return pieces;
};

/**
 * Splits a track into `dayCount` walking days (a trip of N nights walks N + 1 days). When every point has a
 * time and the track's night-long pauses (≥ `nightGapH`) give exactly `dayCount` pieces, each piece is a
 * day; otherwise the track is cut into pieces of equal walked distance, and `splitNote` says why.
 * @example walkingDays([{ latDeg: 0, lonDeg: 0, timeMs: null }, { latDeg: 0, lonDeg: 0.2, timeMs: null }], 2).days.map((d) => d.bearingDeg)
 * // → [90, 90] (due east, about 11.1 km a day)
 */
export function walkingDays(
  points: readonly GpxPoint[],
  dayCount: number,
  options: WalkingDaysOptions = {},
): WalkingDaysResult {
  if (points.length === 0) throw new Error('walkingDays needs at least one point');
  if (!Number.isInteger(dayCount) || dayCount < 1) throw new Error('walkingDays needs a whole number of days ≥ 1');
  const gapH = options.nightGapH ?? nightGapH;
  const timed = splitByTime(points, gapH);
  if (timed && timed.length === dayCount) {
    return { splitBy: 'time', splitNote: null, days: timed.map((piece, index) => dayOf(index + 1, piece)) };
  }
  let splitNote: string | null = null;
  if (timed) {
    const walked = timed.length === 1 ? '1 walking day' : `${timed.length} walking days`;
    splitNote = `The track's times show ${walked} (pauses of ${gapH} h or more count as nights), but the trip has ${dayCount}: the track was split into ${dayCount} days of equal distance instead.`;
  }
  const pieces = splitByDistance(points, dayCount);
  return { splitBy: 'distance', splitNote, days: pieces.map((piece, index) => dayOf(index + 1, piece)) };
}

/**
 * The trip's walking bearings from its days: one per day, a day with no movement taking the nearest
 * earlier day's (or, at the start, the first later day's) bearing; null when no day moves at all.
 * @example walkingBearingsFromDays([{ bearingDeg: null }, { bearingDeg: 90 }] as WalkingDay[]) // [90, 90]
 */
export function walkingBearingsFromDays(days: readonly Pick<WalkingDay, 'bearingDeg'>[]): number[] | null {
  const first = days.find((day) => day.bearingDeg !== null)?.bearingDeg;
  if (first === undefined || first === null) return null;
  let last = first;
  return days.map((day) => {
    if (day.bearingDeg !== null) last = day.bearingDeg;
    return last;
  });
}
