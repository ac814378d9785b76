/**
 * The party's reference answers for tests, by brute force and nothing clever: every assignment of every unit to every
 * carrier, and every kit of counts 0…owned. Slow by design — the solver's branch-and-bound and cut rounds are tested
 * against it. Shares nothing with the solver but the rule's statement (types.ts).
 */
import { kitLines, kitMassG } from '../optimisation/kit.js';
import type { KitCandidate, KitCounts, KitJudge } from '../optimisation/types.js';
import type { SplitRules } from './types.js';

/** Lexicographic cost: total grams over, worst single overage, units carried by someone other than their owner. */
export type SplitCost = [overG: number, maxOverG: number, lentUnits: number];

const lessThan = (a: SplitCost, b: SplitCost): boolean =>
  a[0] !== b[0] ? a[0] < b[0] : a[1] !== b[1] ? a[1] < b[1] : a[2] < b[2];

/** Whether an assignment (unit i → carrier index) keeps the walking rule. */
export function keepsWalkingRule(units: readonly string[], carrierOf: readonly number[], rules: SplitRules): boolean {
  const packs = new Map<number, Map<string, number>>();
  units.forEach((id, i) => {
    const m = carrierOf[i] ?? 0;
    const pack = packs.get(m) ?? new Map<string, number>();
    pack.set(id, (pack.get(id) ?? 0) + 1);
    packs.set(m, pack);
  });
  return units.every((id, i) => {
    const feed = rules.walkingFeeds.find((f) => f.panelItemId === id);
    if (!feed || feed.alternatives.length === 0) return true;
    const pack = packs.get(carrierOf[i] ?? 0) ?? new Map<string, number>();
    return feed.alternatives.some((alt) => {
      const need = new Map<string, number>();
      for (const a of alt.itemIds) need.set(a, (need.get(a) ?? 0) + 1);
      return [...need].every(([a, n]) => (pack.get(a) ?? 0) >= n);
    });
  });
}

/** The least cost of any assignment of the kit's units that keeps the walking rule, or null when none does. */
export function bruteForceSplitCost(
  kit: KitCounts,
  rules: SplitRules,
  massGById: ReadonlyMap<string, number>,
  walkingRule = true,
): SplitCost | null {
  const units = kitLines(kit).flatMap((l) => Array.from({ length: l.count }, () => l.itemId));
  const m = rules.carriers.length;
  const total = m ** units.length;
  let best: SplitCost | null = null;
  const carrierOf = new Array<number>(units.length).fill(0);
  for (let code = 0; code < total; code++) {
    let c = code;
    for (let i = 0; i < units.length; i++) {
      carrierOf[i] = c % m;
      c = Math.floor(c / m);
    }
    if (walkingRule && !keepsWalkingRule(units, carrierOf, rules)) continue;
    const loads = new Array<number>(m).fill(0);
    let lent = 0;
    units.forEach((id, i) => {
      const k = carrierOf[i] ?? 0;
      loads[k] = (loads[k] ?? 0) + (massGById.get(id) ?? 0);
      const owner = rules.ownerByItemId.get(id);
      if (owner !== undefined && owner !== rules.carriers[k]?.memberId) lent++;
    });
    const overs = loads.map((g, k) => Math.max(0, g - (rules.carriers[k]?.gramLimitG ?? Infinity)));
    const cost: SplitCost = [overs.reduce((a, b) => a + b, 0), Math.max(0, ...overs), lent];
    if (!best || lessThan(cost, best)) best = cost;
  }
  return best;
}

/** The reference party answer over every kit. */
export type PartyOracleAnswer =
  | { kind: 'nothing-feasible' }
  /** The lightest judged-feasible kit that splits within every limit (grams are what must match). */
  | { kind: 'fits'; massG: number }
  /** No feasible kit fits: the lightest feasible kit's grams and its least split cost. */
  | { kind: 'over-limits'; massG: number; lightestKits: Map<string, number>[]; cost: SplitCost };

/**
 * Every kit (Π (owned + 1)), judged; among the feasible ones the lightest that splits within the limits under the
 * walking rule and weighs no more than the trip's own limit. With none, the lightest feasible kits (several may tie) and the least split cost of each are the
 * reference for the "over the limits" answer.
 */
export function exhaustivePartyAnswer(
  candidates: readonly KitCandidate[],
  judge: KitJudge,
  rules: SplitRules,
  tripLimitG: number | null = null,
): PartyOracleAnswer {
  const items = candidates.filter((c) => c.ownedCount > 0);
  const massGById = new Map(candidates.map((c) => [c.itemId, c.massG]));
  const kits: Map<string, number>[] = [];
  const counts = items.map(() => 0);
  const total = items.reduce((n, c) => n * (c.ownedCount + 1), 1);
  for (let n = 0; n < total; n++) {
    kits.push(
      new Map(items.flatMap((c, i) => ((counts[i] ?? 0) > 0 ? [[c.itemId, counts[i] as number] as const] : []))),
    );
    for (let i = 0; i < items.length; i++) {
      if ((counts[i] ?? 0) < (items[i]?.ownedCount ?? 0)) {
        counts[i] = (counts[i] ?? 0) + 1;
        break;
      }
      counts[i] = 0;
    }
  }
  const feasible = kits.filter((k) => judge(k).feasible).map((k) => ({ kit: k, massG: kitMassG(k, candidates) }));
  if (feasible.length === 0) return { kind: 'nothing-feasible' };
  feasible.sort((a, b) => a.massG - b.massG);
  for (const f of feasible) {
    const cost = bruteForceSplitCost(f.kit, rules, massGById);
    if (cost && cost[0] === 0 && f.massG <= (tripLimitG ?? Infinity)) return { kind: 'fits', massG: f.massG };
  }
  const lightestG = feasible[0]?.massG ?? 0;
  const lightestKits = feasible.filter((f) => f.massG === lightestG).map((f) => f.kit);
  const costs = lightestKits.map(
    (k) => bruteForceSplitCost(k, rules, massGById) ?? bruteForceSplitCost(k, rules, massGById, false),
  );
  const cost = costs.reduce<SplitCost | null>((a, c) => (c && (!a || lessThan(c, a)) ? c : a), null) ?? [0, 0, 0];
  return { kind: 'over-limits', massG: lightestG, lightestKits, cost };
}
