import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { airTemperatureAt, dailyTemperatureAnchors } from './daily-air-temperature.js';

const hour = 3_600_000;

describe('daily air temperature curve', () => {
  const anchors = dailyTemperatureAnchors([
    { lowUtcMs: 6 * hour, highUtcMs: 15 * hour, lowC: 2, highC: 14 },
    { lowUtcMs: 30 * hour, highUtcMs: 39 * hour, lowC: 4, highC: 10 },
  ]);

  it('passes through the low at sunrise and the high at 15:00, halfway between at mid-time', () => {
    expect(airTemperatureAt(anchors, 6 * hour)).toBeCloseTo(2, 9);
    expect(airTemperatureAt(anchors, 15 * hour)).toBeCloseTo(14, 9);
    expect(airTemperatureAt(anchors, 10.5 * hour)).toBeCloseTo(8, 9);
    expect(airTemperatureAt(anchors, 30 * hour)).toBeCloseTo(4, 9);
  });

  it('stays between the bracketing extremes and holds the end values outside', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 48 * hour, noNaN: true }), (t) => {
        const temp = airTemperatureAt(anchors, t);
        return temp >= 2 - 1e-9 && temp <= 14 + 1e-9;
      }),
    );
    expect(airTemperatureAt(anchors, 0)).toBeCloseTo(2, 9);
    expect(airTemperatureAt(anchors, 60 * hour)).toBeCloseTo(10, 9);
  });

  it('drops anchors that would run backwards', () => {
    const odd = dailyTemperatureAnchors([{ lowUtcMs: 16 * hour, highUtcMs: 15 * hour, lowC: 0, highC: 5 }]);
    expect(odd).toHaveLength(1);
  });
});
