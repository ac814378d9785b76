/** How much atmosphere sunlight crosses: relative and absolute optical air mass, and pressure with elevation. */
import { kastenYoungA, kastenYoungExponent, kastenYoungOffsetDeg, standardPressurePa } from '../constants/solar.js';

/**
 * Relative optical air mass at sea level, Kasten & Young (1989), Applied Optics 28(22), 4735–4738:
 * m = 1 / (cos z + 0.50572 (96.07995° − z)^−1.6364), z the apparent zenith angle. Null when the sun is
 * below the horizon (z > 90°), where the formula no longer describes a path to the observer.
 * @example relativeAirMass(80) // ≈ 5.586
 */
export function relativeAirMass(apparentZenithDeg: number): number | null {
  if (!(apparentZenithDeg <= 90)) return null;
  const z = Math.max(0, apparentZenithDeg);
  return 1 / (Math.cos((z * Math.PI) / 180) + kastenYoungA * (kastenYoungOffsetDeg - z) ** -kastenYoungExponent);
}

/**
 * Air pressure at an elevation, Pa, from the troposphere of the U.S. Standard Atmosphere 1976
 * (p = p₀ (1 − 2.25577·10⁻⁵ h)^5.25588).
 * @example pressureAtElevationPa(1000) // ≈ 89 875
 */
export function pressureAtElevationPa(elevationM: number): number {
  return standardPressurePa * (1 - 2.25577e-5 * elevationM) ** 5.25588;
}

/**
 * Absolute (pressure-corrected) air mass: relative air mass × p / p₀.
 * @example absoluteAirMass(2, 90_000) // ≈ 1.776
 */
export function absoluteAirMass(relative: number, pressurePa: number = standardPressurePa): number {
  return (relative * pressurePa) / standardPressurePa;
}
