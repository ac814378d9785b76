/**
 * A kit view's quick check (`withCuts: false`) reads its base problem's day bounds with the view's factors folded into
 * the counts instead of building the view's own bound vectors; it must give the same answer, to float noise, as the
 * pass over the view's derived vectors, on real trips (the real sun and the invented gear of
 * planning/invented-trips.ts).
 */
import { describe, expect, it } from 'vitest';
import { planningContext } from '../planning/build-problem.js';
import { randomPlanningInput } from '../planning/invented-trips.js';
import { evaluateDailyModel } from './energy-cuts.js';
import { kitViews } from './kit-views.js';
import { presolve } from './presolve.js';
import { seededRandom } from './synthetic-problem.js';

describe('the quick checks of the daily model and of a kit view', () => {
  it('matches the pass over the view’s own derived bounds on 40 real trips', () => {
    let views = 0;
    let short = 0;
    for (let seed = 1; seed <= 40; seed++) {
      const random = seededRandom(seed);
      // Bigger lockers than the oracles' (a radio on every other trip): views that leave out the best store and panels.
      const pre = presolve(
        planningContext(randomPlanningInput(random, { itemTypes: 14, radioChance: 0.5, nights: [2, 6] })).problem,
      );
      for (let k = 0; k < 20; k++) {
        const kit = new Map(
          pre.items.map((it) => [it.candidate.itemId, Math.floor(random() * (it.candidate.ownedCount + 1))]),
        );
        expect(evaluateDailyModel(pre, kit, { anyShortfall: true }).shortfalls.length > 0).toBe(
          evaluateDailyModel(pre, kit).shortfalls.length > 0,
        );
        for (const view of kitViews(pre, kit)) {
          const quick = evaluateDailyModel(view.pre, kit, { withCuts: false });
          const full = evaluateDailyModel(view.pre, kit, { withCuts: false, derivedBounds: true });
          views++;
          // The yes-or-no check, which stops at the first short sky, says the same.
          expect(evaluateDailyModel(view.pre, kit, { anyShortfall: true }).shortfalls.length > 0).toBe(
            full.shortfalls.length > 0,
          );
          // The cut pass reads the derived vectors: it finds a cut in every sky the quick check finds short.
          const cutSkies = evaluateDailyModel(view.pre, kit).cuts.map((cut) => cut.skyIndex);
          expect(new Set(cutSkies).size).toBe(new Set(quick.shortfalls.map((f) => f.skyId)).size);
          if (full.shortfalls.length > 0) short++;
          expect(quick.shortfalls.map((f) => [f.skyId, f.dayIndex])).toEqual(
            full.shortfalls.map((f) => [f.skyId, f.dayIndex]),
          );
          quick.shortfalls.forEach((f, i) => expect(f.shortWh).toBeCloseTo(full.shortfalls[i]?.shortWh ?? NaN, 9));
          expect(quick.worstMarginWh).toBeCloseTo(full.worstMarginWh, 9);
        }
      }
    }
    // The check means something only if the trips give views, some of them short.
    expect(views).toBeGreaterThan(50);
    expect(short).toBeGreaterThan(5);
  });
});
