import { describe, expect, it } from 'vitest';
import { absoluteAirMass, pressureAtElevationPa, relativeAirMass } from './air-mass.js';

describe('relativeAirMass (Kasten & Young 1989)', () => {
  it("matches pvlib-python's test values", () => {
    // pvlib-python pvlib/tests/test_atmosphere.py `test_airmass`, model 'kastenyoung1989':
    // zenith 89.9° → 36.467, 80° → 5.586, 0° → 1.000 (atol 0.001).
    expect(relativeAirMass(89.9)).toBeCloseTo(36.467, 3);
    expect(relativeAirMass(80)).toBeCloseTo(5.586, 3);
    expect(relativeAirMass(0)).toBeCloseTo(1.0, 3);
  });

  it('matches Kasten & Young (1989) Table: about 38 at the horizon', () => {
    // Kasten & Young 1989 give m(90°) = 37.92 for their formula (`from memory`).
    expect(relativeAirMass(90)).toBeCloseTo(37.92, 1);
  });

  it('is null below the horizon', () => {
    expect(relativeAirMass(100)).toBeNull();
    expect(relativeAirMass(Number.NaN)).toBeNull();
  });
});

describe('pressure and absolute air mass', () => {
  it("matches pvlib-python's alt2pres test values within 0.05 %", () => {
    // pvlib-python pvlib/tests/test_atmosphere.py `test_alt2pres`:
    // −100 m → 102 532.073 Pa, 0 → 101 324.999, 1000 → 89 874.750, 8000 → 35 600.496.
    const cases: Array<[number, number]> = [
      [-100, 102532.073],
      [0, 101324.999],
      [1000, 89874.75],
      [8000, 35600.496],
    ];
    for (const [elevationM, pressurePa] of cases) {
      expect(Math.abs(pressureAtElevationPa(elevationM) - pressurePa) / pressurePa).toBeLessThan(5e-4);
    }
  });

  it("matches pvlib-python's get_absolute_airmass test values", () => {
    // pvlib-python `test_get_absolute_airmass`: relative [40, 2, 0.999] at 90 000 Pa → [35.529, 1.776, 0.887].
    expect(absoluteAirMass(40, 90_000)).toBeCloseTo(35.529, 3);
    expect(absoluteAirMass(2, 90_000)).toBeCloseTo(1.776, 3);
    expect(absoluteAirMass(0.999, 90_000)).toBeCloseTo(0.887, 3);
  });
});
