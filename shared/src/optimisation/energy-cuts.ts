import { dayBoundsOf, dot, viewScalesOf, type BoundVector } from './day-bounds.js';
import { groupBigM } from './daily-model.js';
import { alternativePresent, type ActiveGroup, type ActiveItem, type PresolvedProblem } from './presolve.js';
import type { EnergyShortfall, KitCounts } from './types.js';
import { keepCompiled } from '../jit/keep-compiled.js';

/** Wh a reserve row may miss by and still count as met (float noise of the forward pass). */
const reserveToleranceWh = 1e-9;

/**
 * A linear cut on kits from the daily model: Σ_i itemWh[i]·n_i + Σ_g groupWh[g]·W_g ≥ lowerWh, where n_i is the count
 * of active item i and W_g the number of a harvest group's requirement alternatives switched on. Valid for EVERY kit
 * the daily model accepts, so adding it never cuts off a kit the judge could accept.
 */
export interface EnergyCut {
  skyIndex: number;
  dayIndex: number;
  itemWh: Float64Array;
  groupWh: Float64Array;
  lowerWh: number;
}

/** The daily model's answer for one fixed kit, with a cut per sky that runs short. */
export interface DailyEvaluation {
  /** Per sky, the first day that ends below the reserve and by how many Wh. */
  shortfalls: EnergyShortfall[];
  /** Smallest end-of-day Wh above the reserve over every sky-day with demand (negative when short). */
  worstMarginWh: number;
  /** One cut per short sky, at its first short day; the kit breaks each. */
  cuts: EnergyCut[];
}

/** Which bound was smallest on a day: the panels' harvest, a linear bound, the morning/afternoon split, or the room. */
type Pick =
  | { kind: 'harvest' }
  | { kind: 'vector'; v: BoundVector }
  | { kind: 'split'; early: BoundVector | null; roomWh: number; late: BoundVector }
  | { kind: 'room'; capWh: number };

/** An upper bound on the cumulative stored harvest, valid for every kit: a constant plus linear terms. */
interface CumulativeBound {
  constWh: number;
  itemWh: Float64Array;
  groupWh: Float64Array;
}

/** The bound a pass that builds no cut carries (never read). */
const noBound: CumulativeBound = { constWh: 0, itemWh: new Float64Array(0), groupWh: new Float64Array(0) };

const zeroBound = (items: number, groups: number, constWh = 0): CumulativeBound => ({
  constWh,
  itemWh: new Float64Array(items),
  groupWh: new Float64Array(groups),
});

function plus(base: CumulativeBound, item: BoundVector | null, groups?: Float64Array): CumulativeBound {
  const itemWh = Float64Array.from(base.itemWh);
  if (item) for (let i = 0; i < itemWh.length; i++) itemWh[i] = (itemWh[i] ?? 0) + (item[i] ?? 0);
  const groupWh = Float64Array.from(base.groupWh);
  if (groups) for (let g = 0; g < groupWh.length; g++) groupWh[g] = (groupWh[g] ?? 0) + (groups[g] ?? 0);
  return { constWh: base.constWh, itemWh, groupWh };
}

/**
 * Evaluates the daily model (the rows of `buildDailyModel`) for one fixed kit without a solver. With the kit fixed,
 * storing as much as the rows allow each day is optimal, because every row caps the cumulative stored harvest from
 * above and the reserve rows want it large; so a forward pass that takes each day's smallest bound gives the model's
 * answer.
 *
 * When a sky runs short on day t, the pass also records WHICH bound was the smallest each day. Each bound holds for
 * every kit (a room limit is a constant; a harvest, acceptance or step bound is linear in the counts), so chaining the
 * chosen bounds gives an upper bound U_t(n) on the cumulative harvest of ANY kit, and the reserve row gives the cut
 * (1 − r)·C(n) + U_t(n) ≥ D_{≤t}, which this kit breaks. It is the Benders feasibility cut of the daily model (the
 * dual of the forward pass), found without solving an LP.
 * Source: J. F. Benders, Partitioning procedures for solving mixed-variables programming problems, Numerische
 * Mathematik 4 (1962); the forward-pass dual is ours.
 * @example evaluateDailyModel(pre, kit).cuts.length // 0 when the kit passes the daily model
 */
