import { Body, Equator, Horizon, Observer, SearchRiseSet } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { skyDirection, sunPosition } from './solar-position.js';
import { sunTimesNear } from './sun-times.js';

/** Angle between two sky directions, degrees. */
function angleBetweenDeg(a: [number, number, number], b: [number, number, number]): number {
  const dot = a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  return (Math.acos(Math.max(-1, Math.min(1, dot))) * 180) / Math.PI;
}

function astronomySun(utcMs: number, latitudeDeg: number, longitudeDeg: number) {
  const date = new Date(utcMs);
  const observer = new Observer(latitudeDeg, longitudeDeg, 0);
  const equator = Equator(Body.Sun, date, observer, true, true);
  return Horizon(date, observer, equator.ra, equator.dec, 'normal');
}

describe('sunPosition', () => {
  it('matches the NREL SPA worked example', () => {
    // Reda & Andreas, "Solar Position Algorithm for Solar Radiation Applications", NREL/TP-560-34302
    // (2003, rev. 2008), Appendix A.5 example (the output its spa_tester.c prints): 17 October 2003,
    // 12:30:30 local at UTC−7, 39.742476° N, 105.1786° W, 1830.14 m, 820 mbar, 11 °C, ΔT 67 s →
    // topocentric zenith 50.11162°, azimuth 194.34024°.
    // suncalc refracts for a standard sea-level atmosphere, not the example's 820 mbar and 11 °C, and
    // leaves out the 0.0024° parallax: it lands 0.0041° from the zenith and 0.0012° from the azimuth.
    const position = sunPosition(Date.UTC(2003, 9, 17, 19, 30, 30), 39.742476, -105.1786);
    expect(Math.abs(90 - position.altitudeDeg - 50.11162)).toBeLessThan(0.005);
    expect(Math.abs(position.azimuthDeg - 194.34024)).toBeLessThan(0.005);
  });

  it('agrees with astronomy-engine within 0.05° over latitudes −66…66, dates and hours (sun above 5°)', () => {
    // astronomy-engine 2.1 (npm; Don Cross), an independent implementation built on VSOP87 and full
    // nutation, used here as the reference library.
    let compared = 0;
    let worstDeg = 0;
    for (let latitudeDeg = -66; latitudeDeg <= 66; latitudeDeg += 11) {
      for (const longitudeDeg of [-179.5, -122, -3, 15, 88, 151, 179.5]) {
        for (let month = 0; month < 12; month += 1) {
          for (let hour = 0; hour < 24; hour += 2) {
            const utcMs = Date.UTC(2026, month, 7 + month, hour, 17);
            const ours = sunPosition(utcMs, latitudeDeg, longitudeDeg);
            if (ours.altitudeDeg < 5) continue;
            const ref = astronomySun(utcMs, latitudeDeg, longitudeDeg);
            const angle = angleBetweenDeg(
              skyDirection(ours.altitudeDeg, ours.azimuthDeg),
              skyDirection(ref.altitude, ref.azimuth),
            );
            worstDeg = Math.max(worstDeg, angle);
            compared++;
          }
        }
      }
    }
    expect(compared).toBeGreaterThan(1000);
    expect(worstDeg).toBeLessThan(0.05);
  });
});

describe('sunTimesNear', () => {
  it('gives sunrise and sunset within 2 minutes of astronomy-engine up to ±60°', () => {
    let worstMin = 0;
    for (let latitudeDeg = -60; latitudeDeg <= 60; latitudeDeg += 10) {
      for (const longitudeDeg of [-150, -45, 0, 10, 100, 170]) {
        for (let month = 0; month < 12; month += 2) {
          // Local solar noon, roughly: 12:00 UTC shifted by longitude.
          const noonUtcMs = Date.UTC(2026, month, 15, 12) - (longitudeDeg / 15) * 3_600_000;
          const ours = sunTimesNear(noonUtcMs, latitudeDeg, longitudeDeg);
          expect(ours.polar).toBeNull();
          const observer = new Observer(latitudeDeg, longitudeDeg, 0);
          const rise = SearchRiseSet(Body.Sun, observer, +1, new Date(noonUtcMs - 86_400_000 / 2), 1);
          const set = SearchRiseSet(Body.Sun, observer, -1, new Date(noonUtcMs), 1);
          expect(rise).not.toBeNull();
          expect(set).not.toBeNull();
          worstMin = Math.max(
            worstMin,
            Math.abs((ours.sunriseUtcMs ?? 0) - (rise?.date.getTime() ?? 0)) / 60_000,
            Math.abs((ours.sunsetUtcMs ?? 0) - (set?.date.getTime() ?? 0)) / 60_000,
          );
        }
      }
    }
    expect(worstMin).toBeLessThan(2);
  });

  it('reports polar night and polar day at 78° N without NaN', () => {
    const night = sunTimesNear(Date.UTC(2026, 0, 10, 11), 78.2, 15.6);
    expect(night).toMatchObject({ polar: 'night', sunriseUtcMs: null, sunsetUtcMs: null, dayLengthH: 0 });
    const day = sunTimesNear(Date.UTC(2026, 5, 21, 11), 78.2, 15.6);
    expect(day).toMatchObject({ polar: 'day', sunriseUtcMs: null, sunsetUtcMs: null, dayLengthH: 24 });
    expect(Number.isFinite(day.solarNoonUtcMs)).toBe(true);
  });

  it('gives about 12 h of day at the equinox on the equator (common practice: 12 h plus ~7 min for refraction and the disc)', () => {
    const times = sunTimesNear(Date.UTC(2026, 2, 20, 12), 0, 0);
    expect(times.dayLengthH).toBeGreaterThan(12.05);
    expect(times.dayLengthH).toBeLessThan(12.2);
  });
});
