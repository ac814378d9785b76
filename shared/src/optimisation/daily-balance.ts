import type { PresolvedProblem } from './presolve.js';
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
 * Evaluates the daily model for a fixed kit directly, without a solver: with the kit fixed, storing as much as the
 * bounds allow each day is optimal (more stored energy never hurts a later day), so a forward pass gives the model's
 * answer and, when it fails, the first short day per sky. Counts above those owned are capped at the counts owned.
 * Same rules as `buildDailyModel`.
 * @example dailyBalance(pre, new Map([['bank', 2]])).feasible // true when two banks cover the trip
 */
export function dailyBalance(pre: PresolvedProblem, kit: KitCounts): DailyBalance {
  const c = pre.problem.coefficients;
  const count = (i: number): number => Math.min(kit.get(pre.items[i]?.candidate.itemId ?? '') ?? 0, pre.items[i]?.candidate.ownedCount ?? 0);
  const present = (alt: readonly (readonly [number, number])[]): boolean => alt.every(([i, n]) => count(i) >= n);
  const missingPaths: MissingPath[] = [
    ...pre.missingNeeds.map((n) => ({ needId: n.needId, ...(n.label ? { label: n.label } : {}) })),
    ...pre.needs.filter((n) => !n.alternatives.some(present)).map((n) => ({ needId: n.need.needId, ...(n.need.label ? { label: n.need.label } : {}) })),
  ];
  const groupOn = pre.groups.map((g) => !g.hasRequirement || g.requiresAnyOf.some(present));
  let capacityWh = 0;
  pre.items.forEach((it, i) => {
    if (it.store) capacityWh += it.store.usableWh * count(i);
  });
  const reserveWh = c.reserveShare * capacityWh;
  const timing = c.timing ?? 'overlapping';
  const shortfalls: EnergyShortfall[] = [];
  let worstMarginWh = Infinity;
  c.skyIds.forEach((skyId, s) => {
    let storedWh = capacityWh;
    let reported = false;
    for (let t = 0; t < c.dayCount; t++) {
      let harvestWh = 0;
      pre.groups.forEach((g, gi) => {
        if (!groupOn[gi]) return;
        for (const p of g.panelIndices) harvestWh += pre.bestChargeEfficiency * (pre.items[p]?.panel?.harvestWh[s]?.[t] ?? 0) * count(p);
      });
      let acceptWh = 0;
      pre.items.forEach((it, b) => {
        if (it.store) acceptWh += it.store.chargeEfficiency * (it.store.acceptWh[s]?.[t] ?? 0) * count(b);
      });
      const demandWh = c.demandWh[s]?.[t] ?? 0;
      const roomWh = timing === 'overlapping' ? capacityWh - storedWh + demandWh : capacityWh - storedWh;
      storedWh += Math.max(0, Math.min(harvestWh, acceptWh, roomWh)) - demandWh;
      if (demandWh > 0) worstMarginWh = Math.min(worstMarginWh, storedWh - reserveWh);
      if (!reported && storedWh < reserveWh - 1e-9) {
        shortfalls.push({ skyId, dayIndex: t, shortWh: reserveWh - storedWh });
        reported = true;
      }
    }
  });
  return {
    feasible: missingPaths.length === 0 && shortfalls.length === 0,
    missingPaths,
    shortfalls,
    worstMarginWh: worstMarginWh === Infinity ? (1 - c.reserveShare) * capacityWh : worstMarginWh,
  };
}
