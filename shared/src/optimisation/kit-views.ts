import { deriveDayBounds } from './day-bounds.js';
import { dailyModelItems, evaluateDailyModel, type EnergyCut } from './energy-cuts.js';
import { alternativePresent, type ActiveItem, type IndexedAlternative, type PresolvedProblem } from './presolve.js';
import type { KitCounts } from './types.js';
import { keepCompiled } from '../jit/keep-compiled.js';

/**
 * A kit's view of the daily model: the model with what the kit's own paths allow (its devices' draw through the
 * alternatives it holds, only from the stores those reach), and the BLOCKERS — items the kit lacks whose addition
 * could loosen that view (a better path, a path to another store). The view is a relaxation of the judge for every
 * kit that holds no blocker, so a cut found in it holds for those kits and, lifted by the blockers, for all.
 */
export interface KitView {
  /** The view's problem (built on first read). */
  readonly pre: PresolvedProblem;
  blockers: readonly number[];
  /**
   * What the view's model depends on besides the kit's stores and panels: which view (pooled, or one device's) and the
   * kit's best path efficiency per device. Two kits whose views share a key and hold the same stores, panels and
   * controllers get the same answer from it.
   */
  key: string;
}

/** Views sharing a store set share their items array (and so their memoised day bounds, see `dayBoundsOf`). */
const itemsCache = new WeakMap<PresolvedProblem, Map<string, { items: ActiveItem[]; bestChargeEfficiency: number }>>();

/** A need that carries per-device data, with its best alternative's efficiency. */
interface DeviceNeed {
  gainWh: readonly (readonly number[])[];
  alternatives: readonly IndexedAlternative[];
  eBest: number;
}

/** What `kitViews` reads of a problem whatever the kit: its device needs and its stores (once per problem). */
const viewStatics = new WeakMap<PresolvedProblem, { needs: DeviceNeed[]; storeIndices: number[] }>();

/** The needs that carry per-device data: a gain grid and an efficiency on every usable alternative. */
function staticsOf(pre: PresolvedProblem): { needs: DeviceNeed[]; storeIndices: number[] } {
  let hit = viewStatics.get(pre);
  if (!hit) {
    const needs = pre.needs.flatMap((need) =>
      need.need.gainWh && need.alternatives.length > 0 && need.alternatives.every((a) => a.efficiency !== undefined)
        ? [
            {
              gainWh: need.need.gainWh,
              alternatives: need.alternatives,
              // The share the demand rows count the device at: the whole locker's best, also in a search over its core.
              eBest: need.need.demandShare ?? Math.max(...need.alternatives.map((a) => a.efficiency ?? 1)),
            },
          ]
        : [],
    );
    hit = { needs, storeIndices: pre.items.flatMap((it, i) => (it.store ? [i] : [])) };
    viewStatics.set(pre, hit);
  }
  return hit;
}

/**
 * The views of a kit (none when no need carries per-device data, or when they would say nothing new).
 *
 * Why each is a relaxation of the judge for a kit K' holding no blocker (K' may hold more units of anything else):
 * - Draw: a device's battery gains at most `efficiency` per Wh drawn through an alternative, so it draws at least
 *   gain / e, with e the best efficiency among the alternatives K' holds. Every alternative better than the best the
 *   kit holds has a blocker (an item of it the kit lacks, or all its stores when the kit lacks them), so K' holds none
 *   and its best e is no better than the kit's.
 * - Pooled view: the daily model with the demand raised by gain × (1/e_kit − 1/e_best) per device — the caller's demand
 *   counts each device at its best alternative's efficiency, so the raised demand is still no more than K' draws —
 *   and harvest stored at the kit's best store charge efficiency instead of the locker's: every store that charges
 *   better is a blocker, so K' stores each Wh of panel output at no better than that, and every bound of `dayBoundsOf`
 *   (η* × panel or store-input Wh) scales down by the ratio (`deriveDayBounds`). On the 50-item bench lockers this
 *   took rounds from 37 to 34, 175 to 90, 130 to 103 and 460 to 358, the same kits.
 * - Device view (one device, when the kit's alternatives reach only some of the stores): the device's energy can only
 *   come from the stores its alternatives in K' reach, and the stores start full and never give energy to each other,
 *   so what it draws by a day's end is at most those stores' capacity above the reserve plus the harvest they took by
 *   then. Every store K' could reach through an alternative beyond those of the kit is a blocker (the other stores of an
 *   alternative the kit holds; an alternative the kit lacks is blocked by an item of it), so K' reaches no more store
 *   types. Harvest into those stores is bounded as in the pooled model (every bound of `dayBoundsOf` holds store by
 *   store), counting only panels whose group can reach one of them, at the best charge efficiency among them; the
 *   room rows keep every device's most draw (any device may empty those stores).
 * @example kitViews(pre, kit).length // 0 without per-device data
 */
