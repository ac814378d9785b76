/**
 * Clear-sky irradiance with no online data: the Ineichen–Perez model with a fixed Linke turbidity.
 * Ineichen, P. & Perez, R. (2002), "A new airmass independent formulation for the Linke turbidity
 * coefficient", Solar Energy 73(3), 151–157 (with the beam correction of Solar Energy 73(5), 312);
 * written as in pvlib-python's `clearsky.ineichen` without its optional Perez enhancement.
 */
import { defaultLinkeTurbidity, solarConstantWm2 } from '../constants/solar.js';
import { absoluteAirMass, pressureAtElevationPa, relativeAirMass } from './air-mass.js';
import { eccentricityCorrection } from './extraterrestrial.js';

/** Global, direct normal and diffuse horizontal irradiance, W/m². */
export interface ClearSkyIrradiance {
  /** Global horizontal irradiance, W/m². */
  ghiWm2: number;
  /** Direct normal irradiance, W/m². */
  dniWm2: number;
  /** Diffuse horizontal irradiance, W/m². */
  dhiWm2: number;
}

const dark: ClearSkyIrradiance = Object.freeze({ ghiWm2: 0, dniWm2: 0, dhiWm2: 0 });

/** Inputs of the Ineichen–Perez model as the paper states them. */
export interface IneichenPerezInput {
  /** Apparent (refraction-corrected) sun zenith angle, degrees. */
  apparentZenithDeg: number;
  /** Absolute (pressure-corrected) air mass. */
  airMassAbsolute: number;
  /** Linke turbidity at air mass 2 (dimensionless, about 2 very clean … 6 hazy). */
  linkeTurbidity: number;
  /** Site elevation, m (the model's fh1, fh2, cg1, cg2 terms). */
  elevationM: number;
  /** Extraterrestrial normal irradiance that day, W/m². */
  dniExtraWm2: number;
}

/**
 * Ineichen–Perez clear-sky irradiance from its own inputs. Zero when the sun is at or below the horizon.
 * @example ineichenPerez({ apparentZenithDeg: 10, airMassAbsolute: 1, linkeTurbidity: 3, elevationM: 0, dniExtraWm2: 1364 })
 *   // { ghiWm2: 1038.16, dniWm2: 942.21, dhiWm2: 110.27 } (pvlib's own test values)
 */
export function ineichenPerez(input: IneichenPerezInput): ClearSkyIrradiance {
  const cosZenith = Math.cos((input.apparentZenithDeg * Math.PI) / 180);
  if (!(cosZenith > 0) || !(input.airMassAbsolute > 0)) return dark;
  const tl = input.linkeTurbidity;
  const am = input.airMassAbsolute;
  const h = input.elevationM;
  const fh1 = Math.exp(-h / 8000);
  const fh2 = Math.exp(-h / 1250);
  const cg1 = 5.09e-5 * h + 0.868;
  const cg2 = 3.92e-5 * h + 0.0387;
  const ghiWm2 = cg1 * input.dniExtraWm2 * cosZenith * Math.max(0, Math.exp(-cg2 * am * (fh1 + fh2 * (tl - 1))));
  const b = 0.664 + 0.163 / fh1;
  const beam = input.dniExtraWm2 * Math.max(0, b * Math.exp(-0.09 * am * (tl - 1)));
  // The beam may not exceed what the global formula leaves after the diffuse share (paper's correction).
  const beamCap = (ghiWm2 * Math.max(0, 1 - (0.1 - 0.2 * Math.exp(-tl)) / (0.1 + 0.882 / fh1))) / cosZenith;
  const dniWm2 = Math.min(beam, beamCap);
  const dhiWm2 = Math.max(0, ghiWm2 - dniWm2 * cosZenith);
  return { ghiWm2, dniWm2, dhiWm2 };
}

/** Site and atmosphere options for `clearSkyIrradiance`. */
export interface ClearSkyOptions {
  /** Linke turbidity; default `defaultLinkeTurbidity` (3). */
  linkeTurbidity?: number;
  /** Site elevation, m; default 0. */
  elevationM?: number;
  /** Total solar irradiance at 1 AU, W/m²; default `solarConstantWm2` (1361). */
  solarConstantWm2?: number;
}

/**
 * Clear-sky irradiance for a sun altitude on a day of the year: Kasten–Young air mass at the site's
 * pressure (standard atmosphere), Spencer's eccentricity, Ineichen–Perez with a fixed Linke turbidity.
 * @param apparentAltitudeDeg refraction-corrected sun altitude, degrees
 * @example clearSkyIrradiance(60, 172).ghiWm2 // ≈ 860 W/m² at sea level, TL 3
 */
export function clearSkyIrradiance(
  apparentAltitudeDeg: number,
  dayOfYear: number,
  options: ClearSkyOptions = {},
): ClearSkyIrradiance {
  if (!(apparentAltitudeDeg > 0)) return dark;
  const apparentZenithDeg = 90 - apparentAltitudeDeg;
  const relative = relativeAirMass(apparentZenithDeg);
  if (relative === null) return dark;
  const elevationM = options.elevationM ?? 0;
  return ineichenPerez({
    apparentZenithDeg,
    airMassAbsolute: absoluteAirMass(relative, pressureAtElevationPa(elevationM)),
    linkeTurbidity: options.linkeTurbidity ?? defaultLinkeTurbidity,
    elevationM,
    dniExtraWm2: (options.solarConstantWm2 ?? solarConstantWm2) * eccentricityCorrection(dayOfYear),
  });
}
