/**
 * A plan whose search stops early says so, and the lower bound it names holds: the lightest kit found without the stop
 * is no lighter. Invented gear (planning/invented-trips.ts) on a real trip; not outside check values.
 */
import { describe, expect, it } from 'vitest';
import { gramPrice } from '../optimisation/gram-price.js';
import { kitCounts } from '../optimisation/kit.js';
import { optimiseKit } from '../optimisation/optimise.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import { summerTripInput } from './invented-trips.js';
import { planningContext } from './build-problem.js';
import { gramsText } from './plain-words.js';
import type { PlanningInput } from './planning-input.js';
import { namedBoundShare, planTimeShares, planTrip, type PlanOptions } from './plan-trip.js';
import { pathChoicePossible } from './path-choice.js';

/** Eight nights at 46.5° N in July with a phone, a headlamp and a 12 V radio, and 30 item types of invented gear. */
const input = (seed: number): PlanningInput => summerTripInput(seededRandom(seed), 30, 8);

describe('a plan whose search stops early', () => {
  it('names a lower bound that the full search bears out, on the seeds that need more than three rounds', () => {
    let named = 0;
    for (let seed = 1; seed <= 12 && named < 3; seed++) {
      const trip = input(seed);
      const full = planTrip(trip, { withExtras: false });
      if (full.status !== 'optimal' || !full.kit || full.stats.rounds <= 3) continue;
      const stopped = planTrip(trip, {
        withExtras: false,
        chooseKit: (context) => optimiseKit(context.problem, context.judge, { maxRounds: 3 }),
      });
      expect(stopped.status).toBe('best-so-far');
      const bound = /none under ([\d,]+) g/.exec(stopped.headline);
      if (!bound) continue;
      named++;
      const boundG = Number((bound[1] ?? '').replace(/,/g, ''));
      expect(stopped.headline).toContain(`none under ${gramsText(boundG)}`);
      expect(boundG).toBeGreaterThan(0);
      expect(boundG).toBeLessThanOrEqual(full.kit.massG);
      expect(full.kit.massG).toBeLessThanOrEqual(stopped.kit?.massG ?? 0);
    }
    expect(named).toBeGreaterThan(0);
  });

  it('prices a raise by repairing its kit: each price free or about so many grams, for a kit the raised trip accepts', () => {
    let priced = 0;
    for (let seed = 1; seed <= 12 && priced < 3; seed++) {
      const trip = input(seed);
      const stopOnRound3 = {
        chooseKit: (context: ReturnType<typeof planningContext>) =>
          optimiseKit(context.problem, context.judge, { maxRounds: 3 }),
      };
      const stopped = planTrip(trip, stopOnRound3);
      if (stopped.status !== 'best-so-far' || !stopped.kit) continue;
      for (const price of stopped.gramPrices) {
        expect(['free', 'grams', 'nothing-feasible', 'unknown']).toContain(price.kind);
        if (price.kind === 'grams') {
          expect(price.extraG).toBeGreaterThanOrEqual(0);
          expect(price.text).toContain('(about)');
        }
      }
      // The reserve raise, priced directly: the repaired kit holds what it must and the raised trip's judge accepts it.
      const context = planningContext(trip);
      const base = optimiseKit(context.problem, context.judge, { maxRounds: 3 });
      if (base.status !== 'best-so-far') continue;
      const raised = planningContext({ ...trip, reserveShare: trip.reserveShare + 0.1 });
      const price = gramPrice(base, raised.problem, raised.judge);
      if (price.kind !== 'grams') continue;
      priced++;
      expect(price.approximate).toBe(true);
      expect(price.extraG).toBe(price.kit.massG - base.kit.massG);
      expect(raised.judge(kitCounts(price.kit.lines)).feasible).toBe(true);
      expect(context.judge(kitCounts(base.kit.lines)).feasible).toBe(true);
    }
    expect(priced).toBeGreaterThan(0);
  });
  it('names its bound only when the bound is at least half the kit (one far below tells the hiker nothing)', () => {
    let seen = 0;
    for (let seed = 1; seed <= 12 && seen < 2; seed++) {
      const trip = input(seed);
      const withBound = (share: number) =>
        planTrip(trip, {
          withExtras: false,
          chooseKit: (context) => {
            const answer = optimiseKit(context.problem, context.judge, { maxRounds: 3 });
            return answer.status === 'best-so-far'
              ? { ...answer, lowerBoundG: Math.ceil(share * answer.kit.massG) }
              : answer;
          },
        });
      const low = withBound(namedBoundShare - 0.1);
      if (low.status !== 'best-so-far' || !low.kit) continue;
      seen++;
      expect(low.headline).not.toContain('none under');
      expect(low.headline).toContain('but a lighter one may exist');
      const high = withBound(namedBoundShare + 0.1);
      expect(high.headline).toContain(
        `none under ${gramsText(Math.ceil((namedBoundShare + 0.1) * (high.kit?.massG ?? 0)))}`,
      );
    }
    expect(seen).toBeGreaterThan(0);
  });

  it('gives the optimum half its time when swaps and prices follow, and all of it when nothing follows', () => {
    const trip = input(1);
    // No 12 V pack in this gear, so no path choice follows the optimum either.
    expect(pathChoicePossible(planningContext(trip))).toBe(false);
    const budgetsMs: (number | undefined)[] = [];
    const chooseKit: PlanOptions['chooseKit'] = (context, search, options) => {
      budgetsMs.push(options.timeBudgetMs);
      return optimiseKit(context.problem, context.judge, options, search);
    };
    // A clock that never moves: each part's share is of the whole budget.
    const stillClock = () => 0;
    planTrip(trip, { now: stillClock, timeBudgetMs: 10_000, chooseKit });
    planTrip(trip, { now: stillClock, timeBudgetMs: 10_000, withExtras: false, chooseKit });
    expect(budgetsMs).toEqual([10_000 * planTimeShares.optimum, 10_000]);
    expect(planTimeShares.optimum).toBeLessThan(1);
  });
});
