/**
 * The party solver against exhaustive search (every kit × every assignment) on small synthetic parties: 2–3 carriers,
 * at most 6 units in the pool. The worlds are synthetic (optimisation/synthetic-problem.ts) — they test that the cut
 * rounds and the split find exactly the lightest kit the party can carry, not values from the outside world. The same
 * check with the trip simulation as the judge is in planning/plan-party.oracle.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { kitCounts } from '../optimisation/kit.js';
import { exhaustiveLightestKit } from '../optimisation/oracle.js';
import {
  randomSyntheticWorld,
  seededRandom,
  syntheticJudge,
  syntheticProblem,
  type SyntheticWorld,
} from '../optimisation/synthetic-problem.js';
import { bruteForceSplitCost, exhaustivePartyAnswer, keepsWalkingRule } from './party-oracle.test-support.js';
import { optimisePartyKit } from './party-kit.js';
import type { PartyAnswer, PartyProblem, SplitRules } from './types.js';

const caseCount = 200;

/**
 * Carriers with limits drawn around shares of `scaleG` (the lightest feasible kit's grams, so that the lightest kit
 * often just fails to split and a heavier one must be found), owners and walking feeds, from the seed.
 */
function partyRules(world: SyntheticWorld, seed: number, scaleG: number): SplitRules {
  const random = seededRandom(seed * 7919);
  const carrierCount = 2 + Math.floor(random() * 2);
  // Σ limits between 1 and 2.5 times the scale, shared out unevenly: the lightest kit often fits by the sum alone
  // but not item by item, which is where the cut rounds earn their keep.
  const totalG = scaleG * (1 + 1.5 * random());
  const weights = Array.from({ length: carrierCount }, () => 0.2 + random());
  const weightSum = weights.reduce((a, b) => a + b, 0);
  const carriers = weights.map((w, i) => ({
    memberId: `hiker-${i}`,
    gramLimitG: random() < 0.1 ? null : Math.max(1, Math.round((totalG * w) / weightSum)),
  }));
  const ids = [...world.panels, ...world.banks, ...world.pathItems].map((i) => i.itemId);
  const ownerByItemId = new Map(ids.map((id) => [id, `hiker-${Math.floor(random() * carrierCount)}`]));
  const leads = world.pathItems.filter((p) => p.kind === 'lead').map((p) => p.itemId);
  const walkingFeeds = world.panels.map((p) => ({
    panelItemId: p.itemId,
    alternatives: world.banks
      .filter(() => random() < 0.8)
      .map((b) => ({
        itemIds:
          leads.length > 0 && random() < 0.3
            ? [b.itemId, leads[Math.floor(random() * leads.length)] as string]
            : [b.itemId],
      })),
  }));
  return { carriers, ownerByItemId, walkingFeeds };
}

function expectConsistentSplit(answer: Extract<PartyAnswer, { kit: unknown }>, rules: SplitRules): void {
  const kit = kitCounts(answer.kit.lines);
  const units: string[] = [];
  const carrierOf: number[] = [];
  answer.split.carriers.forEach((c, m) => {
    for (const line of c.lines)
      for (let k = 0; k < line.count; k++) {
        units.push(line.itemId);
        carrierOf.push(m);
      }
  });
  for (const [id, n] of kit) expect(units.filter((u) => u === id).length).toBe(n);
  expect(units.length).toBe([...kit.values()].reduce((a, b) => a + b, 0));
  expect(answer.split.carriers.reduce((g, c) => g + c.massG, 0)).toBe(answer.kit.massG);
  if (answer.split.walkingRuleHeld) expect(keepsWalkingRule(units, carrierOf, rules)).toBe(true);
}

