/** Gram prices on a synthetic world (synthetic-problem.ts: invented, not outside check values). */
import { describe, expect, it } from 'vitest';
import { gramPrice } from './gram-price.js';
import { syntheticJudge, syntheticProblem, type SyntheticWorld } from './synthetic-problem.js';
import type { OptimiseAnswer } from './types.js';

/** No sun, 3 days, one device with no path needed: `demandWh` a day from banks of 20 Wh (140 g) and 12 Wh (100 g). */
const noSun = (demandWh: number): SyntheticWorld => ({
  dayCount: 3,
  skyShare: [[0, 0, 0]],
  frozenUntilHour: [0, 0, 0],
  sunScale: 1,
  demandScale: 1,
  demandHours: [18, 19],
  chargeEfficiency: 0.9,
  reserveShare: 0,
  panels: [],
  banks: [
    { itemId: 'bank-20', massG: 140, ownedCount: 2, usableWh: 20, inputW: 10 },
    { itemId: 'bank-12', massG: 100, ownedCount: 3, usableWh: 12, inputW: 10 },
  ],
  pathItems: [],
  devices: [{ deviceId: 'phone', demandWh, alternatives: [[]] }],
});

describe('gramPrice', () => {
  it('is never negative: a stopped search whose kit a lighter kit beats even with the raised requirement gives "unknown"', () => {
    // Found on a 200-item real locker, where a stopped search answered "−716 g". Here: the trip as it is needs
    // 3 × 10 = 30 Wh, and a stopped search answered three 12 Wh banks (36 Wh, 300 g; the lightest is 20 + 12 Wh, 240 g).
    // With 13 Wh a day (39 Wh) those three banks run short, and the lightest kit is two 20 Wh banks, 280 g < 300 g.
    const base: OptimiseAnswer = {
      status: 'best-so-far',
      kit: { lines: [{ itemId: 'bank-12', count: 3 }], massG: 300, verdict: { feasible: true } },
      lowerBoundG: 0,
      stats: { rounds: 1, judgedKits: 1, activeItems: 2, candidateItems: 2 },
      notes: [],
    };
    const raised = noSun(13);
    const price = gramPrice(base, syntheticProblem(raised), syntheticJudge(raised));
    expect(price.kind).toBe('unknown');
  });

  it('from a proven optimum, the same raise costs 40 g (240 g → 280 g)', () => {
    const base: OptimiseAnswer = {
      status: 'optimal',
      kit: {
        lines: [
          { itemId: 'bank-12', count: 1 },
          { itemId: 'bank-20', count: 1 },
        ],
        massG: 240,
        verdict: { feasible: true },
      },
      stats: { rounds: 1, judgedKits: 1, activeItems: 2, candidateItems: 2 },
      notes: [],
    };
    const raised = noSun(13);
    expect(gramPrice(base, syntheticProblem(raised), syntheticJudge(raised))).toMatchObject({
      kind: 'grams',
      extraG: 40,
    });
  });
});
