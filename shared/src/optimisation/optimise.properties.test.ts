/**
 * Properties of the optimiser on synthetic worlds (synthetic-problem.ts — invented, not outside check values).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dailyBalance } from './daily-balance.js';
import { buildDailyModel } from './daily-model.js';
import { clearlyBroken } from './energy-cuts.js';
import { kitViewCuts } from './kit-views.js';
import { solveWithJsLp } from './js-lp-backend.js';
import { kitCounts, kitMassG } from './kit.js';
import { createKitSearch } from './kit-search.js';
import { findSwaps, optimiseKit } from './optimise.js';
import { exhaustiveLightestKit } from './oracle.js';
import { presolve } from './presolve.js';
import { shaveGrams } from './shave-grams.js';
import { smallSyntheticWorld, syntheticJudge, syntheticProblem, type SyntheticWorld } from './synthetic-problem.js';
import type { KitCandidate, OptimisationProblem } from './types.js';

/** One fixed seed for every property run, so failures reproduce. */
const propertySeed = 20261202;
const seedArb = fc.integer({ min: 1, max: 1_000_000 });

function randomKit(candidates: readonly KitCandidate[], picks: readonly number[]): Map<string, number> {
  // Biased towards big kits so that many are feasible.
  return new Map(
    candidates.map((c, i) => [
      c.itemId,
      Math.min(c.ownedCount, Math.round(((picks[i % picks.length] ?? 0) * (c.ownedCount + 0.49)) / 0.999)),
    ]),
  );
}

function grams(problem: OptimisationProblem, world: SyntheticWorld): number | null {
  const a = optimiseKit(problem, syntheticJudge(world));
  expect(a.status).not.toBe('best-so-far');
  return a.status === 'nothing-feasible' ? null : a.kit.massG;
}

describe('the synthetic judge itself', () => {
  it('is monotone: adding a unit of any item never turns a feasible kit into one that runs dry', () => {
    fc.assert(
      fc.property(
        seedArb,
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
        (seed, picks) => {
          const world = smallSyntheticWorld(seed);
          const judge = syntheticJudge(world);
          const { candidates } = syntheticProblem(world);
          const kit = randomKit(candidates, picks);
          if (!judge(kit).feasible) return;
          for (const c of candidates) {
            if ((kit.get(c.itemId) ?? 0) >= c.ownedCount) continue;
            const more = new Map(kit).set(c.itemId, (kit.get(c.itemId) ?? 0) + 1);
            expect(judge(more).feasible).toBe(true);
          }
        },
      ),
      { seed: propertySeed, numRuns: 300 },
    );
  });
});

