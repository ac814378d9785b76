import { describe, expect, it } from 'vitest';
import { cloudyDayFlags, designSkies } from './design-skies.js';

describe('cloudyDayFlags', () => {
  it('places the run at the start, middle and end', () => {
    expect(cloudyDayFlags('cloudy-start', 5, 2)).toEqual([true, true, false, false, false]);
    expect(cloudyDayFlags('cloudy-middle', 5, 2)).toEqual([false, true, true, false, false]);
    expect(cloudyDayFlags('cloudy-end', 5, 2)).toEqual([false, false, false, true, true]);
    expect(cloudyDayFlags('expected', 5, 2)).toEqual([false, false, false, false, false]);
  });

  it('caps k at the trip length and allows k = 0', () => {
    expect(cloudyDayFlags('cloudy-middle', 3, 9)).toEqual([true, true, true]);
    expect(cloudyDayFlags('cloudy-end', 3, 0)).toEqual([false, false, false]);
  });
});

describe('designSkies', () => {
  const input = {
    days: 3,
    cloudyRunDays: 1,
    stepDayIndex: [0, 0, 1, 1, 2, 2],
    clearPlaneWm2: [800, 0, 600, 0, 400, 0],
    overcastPlaneWm2: [100, 0, 80, 0, 60, 0],
    clearShare: 0.75,
    canopyShade: 0.2,
  };

  it('mixes clear and overcast at p on mean days and uses overcast on run days, all times (1 − shade)', () => {
    const [expected, start, middle, end] = designSkies(input);
    expect(expected?.id).toBe('expected');
    expect(expected?.planeIrradianceWm2[0]).toBeCloseTo((0.75 * 800 + 0.25 * 100) * 0.8, 9);
    expect(start?.planeIrradianceWm2[0]).toBeCloseTo(100 * 0.8, 9);
    expect(start?.planeIrradianceWm2[2]).toBeCloseTo(expected?.planeIrradianceWm2[2] ?? Number.NaN, 9);
    expect(middle?.planeIrradianceWm2[2]).toBeCloseTo(80 * 0.8, 9);
    expect(end?.planeIrradianceWm2[4]).toBeCloseTo(60 * 0.8, 9);
    expect(end?.cloudyDays).toEqual([false, false, true]);
  });

  it('makes every cloudy sky equal the expected one when k = 0', () => {
    const skies = designSkies({ ...input, cloudyRunDays: 0 });
    for (const sky of skies) expect(sky.planeIrradianceWm2).toEqual(skies[0]?.planeIrradianceWm2);
  });
});
