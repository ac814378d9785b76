import { describe, expect, it } from 'vitest';
import {
  dailyExtraterrestrialHorizontalWhm2,
  dayOfYearUtc,
  eccentricityCorrection,
  extraterrestrialNormalIrradianceWm2,
  solarDeclinationDeg,
  sunsetHourAngleDeg,
} from './extraterrestrial.js';

const whPerMj = 1e6 / 3600;

describe('daily extraterrestrial irradiation on a horizontal surface', () => {
  it('matches Duffie & Beckman example 1.10.1 within 1 %', () => {
    // Duffie & Beckman, Solar Engineering of Thermal Processes, 3rd ed. (2006), example 1.10.1:
    // H0 at 43° N on April 15 (n = 105) with Gsc = 1367 W/m² is 33.8 MJ/m² (`from memory`;
    // the example uses δ = 9.4° and ωs = 98.9°).
    const h0Mj = dailyExtraterrestrialHorizontalWhm2(43, 105, { solarConstantWm2: 1367 }) / whPerMj;
    expect(Math.abs(h0Mj - 33.8) / 33.8).toBeLessThan(0.01);
  });

  it('is zero in polar night and follows 24 h of sun in polar day', () => {
    expect(dailyExtraterrestrialHorizontalWhm2(80, 355)).toBeCloseTo(0, 9);
    expect(sunsetHourAngleDeg(80, 23)).toBe(180);
    // In polar day the geometry term is π sin φ sin δ; H0 at the pole at solstice ≈ 24 h × Gon × sin δ.
    const pole = dailyExtraterrestrialHorizontalWhm2(90, 172);
    const expected =
      24 * extraterrestrialNormalIrradianceWm2(172) * Math.sin((solarDeclinationDeg(172) * Math.PI) / 180);
    expect(pole / expected).toBeCloseTo(1, 6);
  });
});

describe('extraterrestrial normal irradiance (Spencer 1971)', () => {
  it("matches pvlib-python's test value for day 300 with its 1366.1 W/m² constant", () => {
    // pvlib-python pvlib/tests/test_irradiance.py `test_get_extra_radiation`: 2016-10-26 (day 300),
    // method 'spencer' → 1383.636203 W/m².
    expect(extraterrestrialNormalIrradianceWm2(300, { solarConstantWm2: 1366.1 })).toBeCloseTo(1383.636203, 5);
  });

  it('peaks near perihelion (early January, ≈ +3.3 %) and bottoms near aphelion (early July, ≈ −3.3 %)', () => {
    // Duffie & Beckman, 3rd ed., Figure 1.4.1: the extraterrestrial radiation varies by ±3.3 % over the year.
    expect(eccentricityCorrection(3)).toBeGreaterThan(1.03);
    expect(eccentricityCorrection(3)).toBeLessThan(1.036);
    expect(eccentricityCorrection(185)).toBeGreaterThan(0.964);
    expect(eccentricityCorrection(185)).toBeLessThan(0.97);
  });
});

describe('solar declination (Spencer 1971)', () => {
  it('reaches ±23.44° at the solstices and ≈ 0 at the equinoxes', () => {
    // Obliquity of the ecliptic 23.44° (Meeus, Astronomical Algorithms, 2nd ed., eq. 22.2 for 2000).
    expect(solarDeclinationDeg(172)).toBeCloseTo(23.44, 0);
    expect(solarDeclinationDeg(355)).toBeCloseTo(-23.44, 0);
    expect(Math.abs(solarDeclinationDeg(80))).toBeLessThan(0.8);
  });

  it('is 9.4° on April 15, as in Duffie & Beckman example 1.10.1 (`from memory`)', () => {
    expect(Math.abs(solarDeclinationDeg(105) - 9.4)).toBeLessThan(0.15);
  });
});

describe('dayOfYearUtc', () => {
  it('counts from 1 on January 1 and reaches 366 on 31 December of a leap year', () => {
    expect(dayOfYearUtc(Date.UTC(2026, 0, 1, 23))).toBe(1);
    expect(dayOfYearUtc(Date.UTC(2026, 3, 15))).toBe(105);
    expect(dayOfYearUtc(Date.UTC(2028, 11, 31, 12))).toBe(366);
  });
});
