import { describe, expect, it } from 'vitest';
import { clearSkyIrradiance, ineichenPerez } from './clear-sky.js';

const base = { apparentZenithDeg: 10, airMassAbsolute: 1, linkeTurbidity: 3, elevationM: 0, dniExtraWm2: 1364 };

describe('ineichenPerez', () => {
  it("matches pvlib-python's scalar test values", () => {
    // pvlib-python pvlib/tests/test_clearsky.py `test_ineichen_scalar_input`: zenith 10°, AM 1, TL 3,
    // dni_extra 1364 → ghi 1038.159219, dni 942.2081860378344, dhi 110.26529293612793.
    const out = ineichenPerez(base);
    expect(out.ghiWm2).toBeCloseTo(1038.159219, 4);
    expect(out.dniWm2).toBeCloseTo(942.208186, 4);
    expect(out.dhiWm2).toBeCloseTo(110.265293, 4);
  });

  it("matches pvlib-python's dni_extra and altitude test values", () => {
    // `test_ineichen_dni_extra`: dni_extra 1370 → [1042.72590228, 946.35279683, 110.75033088].
    const extra = ineichenPerez({ ...base, dniExtraWm2: 1370 });
    expect(extra.ghiWm2).toBeCloseTo(1042.72590228, 4);
    expect(extra.dniWm2).toBeCloseTo(946.35279683, 4);
    expect(extra.dhiWm2).toBeCloseTo(110.75033088, 4);
    // `test_ineichen_altitude`: altitude 2000 m → [1134.24312405, 994.95377835, 154.40492924].
    const high = ineichenPerez({ ...base, elevationM: 2000 });
    expect(high.ghiWm2).toBeCloseTo(1134.24312405, 4);
    expect(high.dniWm2).toBeCloseTo(994.95377835, 4);
    expect(high.dhiWm2).toBeCloseTo(154.40492924, 4);
  });

  it("matches pvlib-python's array test grid (zenith 0/40/80, AM 1/5.5/10, TL 2/3/4)", () => {
    // `test_ineichen_arrays`, a few corners of the meshgrid: [am index][zenith index][TL index].
    const cases: Array<[number, number, number, number, number, number]> = [
      // zenith, am, tl, ghi, dni, dhi
      [0, 1, 2, 1095.77074798, 1014.38807396, 81.38267402],
      [0, 1, 4, 1014.15727338, 861.11344424, 153.04382915],
      [80, 1, 3, 183.05548067, 942.20818604, 19.44274618],
      [40, 5.5, 3, 478.92699901, 419.14891162, 157.84030442],
      [80, 10, 4, 43.72365587, 75.80970012, 30.5594396],
    ];
    for (const [apparentZenithDeg, airMassAbsolute, linkeTurbidity, ghi, dni, dhi] of cases) {
      const out = ineichenPerez({ ...base, apparentZenithDeg, airMassAbsolute, linkeTurbidity });
      expect(out.ghiWm2).toBeCloseTo(ghi, 4);
      expect(out.dniWm2).toBeCloseTo(dni, 4);
      expect(out.dhiWm2).toBeCloseTo(dhi, 4);
    }
  });

  it('is dark with the sun below the horizon', () => {
    expect(ineichenPerez({ ...base, apparentZenithDeg: 95 })).toEqual({ ghiWm2: 0, dniWm2: 0, dhiWm2: 0 });
  });
});

describe('clearSkyIrradiance', () => {
  it('gives a plausible clear noon at sea level (common practice: ≈ 1000 W/m² with a high sun)', () => {
    const out = clearSkyIrradiance(75, 172);
    expect(out.ghiWm2).toBeGreaterThan(900);
    expect(out.ghiWm2).toBeLessThan(1100);
    expect(out.dhiWm2 / out.ghiWm2).toBeLessThan(0.2);
  });

  it('closes GHI = DNI cos z + DHI', () => {
    for (const altitude of [2, 10, 30, 60, 89]) {
      const out = clearSkyIrradiance(altitude, 100);
      const cosZ = Math.sin((altitude * Math.PI) / 180);
      expect(out.dniWm2 * cosZ + out.dhiWm2).toBeCloseTo(out.ghiWm2, 6);
    }
  });

  it('gives more sun higher up and less in a hazier atmosphere', () => {
    const sea = clearSkyIrradiance(40, 172);
    expect(clearSkyIrradiance(40, 172, { elevationM: 3000 }).ghiWm2).toBeGreaterThan(sea.ghiWm2);
    expect(clearSkyIrradiance(40, 172, { linkeTurbidity: 5 }).dniWm2).toBeLessThan(sea.dniWm2);
  });

  it('is dark at and below the horizon', () => {
    expect(clearSkyIrradiance(0, 172).ghiWm2).toBe(0);
    expect(clearSkyIrradiance(-10, 172).ghiWm2).toBe(0);
  });
});
