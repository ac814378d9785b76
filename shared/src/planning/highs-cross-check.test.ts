/**
 * Cross-check of the daily model built from REAL trips against an independent solver. The optimiser's own cross-check
 * (optimisation/highs-cross-check.test.ts) runs on 50 synthetic worlds; this one runs on 50 random planning inputs
 * (real sun, sky and temperatures; invented gear, planning/invented-trips.ts), whose coefficients carry the step detail
 * (hourly input limits, the morning before the first top-up) and the split charging needs that planningContext builds.
 * The lightest kit the daily model accepts — found by the decomposed search (javascript-lp-solver master with the
 * forward pass's Benders cuts) — must weigh exactly what HiGHS finds for the whole monolithic daily model written as
 * CPLEX LP text. HiGHS: the `highs` npm package, HiGHS compiled to WebAssembly (Q. Huangfu and J. A. J. Hall,
 * "Parallelizing the dual revised simplex method", Mathematical Programming Computation 10, 2018).
 */
import highsModule, { type Highs } from 'highs';
import { beforeAll, describe, expect, it } from 'vitest';
import { dailyBalance } from '../optimisation/daily-balance.js';
import { buildDailyModel, modelScale } from '../optimisation/daily-model.js';
import { createKitSearch } from '../optimisation/kit-search.js';
import { toLpText } from '../optimisation/lp-text.js';
import { lpTextColumnsValid } from '../optimisation/lp-text.test-support.js';
import { presolve } from '../optimisation/presolve.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import { randomPlanningInput } from './invented-trips.js';
import { planningContext } from './build-problem.js';

// The package's typings describe a CommonJS default export, which NodeNext reads as the module object.
const loadHighs = highsModule as unknown as () => Promise<Highs>;
let highs: Highs;
beforeAll(async () => {
  highs = await loadHighs();
});

/** Instances in the cross-check. */
const instanceCount = 50;

describe('the decomposed search and HiGHS on the daily model of real trips', () => {
  it(`find the same lightest daily-feasible kit on ${instanceCount} random planning inputs`, () => {
    let optimal = 0;
    let infeasible = 0;
    let withPanel = 0;
    for (let seed = 1; seed <= instanceCount; seed++) {
      const random = seededRandom(30_000 + seed);
      const input = randomPlanningInput(random, {
        itemTypes: 4 + Math.floor(random() * 7),
        maxOwned: 3,
        nights: [1, 10],
      });
      const problem = planningContext(input).problem;
      const pre = presolve(problem);
      const scale = modelScale(pre);
      const text = toLpText(buildDailyModel(pre, [], { phase: 'min-grams' }, scale));
      expect(lpTextColumnsValid(text)).toBe(true);
      const theirs = highs.solve(text, { mip_rel_gap: 0, mip_abs_gap: 0 });
      // A judge that accepts every kit the daily model accepts: the search then returns the daily model's optimum.
      const search = createKitSearch(problem, (kit) => ({ feasible: dailyBalance(pre, kit).feasible }), {
        tieBreakByMargin: false,
        kitViews: false,
      });
      const ours = search.next(Infinity);
      if (theirs.Status === 'Infeasible') {
        expect(ours.kind).toBe('exhausted');
        infeasible++;
        continue;
      }
      expect(theirs.Status).toBe('Optimal');
      expect(ours.kind).toBe('found');
      if (ours.kind !== 'found') continue;
      expect(ours.massG).toBe(Math.round(theirs.ObjectiveValue * scale.massG));
      if ([...ours.counts.keys()].some((id) => id.startsWith('panel'))) withPanel++;
      optimal++;
    }
    // Both outcomes must occur, and the sun must matter in some, or the check says little.
    expect(optimal).toBeGreaterThan(instanceCount / 3);
    expect(infeasible).toBeGreaterThan(0);
    expect(withPanel).toBeGreaterThan(0);
    expect(optimal + infeasible).toBe(instanceCount);
  }, 240_000);
});
