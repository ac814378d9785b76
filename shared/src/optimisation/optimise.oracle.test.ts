/**
 * The optimiser against exhaustive search. The worlds are synthetic (synthetic-problem.ts): they test that the model,
 * the presolve and the verify-and-repair loop find exactly the lightest kit the judge accepts — they are not check
 * values from the outside world.
 */
import { describe, expect, it } from 'vitest';
import { kitCounts } from './kit.js';
import { optimiseKit } from './optimise.js';
import { exhaustiveLightestKit } from './oracle.js';
import { smallSyntheticWorld, syntheticJudge, syntheticProblem } from './synthetic-problem.js';

/** Oracle cases, and how many of them skip nothing (so a monotonicity bug cannot hide behind the skip). */
const caseCount = 200;
const noSkipCases = 50;

describe('optimiser vs exhaustive search (200 seeded small lockers)', () => {
  const outcomes = { feasible: 0, nothing: 0, rejectedRounds: 0 };
  for (let seed = 1; seed <= caseCount; seed++) {
    const skipNothing = seed <= noSkipCases;
    it(`case ${seed}${skipNothing ? ' (oracle skips nothing)' : ''}`, () => {
      const world = smallSyntheticWorld(seed);
      const judge = syntheticJudge(world);
      const problem = syntheticProblem(world);
      expect(problem.candidates.length).toBeLessThanOrEqual(7);
      expect(Math.max(...problem.candidates.map((c) => c.ownedCount))).toBeLessThanOrEqual(2);
      const oracle = exhaustiveLightestKit(problem.candidates, judge, { skipNoLargerThanRejected: !skipNothing });
      if (skipNothing) expect(oracle.skipped).toBe(0);
      const answer = optimiseKit(problem, judge);
      if (oracle.best === null) {
        expect(answer.status).toBe('nothing-feasible');
        outcomes.nothing++;
        return;
      }
      expect(answer.status).toBe('optimal');
      if (answer.status !== 'optimal') return;
      expect(answer.kit.massG).toBe(oracle.best.massG);
      // The answer is judged feasible and respects counts owned.
      expect(judge(kitCounts(answer.kit.lines)).feasible).toBe(true);
      for (const line of answer.kit.lines) {
        const cand = problem.candidates.find((c) => c.itemId === line.itemId);
        expect(line.count).toBeLessThanOrEqual(cand?.ownedCount ?? 0);
      }
      outcomes.feasible++;
      outcomes.rejectedRounds += answer.stats.rounds - 1;
    });
  }
  it('the cases are a mix of feasible and infeasible lockers, and some need repair rounds', () => {
    expect(outcomes.feasible + outcomes.nothing).toBe(caseCount);
    expect(outcomes.feasible).toBeGreaterThan(caseCount / 4);
    expect(outcomes.nothing).toBeGreaterThan(5);
    expect(outcomes.rejectedRounds).toBeGreaterThan(0);
  });
});
