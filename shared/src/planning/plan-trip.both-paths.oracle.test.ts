/**
 * planTrip against exhaustive search on lockers holding both power paths: for 120 seeded random trips with a 12 V
 * radio (sometimes able to run live from a pack) and lockers mixing USB panels, banks, boost converters and leads with
 * 12 V packs (LiFePO₄, lithium polymer, lead-acid), PWM and MPPT controllers, 12 V panels, fused DC leads and
 * 12 V → USB adapters, every kit is judged by the hour-by-hour simulation in ascending grams; planTrip's kit must weigh
 * exactly the first feasible one's grams, or both must find nothing. On 30 cases the exhaustive search skips nothing.
 * The gear is invented (planning/invented-trips.ts).
 */
import { describe, expect, it } from 'vitest';
import { kitCounts } from '../optimisation/kit.js';
import { exhaustiveLightestKit } from '../optimisation/oracle.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import { randomPlanningInput } from './invented-trips.js';
import { planningContext } from './build-problem.js';
import { planTrip } from './plan-trip.js';

const caseCount = 120;
const noSkipCases = 30;
/** Seeds apart from the USB-only oracle's, so the two suites draw different worlds. */
const seedOffset = 5000;

describe('planTrip vs exhaustive search on 120 seeded trips with both power paths', () => {
  const outcomes = { feasible: 0, nothing: 0, withPack: 0, withBoost: 0, withController: 0 };
  for (let seed = 1; seed <= caseCount; seed++) {
    const skipNothing = seed <= noSkipCases;
    it(`case ${seed}${skipNothing ? ' (exhaustive search skips nothing)' : ''}`, () => {
      const input = randomPlanningInput(seededRandom(seedOffset + seed), { bothPaths: true });
      const context = planningContext(input);
      const oracle = exhaustiveLightestKit(context.problem.candidates, context.judge, {
        skipNoLargerThanRejected: !skipNothing,
      });
      if (skipNothing) expect(oracle.skipped).toBe(0);
      const plan = planTrip(input, { withExtras: false });
      if (oracle.best === null) {
        expect(plan.status).toBe('nothing-feasible');
        outcomes.nothing++;
        return;
      }
      expect(plan.status).toBe('optimal');
      expect(plan.kit?.massG).toBe(oracle.best.massG);
      expect(context.judge(kitCounts(plan.kit?.lines ?? [])).feasible).toBe(true);
      outcomes.feasible++;
      const kinds = new Set(plan.kit?.lines.map((l) => l.kind));
      if (kinds.has('battery')) outcomes.withPack++;
      if (kinds.has('controller')) outcomes.withController++;
      if (plan.kit?.lines.some((l) => l.kind === 'converter')) outcomes.withBoost++;
    });
  }
  it('the cases mix kits on the pack path, on the bank path, with a controller, and infeasible trips', () => {
    expect(outcomes.feasible + outcomes.nothing).toBe(caseCount);
    expect(outcomes.withPack).toBeGreaterThan(5);
    expect(outcomes.withBoost).toBeGreaterThan(5);
    expect(outcomes.withController).toBeGreaterThan(1);
    expect(outcomes.nothing).toBeGreaterThan(1);
  });
});
