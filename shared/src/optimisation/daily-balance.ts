import { evaluateDailyModel } from './energy-cuts.js';
import { alternativePresent, type IndexedAlternative, type PresolvedProblem } from './presolve.js';
import type { EnergyShortfall, KitCounts, MissingPath } from './types.js';

/** The daily model's verdict for one fixed kit. */
export interface DailyBalance {
  feasible: boolean;
  /** Needs (devices) with no alternative fully present in the kit. */
  missingPaths: MissingPath[];
  /** Per sky, the first day that ends below the reserve and by how many Wh. */
  shortfalls: EnergyShortfall[];
  /** Smallest end-of-day Wh above the reserve over every sky-day with demand (negative when short). */
  worstMarginWh: number;
}

/**
 * Evaluates the daily model for a fixed kit directly, without a solver (the forward pass of `evaluateDailyModel`), with
 * the devices that have no path in it. Counts above those owned are capped at the counts owned. Same rules as
 * `buildDailyModel`.
 * @example dailyBalance(pre, new Map([['bank', 2]])).feasible // true when two banks cover the trip
 */
export function dailyBalance(pre: PresolvedProblem, kit: KitCounts): DailyBalance {
  const count = (i: number): number =>
    Math.min(kit.get(pre.items[i]?.candidate.itemId ?? '') ?? 0, pre.items[i]?.candidate.ownedCount ?? 0);
  const counts = pre.items.map((_, i) => count(i));
  const present = (alt: IndexedAlternative): boolean => alternativePresent(alt, counts);
  const missingPaths: MissingPath[] = [
    ...pre.missingNeeds.map((n) => ({ needId: n.needId, ...(n.label ? { label: n.label } : {}) })),
    ...pre.needs
      .filter((n) => !n.alternatives.some(present))
      .map((n) => ({ needId: n.need.needId, ...(n.need.label ? { label: n.need.label } : {}) })),
  ];
  const { shortfalls, worstMarginWh } = evaluateDailyModel(pre, kit);
  return {
    feasible: missingPaths.length === 0 && shortfalls.length === 0,
    missingPaths,
    shortfalls,
    worstMarginWh,
  };
}
