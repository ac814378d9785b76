import type { ActiveItem, PresolvedProblem } from './presolve.js';
import { keepCompiled } from '../jit/keep-compiled.js';

/**
 * One upper bound on a sky-day's stored harvest, linear in the item counts: Σ_i coefficientWh[i] · n_i (Wh, already
 * multiplied by the charge efficiency the bound assumes). Indexed by active item.
 */
export type BoundVector = Float64Array;

/**
 * Every bound on one sky-day's stored harvest N that the daily model uses, as vectors in the item counts, so the MILP
 * builder and the direct evaluator read the same numbers.
 */
export interface DayBounds {
  /** Per harvest group (index as `PresolvedProblem.groups`): η* Σ_{p∈g} h_{p,s,t} n_p; null when the group has no panel harvest that day. */
  groupHarvest: (BoundVector | null)[];
  /** Σ_b η_b acc_{b,s,t} n_b: what the stores can take in that day. */
  accept: BoundVector;
  /** Step threshold bounds (hourly input limits), each valid alone. */
  steps: BoundVector[];
  /** Bounds on the harvest before the day's first top-up (panels', stores'), and from it on; absent without the detail. */
  split?: { early: BoundVector[]; late: BoundVector[] };
}

/** Most threshold rows per sky-day (the sunniest steps first; any subset of thresholds stays a relaxation). */
export const maxStepBoundsPerDay = 12;

function hasStepDetail(pre: PresolvedProblem): boolean {
  const c = pre.problem.coefficients;
  return (
    !!c.dayFirstStep &&
    pre.items.every((it) => (!it.panel || it.panel.harvestWhByStep) && (!it.store || it.store.acceptWhByStep))
  );
}

/**
 * A function giving the bounds of each sky-day of a presolved problem (memoised: each sky-day is built once).
 *
 * Step bounds: in each step the harvest into stores is at most min(P_h, I_h) with P_h = Σ_p x_{p,h} n_p (panels' output)
 * and I_h = Σ_b a_{b,h} n_b (stores' input), so for ANY set S of the day's steps: harvest ≤ Σ_{h∉S} P_h + Σ_{h∈S} I_h,
 * linear in the counts. S runs over the day's j sunniest steps (j = 1…), where input limits bind.
 * Split bounds (with `firstTopUpStep`): the same panel and store sums over the steps before the first top-up and from it.
 * @example dayBoundsOf(pre)(0, 0).accept.length // pre.items.length
 */
export function dayBoundsOf(pre: PresolvedProblem): (s: number, t: number) => DayBounds {
  let hit = boundsCache.get(pre.items);
  if (!hit) {
    hit = buildDayBounds(pre);
    boundsCache.set(pre.items, hit);
  }
  return hit;
}

/**
 * One bounds function per items array: every evaluation of a search reads the same memo. The bounds depend only on
 * the items (their panel and store coefficients), the best charge efficiency and the trip's steps, which every
 * problem sharing an items array shares (a kit view with other demand keeps its items array, see `kit-views.ts`).
 */
const boundsCache = new WeakMap<readonly ActiveItem[], (s: number, t: number) => DayBounds>();

/**
 * How a view's bounds follow from its base's (`deriveDayBounds`): every vector but the acceptance one is the base's
 * times `ratioScale` item by item, the acceptance vector the base's times `keptScale`. A check that needs only the
 * bounds' values for one kit reads the base's vectors with these factors folded into the counts, building none.
 */
export interface ViewScales {
  base: (s: number, t: number) => DayBounds;
  ratioScale: Float64Array;
  keptScale: Float64Array;
}

const viewScales = new WeakMap<readonly ActiveItem[], ViewScales>();

/**
 * The scales of a view registered by `deriveDayBounds`, if `pre` is one.
 * @example viewScalesOf(view)?.ratioScale.length // view.items.length
 */
export function viewScalesOf(pre: PresolvedProblem): ViewScales | undefined {
  return viewScales.get(pre.items);
}

/**
 * Registers the bounds of a view of `base` (same steps; some panels and stores left out, a lower best charge
 * efficiency — see `kit-views.ts`) as the base's bounds with the items left out set to 0 and the rest scaled by the
 * ratio of best charge efficiencies (every panel and step vector is η* × Wh; the acceptance vector carries each
 * store's own efficiency and is only masked). The base's choice of step thresholds is kept: any subset of thresholds
 * is a valid bound, so the view's bounds stay a relaxation. Far cheaper than building them again for every view.
 * @example deriveDayBounds(view, pre) // dayBoundsOf(view) now reads pre's memo
 */
export function deriveDayBounds(view: PresolvedProblem, base: PresolvedProblem): void {
  if (boundsCache.has(view.items)) return;
  const baseBounds = dayBoundsOf(base);
  const ratio = base.bestChargeEfficiency > 0 ? view.bestChargeEfficiency / base.bestChargeEfficiency : 0;
  const kept = view.items.map((it) => it.panel !== undefined || it.store !== undefined);
  viewScales.set(view.items, {
    base: baseBounds,
    ratioScale: Float64Array.from(kept, (k) => (k ? ratio : 0)),
    keptScale: Float64Array.from(kept, (k) => (k ? 1 : 0)),
  });
  const scaled = (v: BoundVector, factor: number): BoundVector => v.map((x, i) => (kept[i] ? x * factor : 0));
  const memo = new Map<number, DayBounds>();
  const dayCount = base.problem.coefficients.dayCount;
  boundsCache.set(view.items, (s, t) => {
    const key = s * (dayCount + 1) + t;
    let hit = memo.get(key);
    if (!hit) {
      const b = baseBounds(s, t);
      const groupHarvest = b.groupHarvest.map((v) => {
        if (!v) return null;
        const out = scaled(v, ratio);
        return out.some((x) => x > 0) ? out : null;
      });
      hit = {
        groupHarvest,
        accept: scaled(b.accept, 1),
        steps: b.steps.map((v) => scaled(v, ratio)),
        ...(b.split
          ? {
              split: {
                early: b.split.early.map((v) => scaled(v, ratio)),
                late: b.split.late.map((v) => scaled(v, ratio)),
              },
            }
          : {}),
      };
      memo.set(key, hit);
    }
    return hit;
  });
}

