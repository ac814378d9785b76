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

/** A stopped search's answer for the trip as it is (10 Wh a day): three 12 Wh banks, 300 g (the lightest is 240 g). */
const threeSmallBanks: OptimiseAnswer = {
  status: 'best-so-far',
  kit: { lines: [{ itemId: 'bank-12', count: 3 }], massG: 300, verdict: { feasible: true } },
  lowerBoundG: 0,
  stats: { rounds: 1, judgedKits: 1, activeItems: 2, candidateItems: 2 },
  notes: [],
};

describe('gramPrice', () => {
  it('prices a stopped search’s kit by repairing it: three 12 Wh banks meet 13 Wh a day with a 20 Wh bank for one 12 Wh bank, 40 g more (about)', () => {
    // The trip as it is needs 3 × 10 = 30 Wh, and a stopped search answered three 12 Wh banks (36 Wh, 300 g; the lightest
    // is 20 + 12 Wh, 240 g). With 13 Wh a day (39 Wh) those three banks run short. The repair adds the stores lightest
    // first (both 20 Wh banks: 76 Wh), then shaves the added ones first: one 20 Wh bank stays, and one of the three 12 Wh
    // banks goes (44 Wh, 340 g). A search for the raised optimum (two 20 Wh banks, 280 g, lighter than the base kit)
    // would give no price at all: a stopped search on the 200-item bench locker once answered "−716 g".
    const raised = noSun(13);
    const judge = syntheticJudge(raised);
    const price = gramPrice(threeSmallBanks, syntheticProblem(raised), judge);
    expect(price).toMatchObject({ kind: 'grams', extraG: 40, approximate: true });
    if (price.kind !== 'grams') return;
    expect(new Map(price.kit.lines.map((l) => [l.itemId, l.count]))).toEqual(
      new Map([
        ['bank-12', 2],
        ['bank-20', 1],
      ]),
    );
    expect(judge(new Map(price.kit.lines.map((l) => [l.itemId, l.count]))).feasible).toBe(true);
  });

  it('a stopped search’s kit that no gear can repair: nothing feasible', () => {
    // Every bank together holds 2 × 20 + 3 × 12 = 76 Wh; 26 Wh a day for 3 days is 78.
    const raised = noSun(26);
    expect(gramPrice(threeSmallBanks, syntheticProblem(raised), syntheticJudge(raised))).toEqual({
      kind: 'nothing-feasible',
    });
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
