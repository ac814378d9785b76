import turfDistance from '@turf/distance';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { deriveGpxRoute } from './gpx-route.js';
import type { GpxPoint } from './parse-gpx.js';
import { walkingBearingsFromDays, walkingDays } from './walking-days.js';

const fixture = readFileSync(new URL('./fixtures/three-day-track.gpx', import.meta.url), 'utf8');
const turfM = (a: [number, number], b: [number, number]) =>
  turfDistance([a[1], a[0]], [b[1], b[0]], { units: 'meters' });
const p = (latDeg: number, lonDeg: number, timeMs: number | null = null): GpxPoint => ({ latDeg, lonDeg, timeMs });

describe('deriveGpxRoute on the three-day fixture (invented track: north, east, south)', () => {
  it('splits at the two nights in the times and reads each day', () => {
    const result = deriveGpxRoute(fixture, 2);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const { route } = result;
    expect(route.start.latDeg).toBeCloseTo(46.5, 9);
    expect(route.start.lonDeg).toBeCloseTo(9.8, 9);
    expect(route.splitBy).toBe('time');
    expect(route.splitNote).toBeNull();
    expect(route.days.map((day) => day.bearingDeg)).toHaveLength(3);
    const [north, east, south] = route.days;
    expect(north?.bearingDeg).toBeCloseTo(0, 6);
    // Heading for a point due east on the same parallel starts slightly north of east (great circle).
    expect(east?.bearingDeg).toBeGreaterThan(89.9);
    expect(east?.bearingDeg).toBeLessThan(90);
    expect(south?.bearingDeg).toBeCloseTo(180, 6);
    // Distances cross-checked with @turf/distance (each day is a straight line in the fixture).
    expect(north?.distanceM).toBeCloseTo(turfM([46.5, 9.8], [46.55, 9.8]), -1);
    expect(east?.distanceM).toBeCloseTo(turfM([46.55, 9.8], [46.55, 9.87]), -1);
    expect(south?.distanceM).toBeCloseTo(turfM([46.55, 9.87], [46.51, 9.87]), -1);
    expect(route.totalDistanceM).toBeCloseTo(
      (north?.distanceM ?? 0) + (east?.distanceM ?? 0) + (south?.distanceM ?? 0),
      3,
    );
    expect(route.walkingBearingsDeg).toHaveLength(3);
  });

  it('when the trip has more days than the track has, splits by distance and says why', () => {
    const result = deriveGpxRoute(fixture, 5);
    expect(result.ok && result.route.splitBy).toBe('distance');
    expect(result.ok && result.route.splitNote).toMatch(/3 walking days.*trip has 6/);
    expect(result.ok && result.route.days).toHaveLength(6);
    if (!result.ok) return;
    const each = result.route.totalDistanceM / 6;
    for (const day of result.route.days) expect(day.distanceM).toBeCloseTo(each, 3);
  });

  it('passes on the parser error', () => {
    const result = deriveGpxRoute('not xml', 2);
    expect(!result.ok && result.error.code).toBe('not-xml');
  });
});

describe('walkingDays by distance', () => {
  it('cuts one long leg at equal distances', () => {
    const { days, splitBy, splitNote } = walkingDays([p(0, 0), p(0, 0.3)], 3);
    expect(splitBy).toBe('distance');
    expect(splitNote).toBeNull();
    expect(days.map((day) => day.end.lonDeg)).toEqual([
      expect.closeTo(0.1, 9),
      expect.closeTo(0.2, 9),
      expect.closeTo(0.3, 9),
    ]);
    for (const day of days) {
      expect(day.bearingDeg).toBeCloseTo(90, 6);
      expect(day.distanceM).toBeCloseTo(turfM([0, 0], [0, 0.1]), 0);
    }
  });

  it('one point: no movement, no bearing', () => {
    const { days } = walkingDays([p(10, 10)], 2);
    expect(days.map((day) => [day.distanceM, day.bearingDeg])).toEqual([
      [0, null],
      [0, null],
    ]);
    expect(walkingBearingsFromDays(days)).toBeNull();
  });

  it('times that go backwards are not trusted: split by distance', () => {
    const { splitBy } = walkingDays([p(0, 0, 10_000_000_000), p(0, 0.1, 0), p(0, 0.2, 40_000_000_000)], 2);
    expect(splitBy).toBe('distance');
  });

  it('refuses zero days', () => {
    expect(() => walkingDays([p(0, 0)], 0)).toThrow();
  });
});

describe('walkingBearingsFromDays', () => {
  it('a still day keeps the bearing before it, a still first day takes the first moving one', () => {
    expect(
      walkingBearingsFromDays([{ bearingDeg: null }, { bearingDeg: 90 }, { bearingDeg: null }, { bearingDeg: 200 }]),
    ).toEqual([90, 90, 90, 200]);
  });
});
