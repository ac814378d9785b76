/**
 * A search under a raised requirement that starts from the kits the trip's own search rejected (`knownRejected`, what
 * each gram price does) finds the same lightest kit as a search from nothing. Synthetic worlds (synthetic-problem.ts:
 * invented, not outside check values); the raise is a quarter more demand, under which the judge rejects at least
 * what it rejected before.
 */
import { describe, expect, it } from 'vitest';
import { kitMassG } from './kit.js';
import { createKitSearch } from './kit-search.js';
import { optimiseKit } from './optimise.js';
import { randomSyntheticWorld, seededRandom, syntheticJudge, syntheticProblem } from './synthetic-problem.js';

/** Demand of the raised world against the trip as it is. */
const raisedDemandScale = 1.25;
const seeds = Array.from({ length: 80 }, (_, i) => i + 1);

describe('a raised search that starts from the kits rejected before', () => {
  let raisedWithRounds = 0;
  it.each(seeds)('finds the same lightest kit as one from nothing (case %i)', (seed) => {
    const world = randomSyntheticWorld(seededRandom(seed), { itemTypes: 8, maxOwned: 2, dayCount: 5, skyCount: 3 });
    const raised = { ...world, demandScale: world.demandScale * raisedDemandScale };
    const base = createKitSearch(syntheticProblem(world), syntheticJudge(world));
    optimiseKit(syntheticProblem(world), syntheticJudge(world), {}, base);
    const raisedJudge = syntheticJudge(raised);
    // The premise: every kit rejected as the trip is, is rejected with the raise.
    for (const kit of base.rejectedKits) expect(raisedJudge(kit).feasible).toBe(false);

    const fromNothing = optimiseKit(syntheticProblem(raised), raisedJudge, { tieBreakByMargin: false });
    const started = createKitSearch(syntheticProblem(raised), raisedJudge, {
      tieBreakByMargin: false,
      knownRejected: base.rejectedKits,
    });
    const fromKnown = optimiseKit(syntheticProblem(raised), raisedJudge, {}, started);
    expect(fromKnown.status).toBe(fromNothing.status);
    if (fromNothing.status !== 'nothing-feasible' && fromKnown.status !== 'nothing-feasible') {
      const candidates = syntheticProblem(raised).candidates;
      const massOf = (lines: readonly { itemId: string; count: number }[]): number =>
        kitMassG(new Map(lines.map((l) => [l.itemId, l.count])), candidates);
      expect(massOf(fromKnown.kit.lines)).toBe(massOf(fromNothing.kit.lines));
      expect(raisedJudge(new Map(fromKnown.kit.lines.map((l) => [l.itemId, l.count]))).feasible).toBe(true);
      if (base.rejectedKits.length > 0) raisedWithRounds++;
    }
  });

  it('the cases include raised searches that start past rejected kits', () => {
    expect(raisedWithRounds).toBeGreaterThan(5);
  });
});