export function kitViews(pre: PresolvedProblem, kit: KitCounts): KitView[] {
  const { needs, storeIndices } = staticsOf(pre);
  if (needs.length === 0) return [];
  const c = pre.problem.coefficients;
  const counts = pre.items.map((it) => Math.min(kit.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount));
  const inKit = (i: number): boolean => (counts[i] ?? 0) > 0;
  /** Items that keep an alternative the kit lacks out of a kit: one item it lacks, or all its stores. */
  const blockerOf = (a: IndexedAlternative): number[] => {
    const lacking = a.items.find(([i, n]) => (counts[i] ?? 0) < n);
    if (lacking) return [lacking[0]];
    return a.anyOf.length > 0 ? [...a.anyOf] : [];
  };
  keepCompiled('kit views', blockerOf);

  /** Devices drawing through a worse alternative than the locker's best: their demand is raised in the pooled view. */
  const raised: { gainWh: readonly (readonly number[])[]; factor: number }[] = [];
  const pooledKey: string[] = [];
  const pooledBlockers = new Set<number>();
  const views: KitView[] = [];
  for (const [d, need] of needs.entries()) {
    const held = need.alternatives.filter((a) => alternativePresent(a, counts));
    if (held.length === 0) continue;
    const eKit = Math.max(...held.map((a) => a.efficiency ?? 1));
    const eBest = need.eBest;
    pooledKey.push(`${d}:${eKit}`);
    const better = need.alternatives.filter((a) => !held.includes(a) && (a.efficiency ?? 1) > eKit);
    const effBlockers = better.flatMap(blockerOf);
    if (eKit < eBest) {
      for (const b of effBlockers) pooledBlockers.add(b);
      raised.push({ gainWh: need.gainWh, factor: 1 / eKit - 1 / eBest });
    }

    // The stores the kit's alternatives reach (an alternative without a store list reaches every store).
    if (held.some((a) => a.anyOf.length === 0)) continue;
    const reached = new Set(held.flatMap((a) => a.anyOf.filter(inKit)));
    const blockers = new Set(effBlockers);
    for (const a of held) for (const b of a.anyOf) if (!inKit(b)) blockers.add(b);
    for (const a of need.alternatives) {
      if (held.includes(a)) continue;
      if (a.anyOf.length === 0 || a.anyOf.some((b) => !reached.has(b))) for (const b of blockerOf(a)) blockers.add(b);
    }
    if (storeIndices.every((i) => reached.has(i))) continue;
    const gainWh = need.gainWh;
    views.push(
      lazyView(
        () =>
          restricted(
            pre,
            reached,
            gainWh.map((row) => row.map((wh) => wh / eKit)),
          ),
        [...blockers].sort((x, y) => x - y),
        `device ${d} at ${eKit} from ${[...reached].sort((x, y) => x - y).join(',')}`,
      ),
    );
  }
  // The pooled model stores harvest at the locker's best charge efficiency; a kit holding no store that charges better
  // than its own best stores at most that, so every store that charges better is a blocker of the pooled view.
  const storeEff = (i: number): number => pre.items[i]?.store?.chargeEfficiency ?? 0;
  const kitStoreEff = Math.max(0, ...storeIndices.filter(inKit).map(storeEff));
  if (kitStoreEff < pre.bestChargeEfficiency)
    for (const i of storeIndices) if (storeEff(i) > kitStoreEff) pooledBlockers.add(i);
  if (kitStoreEff < pre.bestChargeEfficiency || raised.some((r) => r.gainWh.some((row) => row.some((wh) => wh > 0)))) {
    views.unshift(
      lazyView(
        () => {
          const view: PresolvedProblem = {
            ...pre,
            ...atEfficiency(pre, kitStoreEff),
            problem: {
              ...pre.problem,
              coefficients: {
                ...c,
                demandWh: c.demandWh.map((row, s) =>
                  row.map((wh, t) => {
                    let extraWh = 0;
                    for (const r of raised) extraWh += (r.gainWh[s]?.[t] ?? 0) * r.factor;
                    return wh + extraWh;
                  }),
                ),
                roomDemandWh: c.roomDemandWh ?? c.demandWh,
              },
            },
          };
          deriveDayBounds(view, pre);
          return view;
        },
        [...pooledBlockers].sort((x, y) => x - y),
        `pooled ${pooledKey.join(' ')} stores at ${kitStoreEff}`,
      ),
    );
  }
  return views;
}

/** Per problem and charge efficiency, one items array (its day bounds are the base's scaled, see `deriveDayBounds`). */
const efficiencyItems = new WeakMap<PresolvedProblem, Map<number, ActiveItem[]>>();

