import type { ActiveItem, IndexedAlternative, PresolvedProblem } from './presolve.js';
import type { OptimisationProblem } from './types.js';

/**
 * Active items from which a search first solves a core of the locker (`coreLocker`): at 188 (the 200-item bench
 * locker, 30 nights) the master's open nodes outgrow their cap after about 19 rounds, while a core of about 30 of its
 * items is most often solved to its optimum in under a second (seed 200's in 2.3 s), and a 61-item subset in 1.5 s; a
 * 77-item one stopped unproven after 3 s.
 */
export const coreSearchMinItems = 80;

/**
 * Stores and panels a core keeps with the most Wh per gram (Wh a day for a panel, summed over the skies and days).
 * Tried on the 200-item bench lockers, seeds 200–204 (cores of 24–39 items): 8 densest, 2 lightest and 4 paths gave
 * 1,527 / 730 / 994 / 725 / 1,116 g; 10, 3 and 4 gave 1,705 g (stopped at 3 s) on seed 200 and the rest alike; 6, 2 and
 * 3 gave 1,568 / 769 / 994 / 725 / 1,186 g; 10, 10 and 8 (68 items) stopped at 3 s on seed 200 at 1,570 g.
 */
export const coreDensestPerRole = 8;

/** Stores and panels a core keeps of the lightest (a short trip's lightest kit holds a small bank, not the densest). */
export const coreLightestPerRole = 2;

/** Charging paths a core keeps per device (and per panel group's requirement): the lightest that fit its stores. */
export const corePathsPerNeed = 4;

/** The share of a time budget a core search may take; the rest goes to the search over the whole locker. */
export const coreBudgetShare = 0.5;

/**
 * The most a core search may take, ms (the 200-item bench cores, seeds 200–208, took 0.1–0.6 s but two: 2.3 s, and
 * 3.2 s stopped).
 */
export const coreSearchMaxMs = 3_000;

/**
 * The items of a large locker that a quick first search looks at: the stores and panels with the most Wh per gram and
 * the lightest ones (`coreDensestPerRole`, `coreLightestPerRole`), and the items of each device's lightest charging
 * paths that fit those stores (`corePathsPerNeed`), likewise for what switches a panel group on. The core's lightest
 * kit is a kit of the whole locker too, so it is a sound answer so far, and the search over the whole locker only has
 * to beat it.
 * Source: restricting a MILP to a promising core of its variables is the core approach of knapsack and set-covering
 * heuristics (E. Balas and E. Zemel, An algorithm for large zero-one knapsack problems, Operations Research 28(5),
 * 1980; A. Caprara, M. Fischetti and P. Toth, A heuristic method for the set covering problem, Operations Research
 * 47(5), 1999).
 * @example coreLocker(presolve(problem)).size // ≤ the active items
 */
export function coreLocker(
  pre: PresolvedProblem,
  sizes: { densest: number; lightest: number; paths: number } = {
    densest: coreDensestPerRole,
    lightest: coreLightestPerRole,
    paths: corePathsPerNeed,
  },
): Set<number> {
  const keep = new Set<number>();
  const indices = pre.items.map((_, i) => i);
  const gramsOf = (i: number): number => (pre.items[i] as ActiveItem).candidate.massG;
  const pickBest = (role: number[], whOf: (it: ActiveItem) => number): void => {
    // Each item's Wh per gram worked out once (a panel's sums its whole sky-by-day grid), not at every comparison.
    const density = new Map(role.map((i) => [i, whOf(pre.items[i] as ActiveItem) / gramsOf(i)]));
    const byDensity = [...role].sort((a, b) => (density.get(b) ?? 0) - (density.get(a) ?? 0) || a - b);
    const byGrams = [...role].sort((a, b) => gramsOf(a) - gramsOf(b) || a - b);
    for (const i of [...byDensity.slice(0, sizes.densest), ...byGrams.slice(0, sizes.lightest)]) keep.add(i);
  };
  pickBest(
    indices.filter((i) => pre.items[i]?.store),
    (it) => it.store?.usableWh ?? 0,
  );
  pickBest(
    indices.filter((i) => pre.items[i]?.panel),
    (it) => (it.panel?.harvestWh ?? []).reduce((sum, sky) => sum + sky.reduce((s, wh) => s + wh, 0), 0),
  );
  // A path whose "any of" stores are all outside the core cannot charge from it.
  const fits = (alt: IndexedAlternative): boolean => alt.anyOf.length === 0 || alt.anyOf.some((i) => keep.has(i));
  const altGrams = (alt: IndexedAlternative): number => alt.items.reduce((g, [i, n]) => g + n * gramsOf(i), 0);
  const keepLightest = (alternatives: readonly IndexedAlternative[]): void => {
    const usable = alternatives.filter(fits).sort((a, b) => altGrams(a) - altGrams(b));
    for (const alt of usable.slice(0, sizes.paths)) for (const [i] of alt.items) keep.add(i);
  };
  for (const need of pre.needs) keepLightest(need.alternatives);
  for (const group of pre.groups)
    if (group.hasRequirement && group.panelIndices.some((p) => keep.has(p))) keepLightest(group.requiresAnyOf);
  return keep;
}

/**
 * The problem with every item outside `core` (active indices of `pre`) owned zero times: its kits are kits of the
 * whole problem, and the presolve drops the rest as not owned.
 * @example restrictedTo(pre, coreLocker(pre)).candidates.length // the same candidates, most owned 0 times
 */
export function restrictedTo(pre: PresolvedProblem, core: ReadonlySet<number>): OptimisationProblem {
  const kept = new Set([...core].map((i) => (pre.items[i] as ActiveItem).candidate.itemId));
  return {
    ...pre.problem,
    candidates: pre.problem.candidates.map((c) => (kept.has(c.itemId) ? c : { ...c, ownedCount: 0 })),
  };
}
