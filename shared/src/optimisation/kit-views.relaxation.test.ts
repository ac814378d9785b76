/**
 * The daily model and a kit's views are relaxations of the judge: every kit the hour-by-hour simulation accepts passes
 * the daily model and every view of it,
 * over the whole locker and over its core (the first search of a large locker, whose views raise the demand from the
 * whole locker's best share). Checked where it is tightest — kits shaved to the edge of feasibility (no unit can go
 * without the simulation rejecting the kit) — on summer trips of the bench's kind. The real sun, the real simulation
 * and invented gear (planning/invented-trips.ts); the check values are the simulation's own verdicts.
 */
import { describe, expect, it } from 'vitest';
import { planningContext } from '../planning/build-problem.js';
import { summerTripInput } from '../planning/invented-trips.js';
import { coreLocker, restrictedTo } from './core-locker.js';
import { evaluateDailyModel } from './energy-cuts.js';
import { kitViews, kitViewsShort } from './kit-views.js';
import { presolve, type PresolvedProblem } from './presolve.js';
import { seededRandom } from './synthetic-problem.js';
import type { KitCounts } from './types.js';

/** Lockers of the bench's kind, smaller and over fewer nights (the shave simulates each unit it tries). */
const lockerItems = 30;
const tripNights = 8;
const lockerSeeds = Array.from({ length: 20 }, (_, k) => 300 + k);

describe('the views of a kit are relaxations of the simulation', () => {
  it('every kit the simulation accepts, shaved to the edge, passes all its views (whole locker and core)', () => {
    let edgeKits = 0;
    let viewed = 0;
    for (const seed of lockerSeeds) {
      const random = seededRandom(seed);
      const context = planningContext(summerTripInput(random, lockerItems, tripNights));
      const pre = presolve(context.problem);
      const corePre = presolve(restrictedTo(pre, coreLocker(pre)));
      for (const problem of [pre, corePre]) {
        const kit = shavedToEdge(problem, context.judge, random);
        if (!kit) continue;
        edgeKits++;
        // Each kit on the way down passed too (`shavedToEdge` asks); the edge kit itself:
        expect(kitViewsShort(problem, kit)).toBe(false);
        if (kitViews(problem, kit).length > 0) viewed++;
      }
    }
    console.info(`views: ${edgeKits} edge kits, ${viewed} of them with views`);
    // Means something only when most lockers keep up whole and most edge kits have views.
    expect(edgeKits).toBeGreaterThanOrEqual(25);
    expect(viewed).toBeGreaterThanOrEqual(20);
  });
});

/**
 * The problem's whole locker, shaved a unit at a time in a random order while the simulation still accepts it; each
 * accepted kit on the way is checked against its views. Undefined when the whole locker runs dry.
 */
function shavedToEdge(
  pre: PresolvedProblem,
  judge: (kit: KitCounts) => { feasible: boolean },
  random: () => number,
): KitCounts | undefined {
  const kit = new Map(pre.items.map((it) => [it.candidate.itemId, it.candidate.ownedCount]));
  if (!judge(kit).feasible) return undefined;
  expect(kitViewsShort(pre, kit)).toBe(false);
  const order = [...pre.items].sort(() => random() - 0.5);
  for (const it of order) {
    const id = it.candidate.itemId;
    while ((kit.get(id) ?? 0) > 0) {
      const fewer = new Map(kit).set(id, (kit.get(id) ?? 0) - 1);
      if (!judge(fewer).feasible) break;
      kit.set(id, (kit.get(id) ?? 0) - 1);
      expect(evaluateDailyModel(pre, kit, { anyShortfall: true }).shortfalls).toEqual([]);
      expect(kitViewsShort(pre, kit)).toBe(false);
    }
  }
  return kit;
}
