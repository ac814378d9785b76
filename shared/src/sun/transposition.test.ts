import { describe, expect, it } from 'vitest';
import {
  angleOfIncidenceDeg,
  cosAngleOfIncidence,
  groundReflectedWm2,
  isotropicSkyDiffuseWm2,
  overcastPlaneIrradianceWm2,
  planeIrradianceIsotropic,
} from './transposition.js';

describe('angle of incidence', () => {
  it("matches pvlib-python's aoi test values", () => {
    // pvlib-python pvlib/tests/test_irradiance.py `test_aoi_and_aoi_projection`:
    // (tilt, surface az, zenith, sun az) → aoi, projection.
    const cases: Array<[number, number, number, number, number, number]> = [
      [0, 0, 0, 0, 0, 1],
      [30, 180, 30, 180, 0, 1],
      [30, 180, 150, 0, 180, -1],
      [90, 0, 30, 60, 75.5224878, 0.25],
      [90, 0, 30, 170, 119.4987042, -0.4924038],
    ];
    for (const [tiltDeg, azimuthDeg, zenith, sunAz, aoi, projection] of cases) {
      expect(angleOfIncidenceDeg({ tiltDeg, azimuthDeg }, zenith, sunAz)).toBeCloseTo(aoi, 4);
      expect(cosAngleOfIncidence({ tiltDeg, azimuthDeg }, zenith, sunAz)).toBeCloseTo(projection, 6);
    }
  });
});

describe('isotropic sky and ground reflection', () => {
  it("matches pvlib-python's isotropic and ground-diffuse test values", () => {
    // pvlib `test_isotropic_float`: isotropic(40, 100) → 88.30222215594891.
    expect(isotropicSkyDiffuseWm2(40, 100)).toBeCloseTo(88.30222215594891, 9);
    // pvlib `test_get_ground_diffuse_simple_float`: get_ground_diffuse(40, 900), albedo 0.25 → 26.32000014911496.
    expect(groundReflectedWm2(40, 900, 0.25)).toBeCloseTo(26.32000014911496, 6);
    // pvlib `test_get_ground_diffuse_albedo_series`: tilt 45, GHI 1000, albedo 0.2 → 0.2 × 0.5 × (1 − √2/2) × 1000.
    expect(groundReflectedWm2(45, 1000, 0.2)).toBeCloseTo(0.2 * 0.5 * (1 - Math.SQRT2 / 2) * 1000, 9);
  });

  it('adds direct, sky and ground parts and drops direct light from behind the plane', () => {
    const input = { dniWm2: 800, dhiWm2: 100, ghiWm2: 793, sunZenithDeg: 30, sunAzimuthDeg: 180, albedo: 0.2 };
    const facing = planeIrradianceIsotropic({ tiltDeg: 30, azimuthDeg: 180 }, input);
    expect(facing.directWm2).toBeCloseTo(800, 6);
    expect(facing.totalWm2).toBeCloseTo(facing.directWm2 + facing.skyDiffuseWm2 + facing.groundReflectedWm2, 9);
    const away = planeIrradianceIsotropic({ tiltDeg: 90, azimuthDeg: 0 }, input);
    expect(away.directWm2).toBe(0);
    expect(away.totalWm2).toBeCloseTo(50 + 793 * 0.1, 6);
  });

  it('gives a flat plane exactly the horizontal global irradiance (closure)', () => {
    const ghi = 800 * Math.cos((35 * Math.PI) / 180) + 120;
    const flat = planeIrradianceIsotropic(
      { tiltDeg: 0, azimuthDeg: 0 },
      { dniWm2: 800, dhiWm2: 120, ghiWm2: ghi, sunZenithDeg: 35, sunAzimuthDeg: 140, albedo: 0.5 },
    );
    expect(flat.totalWm2).toBeCloseTo(ghi, 9);
  });

  it('never gives an overcast tilted plane more than the horizontal value (no tilt gain under overcast)', () => {
    for (const tilt of [0, 30, 60, 75, 90]) {
      expect(overcastPlaneIrradianceWm2(tilt, 200, 0.2)).toBeLessThanOrEqual(200 + 1e-9);
    }
    expect(overcastPlaneIrradianceWm2(90, 200, 0.2)).toBeCloseTo(120, 9);
  });
});
