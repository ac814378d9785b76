import { kitLines } from '../optimisation/kit.js';
import type { KitCounts, PathAlternative } from '../optimisation/types.js';
import type { CarrierLoad, KitSplit, SplitRules } from './types.js';

/**
 * Search nodes one split may visit before it settles for the best split found (reported as not proven). A party of
 * four sharing twelve units has 4¹² ≈ 17 million raw assignments; the bounds below cut that to a few thousand nodes in
 * practice, so this only stops pathological kits (common practice for exact searches in an interactive answer).
 */
export const defaultSplitNodeBudget = 200_000;

/** Options of a split. */
export interface SplitOptions {
  /** Apply the walking rule (default true). Off, the split is plain bin packing by grams: the solver's relaxation. */
  walkingRule?: boolean;
  /** Node budget (default {@link defaultSplitNodeBudget}). */
  maxNodes?: number;
  /** Unit grams by item id. */
  massGById: ReadonlyMap<string, number>;
}

interface Unit {
  itemId: string;
  massG: number;
  owner: string | undefined;
  /** The walking rule's alternatives for a panel (none: no rule). */
  feeds: readonly PathAlternative[] | null;
}

/** Lexicographic cost of a split: total grams over, worst single overage, lent units. */
type Cost = readonly [overG: number, maxOverG: number, lentUnits: number];

const better = (a: Cost, b: Cost): boolean =>
  a[0] < b[0] || (a[0] === b[0] && (a[1] < b[1] || (a[1] === b[1] && a[2] < b[2])));

/** Whether a pack holds every item of one alternative (a repeated id needs as many units). */
function packHolds(pack: ReadonlyMap<string, number>, alternatives: readonly PathAlternative[]): boolean {
  return alternatives.some((alt) => {
    const need = new Map<string, number>();
    for (const id of alt.itemIds) need.set(id, (need.get(id) ?? 0) + 1);
    return [...need].every(([id, n]) => (pack.get(id) ?? 0) >= n);
  });
}

/**
 * Divides a kit among the carriers: the split with the fewest grams over the limits (then the smallest overage any
 * one person has, then the fewest items carried by someone other than their owner) that keeps the walking rule (each
 * panel rides with a store it can fill; see `types.ts`). An exact depth-first search: stores and leads are placed
 * first, heaviest first, then panels (whose rule can then be checked at once); a branch stops when its overage so far
 * plus the grams left beyond everyone's free room cannot beat the best split; empty packs of equal limit are tried
 * once. Returns null when no split keeps the walking rule at all (a panel whose stores are not in the kit).
 * @example splitKit(new Map([['bank', 1]]), rules, { massGById }).carriers[0].massG // 190
 */
