import { type GeoPoint, haversineDistanceM } from './great-circle.js';
import { type GpxError, type GpxTrack, parseGpx } from './parse-gpx.js';
import { type DaySplit, type WalkingDay, walkingBearingsFromDays, walkingDays } from './walking-days.js';

/** What a trip takes from a GPX file: the start point and each walking day's bearing and distance. */
export interface GpxRoute {
  name: string | null;
  source: GpxTrack['source'];
  pointCount: number;
  /** The first point: the trip's start point. */
  start: GeoPoint;
  /** Distance along the whole track, metres. */
  totalDistanceM: number;
  splitBy: DaySplit;
  splitNote: string | null;
  days: WalkingDay[];
  /** One bearing per day for the trip's `walkingBearingsDeg`, or null when the track never moves. */
  walkingBearingsDeg: number[] | null;
}

export type GpxRouteResult = { ok: true; route: GpxRoute } | { ok: false; error: GpxError };

/**
 * Reads a GPX file for a trip of `nights` nights: its start point, and its nights + 1 walking days with
 * their bearings and distances (split at the track's nights when its times show them, else by distance).
 * The time zone is not read here: the server derives it from the start point.
 * @example deriveGpxRoute(text, 2) // → { ok: true, route: { start: { latDeg, lonDeg }, days: [3 days], ... } }
 */
export function deriveGpxRoute(text: string, nights: number): GpxRouteResult {
  const parsed = parseGpx(text);
  if (!parsed.ok) return parsed;
  const { points, name, source } = parsed.track;
  const split = walkingDays(points, nights + 1);
  const totalDistanceM = points
    .slice(1)
    .reduce((sum, point, index) => sum + haversineDistanceM(points[index] as GeoPoint, point), 0);
  const first = points[0] as GeoPoint;
  return {
    ok: true,
    route: {
      name,
      source,
      pointCount: points.length,
      start: { latDeg: first.latDeg, lonDeg: first.lonDeg },
      totalDistanceM,
      splitBy: split.splitBy,
      splitNote: split.splitNote,
      days: split.days,
      walkingBearingsDeg: walkingBearingsFromDays(split.days),
    },
  };
}