describe('the daily model is a relaxation of the judge', () => {
  it('every kit the judge accepts is feasible in the daily model with that kit fixed (forward pass and MILP)', () => {
    let accepted = 0;
    fc.assert(
      fc.property(
        seedArb,
        fc.array(fc.double({ min: 0.3, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
        (seed, picks) => {
          const world = smallSyntheticWorld(seed);
          const problem = syntheticProblem(world);
          const kit = randomKit(problem.candidates, picks);
          if (!syntheticJudge(world)(kit).feasible) return;
          accepted++;
          const pre = presolve(problem);
          expect(dailyBalance(pre, kit).feasible).toBe(true);
          const fixed = solveWithJsLp(buildDailyModel(pre, [], { phase: 'fixed-kit', counts: kit }), {
            timeoutMs: 5000,
            now: () => 0,
          });
          expect(fixed.status).toBe('optimal');
        },
      ),
      { seed: propertySeed, numRuns: 300 },
    );
    expect(accepted).toBeGreaterThan(50);
  });

  it("no kit the judge accepts breaks a cut of another kit's views (their demand through its paths, lifted by the blockers)", () => {
    let checked = 0;
    fc.assert(
      fc.property(
        seedArb,
        // Small kits to cut from (a path, too little energy), big kits to accept.
        fc.array(fc.double({ min: 0, max: 0.75, noNaN: true }), { minLength: 7, maxLength: 7 }),
        fc.array(fc.double({ min: 0.3, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
        (seed, cutPicks, acceptedPicks) => {
          const world = smallSyntheticWorld(seed);
          const problem = syntheticProblem(world);
          const pre = presolve(problem);
          const accepted = randomKit(problem.candidates, acceptedPicks);
          if (!syntheticJudge(world)(accepted).feasible) return;
          for (const cut of kitViewCuts(pre, randomKit(problem.candidates, cutPicks))) {
            checked++;
            expect(clearlyBroken(pre, cut, accepted)).toBe(false);
          }
        },
      ),
      { seed: propertySeed, numRuns: 1500 },
    );
    expect(checked).toBeGreaterThan(10);
  });

  it('the forward pass and the MILP agree on fixed kits, accepted or not', () => {
    fc.assert(
      fc.property(
        seedArb,
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
        (seed, picks) => {
          const world = smallSyntheticWorld(seed);
          const pre = presolve(syntheticProblem(world));
          const kit = randomKit(pre.problem.candidates, picks);
          const fixed = solveWithJsLp(buildDailyModel(pre, [], { phase: 'fixed-kit', counts: kit }), {
            timeoutMs: 5000,
            now: () => 0,
          });
          expect(fixed.status === 'optimal').toBe(dailyBalance(pre, kit).feasible);
        },
      ),
      { seed: propertySeed, numRuns: 200 },
    );
  });
});

describe('answers', () => {
  it('with a gram limit below the optimum, the answer is the same lightest feasible kit, over the limit', () => {
    fc.assert(
      fc.property(seedArb, fc.double({ min: 0.05, max: 0.95, noNaN: true }), (seed, share) => {
        const world = smallSyntheticWorld(seed);
        const free = optimiseKit(syntheticProblem(world), syntheticJudge(world));
        if (free.status !== 'optimal' || free.kit.massG === 0) return;
        const limitG = Math.floor(free.kit.massG * share);
        const limited = optimiseKit(syntheticProblem(world, limitG), syntheticJudge(world));
        expect(limited.status).toBe('over-limit');
        if (limited.status !== 'over-limit') return;
        expect(limited.kit.lines).toEqual(free.kit.lines);
        expect(limited.overLimitG).toBe(free.kit.massG - limitG);
      }),
      { seed: propertySeed, numRuns: 60 },
    );
  });

  it('more demand never gives a lighter optimum', () => {
    fc.assert(
      fc.property(seedArb, fc.double({ min: 1.05, max: 2, noNaN: true }), (seed, factor) => {
        const world = smallSyntheticWorld(seed);
        const base = grams(syntheticProblem(world), world);
        const more = { ...world, demandScale: factor };
        const after = grams(syntheticProblem(more), more);
        if (base === null) expect(after).toBeNull();
        else if (after !== null) expect(after).toBeGreaterThanOrEqual(base);
      }),
      { seed: propertySeed, numRuns: 60 },
    );
  });

  it('more sun never gives a heavier optimum', () => {
    fc.assert(
      fc.property(seedArb, fc.double({ min: 1.05, max: 3, noNaN: true }), (seed, factor) => {
        const world = smallSyntheticWorld(seed);
        const base = grams(syntheticProblem(world), world);
        const sunnier = { ...world, sunScale: factor };
        const after = grams(syntheticProblem(sunnier), sunnier);
        if (base !== null) {
          expect(after).not.toBeNull();
          expect(after as number).toBeLessThanOrEqual(base);
        }
      }),
      { seed: propertySeed, numRuns: 60 },
    );
  });

  it('every swap is judged feasible, none holds the optimum, they are distinct and come in grams order', () => {
    let swapsSeen = 0;
    fc.assert(
      fc.property(seedArb, (seed) => {
        const world = smallSyntheticWorld(seed);
        const problem = syntheticProblem(world);
        const judge = syntheticJudge(world);
        const search = createKitSearch(problem, judge);
        const answer = optimiseKit(problem, judge, {}, search);
        if (answer.status !== 'optimal') return;
        const swaps = findSwaps(problem, judge, answer.kit, {}, search);
        swapsSeen += swaps.length;
        const optimum = kitCounts(answer.kit.lines);
        const keys = new Set<string>();
        let lastG = answer.kit.massG;
        for (const swap of swaps) {
          const counts = kitCounts(swap.kit.lines);
          expect(judge(counts).feasible).toBe(true);
          const holdsOptimum = [...optimum].every(([id, n]) => (counts.get(id) ?? 0) >= n);
          expect(holdsOptimum).toBe(false);
          expect(swap.extraG).toBe(swap.kit.massG - answer.kit.massG);
          expect(swap.kit.massG).toBeGreaterThanOrEqual(lastG);
          lastG = swap.kit.massG;
          const key = JSON.stringify(swap.kit.lines);
          expect(keys.has(key)).toBe(false);
          keys.add(key);
          for (const line of swap.kit.lines)
            expect(line.count).toBeLessThanOrEqual(
              problem.candidates.find((c) => c.itemId === line.itemId)?.ownedCount ?? 0,
            );
        }
      }),
      { seed: propertySeed, numRuns: 60 },
    );
    expect(swapsSeen).toBeGreaterThan(20);
  });

  it('every shave is judged feasible, weighs less, and they come lightest first', () => {
    let shavesSeen = 0;
    fc.assert(
      fc.property(seedArb, (seed) => {
        const world = smallSyntheticWorld(seed);
        const problem = syntheticProblem(world);
        const judge = syntheticJudge(world);
        const locker = new Map(problem.candidates.map((c) => [c.itemId, c.ownedCount]));
        const baseG = kitMassG(locker, problem.candidates);
        const { shaves, untriedChanges } = shaveGrams(problem.candidates, judge, locker);
        expect(untriedChanges).toBe(0);
        shavesSeen += shaves.length;
        let lastG = -Infinity;
        for (const s of shaves) {
          expect(judge(kitCounts(s.kit.lines)).feasible).toBe(true);
          expect(s.kit.massG).toBeLessThan(baseG);
          expect(s.savedG).toBe(baseG - s.kit.massG);
          expect(s.kit.massG).toBeGreaterThanOrEqual(lastG);
          lastG = s.kit.massG;
        }
      }),
      { seed: propertySeed, numRuns: 60 },
    );
    expect(shavesSeen).toBeGreaterThan(20);
  });

  it('the dominance presolve never changes the optimum grams (same answer with every attribute removed)', () => {
    fc.assert(
      fc.property(seedArb, (seed) => {
        const world = smallSyntheticWorld(seed, 3);
        const problem = syntheticProblem(world);
        const bare: OptimisationProblem = {
          ...problem,
          candidates: problem.candidates.map((c) => ({
            itemId: c.itemId,
            kind: c.kind,
            massG: c.massG,
            ownedCount: c.ownedCount,
          })),
        };
        expect(presolve(bare).dominance).toEqual([]);
        const a = optimiseKit(problem, syntheticJudge(world));
        const b = optimiseKit(bare, syntheticJudge(world));
        expect(a.status).toBe(b.status);
        if (a.status !== 'nothing-feasible' && b.status !== 'nothing-feasible') expect(a.kit.massG).toBe(b.kit.massG);
      }),
      { seed: propertySeed, numRuns: 60 },
    );
  });

  it('the oracle with the monotone skip finds the same grams as the oracle that skips nothing', () => {
    fc.assert(
      fc.property(seedArb, (seed) => {
        const world = smallSyntheticWorld(seed);
        const { candidates } = syntheticProblem(world);
        const judge = syntheticJudge(world);
        const a = exhaustiveLightestKit(candidates, judge);
        const b = exhaustiveLightestKit(candidates, judge, { skipNoLargerThanRejected: false });
        expect(a.best?.massG ?? null).toBe(b.best?.massG ?? null);
        expect(a.judged).toBeLessThanOrEqual(b.judged);
      }),
      { seed: propertySeed, numRuns: 60 },
    );
  });
});