export function splitKit(kit: KitCounts, rules: SplitRules, options: SplitOptions): KitSplit | null {
  const carriers = rules.carriers;
  if (carriers.length === 0) throw new Error('a split needs at least one carrier');
  const walkingRule = options.walkingRule ?? true;
  const maxNodes = options.maxNodes ?? defaultSplitNodeBudget;
  const feedsByPanel = new Map(
    rules.walkingFeeds.filter((f) => f.alternatives.length > 0).map((f) => [f.panelItemId, f.alternatives]),
  );
  const units: Unit[] = [];
  for (const line of kitLines(kit)) {
    for (let k = 0; k < line.count; k++) {
      units.push({
        itemId: line.itemId,
        massG: options.massGById.get(line.itemId) ?? 0,
        owner: rules.ownerByItemId.get(line.itemId),
        feeds: walkingRule ? (feedsByPanel.get(line.itemId) ?? null) : null,
      });
    }
  }
  const byMassThenId = (a: Unit, b: Unit): number =>
    b.massG - a.massG || (a.itemId < b.itemId ? -1 : a.itemId > b.itemId ? 1 : 0);
  units.sort((a, b) => (a.feeds === null ? 0 : 1) - (b.feeds === null ? 0 : 1) || byMassThenId(a, b));

  const limits = carriers.map((c) => c.gramLimitG ?? Infinity);
  const loads = carriers.map(() => 0);
  const packs = carriers.map(() => new Map<string, number>());
  const choice: number[] = new Array<number>(units.length).fill(0);
  // Grams of units i… and the owners among them (an owner's empty pack is not interchangeable with another's).
  const massFrom: number[] = new Array<number>(units.length + 1).fill(0);
  const ownersFrom: Set<string>[] = Array.from({ length: units.length + 1 }, () => new Set<string>());
  for (let i = units.length - 1; i >= 0; i--) {
    const u = units[i] as Unit;
    massFrom[i] = (massFrom[i + 1] ?? 0) + u.massG;
    ownersFrom[i] = new Set(ownersFrom[i + 1]);
    if (u.owner !== undefined) ownersFrom[i]?.add(u.owner);
  }

  let best: { cost: Cost; choice: number[] } | null = null;
  let nodes = 0;
  let exhausted = true;

  const overOf = (m: number, load: number): number => Math.max(0, load - (limits[m] ?? Infinity));

  const visit = (i: number, overG: number, maxOverG: number, lent: number): void => {
    if (nodes++ >= maxNodes) {
      exhausted = false;
      return;
    }
    if (i === units.length) {
      const cost: Cost = [overG, maxOverG, lent];
      if (!best || better(cost, best.cost)) best = { cost, choice: [...choice] };
      return;
    }
    // Lower bound on the total overage: grams left beyond everyone's free room.
    let freeG = 0;
    for (let m = 0; m < carriers.length; m++) freeG += Math.max(0, (limits[m] ?? Infinity) - (loads[m] ?? 0));
    const boundG = overG + Math.max(0, (massFrom[i] ?? 0) - freeG);
    if (best) {
      const b: Cost = best.cost;
      if (boundG > b[0]) return;
      if (boundG === b[0] && b[0] === 0 && lent >= b[2]) return;
    }
    const u = units[i] as Unit;
    const order = carriers
      .map((c, m) => m)
      .sort((a, b) => {
        const ownA = carriers[a]?.memberId === u.owner ? 0 : 1;
        const ownB = carriers[b]?.memberId === u.owner ? 0 : 1;
        const roomA = (limits[a] ?? Infinity) - (loads[a] ?? 0);
        const roomB = (limits[b] ?? Infinity) - (loads[b] ?? 0);
        return ownA - ownB || (roomB > roomA ? 1 : roomB < roomA ? -1 : a - b);
      });
    const triedEmpty = new Set<number>();
    for (const m of order) {
      const pack = packs[m] as Map<string, number>;
      const memberId = carriers[m]?.memberId ?? '';
      if (pack.size === 0 && !ownersFrom[i]?.has(memberId)) {
        // Empty packs of people who own nothing still to place are interchangeable when their limits are equal.
        if (triedEmpty.has(limits[m] ?? Infinity)) continue;
        triedEmpty.add(limits[m] ?? Infinity);
      }
      if (u.feeds && !packHolds(pack, u.feeds)) continue;
      const before = loads[m] ?? 0;
      const after = before + u.massG;
      const addedOver = overOf(m, after) - overOf(m, before);
      loads[m] = after;
      pack.set(u.itemId, (pack.get(u.itemId) ?? 0) + 1);
      choice[i] = m;
      visit(
        i + 1,
        overG + addedOver,
        Math.max(maxOverG, overOf(m, after)),
        lent + (u.owner !== undefined && u.owner !== memberId ? 1 : 0),
      );
      const n = (pack.get(u.itemId) ?? 1) - 1;
      if (n === 0) pack.delete(u.itemId);
      else pack.set(u.itemId, n);
      loads[m] = before;
      if (best && (best as { cost: Cost }).cost[0] === 0 && (best as { cost: Cost }).cost[2] === 0) return;
    }
  };
  visit(0, 0, 0, 0);
  const found = best as { cost: Cost; choice: number[] } | null;
  if (!found) return null;

  const counts = carriers.map(() => new Map<string, number>());
  units.forEach((u, i) => {
    const c = counts[found.choice[i] ?? 0] as Map<string, number>;
    c.set(u.itemId, (c.get(u.itemId) ?? 0) + 1);
  });
  const loadsOut: CarrierLoad[] = carriers.map((c, m) => {
    const lines = kitLines(counts[m] as Map<string, number>);
    const massG = lines.reduce((g, l) => g + l.count * (options.massGById.get(l.itemId) ?? 0), 0);
    return {
      memberId: c.memberId,
      lines,
      massG,
      gramLimitG: c.gramLimitG,
      overG: c.gramLimitG === null ? 0 : Math.max(0, massG - c.gramLimitG),
    };
  });
  return {
    carriers: loadsOut,
    overG: found.cost[0],
    withinLimits: found.cost[0] === 0,
    lentUnits: found.cost[2],
    proven: exhausted,
    walkingRuleHeld: walkingRule,
  };
}
