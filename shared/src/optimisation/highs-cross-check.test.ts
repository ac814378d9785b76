/**
 * Cross-check of the decomposed search against an independent solver: on 50 random synthetic worlds, the lightest kit
 * the daily model accepts — found by the master problem (javascript-lp-solver) with the forward pass's Benders cuts —
 * must weigh exactly what HiGHS finds for the whole monolithic daily model (every sky-day row at once), written as
 * CPLEX LP text. HiGHS: the `highs` npm package, HiGHS compiled to WebAssembly (Q. Huangfu and J. A. J. Hall,
 * "Parallelizing the dual revised simplex method", Mathematical Programming Computation 10, 2018).
 */
import highsModule, { type Highs } from 'highs';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildDailyModel, modelScale } from './daily-model.js';
import { dailyBalance } from './daily-balance.js';
import { lpTextColumnsValid } from './lp-text.test-support.js';
import { toLpText } from './lp-text.js';
import { createKitSearch } from './kit-search.js';
import { presolve } from './presolve.js';
import { randomSyntheticWorld, seededRandom, syntheticProblem } from './synthetic-problem.js';

// The package's typings describe a CommonJS default export, which NodeNext reads as the module object.
const loadHighs = highsModule as unknown as () => Promise<Highs>;
let highs: Highs;
beforeAll(async () => {
  highs = await loadHighs();
});

/** Instances in the cross-check. */
const instanceCount = 50;

describe('the decomposed search and HiGHS on the monolithic daily model', () => {
  it(`find the same lightest daily-feasible kit on ${instanceCount} random worlds`, () => {
    let optimal = 0;
    let infeasible = 0;
    for (let seed = 1; seed <= instanceCount; seed++) {
      const random = seededRandom(10_000 + seed);
      const world = randomSyntheticWorld(random, {
        itemTypes: 5 + Math.floor(random() * 8),
        maxOwned: 3,
        dayCount: 3 + Math.floor(random() * 8),
        skyCount: 4,
      });
      const problem = syntheticProblem(world);
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
      if (ours.kind === 'found') expect(ours.massG).toBe(Math.round(theirs.ObjectiveValue * scale.massG));
      optimal++;
    }
    // Both outcomes must occur, or the check says little.
    expect(optimal).toBeGreaterThan(instanceCount / 2);
    expect(optimal + infeasible).toBe(instanceCount);
  }, 240_000);
});
