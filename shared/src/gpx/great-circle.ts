import { meanEarthRadiusM } from './gpx-constants.js';

/** A point on the Earth, degrees: latitude north positive, longitude east positive. */
export interface GeoPoint {
  latDeg: number;
  lonDeg: number;
}

const degToRad = (deg: number): number => (deg * Math.PI) / 180;
const radToDeg = (rad: number): number => (rad * 180) / Math.PI;

/** An angle in degrees brought into [0, 360). */
export function normalizeBearingDeg(deg: number): number {
  const wrapped = deg % 360;
  return wrapped < 0 ? wrapped + 360 : wrapped;
}

/**
 * Great-circle distance between two points by the haversine formula, metres (or in the unit of `radius`).
 * Source: R. W. Sinnott, "Virtues of the Haversine", Sky and Telescope 68 (2), 1984, p. 159; the same formula
 * is in E. Williams, "Aviation Formulary".
 * @param radius sphere radius; the default is the mean Earth radius in metres (`meanEarthRadiusM`)
 * @example haversineDistanceM({ latDeg: 0, lonDeg: 0 }, { latDeg: 0, lonDeg: 1 }) // ≈ 111 195 m
 */
export function haversineDistanceM(from: GeoPoint, to: GeoPoint, radius: number = meanEarthRadiusM): number {
  const phi1 = degToRad(from.latDeg);
  const phi2 = degToRad(to.latDeg);
  const dPhi = phi2 - phi1;
  const dLambda = degToRad(to.lonDeg - from.lonDeg);
  const h = Math.sin(dPhi / 2) ** 2 + Math.cos(phi1) * Math.cos(phi2) * Math.sin(dLambda / 2) ** 2;
  return 2 * radius * Math.asin(Math.min(1, Math.sqrt(h)));
}

/**
 * Initial great-circle bearing (forward azimuth) from one point towards another, degrees clockwise from
 * true north in [0, 360). Source: E. Williams, "Aviation Formulary", course between points, in the atan2 form.
 * Two equal points have no bearing: the answer is 0 then.
 * @example initialBearingDeg({ latDeg: 0, lonDeg: 0 }, { latDeg: 1, lonDeg: 0 }) // 0 (due north)
 */
export function initialBearingDeg(from: GeoPoint, to: GeoPoint): number {
  const phi1 = degToRad(from.latDeg);
  const phi2 = degToRad(to.latDeg);
  const dLambda = degToRad(to.lonDeg - from.lonDeg);
  const y = Math.sin(dLambda) * Math.cos(phi2);
  const x = Math.cos(phi1) * Math.sin(phi2) - Math.sin(phi1) * Math.cos(phi2) * Math.cos(dLambda);
  return normalizeBearingDeg(radToDeg(Math.atan2(y, x)));
}

/**
 * The point a share of the way along the straight line between two points, by linear interpolation of
 * latitude and longitude (fine over the tens of metres between two track points; not for long legs or
 * across the antimeridian).
 * @example interpolatePoint({ latDeg: 0, lonDeg: 0 }, { latDeg: 0, lonDeg: 2 }, 0.5) // { latDeg: 0, lonDeg: 1 }
 */
export function interpolatePoint(from: GeoPoint, to: GeoPoint, share: number): GeoPoint {
  return {
    latDeg: from.latDeg + (to.latDeg - from.latDeg) * share,
    lonDeg: from.lonDeg + (to.lonDeg - from.lonDeg) * share,
  };
}
