/**
 * Where the sun is: altitude and azimuth from suncalc 2.x (Meeus, Astronomical Algorithms, 2nd ed.,
 * ch. 25 series; degrees, azimuth clockwise from north, altitude corrected for standard refraction).
 */
import { getPosition } from 'suncalc';

/** The sun's place in the local sky. */
export interface SunPosition {
  /** Apparent altitude above the horizon, degrees (refraction-corrected; negative below the horizon). */
  altitudeDeg: number;
  /** Azimuth, degrees clockwise from true north (0 N, 90 E, 180 S, 270 W). */
  azimuthDeg: number;
}

/**
 * Sun altitude and azimuth at an instant for an observer.
 * Accuracy: within 0.005° of NREL's SPA on its worked example and within 0.05° of astronomy-engine
 * over −66°…66° (see the tests). Refraction assumes a standard atmosphere (about 1010 hPa, 10 °C).
 * @param utcMs instant, ms since the Unix epoch
 * @param latitudeDeg −90…90, north positive
 * @param longitudeDeg −180…180, east positive
 * @example sunPosition(Date.UTC(2003, 9, 17, 19, 30, 30), 39.742476, -105.1786) // { altitudeDeg: 39.89…, azimuthDeg: 194.34… }
 */
export function sunPosition(utcMs: number, latitudeDeg: number, longitudeDeg: number): SunPosition {
  const { altitude, azimuth } = getPosition(new Date(utcMs), latitudeDeg, longitudeDeg);
  return { altitudeDeg: altitude, azimuthDeg: azimuth };
}

/**
 * Unit vector towards a point of the sky given by altitude and azimuth, in a local east–north–up frame.
 * @example skyDirection(90, 0) // [0, 0, 1] (straight up, to rounding)
 */
export function skyDirection(altitudeDeg: number, azimuthDeg: number): [number, number, number] {
  const alt = (altitudeDeg * Math.PI) / 180;
  const az = (azimuthDeg * Math.PI) / 180;
  return [Math.cos(alt) * Math.sin(az), Math.cos(alt) * Math.cos(az), Math.sin(alt)];
}
