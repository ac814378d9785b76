import turfBearing from '@turf/bearing';
import turfDistance from '@turf/distance';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { haversineDistanceM, initialBearingDeg, normalizeBearingDeg } from './great-circle.js';

/** Degrees and minutes to decimal degrees. */
const dm = (deg: number, min: number) => Math.sign(deg) * (Math.abs(deg) + min / 60);

// E. Williams, "Aviation Formulary" V1.47, worked example "LAX to JFK": LAX (33°57'N, 118°24'W),
// JFK (40°38'N, 73°47'W); distance d = 0.623585 rad ≈ 2144 nm, initial true course 1.150035 rad = 65.89°
// (from memory of the worked example).
const lax = { latDeg: dm(33, 57), lonDeg: dm(-118, 24) };
const jfk = { latDeg: dm(40, 38), lonDeg: dm(-73, 47) };
/** One nautical mile is one minute of arc, so a sphere of 180 × 60 / π nm has the arc in nm. */
const arcMinuteRadiusNm = (180 * 60) / Math.PI;

describe('great-circle distance (haversine)', () => {
  it('LAX to JFK is 0.623585 rad, 2144 nm (Aviation Formulary worked example)', () => {
    expect(haversineDistanceM(lax, jfk, 1)).toBeCloseTo(0.623585, 5);
    expect(haversineDistanceM(lax, jfk, arcMinuteRadiusNm)).toBeCloseTo(2144, 0);
  });

  it('one degree of longitude on the equator is 2πR / 360 on the IUGG mean sphere (111 195 m)', () => {
    // 2π × 6 371 008.8 m / 360 = 111 195.08 m (arithmetic on the GRS 80 mean radius, Moritz 1980).
    expect(haversineDistanceM({ latDeg: 0, lonDeg: 0 }, { latDeg: 0, lonDeg: 1 })).toBeCloseTo(111_195.08, 1);
  });

  it('agrees with @turf/distance (same mean radius) on random pairs within 1 mm per 1000 km', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        (lat1, lon1, lat2, lon2) => {
          const ours = haversineDistanceM({ latDeg: lat1, lonDeg: lon1 }, { latDeg: lat2, lonDeg: lon2 });
          const turf = turfDistance([lon1, lat1], [lon2, lat2], { units: 'meters' });
          expect(Math.abs(ours - turf)).toBeLessThanOrEqual(1e-3 + 1e-9 * turf);
        },
      ),
    );
  });

  it('is zero from a point to itself and symmetric', () => {
    const a = { latDeg: 47.1, lonDeg: 9.2 };
    const b = { latDeg: 46.4, lonDeg: 10.7 };
    expect(haversineDistanceM(a, a)).toBeCloseTo(0, 9);
    expect(haversineDistanceM(a, b)).toBeCloseTo(haversineDistanceM(b, a), 6);
  });
});

describe('initial bearing', () => {
  it('LAX to JFK starts on 65.89° (Aviation Formulary worked example, 1.150035 rad)', () => {
    expect(initialBearingDeg(lax, jfk)).toBeCloseTo(65.89, 1);
    expect((initialBearingDeg(lax, jfk) * Math.PI) / 180).toBeCloseTo(1.150035, 4);
  });

  it('points the four ways of the compass along a meridian and the equator', () => {
    const origin = { latDeg: 0, lonDeg: 0 };
    expect(initialBearingDeg(origin, { latDeg: 1, lonDeg: 0 })).toBeCloseTo(0, 9);
    expect(initialBearingDeg(origin, { latDeg: 0, lonDeg: 1 })).toBeCloseTo(90, 9);
    expect(initialBearingDeg(origin, { latDeg: -1, lonDeg: 0 })).toBeCloseTo(180, 9);
    expect(initialBearingDeg(origin, { latDeg: 0, lonDeg: -1 })).toBeCloseTo(270, 9);
  });

  it('agrees with @turf/bearing on random pairs (turf answers −180…180)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -80, max: 80, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        (lat1, lon1, lat2, lon2) => {
          fc.pre(Math.abs(lat1 - lat2) + Math.abs(lon1 - lon2) > 1e-6);
          const ours = initialBearingDeg({ latDeg: lat1, lonDeg: lon1 }, { latDeg: lat2, lonDeg: lon2 });
          const turf = normalizeBearingDeg(turfBearing([lon1, lat1], [lon2, lat2]));
          const diff = Math.abs(ours - turf);
          expect(Math.min(diff, 360 - diff)).toBeLessThan(1e-6);
        },
      ),
    );
  });
});

describe('normalizeBearingDeg', () => {
  it('wraps into [0, 360)', () => {
    expect(normalizeBearingDeg(-90)).toBeCloseTo(270, 9);
    expect(normalizeBearingDeg(360)).toBeCloseTo(0, 9);
    expect(normalizeBearingDeg(725)).toBeCloseTo(5, 9);
  });
});
