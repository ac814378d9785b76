/**
 * Irradiance on a tilted, oriented plane: angle of incidence, the isotropic-sky model of Liu & Jordan
 * (1963) and ground reflection. Duffie & Beckman, Solar Engineering of Thermal Processes, 3rd ed.,
 * eq. 1.6.3 (incidence) and eq. 2.15.1 (isotropic sky: I_T = I_b R_b + I_d (1 + cos β)/2 + I ρ_g (1 − cos β)/2);
 * equation numbers `from memory`.
 */

/** Orientation of a plane: tilt from horizontal and the azimuth its face points to. */
export interface PlaneOrientation {
  /** Tilt from horizontal, degrees: 0 flat (facing up), 90 vertical. */
  tiltDeg: number;
  /** Azimuth the face points to, degrees clockwise from north (180 faces south). */
  azimuthDeg: number;
}

const degToRad = Math.PI / 180;

/**
 * Cosine of the angle of incidence of the sun's rays on a plane (negative when the sun is behind it).
 * @example cosAngleOfIncidence({ tiltDeg: 90, azimuthDeg: 0 }, 30, 60) // 0.25
 */
export function cosAngleOfIncidence(plane: PlaneOrientation, sunZenithDeg: number, sunAzimuthDeg: number): number {
  const tilt = plane.tiltDeg * degToRad;
  const zenith = sunZenithDeg * degToRad;
  const value =
    Math.cos(zenith) * Math.cos(tilt) +
    Math.sin(zenith) * Math.sin(tilt) * Math.cos((sunAzimuthDeg - plane.azimuthDeg) * degToRad);
  return Math.max(-1, Math.min(1, value));
}

/**
 * Angle of incidence of the sun's rays on a plane, degrees (0 = rays normal to the face).
 * @example angleOfIncidenceDeg({ tiltDeg: 90, azimuthDeg: 0 }, 30, 60) // ≈ 75.52
 */
export function angleOfIncidenceDeg(plane: PlaneOrientation, sunZenithDeg: number, sunAzimuthDeg: number): number {
  return Math.acos(cosAngleOfIncidence(plane, sunZenithDeg, sunAzimuthDeg)) / degToRad;
}

/** Irradiance components on a plane, W/m². */
export interface PlaneIrradiance {
  totalWm2: number;
  directWm2: number;
  skyDiffuseWm2: number;
  groundReflectedWm2: number;
}

/** Horizontal irradiance and the sun's place, the inputs of a transposition. */
export interface TranspositionInput {
  /** Direct normal irradiance, W/m². */
  dniWm2: number;
  /** Diffuse horizontal irradiance, W/m². */
  dhiWm2: number;
  /** Global horizontal irradiance, W/m². */
  ghiWm2: number;
  /** Sun zenith angle, degrees. */
  sunZenithDeg: number;
  /** Sun azimuth, degrees clockwise from north. */
  sunAzimuthDeg: number;
  /** Ground reflectance 0–1. */
  albedo: number;
}

/**
 * Sky diffuse on a tilted plane under an isotropic sky: DHI (1 + cos β) / 2.
 * @example isotropicSkyDiffuseWm2(40, 100) // ≈ 88.302 (pvlib `irradiance.isotropic` test value)
 */
export function isotropicSkyDiffuseWm2(tiltDeg: number, dhiWm2: number): number {
  return (dhiWm2 * (1 + Math.cos(tiltDeg * degToRad))) / 2;
}

/**
 * Ground-reflected irradiance on a tilted plane from an isotropically reflecting ground: GHI ρ (1 − cos β) / 2.
 * @example groundReflectedWm2(40, 900, 0.25) // ≈ 26.32 (pvlib `irradiance.get_ground_diffuse` test value)
 */
export function groundReflectedWm2(tiltDeg: number, ghiWm2: number, albedo: number): number {
  return (ghiWm2 * albedo * (1 - Math.cos(tiltDeg * degToRad))) / 2;
}

/**
 * Irradiance on a plane by the isotropic-sky model with ground reflection (Liu & Jordan 1963;
 * Duffie & Beckman eq. 2.15.1). Direct light counts only when the sun is in front of the plane.
 * @example planeIrradianceIsotropic({ tiltDeg: 30, azimuthDeg: 180 }, { dniWm2: 800, dhiWm2: 100, ghiWm2: 793, sunZenithDeg: 30, sunAzimuthDeg: 180, albedo: 0.2 }).totalWm2 // ≈ 900
 */
export function planeIrradianceIsotropic(plane: PlaneOrientation, input: TranspositionInput): PlaneIrradiance {
  const cosAoi = cosAngleOfIncidence(plane, input.sunZenithDeg, input.sunAzimuthDeg);
  const sunUp = input.sunZenithDeg < 90;
  const directWm2 = sunUp ? input.dniWm2 * Math.max(0, cosAoi) : 0;
  const skyDiffuseWm2 = isotropicSkyDiffuseWm2(plane.tiltDeg, input.dhiWm2);
  const groundReflectedWm2Value = groundReflectedWm2(plane.tiltDeg, input.ghiWm2, input.albedo);
  return {
    totalWm2: directWm2 + skyDiffuseWm2 + groundReflectedWm2Value,
    directWm2,
    skyDiffuseWm2,
    groundReflectedWm2: groundReflectedWm2Value,
  };
}

/**
 * Irradiance on a tilted plane under an overcast sky whose light is all diffuse and isotropic:
 * GHI (1 + cos β)/2 + GHI ρ (1 − cos β)/2 (no tilt gain: a tilted plane gets at most the horizontal value).
 * @example overcastPlaneIrradianceWm2(90, 200, 0.2) // 120
 */
export function overcastPlaneIrradianceWm2(tiltDeg: number, ghiWm2: number, albedo: number): number {
  return isotropicSkyDiffuseWm2(tiltDeg, ghiWm2) + groundReflectedWm2(tiltDeg, ghiWm2, albedo);
}