describe('party solver vs exhaustive search (200 seeded small parties)', () => {
  const outcomes = { fits: 0, heavierThanLightest: 0, overLimits: 0, nothing: 0, tripLimited: 0, overTripLimit: 0 };
  let seed = 0;
  for (let n = 1; n <= caseCount; n++) {
    // Draw worlds until the pool holds at most 6 units (the brute force's 3⁶ assignments per kit); keep a pool that
    // cannot work only on one case in eight, so most cases exercise the split.
    let world: SyntheticWorld;
    for (;;) {
      const random = seededRandom(++seed);
      world = randomSyntheticWorld(random, {
        itemTypes: 3 + Math.floor(random() * 4),
        maxOwned: 2,
        dayCount: 2 + Math.floor(random() * 3),
        skyCount: 1 + Math.floor(random() * 3),
        deviceCount: 1,
      });
      const pool = [...world.panels, ...world.banks, ...world.pathItems];
      if (pool.reduce((u, i) => u + i.ownedCount, 0) > 6) continue;
      const works = syntheticJudge(world)(new Map(pool.map((i) => [i.itemId, i.ownedCount]))).feasible;
      if (works || n % 8 === 0) break;
    }
    const caseSeed = seed;
    it(`case ${n} (world ${caseSeed})`, () => {
      const judge = syntheticJudge(world);
      const problem = syntheticProblem(world);
      const poolG = problem.candidates.reduce((g, c) => g + c.massG * c.ownedCount, 0);
      const scaleG = exhaustiveLightestKit(problem.candidates, judge).best?.massG ?? poolG;
      const rules = partyRules(world, caseSeed, scaleG);
      // On about a third of the cases the trip also caps the whole kit's grams.
      const random = seededRandom(caseSeed * 104_729);
      const tripLimitG = random() < 0.35 ? Math.round(scaleG * (0.9 + 0.6 * random())) : null;
      const party: PartyProblem = { problem, ...rules, tripLimitG };
      const oracle = exhaustivePartyAnswer(party.problem.candidates, judge, rules, tripLimitG);
      const answer = optimisePartyKit(party, judge);
      const massGById = new Map(party.problem.candidates.map((c) => [c.itemId, c.massG]));
      if (oracle.kind === 'nothing-feasible') {
        expect(answer.status).toBe('nothing-feasible');
        outcomes.nothing++;
        return;
      }
      if (oracle.kind === 'fits') {
        expect(answer.status).toBe('optimal');
        if (answer.status !== 'optimal') return;
        expect(answer.kit.massG).toBe(oracle.massG);
        expect(judge(kitCounts(answer.kit.lines)).feasible).toBe(true);
        expect(answer.split.withinLimits).toBe(true);
        expect(answer.kit.massG).toBeLessThanOrEqual(tripLimitG ?? Infinity);
        if (tripLimitG !== null) outcomes.tripLimited++;
        for (const c of answer.split.carriers)
          if (c.gramLimitG !== null) expect(c.massG).toBeLessThanOrEqual(c.gramLimitG);
        expectConsistentSplit(answer, rules);
        outcomes.fits++;
        if (answer.stats.unsplittableKits > 0) outcomes.heavierThanLightest++;
        return;
      }
      // No kit fits: the lightest feasible kit, its best split, and each person's overage named.
      expect(answer.status).toBe('over-limits');
      if (answer.status !== 'over-limits') return;
      expect(answer.kit.massG).toBe(oracle.massG);
      const kit = kitCounts(answer.kit.lines);
      const reference = bruteForceSplitCost(kit, rules, massGById) ?? bruteForceSplitCost(kit, rules, massGById, false);
      expect([
        answer.split.overG,
        Math.max(0, ...answer.split.carriers.map((c) => c.overG)),
        answer.split.lentUnits,
      ]).toEqual(reference);
      const over = answer.split.carriers.filter((c) => c.overG > 0);
      // Over the limits, someone is named, or the kit is over the trip's limit by the grams said; or no split keeps the
      // walking rule at all, and the note says so.
      expect(answer.overTripLimitG).toBe(Math.max(0, answer.kit.massG - (tripLimitG ?? Infinity)));
      if (answer.overTripLimitG > 0) outcomes.overTripLimit++;
      else if (answer.split.walkingRuleHeld) expect(over.length).toBeGreaterThan(0);
      else expect(answer.notes.join(' ')).toMatch(/walking/);
      for (const c of over) expect(c.overG).toBe(c.massG - (c.gramLimitG ?? 0));
      expectConsistentSplit(answer, rules);
      outcomes.overLimits++;
    });
  }
  it('the cases mix parties that fit, that need a heavier kit than the lightest, that cannot fit, and pools that cannot work', () => {
    expect(outcomes.fits + outcomes.overLimits + outcomes.nothing).toBe(caseCount);
    expect(outcomes.fits).toBeGreaterThan(15);
    expect(outcomes.heavierThanLightest).toBeGreaterThan(3);
    expect(outcomes.overLimits).toBeGreaterThan(10);
    expect(outcomes.nothing).toBeGreaterThan(3);
    expect(outcomes.tripLimited).toBeGreaterThan(5);
    expect(outcomes.overTripLimit).toBeGreaterThan(3);
  });
});
