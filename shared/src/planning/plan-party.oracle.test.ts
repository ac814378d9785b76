/**
 * planParty against exhaustive search on real trips: seeded random trips and pools of at most 6 units (invented gear,
 * planning/invented-trips.ts), shared among 2–3 carriers with random limits and owners. Every kit is judged by the
 * real hour-by-hour simulation and every assignment of its units to the carriers is tried under the walking rule; the
 * lightest feasible kit that splits within every limit must weigh exactly what planParty returns, and when none does,
 * planParty's kit must be the lightest feasible kit with the least overage, naming whose limit and by how much.
 * (Pools this small rarely need a heavier kit than the lightest; the cut rounds that find one are checked against
 * exhaustive search in party/party-kit.oracle.test.ts and by hand in party/party-kit.test.ts.)
 */
import { describe, expect, it } from 'vitest';
import { kitCounts } from '../optimisation/kit.js';
import { exhaustiveLightestKit } from '../optimisation/oracle.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import { bruteForceSplitCost, exhaustivePartyAnswer, keepsWalkingRule } from '../party/party-oracle.test-support.js';
import type { PlanResult } from '../schemas/plans.js';
import { randomPlanningInput } from './invented-trips.js';
import { planningContext } from './build-problem.js';
import { partyProblemOf, planParty } from './plan-party.js';
import type { PartyPlanning, PlanningInput } from './planning-input.js';

const caseCount = 120;
const names = ['Wren', 'Tamsin', 'Odile'];

/**
 * A pool of at most 6 units from the seed, drawing again from the same generator until one fits; a pool that cannot
 * keep the devices charged at all is kept only on one seed in eight, so most cases exercise the split.
 */
function smallPool(seed: number): { input: PlanningInput; random: () => number } {
  const random = seededRandom(seed);
  for (;;) {
    const input = randomPlanningInput(random, { itemTypes: 2 + Math.floor(random() * 5), maxOwned: 2 });
    if (input.gear.reduce((u, g) => u + g.countOwned, 0) > 6) continue;
    if (seed % 8 === 0) return { input, random };
    const context = planningContext(input);
    if (context.judge(new Map(input.gear.map((g) => [g.itemId, g.countOwned]))).feasible) return { input, random };
  }
}

/** 2–3 carriers with Σ limits 0.8–2.3 × `scaleG`, shared out unevenly; owners at random. */
function randomParty(input: PlanningInput, random: () => number, scaleG: number): PartyPlanning {
  const count = 2 + Math.floor(random() * 2);
  const totalG = scaleG * (0.8 + 1.5 * random());
  const weights = Array.from({ length: count }, () => 0.2 + random());
  const sum = weights.reduce((a, b) => a + b, 0);
  return {
    members: weights.map((w, i) => ({
      memberId: `member-${i}`,
      name: names[i] ?? `member ${i}`,
      gramLimitG: random() < 0.1 ? null : Math.max(1, Math.round((totalG * w) / sum)),
    })),
    ownerByItemId: Object.fromEntries(input.gear.map((g) => [g.itemId, `member-${Math.floor(random() * count)}`])),
  };
}

function carriersOf(plan: PlanResult) {
  return plan.kit?.carriers ?? [];
}

describe('planParty vs exhaustive search on 120 seeded real trips', () => {
  const outcomes = { fits: 0, overLimits: 0, nothing: 0, withPanel: 0 };
  for (let seed = 1; seed <= caseCount; seed++) {
    it(`case ${seed}`, () => {
      const pool = smallPool(seed);
      const random = pool.random;
      const context = planningContext(pool.input);
      const lightest = exhaustiveLightestKit(context.problem.candidates, context.judge).best;
      const poolG = pool.input.gear.reduce((g, i) => g + i.massG * i.countOwned, 0);
      const party = randomParty(pool.input, random, lightest?.massG || poolG);
      // On about a third of the cases the trip also caps the whole kit's grams.
      const tripLimitG = random() < 0.35 ? Math.round((lightest?.massG || poolG) * (0.9 + 0.6 * random())) : null;
      const input = { ...pool.input, gramLimitG: tripLimitG };
      const rules = partyProblemOf(context, party);
      const oracle = exhaustivePartyAnswer(context.problem.candidates, context.judge, rules, tripLimitG);
      const plan = planParty(input, party, { withExtras: false });
      if (oracle.kind === 'nothing-feasible') {
        expect(plan.status).toBe('nothing-feasible');
        outcomes.nothing++;
        return;
      }
      const carriers = carriersOf(plan);
      const counts = kitCounts(plan.kit?.lines ?? []);
      expect(carriers.map((c) => c.memberId)).toEqual(party.members.map((m) => m.memberId));
      expect(carriers.reduce((g, c) => g + c.massG, 0)).toBe(plan.kit?.massG);
      // Every unit of the kit is carried exactly once.
      const units: string[] = [];
      const carrierOf: number[] = [];
      carriers.forEach((c, m) =>
        c.lines.forEach((l) => {
          for (let k = 0; k < l.count; k++) {
            units.push(l.itemId);
            carrierOf.push(m);
          }
        }),
      );
      for (const [id, n] of counts) expect(units.filter((u) => u === id).length).toBe(n);
      if (plan.kit?.lines.some((l) => l.kind === 'panel')) outcomes.withPanel++;
      if (oracle.kind === 'fits') {
        expect(plan.status).toBe('optimal');
        expect(plan.kit?.massG).toBe(oracle.massG);
        expect(context.judge(counts).feasible).toBe(true);
        expect(plan.kit?.massG).toBeLessThanOrEqual(tripLimitG ?? Infinity);
        for (const c of carriers) {
          expect(c.overG).toBe(0);
          if (c.gramLimitG !== null) expect(c.massG).toBeLessThanOrEqual(c.gramLimitG);
        }
        expect(keepsWalkingRule(units, carrierOf, rules)).toBe(true);
        outcomes.fits++;
        return;
      }
      expect(plan.status).toBe('over-limit');
      expect(plan.kit?.massG).toBe(oracle.massG);
      const massGById = new Map(context.problem.candidates.map((c) => [c.itemId, c.massG]));
      const reference = bruteForceSplitCost(counts, rules, massGById);
      if (reference) {
        expect([carriers.reduce((g, c) => g + c.overG, 0), Math.max(0, ...carriers.map((c) => c.overG))]).toEqual(
          reference.slice(0, 2),
        );
        if (tripLimitG !== null && oracle.massG > tripLimitG)
          expect(plan.headline).toContain(`${(oracle.massG - tripLimitG).toLocaleString('en-GB')} g over`);
        // The headline names each person over their limit, with the grams over it.
        for (const c of carriers.filter((x) => x.overG > 0)) {
          expect(plan.headline).toContain(c.name);
          expect(plan.headline).toContain(`${c.overG.toLocaleString('en-GB')} g over`);
        }
      }
      outcomes.overLimits++;
    });
  }
  it('the cases mix parties that fit, that cannot fit, and pools that cannot work; some kits hold panels', () => {
    expect(outcomes.fits + outcomes.overLimits + outcomes.nothing).toBe(caseCount);
    expect(outcomes.fits).toBeGreaterThan(30);
    expect(outcomes.overLimits).toBeGreaterThan(20);
    expect(outcomes.nothing).toBeGreaterThan(5);
    expect(outcomes.withPanel).toBeGreaterThan(5);
  });
});
