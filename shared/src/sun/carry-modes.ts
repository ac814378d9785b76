/**
 * How the panel is carried and where it faces: strapped to the pack while walking (steep, facing behind
 * the direction of travel), propped at camp and re-aimed at the sun, or lying flat.
 */
import { packPanelTiltDeg, unknownBearingHeadingCount } from '../constants/solar.js';
import type { ClearSkyIrradiance } from './clear-sky.js';
import {
  cosAngleOfIncidence,
  groundReflectedWm2,
  isotropicSkyDiffuseWm2,
  planeIrradianceIsotropic,
  type PlaneOrientation,
} from './transposition.js';

/** Normalises an angle to 0 ≤ a < 360 degrees. */
export function normaliseDeg(angleDeg: number): number {
  const a = angleDeg % 360;
  return a < 0 ? a + 360 : a;
}

/**
 * The pack panel's plane for a walking bearing: `packPanelTiltDeg` (75°) facing behind the walker.
 * @example packPlane(0) // { tiltDeg: 75, azimuthDeg: 180 } (walking north, the panel faces south)
 */
export function packPlane(walkingBearingDeg: number): PlaneOrientation {
  return { tiltDeg: packPanelTiltDeg, azimuthDeg: normaliseDeg(walkingBearingDeg + 180) };
}

/**
 * A propped panel aimed straight at the sun at an altitude and azimuth (tilt = zenith angle, 0–90°).
 * @example proppedPlane(30, 200) // { tiltDeg: 60, azimuthDeg: 200 }
 */
export function proppedPlane(aimAltitudeDeg: number, aimAzimuthDeg: number): PlaneOrientation {
  return { tiltDeg: Math.max(0, Math.min(90, 90 - aimAltitudeDeg)), azimuthDeg: normaliseDeg(aimAzimuthDeg) };
}

/** The flat panel: tilt 0. */
export const flatPlane: PlaneOrientation = Object.freeze({ tiltDeg: 0, azimuthDeg: 180 });

/** The sun and the clear sky at one instant, and the ground's reflectance. */
export interface SkyAtStep {
  sunAltitudeDeg: number;
  sunAzimuthDeg: number;
  clear: ClearSkyIrradiance;
  albedo: number;
}

/**
 * Clear-sky irradiance on a plane, W/m², by the isotropic model (see transposition).
 * @example clearPlaneWm2(flatPlane, { sunAltitudeDeg: 60, sunAzimuthDeg: 180, clear: { ghiWm2: 900, dniWm2: 900, dhiWm2: 120 }, albedo: 0.2 }) // ≈ 899 (to rounding of the inputs)
 */
export function clearPlaneWm2(plane: PlaneOrientation, sky: SkyAtStep): number {
  return planeIrradianceIsotropic(plane, {
    dniWm2: sky.clear.dniWm2,
    dhiWm2: sky.clear.dhiWm2,
    ghiWm2: sky.clear.ghiWm2,
    sunZenithDeg: 90 - sky.sunAltitudeDeg,
    sunAzimuthDeg: sky.sunAzimuthDeg,
    albedo: sky.albedo,
  }).totalWm2;
}

/**
 * Clear-sky irradiance on a pack panel averaged over `unknownBearingHeadingCount` evenly spaced
 * headings, W/m²: for a walk whose direction is not known.
 * @example packPlaneAllHeadingsWm2(skyAtNoon) // between the best and worst single heading
 */
export function packPlaneAllHeadingsWm2(sky: SkyAtStep, headings: number = unknownBearingHeadingCount): number {
  const sunZenithDeg = 90 - sky.sunAltitudeDeg;
  let cosSum = 0;
  if (sunZenithDeg < 90) {
    for (let h = 0; h < headings; h++) {
      const plane: PlaneOrientation = { tiltDeg: packPanelTiltDeg, azimuthDeg: (360 * h) / headings };
      cosSum += Math.max(0, cosAngleOfIncidence(plane, sunZenithDeg, sky.sunAzimuthDeg));
    }
  }
  return (
    (sky.clear.dniWm2 * cosSum) / headings +
    isotropicSkyDiffuseWm2(packPanelTiltDeg, sky.clear.dhiWm2) +
    groundReflectedWm2(packPanelTiltDeg, sky.clear.ghiWm2, sky.albedo)
  );
}