/** The problem's items and best charge efficiency for a view whose stores charge at most `efficiency`. */
function atEfficiency(
  pre: PresolvedProblem,
  efficiency: number,
): Pick<PresolvedProblem, 'items' | 'bestChargeEfficiency'> {
  if (efficiency >= pre.bestChargeEfficiency)
    return { items: pre.items, bestChargeEfficiency: pre.bestChargeEfficiency };
  let byEfficiency = efficiencyItems.get(pre);
  if (!byEfficiency) {
    byEfficiency = new Map();
    efficiencyItems.set(pre, byEfficiency);
  }
  let items = byEfficiency.get(efficiency);
  if (!items) {
    items = [...pre.items];
    byEfficiency.set(efficiency, items);
  }
  return { items, bestChargeEfficiency: efficiency };
}

/** A view whose problem is built when first read (a check answered from the cache by its key never builds it). */
function lazyView(build: () => PresolvedProblem, blockers: readonly number[], key: string): KitView {
  let built: PresolvedProblem | undefined;
  return {
    get pre() {
      built ??= build();
      return built;
    },
    blockers,
    key,
  };
}

/** The problem with only `stores` as stores, only the panels that can reach one of them, and `demandWh`. */
function restricted(pre: PresolvedProblem, stores: ReadonlySet<number>, demandWh: number[][]): PresolvedProblem {
  let byKey = itemsCache.get(pre);
  if (!byKey) {
    byKey = new Map();
    itemsCache.set(pre, byKey);
  }
  const key = [...stores].sort((a, b) => a - b).join(',');
  let hit = byKey.get(key);
  if (!hit) {
    // A panel counts when its group has no requirement or some alternative of it may feed one of the stores.
    const groupReaches = pre.groups.map(
      (g) =>
        !g.hasRequirement || g.requiresAnyOf.some((a) => a.anyOf.length === 0 || a.anyOf.some((b) => stores.has(b))),
    );
    const items = pre.items.map((it, i): ActiveItem => {
      const { store, panel, ...rest } = it;
      const keepsPanel = panel && it.groupIndex !== undefined && groupReaches[it.groupIndex];
      return { ...rest, ...(store && stores.has(i) ? { store } : {}), ...(keepsPanel ? { panel } : {}) };
    });
    const bestChargeEfficiency = Math.max(0, ...items.map((it) => it.store?.chargeEfficiency ?? 0));
    hit = { items, bestChargeEfficiency };
    byKey.set(key, hit);
  }
  const c = pre.problem.coefficients;
  const view: PresolvedProblem = {
    ...pre,
    items: hit.items,
    bestChargeEfficiency: hit.bestChargeEfficiency,
    problem: {
      ...pre.problem,
      coefficients: { ...c, demandWh, roomDemandWh: c.roomDemandWh ?? c.demandWh },
    },
  };
  deriveDayBounds(view, pre);
  return view;
}

/**
 * The energy cuts of a kit's views that the kit breaks, each lifted to hold for every kit: a blocker's coefficient is
 * raised to the cut's right-hand side, so any kit holding a blocker meets the cut (every other term is ≥ 0).
 * @example kitViewCuts(pre, kit).length // 0 when every view of the kit holds
 */
export function kitViewCuts(pre: PresolvedProblem, kit: KitCounts): EnergyCut[] {
  const cuts: EnergyCut[] = [];
  for (const view of kitViews(pre, kit)) {
    for (const cut of evaluateDailyModel(view.pre, kit).cuts) {
      if (!(cut.lowerWh > 0)) continue;
      const itemWh = Float64Array.from(cut.itemWh);
      for (const b of view.blockers) itemWh[b] = Math.max(itemWh[b] ?? 0, cut.lowerWh);
      cuts.push({ ...cut, itemWh });
    }
  }
  return cuts;
}

/**
 * Whether some view of the kit runs short (a quick necessary check before the judge; no cuts built).
 * @example kitViewsShort(pre, kit) // false when every view holds
 */
export function kitViewsShort(pre: PresolvedProblem, kit: KitCounts): boolean {
  const views = kitViews(pre, kit);
  if (views.length === 0) return false;
  let cache = shortCache.get(pre);
  if (!cache) {
    cache = { roles: dailyModelItems(pre), answers: new Map() };
    shortCache.set(pre, cache);
  }
  // Lifting tries kits that differ in a lead or a converter: their views' answers are read, not worked out again.
  const held = cache.roles
    .map((i) => {
      const it = pre.items[i] as ActiveItem;
      return Math.min(kit.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount);
    })
    .join(',');
  const { answers } = cache;
  return views.some((view) => {
    const key = `${view.key} | ${held}`;
    let short = answers.get(key);
    if (short === undefined) {
      short = evaluateDailyModel(view.pre, kit, { anyShortfall: true }).shortfalls.length > 0;
      if (answers.size >= maxCachedAnswers) answers.clear();
      answers.set(key, short);
    }
    return short;
  });
}

/** Answers kept per problem before the cache starts over (a plan asks a few thousand). */
const maxCachedAnswers = 50_000;

const shortCache = new WeakMap<PresolvedProblem, { roles: number[]; answers: Map<string, boolean> }>();