export function evaluateDailyModel(
  pre: PresolvedProblem,
  kit: KitCounts,
  options: {
    withCuts?: boolean;
    /** A view's checks read its own derived bound vectors, as the cut pass does (tests compare the two). */
    derivedBounds?: boolean;
    /**
     * Only whether the kit runs short: the pass stops at the first short sky (the one found short last time first) and
     * reports that one; `worstMarginWh` then covers only the skies run. Implies `withCuts: false`.
     */
    anyShortfall?: boolean;
  } = {},
): DailyEvaluation {
  const c = pre.problem.coefficients;
  const itemCount = pre.items.length;
  const groupCount = pre.groups.length;
  const counts = pre.items.map((it) => Math.min(kit.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount));
  // Every bound vector is zero but at stores and panels, and a kit holds few of them: dot products run over the packed
  // stores and panels only. A kit grown by lifting holds every lead and converter the locker has: on the 50-item bench
  // locker (seed 50) this, with the roles read once per items array, took the daily checks from 46 to 19 ms a plan.
  const { bounded, capacity } = itemRoles(pre);
  const packedList: number[] = [];
  for (let i = 0; i < itemCount; i++) if ((counts[i] as number) > 0 && bounded[i]) packedList.push(i);
  const packed = Int32Array.from(packedList);
  const packedCounts = Float64Array.from(packed, (i) => counts[i] ?? 0);
  // A view's checks read its base's bounds with the view's factors in the counts (no vector built); only the pass that
  // builds a cut needs the view's own vectors.
  const scales = options.derivedBounds ? undefined : viewScalesOf(pre);
  const ratioCounts = scales
    ? Float64Array.from(packed, (i, k) => (packedCounts[k] ?? 0) * (scales.ratioScale[i] ?? 0))
    : packedCounts;
  const keptCounts = scales
    ? Float64Array.from(packed, (i, k) => (packedCounts[k] ?? 0) * (scales.keptScale[i] ?? 0))
    : packedCounts;
  // A view keeps all of a group's panels or none (`restricted` in kit-views.ts).
  const groupKept = scales && pre.groups.map((g) => g.panelIndices.some((p) => (scales.ratioScale[p] ?? 0) > 0));
  /** Σ over the packed items of v[i] × factors[k] (the counts, or the counts with a view's factors). */
  const scaledValue = (v: BoundVector, factors: Float64Array): number => {
    let sum = 0;
    for (let k = 0; k < packed.length; k++) sum += (v[packed[k] as number] as number) * (factors[k] as number);
    return sum;
  };
  const value = (v: BoundVector): number => scaledValue(v, packedCounts);
  const groupOn = pre.groups.map(
    (g) => !g.hasRequirement || g.requiresAnyOf.some((alt) => alternativePresent(alt, counts)),
  );
  const spareCapacityWh = value(capacity);
  const timing = c.timing ?? 'overlapping';
  const boundsOf = dayBoundsOf(pre);
  const checkBoundsOf = scales ? scales.base : boundsOf;
  const shortfalls: EnergyShortfall[] = [];
  const cuts: EnergyCut[] = [];
  let worstMarginWh = Infinity;

  /** One sky's forward pass; with `track`, the chain of smallest bounds for the cut. Returns the cut when short. */
  const runSky = (s: number, track: boolean): EnergyCut | null => {
    const skyId = c.skyIds[s] ?? '';
    const demand = c.demandWh[s] ?? [];
    const room = c.roomDemandWh?.[s] ?? demand;
    let cumDemandWh = 0;
    let cumRoomWh = 0;
    let cumWh = 0;
    let bound = track ? zeroBound(itemCount, groupCount) : noBound;
    let short = false;
    for (let t = 0; t < c.dayCount; t++) {
      const previousRoomWh = cumRoomWh;
      cumDemandWh += demand[t] ?? 0;
      cumRoomWh += room[t] ?? 0;
      const b = track ? boundsOf(s, t) : checkBoundsOf(s, t);
      let anyColumn = false;
      let harvestWh = 0;
      for (let gi = 0; gi < groupCount; gi++) {
        const g = pre.groups[gi] as ActiveGroup;
        const v = b.groupHarvest[gi];
        if (!v || (g.hasRequirement && g.requiresAnyOf.length === 0)) continue;
        // A view's group whose panels it leaves out has no column there (its derived vector is null).
        if (!track && groupKept && !groupKept[gi]) continue;
        anyColumn = true;
        if (groupOn[gi]) harvestWh += track ? value(v) : scaledValue(v, ratioCounts);
      }
      if (anyColumn && !track) {
        // The same smallest bound as below without naming it: the search checks many kits and needs no cut from them.
        let bestWh = harvestWh;
        const acceptWh = scaledValue(b.accept, keptCounts);
        if (acceptWh < bestWh) bestWh = acceptWh;
        for (const v of b.steps) {
          const wh = scaledValue(v, ratioCounts);
          if (wh < bestWh) bestWh = wh;
        }
        if (b.split) {
          let lateWh = Infinity;
          for (const v of b.split.late) lateWh = Math.min(lateWh, scaledValue(v, ratioCounts));
          let earlyWh = b.split.early.length > 0 ? Infinity : 0;
          for (const v of b.split.early) earlyWh = Math.min(earlyWh, scaledValue(v, ratioCounts));
          if (c.earlyRoomCapped) earlyWh = Math.min(earlyWh, spareCapacityWh);
          const splitWh = Math.min(earlyWh, previousRoomWh - cumWh) + lateWh;
          if (splitWh < bestWh) bestWh = splitWh;
        }
        const roomWh = (timing === 'overlapping' ? cumRoomWh : previousRoomWh) - cumWh;
        if (roomWh < bestWh) bestWh = roomWh;
        cumWh += Math.max(0, bestWh);
      } else if (anyColumn) {
        // The day's stored harvest is the smallest of its bounds; `pick` names it for the cut.
        let bestWh = harvestWh;
        let pick: Pick = { kind: 'harvest' };
        const consider = (wh: number, p: Pick): void => {
          if (wh < bestWh) {
            bestWh = wh;
            pick = p;
          }
        };
        consider(value(b.accept), { kind: 'vector', v: b.accept });
        for (const v of b.steps) consider(value(v), { kind: 'vector', v });
        if (b.split) {
          const lateValues = b.split.late.map(value);
          const late = b.split.late[argMin(lateValues)] as BoundVector;
          // The stores' capacity above the reserve is one more bound on the morning (`earlyRoomCapped`).
          const earlyVectors = c.earlyRoomCapped ? [...b.split.early, capacity] : b.split.early;
          const earlyValues = earlyVectors.map(value);
          const earlyIdx = argMin(earlyValues);
          const earlyRoomWh = previousRoomWh - cumWh;
          const earlyBoundWh = earlyValues[earlyIdx] ?? 0;
          // When the room left the day before caps the morning: cum_t ≤ D_{<t} + late bound.
          consider(Math.min(earlyBoundWh, earlyRoomWh) + Math.min(...lateValues), {
            kind: 'split',
            early: earlyBoundWh <= earlyRoomWh ? (earlyVectors[earlyIdx] as BoundVector) : null,
            roomWh: previousRoomWh,
            late,
          });
        }
        const roomCapWh = timing === 'overlapping' ? cumRoomWh : previousRoomWh;
        consider(roomCapWh - cumWh, { kind: 'room', capWh: roomCapWh });
        cumWh += Math.max(0, bestWh);
        // Even a bound worth nothing for this kit must be chained: other kits may harvest that day.
        if (track) bound = chain(bound, pick, b);
      }
      if ((demand[t] ?? 0) > 0) {
        const marginWh = spareCapacityWh + cumWh - cumDemandWh;
        if (!track) worstMarginWh = Math.min(worstMarginWh, marginWh);
        if (marginWh < -reserveToleranceWh && !short) {
          short = true;
          if (track)
            return {
              skyIndex: s,
              dayIndex: t,
              itemWh: plus(bound, capacity).itemWh,
              groupWh: bound.groupWh,
              lowerWh: cumDemandWh - bound.constWh,
            };
          shortfalls.push({ skyId, dayIndex: t, shortWh: -marginWh });
        }
      }
    }
    return null;
  };

  /** The running bound after one day, from the bound that was smallest. */
  const chain = (base: CumulativeBound, pick: Pick, b: ReturnType<typeof boundsOf>): CumulativeBound => {
    if (pick.kind === 'room') return zeroBound(itemCount, groupCount, pick.capWh);
    if (pick.kind === 'vector') return plus(base, pick.v);
    if (pick.kind === 'split')
      return pick.early
        ? plus(plus(base, pick.early), pick.late)
        : plus(zeroBound(itemCount, groupCount, pick.roomWh), pick.late);
    const items = new Float64Array(itemCount);
    const groups = new Float64Array(groupCount);
    pre.groups.forEach((g, gi) => {
      const v = b.groupHarvest[gi];
      if (!v || (g.hasRequirement && g.requiresAnyOf.length === 0)) return;
      // Off for lack of a controller: the active bound is big-M × (alternatives switched on), zero for this kit.
      if (groupOn[gi]) for (let i = 0; i < itemCount; i++) items[i] = (items[i] ?? 0) + (v[i] ?? 0);
      else groups[gi] = groupBigM(pre, v);
    });
    return plus(base, items, groups);
  };
  keepCompiled('daily-model pass', runSky, scaledValue, value, chain);

  if (options.anyShortfall) {
    const skyCount = c.skyIds.length;
    const first = lastShortSky.get(c.skyIds) ?? 0;
    for (let j = 0; j < skyCount && shortfalls.length === 0; j++) runSky((first + j) % skyCount, false);
    const short = shortfalls[0];
    if (short) lastShortSky.set(c.skyIds, c.skyIds.indexOf(short.skyId));
  } else {
    for (let s = 0; s < c.skyIds.length; s++) runSky(s, false);
  }
  if (!options.anyShortfall && options.withCuts !== false) {
    for (const short of shortfalls) {
      const cut = runSky(c.skyIds.indexOf(short.skyId), true);
      if (cut) cuts.push(cut);
    }
  }
  return { shortfalls, cuts, worstMarginWh: worstMarginWh === Infinity ? spareCapacityWh : worstMarginWh };
}

