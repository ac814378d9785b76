/**
 * planTrip against exhaustive search on real trips: for 200 seeded random small lockers (≤ 7 item types, ≤ 2 owned
 * each; phones, headlamps and some 12 V radios) and random trips (−60…66° latitude, any season, 1–10 nights, presets
 * or random skies, temperatures for the place and season), every kit is judged by the real hour-by-hour simulation in
 * ascending grams; the first feasible one is the lightest. planTrip's kit must weigh exactly that (grams are whole
 * numbers), or both must find nothing feasible. On 50 cases the exhaustive search skips nothing, so a monotonicity
 * bug in the simulation cannot hide behind the skip. The gear is invented (planning/invented-trips.ts).
 */
import { describe, expect, it } from 'vitest';
import { kitCounts } from '../optimisation/kit.js';
import { exhaustiveLightestKit } from '../optimisation/oracle.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import { randomPlanningInput } from './invented-trips.js';
import { planningContext } from './build-problem.js';
import { planTrip } from './plan-trip.js';

/** Oracle cases, and how many of them skip nothing. */
const caseCount = 200;
const noSkipCases = 50;

describe('planTrip vs exhaustive search on 200 seeded real trips', () => {
  const outcomes = { feasible: 0, nothing: 0, emptyKit: 0, withPanel: 0, withConverter: 0, repairRounds: 0 };
  for (let seed = 1; seed <= caseCount; seed++) {
    const skipNothing = seed <= noSkipCases;
    it(`case ${seed}${skipNothing ? ' (exhaustive search skips nothing)' : ''}`, () => {
      const input = randomPlanningInput(seededRandom(seed));
      expect(input.gear.length).toBeLessThanOrEqual(7);
      expect(Math.max(...input.gear.map((g) => g.countOwned))).toBeLessThanOrEqual(2);
      const context = planningContext(input);
      const oracle = exhaustiveLightestKit(context.problem.candidates, context.judge, {
        skipNoLargerThanRejected: !skipNothing,
      });
      if (skipNothing) expect(oracle.skipped).toBe(0);
      const plan = planTrip(input, { withExtras: false });
      if (oracle.best === null) {
        expect(plan.status).toBe('nothing-feasible');
        expect(plan.kit).toBeNull();
        expect(plan.nothingFeasible?.missing.length).toBeGreaterThan(0);
        outcomes.nothing++;
        return;
      }
      expect(plan.status).toBe('optimal');
      expect(plan.kit?.massG).toBe(oracle.best.massG);
      // The answer is a kit the simulation accepts, within the counts owned.
      const counts = kitCounts(plan.kit?.lines ?? []);
      expect(context.judge(counts).feasible).toBe(true);
      expect(plan.evaluation?.verdict.status).not.toBe('runs-dry');
      for (const line of plan.kit?.lines ?? [])
        expect(line.count).toBeLessThanOrEqual(input.gear.find((g) => g.itemId === line.itemId)?.countOwned ?? 0);
      outcomes.feasible++;
      if (oracle.best.massG === 0) outcomes.emptyKit++;
      if (plan.kit?.lines.some((l) => l.kind === 'panel')) outcomes.withPanel++;
      if (plan.kit?.lines.some((l) => l.kind === 'converter')) outcomes.withConverter++;
      if (plan.stats.rounds > 1) outcomes.repairRounds++;
    });
  }
  it('the cases mix feasible and infeasible trips, empty kits, panels, converters and repair rounds', () => {
    expect(outcomes.feasible + outcomes.nothing).toBe(caseCount);
    expect(outcomes.feasible).toBeGreaterThan(caseCount / 4);
    expect(outcomes.nothing).toBeGreaterThan(caseCount / 10);
    expect(outcomes.emptyKit).toBeGreaterThan(0);
    expect(outcomes.withPanel).toBeGreaterThan(5);
    expect(outcomes.withConverter).toBeGreaterThan(3);
    expect(outcomes.repairRounds).toBeGreaterThan(10);
  });
});
