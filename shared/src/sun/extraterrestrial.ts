/**
 * Sunlight outside the atmosphere: the Earth–Sun distance correction, the sun's declination and the
 * day's extraterrestrial irradiation on a horizontal surface.
 */
import { solarConstantWm2 } from '../constants/solar.js';
import { msPerDay } from './time-constants.js';

/** Options for the extraterrestrial models. */
export interface ExtraterrestrialOptions {
  /** Total solar irradiance at 1 AU, W/m². Default `solarConstantWm2` (1361, Kopp & Lean 2011). */
  solarConstantWm2?: number;
}

/**
 * Day of the year of an instant's UTC date, 1 on 1 January.
 * @example dayOfYearUtc(Date.UTC(2026, 3, 15)) // 105
 */
export function dayOfYearUtc(utcMs: number): number {
  const date = new Date(utcMs);
  return Math.floor((utcMs - Date.UTC(date.getUTCFullYear(), 0, 1)) / msPerDay) + 1;
}

/** Spencer's day angle B = 2π (n − 1) / 365, radians. */
function dayAngleRad(dayOfYear: number): number {
  return (2 * Math.PI * (dayOfYear - 1)) / 365;
}

/**
 * Eccentricity correction (r₀ / r)², the ratio of sunlight at the Earth's distance that day to that at 1 AU.
 * Spencer, J. W. (1971), "Fourier series representation of the position of the sun", Search 2(5), 172;
 * as Duffie & Beckman, Solar Engineering of Thermal Processes, 3rd ed., eq. 1.4.1b.
 * @example eccentricityCorrection(1) // 1.0351… (early January, Earth nearest the sun)
 */
export function eccentricityCorrection(dayOfYear: number): number {
  const b = dayAngleRad(dayOfYear);
  return (
    1.00011 + 0.034221 * Math.cos(b) + 0.00128 * Math.sin(b) + 0.000719 * Math.cos(2 * b) + 0.000077 * Math.sin(2 * b)
  );
}

/**
 * Extraterrestrial irradiance on a plane normal to the sun's rays, W/m² (Spencer 1971; Duffie & Beckman
 * eq. 1.4.1b).
 * @example extraterrestrialNormalIrradianceWm2(300, { solarConstantWm2: 1366.1 }) // ≈ 1383.6
 */
export function extraterrestrialNormalIrradianceWm2(dayOfYear: number, options: ExtraterrestrialOptions = {}): number {
  return (options.solarConstantWm2 ?? solarConstantWm2) * eccentricityCorrection(dayOfYear);
}

/**
 * The sun's declination, degrees, by Spencer's (1971) Fourier series (Duffie & Beckman eq. 1.6.1b;
 * error below 0.035°).
 * @example solarDeclinationDeg(172) // ≈ 23.45 (June solstice)
 */
export function solarDeclinationDeg(dayOfYear: number): number {
  const b = dayAngleRad(dayOfYear);
  const rad =
    0.006918 -
    0.399912 * Math.cos(b) +
    0.070257 * Math.sin(b) -
    0.006758 * Math.cos(2 * b) +
    0.000907 * Math.sin(2 * b) -
    0.002697 * Math.cos(3 * b) +
    0.00148 * Math.sin(3 * b);
  return (rad * 180) / Math.PI;
}

/**
 * Sunset hour angle ωs, degrees (Duffie & Beckman eq. 1.6.10): 180 in polar day, 0 in polar night.
 * @example sunsetHourAngleDeg(43, 9.41) // ≈ 98.9
 */
export function sunsetHourAngleDeg(latitudeDeg: number, declinationDeg: number): number {
  const x = -Math.tan((latitudeDeg * Math.PI) / 180) * Math.tan((declinationDeg * Math.PI) / 180);
  if (x <= -1) return 180;
  if (x >= 1) return 0;
  return (Math.acos(x) * 180) / Math.PI;
}

/**
 * Daily extraterrestrial irradiation on a horizontal surface H₀, Wh/m² (divide by 277.78 for MJ/m²).
 * Duffie & Beckman, Solar Engineering of Thermal Processes, 3rd ed., eq. 1.10.3, with Spencer's
 * eccentricity and declination; polar day and night through ωs = 180° / 0°.
 * @example dailyExtraterrestrialHorizontalWhm2(43, 105, { solarConstantWm2: 1367 }) // ≈ 9400 (33.8 MJ/m²)
 */
export function dailyExtraterrestrialHorizontalWhm2(
  latitudeDeg: number,
  dayOfYear: number,
  options: ExtraterrestrialOptions = {},
): number {
  const gsc = options.solarConstantWm2 ?? solarConstantWm2;
  const declinationDeg = solarDeclinationDeg(dayOfYear);
  const omegaSDeg = sunsetHourAngleDeg(latitudeDeg, declinationDeg);
  const phi = (latitudeDeg * Math.PI) / 180;
  const delta = (declinationDeg * Math.PI) / 180;
  const omegaS = (omegaSDeg * Math.PI) / 180;
  const geometry = Math.cos(phi) * Math.cos(delta) * Math.sin(omegaS) + omegaS * Math.sin(phi) * Math.sin(delta);
  // 24 h × 3600 s / π turns the integral over hour angle into seconds; / 3600 gives Wh.
  const joules = ((24 * 3600 * gsc) / Math.PI) * eccentricityCorrection(dayOfYear) * Math.max(0, geometry);
  return joules / 3600;
}