/** What the forward pass reads of an items array: which items a bound vector can weigh, and each store's spare Wh. */
interface ItemRoles {
  /** Stores and panels: every bound vector of `dayBoundsOf` is zero elsewhere. */
  bounded: boolean[];
  /** (1 − reserve) × usable Wh per store, 0 elsewhere. */
  capacity: Float64Array;
  reserveShare: number;
}

/** Per items array (a problem's views share their base's or one per store set, see `kit-views.ts`). */
const rolesCache = new WeakMap<readonly ActiveItem[], ItemRoles>();

function itemRoles(pre: PresolvedProblem): ItemRoles {
  const reserveShare = pre.problem.coefficients.reserveShare;
  let hit = rolesCache.get(pre.items);
  if (!hit || hit.reserveShare !== reserveShare) {
    hit = {
      bounded: pre.items.map((it) => it.store !== undefined || it.panel !== undefined),
      capacity: Float64Array.from(pre.items, (it) => (it.store ? (1 - reserveShare) * it.store.usableWh : 0)),
      reserveShare,
    };
    rolesCache.set(pre.items, hit);
  }
  return hit;
}

/**
 * The sky a quick check last found short, per list of skies (a problem's views share it; a search's kits run short
 * alike, most often in one sky): the next quick check starts there. Only the order of the skies changes, never the
 * answer.
 */
