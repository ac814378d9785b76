/**
 * The daily model's forward pass and its Benders cuts, on synthetic worlds (invented; they test the algebra, not the
 * physics). A cut is sound only if no kit the daily model accepts breaks it; a cut is useful only if the kit it came
 * from breaks it.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildDailyModel } from './daily-model.js';
import { clearlyBroken, evaluateDailyModel } from './energy-cuts.js';
import { solveWithJsLp } from './js-lp-backend.js';
import { alternativePresent, presolve } from './presolve.js';
import { smallSyntheticWorld, syntheticProblem } from './synthetic-problem.js';
import type { KitCandidate } from './types.js';

const propertySeed = 20261203;

function kitOf(candidates: readonly KitCandidate[], picks: readonly number[]): Map<string, number> {
  return new Map(
    candidates.map((c, i) => [
      c.itemId,
      Math.min(c.ownedCount, Math.floor((picks[i % picks.length] ?? 0) * (c.ownedCount + 1))),
    ]),
  );
}

describe('the forward pass of the daily model', () => {
  it('agrees with the MILP with the kit fixed, with and without step detail', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.array(fc.double({ min: 0, max: 0.999, noNaN: true }), { minLength: 7, maxLength: 7 }),
        fc.boolean(),
        (seed, picks, detail) => {
          const problem = syntheticProblem(smallSyntheticWorld(seed));
          const coarse = detail
            ? problem
            : {
                ...problem,
                coefficients: { ...problem.coefficients, dayFirstStep: undefined, firstTopUpStep: undefined },
              };
          const pre = presolve(coarse);
          const kit = kitOf(problem.candidates, picks);
          const fixed = solveWithJsLp(buildDailyModel(pre, [], { phase: 'fixed-kit', counts: kit }), {
            timeoutMs: 5000,
            now: () => 0,
          });
          const paths = pre.needs.every((n) =>
            n.alternatives.some((alt) =>
              alternativePresent(
                alt,
                pre.items.map((it) => kit.get(it.candidate.itemId) ?? 0),
              ),
            ),
          );
          const passes = evaluateDailyModel(pre, kit).shortfalls.length === 0 && paths && pre.missingNeeds.length === 0;
          expect(fixed.status === 'optimal').toBe(passes);
        },
      ),
      { seed: propertySeed, numRuns: 200 },
    );
  });
});

describe('the Benders cuts of a short kit', () => {
  it('are broken by the kit they came from and by no kit the daily model accepts', () => {
    let cutsChecked = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.array(fc.double({ min: 0, max: 0.999, noNaN: true }), { minLength: 7, maxLength: 7 }),
        fc.array(fc.array(fc.double({ min: 0, max: 0.999, noNaN: true }), { minLength: 7, maxLength: 7 }), {
          minLength: 8,
          maxLength: 8,
        }),
        (seed, shortPicks, otherPicks) => {
          const problem = syntheticProblem(smallSyntheticWorld(seed));
          const pre = presolve(problem);
          const kit = kitOf(problem.candidates, shortPicks);
          const { cuts, shortfalls } = evaluateDailyModel(pre, kit);
          expect(cuts.length).toBe(shortfalls.length);
          for (const cut of cuts) {
            expect(clearlyBroken(pre, cut, kit)).toBe(true);
            // The whole locker and random kits: whenever the daily model accepts one, it keeps every cut.
            const others = [
              new Map(problem.candidates.map((c) => [c.itemId, c.ownedCount])),
              ...otherPicks.map((p) => kitOf(problem.candidates, p)),
            ];
            for (const other of others) {
              if (evaluateDailyModel(pre, other).shortfalls.length > 0) continue;
              expect(clearlyBroken(pre, cut, other)).toBe(false);
              cutsChecked++;
            }
          }
        },
      ),
      { seed: propertySeed, numRuns: 300 },
    );
    expect(cutsChecked).toBeGreaterThan(100);
  });
});
