/**
 * The core of a large locker (`coreLocker`) and the search that solves it first (`optimiseKit`): the core keeps what
 * it says it keeps, its kits are kits of the whole locker, and solving it first never changes a proven optimum and
 * never leaves a stopped search with a heavier kit than the core's own. Real sun, invented gear
 * (planning/invented-trips.ts); no outside check values.
 */
import { describe, expect, it } from 'vitest';
import { planningContext } from '../planning/build-problem.js';
import { summerTripInput } from '../planning/invented-trips.js';
import { coreDensestPerRole, coreLightestPerRole, coreLocker, corePathsPerNeed, restrictedTo } from './core-locker.js';
import { kitCounts } from './kit.js';
import { optimiseKit } from './optimise.js';
import { presolve, type ActiveItem } from './presolve.js';
import { seededRandom } from './synthetic-problem.js';

/** Four nights in July with a phone, a headlamp and a 12 V radio, and 60 item types of invented gear. */
const contextOf = (seed: number) => planningContext(summerTripInput(seededRandom(seed), 60, 4));

const panelWh = (it: ActiveItem): number =>
  (it.panel?.harvestWh ?? []).reduce((sum, sky) => sum + sky.reduce((s, wh) => s + wh, 0), 0);

describe('the core of a locker', () => {
  it('keeps the densest and the lightest stores and panels, and a path for every device from its own stores', () => {
    for (let seed = 1; seed <= 6; seed++) {
      const pre = presolve(contextOf(seed).problem);
      const core = coreLocker(pre);
      expect(core.size).toBeLessThan(pre.items.length);
      const roles: [(it: ActiveItem) => boolean, (it: ActiveItem) => number][] = [
        [(it) => it.store !== undefined, (it) => it.store?.usableWh ?? 0],
        [(it) => it.panel !== undefined, panelWh],
      ];
      const named = new Set<number>();
      for (const [isRole, whOf] of roles) {
        const role = pre.items.map((it, i) => [it, i] as const).filter(([it]) => isRole(it));
        const density = ([it]: readonly [ActiveItem, number]): number => whOf(it) / it.candidate.massG;
        const densest = [...role].sort((a, b) => density(b) - density(a) || a[1] - b[1]);
        const lightest = [...role].sort((a, b) => a[0].candidate.massG - b[0].candidate.massG || a[1] - b[1]);
        for (const [, i] of densest.slice(0, coreDensestPerRole)) expect(core.has(i)).toBe(true);
        for (const [, i] of lightest.slice(0, coreLightestPerRole)) expect(core.has(i)).toBe(true);
        // A store or panel in the core is one of those, or the store a path reaches is not: no other reason to keep it.
        for (const [, i] of [...densest.slice(0, coreDensestPerRole), ...lightest.slice(0, coreLightestPerRole)])
          named.add(i);
        const pathItems = new Set(
          [...pre.needs.flatMap((n) => n.alternatives), ...pre.groups.flatMap((g) => g.requiresAnyOf)].flatMap((alt) =>
            alt.items.map(([i]) => i),
          ),
        );
        for (const [, i] of role) if (core.has(i)) expect(named.has(i) || pathItems.has(i)).toBe(true);
      }
      // Every device keeps its lightest paths the core can use: all their items in the core, and one of their stores
      // among the named stores when they name any (`corePathsPerNeed` of them, or all there are).
      for (const need of pre.needs) {
        const fits = need.alternatives.filter((alt) => alt.anyOf.length === 0 || alt.anyOf.some((i) => named.has(i)));
        const usable = fits.filter((alt) => alt.items.every(([i]) => core.has(i)));
        expect(usable.length).toBeGreaterThanOrEqual(Math.min(corePathsPerNeed, fits.length));
        expect(usable.length).toBeGreaterThan(0);
      }
    }
  });

  it('is a locker of its own: the items outside it owned zero times, the rest as owned', () => {
    const pre = presolve(contextOf(3).problem);
    const core = coreLocker(pre);
    const restricted = restrictedTo(pre, core);
    const kept = new Set([...core].map((i) => pre.items[i]?.candidate.itemId));
    expect(restricted.candidates.map((c) => c.itemId)).toEqual(pre.problem.candidates.map((c) => c.itemId));
    for (const c of restricted.candidates) {
      const owned = pre.problem.candidates.find((o) => o.itemId === c.itemId)?.ownedCount;
      expect(c.ownedCount).toBe(kept.has(c.itemId) ? owned : 0);
    }
    expect(new Set(presolve(restricted).items.map((it) => it.candidate.itemId))).toEqual(kept);
  });
});

describe('a search that solves the core first', () => {
  it('finds the same proven optimum as the search over the whole locker alone', () => {
    for (let seed = 1; seed <= 4; seed++) {
      const { problem, judge } = contextOf(seed);
      const alone = optimiseKit(problem, judge);
      const coreFirst = optimiseKit(problem, judge, { coreMinItems: 1 });
      expect(coreFirst.status).toBe(alone.status);
      if (alone.status === 'optimal' && coreFirst.status === 'optimal')
        expect(coreFirst.kit.massG).toBe(alone.kit.massG);
    }
  });

  it('answers a stopped search with a kit no heavier than the core’s own, which the judge accepts', () => {
    let stopped = 0;
    for (let seed = 1; seed <= 8; seed++) {
      const { problem, judge } = contextOf(seed);
      const pre = presolve(problem);
      // Two rounds each: the core's search and the whole locker's both stop on most seeds.
      const options = { maxRounds: 2, coreMinItems: 1 };
      const core = optimiseKit(restrictedTo(pre, coreLocker(pre)), judge, { maxRounds: 2 });
      const answer = optimiseKit(problem, judge, options);
      if (core.status === 'nothing-feasible' || answer.status === 'nothing-feasible') continue;
      expect(judge(kitCounts(answer.kit.lines)).feasible).toBe(true);
      expect(answer.kit.massG).toBeLessThanOrEqual(core.kit.massG);
      if (answer.status === 'best-so-far') {
        stopped++;
        expect(answer.notes.join(' ')).toMatch(/A quicker first search over \d+ of the \d+ usable items/);
      }
    }
    expect(stopped).toBeGreaterThan(0);
  });
});

describe('the demand share of a device', () => {
  it('is the whole locker’s best in the core too, and a problem whose paths beat it is refused', () => {
    const problem = contextOf(3).problem;
    const pre = presolve(problem);
    const corePre = presolve(restrictedTo(pre, coreLocker(pre)));
    for (const need of corePre.needs) {
      const whole = pre.needs.find((n) => n.need.needId === need.need.needId);
      // The core keeps the whole locker's demand rows and the share they count each device at.
      expect(need.need.demandShare).toBe(whole?.need.demandShare);
      for (const a of need.alternatives) expect(a.efficiency ?? 0).toBeLessThanOrEqual(need.need.demandShare ?? 0);
    }
    const needs = problem.coefficients.needs.map((n) => ({ ...n, demandShare: 0.1 }));
    expect(() => presolve({ ...problem, coefficients: { ...problem.coefficients, needs } })).toThrow(
      /above demandShare/,
    );
    const outOfRange = problem.coefficients.needs.map((n) => ({ ...n, demandShare: 1.5 }));
    expect(() => presolve({ ...problem, coefficients: { ...problem.coefficients, needs: outOfRange } })).toThrow(
      /demandShare must be in \(0, 1\]/,
    );
  });
});