const lastShortSky = new WeakMap<object, number>();

/**
 * The items the daily forward pass reads, by index: stores, panels, and the items of a panel group's alternatives
 * (what switches a group on). Two kits alike in these get the same answer from `evaluateDailyModel`.
 * @example dailyModelItems(pre).includes(bankIndex) // true
 */
export function dailyModelItems(pre: PresolvedProblem): number[] {
  return pre.items.flatMap((it, i) =>
    it.store ||
    it.panel ||
    pre.groups.some((g) => g.requiresAnyOf.some((alt) => alt.anyOf.includes(i) || alt.items.some(([j]) => j === i)))
      ? [i]
      : [],
  );
}

function argMin(values: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if ((values[i] ?? Infinity) < (values[best] ?? Infinity)) best = i;
  return best;
}

/**
 * Whether a kit breaks a cut by more than float noise (1e-6 relative), so the master cannot propose it again.
 * @example clearlyBroken(pre, evaluation.cuts[0], kit) // true
 */
export function clearlyBroken(pre: PresolvedProblem, cut: EnergyCut, kit: KitCounts): boolean {
  const counts = pre.items.map((it) => Math.min(kit.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount));
  const on = pre.groups.map((g) => g.requiresAnyOf.filter((alt) => alternativePresent(alt, counts)).length);
  const lhsWh = dot(cut.itemWh, counts) + dot(cut.groupWh, on);
  return cut.lowerWh - lhsWh > 1e-6 * Math.max(1, Math.abs(cut.lowerWh));
}