function buildDayBounds(pre: PresolvedProblem): (s: number, t: number) => DayBounds {
  const c = pre.problem.coefficients;
  const n = pre.items.length;
  const eta = pre.bestChargeEfficiency;
  const detailed = hasStepDetail(pre);
  const first = c.dayFirstStep;
  const memo = new Map<number, DayBounds>();
  const sumSteps = (row: readonly number[] | undefined, steps: Iterable<number>): number => {
    let wh = 0;
    for (const h of steps) wh += row?.[h] ?? 0;
    return wh;
  };
  const range = (from: number, to: number): number[] =>
    Array.from({ length: Math.max(0, to - from) }, (_, k) => from + k);
  /** η* × (panels' Wh over `panelSteps` + stores' Wh over `storeSteps`) per unit. */
  const vector = (s: number, panelSteps: readonly number[], storeSteps: readonly number[]): BoundVector => {
    const v = new Float64Array(n);
    pre.items.forEach((it, i) => {
      if (it.panel) v[i] = (v[i] ?? 0) + eta * sumSteps(it.panel.harvestWhByStep?.[s], panelSteps);
      if (it.store) v[i] = (v[i] ?? 0) + eta * sumSteps(it.store.acceptWhByStep?.[s], storeSteps);
    });
    return v;
  };

  const build = (s: number, t: number): DayBounds => {
    const groupHarvest = pre.groups.map((g) => {
      const v = new Float64Array(n);
      let any = false;
      for (const p of g.panelIndices) {
        const wh = eta * (pre.items[p]?.panel?.harvestWh[s]?.[t] ?? 0);
        if (wh > 0) any = true;
        v[p] = wh;
      }
      return any ? v : null;
    });
    const accept = new Float64Array(n);
    pre.items.forEach((it, b) => {
      if (it.store) accept[b] = it.store.chargeEfficiency * (it.store.acceptWh[s]?.[t] ?? 0);
    });
    const bounds: DayBounds = { groupHarvest, accept, steps: [] };
    if (!detailed || !first) return bounds;
    const from = first[t] ?? 0;
    const to = first[t + 1] ?? from;
    const sunny: { h: number; potentialWh: number }[] = [];
    for (let h = from; h < to; h++) {
      let potentialWh = 0;
      for (const it of pre.items)
        if (it.panel) potentialWh += (it.panel.harvestWhByStep?.[s]?.[h] ?? 0) * it.candidate.ownedCount;
      if (potentialWh > 0) sunny.push({ h, potentialWh });
    }
    sunny.sort((a, b) => b.potentialWh - a.potentialWh || a.h - b.h);
    const stride = Math.max(1, Math.ceil(sunny.length / maxStepBoundsPerDay));
    // S = the j sunniest steps, for j = 1, 1 + stride, …: each item's Wh in one pass over the sunny steps, the panels'
    // over the steps not yet in S (a running remainder) and the stores' over those in S (a running sum).
    const sizes: number[] = [];
    for (let j = 1; j < sunny.length; j += stride) sizes.push(j);
    const steps = sizes.map(() => new Float64Array(n));
    pre.items.forEach((it, i) => {
      const panelRow = it.panel?.harvestWhByStep?.[s];
      const storeRow = it.store?.acceptWhByStep?.[s];
      if (!panelRow && !storeRow) return;
      let panelLeftWh = 0;
      for (const x of sunny) panelLeftWh += panelRow?.[x.h] ?? 0;
      let storeInWh = 0;
      for (let k = 0, next = 0; next < sizes.length; k++) {
        const h = (sunny[k] as { h: number }).h;
        panelLeftWh -= panelRow?.[h] ?? 0;
        storeInWh += storeRow?.[h] ?? 0;
        if (k + 1 === sizes[next]) (steps[next++] as BoundVector)[i] = eta * (Math.max(0, panelLeftWh) + storeInWh);
      }
    });
    bounds.steps.push(...steps);
    const topUp = c.firstTopUpStep;
    if (topUp) {
      const cut = Math.min(to, Math.max(from, topUp[t] ?? to));
      const early = range(from, cut);
      const late = range(cut, to);
      bounds.split = {
        early: [vector(s, early, []), vector(s, [], early)],
        late: [vector(s, late, []), vector(s, [], late)],
      };
    }
    return bounds;
  };

  keepCompiled('day bounds', build);
  return (s, t) => {
    const key = s * (c.dayCount + 1) + t;
    let hit = memo.get(key);
    if (!hit) {
      hit = build(s, t);
      memo.set(key, hit);
    }
    return hit;
  };
}

/**
 * Σ_i v[i] · n_i for a kit's counts by active index.
 * @example dot(new Float64Array([2, 3]), [1, 2]) // 8
 */
export function dot(v: BoundVector, counts: ArrayLike<number>): number {
  let sum = 0;
  for (let i = 0; i < v.length; i++) sum += (v[i] ?? 0) * (counts[i] ?? 0);
  return sum;
}
