import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  cloudChain,
  cloudyRunDays,
  isValidCloudChain,
  longestCloudyRunCdf,
  minCloudyPersistence,
} from './cloud-chain.js';

/**
 * Independent computation: enumerate all 2^n clear/cloudy sequences, weight each by the chain
 * (stationary first day, then the transitions), and add up P(longest cloudy run ≤ k).
 */
function bruteForceCdf(p: number, q: number, n: number): number[] {
  const clearToCloudy = p > 0 ? ((1 - p) * (1 - q)) / p : 1;
  const cdf = new Array<number>(n + 1).fill(0);
  for (let mask = 0; mask < 1 << n; mask++) {
    let probability = 1;
    let longest = 0;
    let run = 0;
    for (let day = 0; day < n; day++) {
      const cloudy = ((mask >> day) & 1) === 1;
      if (day === 0) probability *= cloudy ? 1 - p : p;
      else {
        const wasCloudy = ((mask >> (day - 1)) & 1) === 1;
        const toCloudy = wasCloudy ? q : clearToCloudy;
        probability *= cloudy ? toCloudy : 1 - toCloudy;
      }
      run = cloudy ? run + 1 : 0;
      longest = Math.max(longest, run);
    }
    for (let k = longest; k <= n; k++) cdf[k] = (cdf[k] ?? 0) + probability;
  }
  return cdf;
}

describe('longest cloudy run distribution', () => {
  it('equals brute-force enumeration of all 2^n sequences for n ≤ 12', () => {
    const pairs: Array<[number, number]> = [
      [0.5, 0.5],
      [0.8, 0.3],
      [0.25, 0.75],
      [0.6, 0.9],
      [0.35, 0.5],
      [1, 0.4],
      [0, 1],
    ];
    for (const [p, q] of pairs) {
      for (const n of [1, 2, 3, 5, 8, 12]) {
        const exact = longestCloudyRunCdf(p, q, n);
        const brute = bruteForceCdf(p, q, n);
        exact.forEach((value, k) => expect(value).toBeCloseTo(brute[k] ?? Number.NaN, 12));
      }
    }
  });

  it('equals brute force for random valid chains (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 10 }),
        (p, u, n) => {
          const q = minCloudyPersistence(p) + u * (1 - minCloudyPersistence(p));
          const exact = longestCloudyRunCdf(p, q, n);
          const brute = bruteForceCdf(p, q, n);
          return exact.every((value, k) => Math.abs(value - (brute[k] ?? Number.NaN)) < 1e-10);
        },
      ),
    );
  });

  it('with independent days (q = 1 − p) gives P(no cloudy day) = p^n', () => {
    expect(longestCloudyRunCdf(0.7, 0.3, 6)[0]).toBeCloseTo(0.7 ** 6, 12);
  });
});

describe('chain validity', () => {
  it('needs q ≥ 1 − p/(1 − p) when p < 0.5', () => {
    expect(minCloudyPersistence(0.25)).toBeCloseTo(2 / 3, 12);
    expect(minCloudyPersistence(0.5)).toBe(0);
    expect(isValidCloudChain(0.25, 0.6)).toBe(false);
    expect(isValidCloudChain(0.25, 0.7)).toBe(true);
    expect(isValidCloudChain(0, 0.99)).toBe(false);
    expect(isValidCloudChain(0, 1)).toBe(true);
    expect(isValidCloudChain(0.9, 0)).toBe(true);
    expect(() => cloudChain(0.2, 0.1)).toThrow(RangeError);
  });

  it('keeps the long-run clear share at p (stationarity)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (p, u) => {
          const q = minCloudyPersistence(p) + u * (1 - minCloudyPersistence(p));
          const chain = cloudChain(p, q);
          const nextClear = p * (1 - chain.clearToCloudy) + (1 - p) * (1 - q);
          return chain.clearToCloudy <= 1 && Math.abs(nextClear - p) < 1e-12;
        },
      ),
    );
  });
});

describe('cloudyRunDays', () => {
  it('is the smallest k whose probability reaches L', () => {
    const cdf = longestCloudyRunCdf(0.6, 0.5, 8);
    const k = cloudyRunDays(0.6, 0.5, 8, 0.9);
    expect(cdf[k]).toBeGreaterThanOrEqual(0.9);
    expect(cdf[k - 1]).toBeLessThan(0.9);
  });

  it('is monotone in L and in trip length, and never exceeds the trip', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 61 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (p, u, days, l1, l2) => {
          const q = minCloudyPersistence(p) + u * (1 - minCloudyPersistence(p));
          const [lo, hi] = l1 <= l2 ? [l1, l2] : [l2, l1];
          const kLo = cloudyRunDays(p, q, days, lo);
          const kHi = cloudyRunDays(p, q, days, hi);
          const kLonger = cloudyRunDays(p, q, days + 1, hi);
          return kLo <= kHi && kHi <= days && kHi <= kLonger;
        },
      ),
      { numRuns: 200 },
    );
  });

  it('is 0 for an always-clear sky and the whole trip for an always-cloudy one', () => {
    expect(cloudyRunDays(1, 0.5, 10, 0.99)).toBe(0);
    expect(cloudyRunDays(0, 1, 10, 0.5)).toBe(10);
    expect(cloudyRunDays(0.5, 0.5, 10, 0)).toBe(0);
  });
});
