import { dayBoundsOf, type BoundVector } from './day-bounds.js';
import type { EnergyCut } from './energy-cuts.js';
import type { LinearModel, LinearRow } from './linear-model.js';
import { alternativePresent, type PresolvedProblem } from './presolve.js';
import type { KitCounts } from './types.js';

/**
 * A cut on kits, in item counts (by item id):
 * - `no-larger-than`: exclude every kit with no more of any item than `counts` (the judge rejected `counts`, and the
 *   judge is monotone): Σ_i Σ_{k > K_i} y_{i,k} ≥ 1.
 * - `no-superset-of`: exclude every kit holding at least `counts` (the optimum and the optimum plus spares):
 *   Σ_{i: K_i > 0} Σ_{k ≥ K_i} y_{i,k} ≤ |{i: K_i > 0}| − 1.
 */
export interface KitCut {
  /** `not-exactly`: exclude this one kit (for the tie-break among kits of equal grams). */
  kind: 'no-larger-than' | 'no-superset-of' | 'not-exactly';
  counts: KitCounts;
}

/**
 * The master problem of the decomposed search: the same count, path, dominance and cut rows, but the sky-day energy
 * rows replaced by the daily model's feasibility cuts found so far (`evaluateDailyModel`), plus an optional gram cap.
 */
export interface MasterRows {
  energyCuts: readonly EnergyCut[];
  maxMassG?: number;
}

/** How the model is solved in one phase. */
export type ModelPhase =
  | { phase: 'min-grams' }
  /** With grams at most `maxMassG`, maximise the worst sky-day margin above the reserve. */
  | { phase: 'max-margin'; maxMassG: number }
  /** Feasibility with the kit fixed (for checks and diagnostics). */
  | { phase: 'fixed-kit'; counts: KitCounts };

/** Column names: y (one-hot count), z (need alternative), w (group alternative), n (stored harvest), m (margin). */
export const yColumn = (item: number, k: number): string => `y${item}_${k}`;
const zColumn = (need: number, alt: number): string => `z${need}_${alt}`;
const wColumn = (group: number, alt: number): string => `w${group}_${alt}`;
const nColumn = (group: number, sky: number, day: number): string => `n${group}_${sky}_${day}`;
const earlyColumn = (sky: number, day: number): string => `e${sky}_${day}`;
const marginColumn = 'm';

/** Scale factors: energies are divided by `energyWh`, grams by `massG`, so coefficients sit near 1–100. */
export interface ModelScale {
  energyWh: number;
  massG: number;
}

/**
 * Scale factors for a presolved problem: the largest energy of the trip and the heaviest item map to 10.
 * @example modelScale(pre).massG // heaviest item grams / 10
 */
export function modelScale(pre: PresolvedProblem): ModelScale {
  const c = pre.problem.coefficients;
  let energy = 0;
  for (const row of c.demandWh)
    energy = Math.max(
      energy,
      row.reduce((a, b) => a + b, 0),
    );
  for (const it of pre.items) {
    if (it.store) energy = Math.max(energy, it.store.usableWh);
    if (it.panel) for (const row of it.panel.harvestWh) for (const v of row) energy = Math.max(energy, v);
  }
  const mass = Math.max(0, ...pre.items.map((it) => it.candidate.massG));
  return { energyWh: energy > 0 ? energy / 10 : 1, massG: mass > 0 ? mass / 10 : 1 };
}

/** Cumulative sums of a row. */
function cumulative(row: readonly number[]): number[] {
  const out: number[] = [];
  let sum = 0;
  for (const v of row) out.push((sum += v));
  return out;
}

/**
 * Builds the daily mixed-integer model (one robust model over every design sky) for a presolved problem.
 *
 * Per item i, binaries y_{i,k} (k = 1…owned) with Σ_k y_{i,k} ≤ 1, count n_i = Σ_k k·y_{i,k}; capacity C = Σ E_b n_b.
 * Per group g, sky s, day t: stored harvest N_{g,s,t} ≥ 0 with
 *   N_{g,s,t} ≤ η* Σ_{p∈g} h_{p,s,t} n_p   (η* = best charge efficiency: an upper bound whatever store takes it),
 *   N_{g,s,t} ≤ M Σ_a w_{g,a}              (a group that needs a controller harvests nothing without one),
 *   Σ_g N_{g,s,t} ≤ Σ_b η_b acc_{b,s,t} n_b (what the stores can take in that day).
 * Stores start full, so stored energy at the end of day t is A_{s,t+1} = C + Σ_{u≤t}(N_{s,u} − D_{s,u}) − spill, and:
 *   room:    Σ_{u≤t} N_{s,u} ≤ Σ_{u≤t} D_{s,u} (`overlapping`) or Σ_{u<t} D_{s,u} (`after-harvest`: full before top-ups),
 *   reserve: (1 − r) C + Σ_{u≤t} N_{s,u} − m ≥ Σ_{u≤t} D_{s,u} (rows only on days with demand: the others are implied).
 * Paths: per need d, Σ_a z_{d,a} ≥ 1 with z_{d,a} ≤ Σ_{k≥c} y_{i,k} for each item i the alternative needs c times,
 * and z_{d,a} ≤ Σ_{i∈anyOf} Σ_k y_{i,k} when it needs one of a list.
 * Dominance (presolve): Σ_{k≥1} y_{i,k} ≤ y_{j,owned_j}. Cuts as `KitCut`.
 * Source: the formulation is ours; one-hot integer expansion and no-good cuts are textbook MILP modelling
 * (H. P. Williams, Model Building in Mathematical Programming, 5th ed., Wiley 2013, ch. 9).
 * @example buildDailyModel(pre, [], { phase: 'min-grams' }).sense // 'min'
 */
export function buildDailyModel(
  pre: PresolvedProblem,
  cuts: readonly KitCut[],
  phase: ModelPhase,
  scale = modelScale(pre),
  master?: MasterRows,
): LinearModel {
  const c = pre.problem.coefficients;
  const skyCount = c.skyIds.length;
  const dayCount = c.dayCount;
  const timing = c.timing ?? 'overlapping';
  const e = 1 / scale.energyWh;
  const columns: string[] = [];
  const binaries = new Set<string>();
  const upperBounds: Record<string, number> = {};
  const rows: LinearRow[] = [];
  const objective: Record<string, number> = {};

  // Counts.
  pre.items.forEach((it, i) => {
    for (let k = 1; k <= it.candidate.ownedCount; k++) {
      columns.push(yColumn(i, k));
      binaries.add(yColumn(i, k));
    }
    if (it.candidate.ownedCount >= 2) {
      rows.push({
        name: `one${i}`,
        terms: range(1, it.candidate.ownedCount).map((k) => [yColumn(i, k), 1] as const),
        upper: 1,
      });
    }
  });
  /** Terms for Σ_{k≥from} y_{i,k} (presence of at least `from` units), times `factor`. */
  const atLeast = (i: number, from: number, factor = 1): (readonly [string, number])[] =>
    range(Math.max(1, from), pre.items[i]?.candidate.ownedCount ?? 0).map((k) => [yColumn(i, k), factor] as const);
  /** Terms for factor × n_i. */
  const countTerms = (i: number, factor: number): (readonly [string, number])[] =>
    factor === 0
      ? []
      : range(1, pre.items[i]?.candidate.ownedCount ?? 0).map((k) => [yColumn(i, k), factor * k] as const);

  /** Terms −Σ_{i∈items} Σ_k y_{i,k}: "one of these items is packed" (for "alternative ≤ that" rows). */
  const anyOfTerms = (items: readonly number[]): (readonly [string, number])[] =>
    items.flatMap((i) => atLeast(i, 1, -1));

  // Paths for devices.
  pre.needs.forEach((need, d) => {
    need.alternatives.forEach((alt, a) => {
      columns.push(zColumn(d, a));
      for (const [item, n] of alt.items)
        rows.push({ name: `zp${d}_${a}_${item}`, terms: [[zColumn(d, a), 1], ...atLeast(item, n, -1)], upper: 0 });
      if (alt.anyOf.length > 0)
        rows.push({ name: `zq${d}_${a}`, terms: [[zColumn(d, a), 1], ...anyOfTerms(alt.anyOf)], upper: 0 });
    });
    rows.push({ name: `need${d}`, terms: need.alternatives.map((_, a) => [zColumn(d, a), 1] as const), lower: 1 });
  });
  // Group requirements.
  pre.groups.forEach((g, gi) => {
    g.requiresAnyOf.forEach((alt, a) => {
      columns.push(wColumn(gi, a));
      upperBounds[wColumn(gi, a)] = 1;
      for (const [item, n] of alt.items)
        rows.push({ name: `wp${gi}_${a}_${item}`, terms: [[wColumn(gi, a), 1], ...atLeast(item, n, -1)], upper: 0 });
      if (alt.anyOf.length > 0)
        rows.push({ name: `wq${gi}_${a}`, terms: [[wColumn(gi, a), 1], ...anyOfTerms(alt.anyOf)], upper: 0 });
    });
  });

  const boundsOf = dayBoundsOf(pre);
  /** Terms −e·v·n of a bound vector (for "harvest − bound ≤ 0" rows). */
  const negTerms = (v: BoundVector): (readonly [string, number])[] =>
    pre.items.flatMap((_, i) => countTerms(i, -(v[i] ?? 0) * e));
  const withMargin = phase.phase === 'max-margin';
  if (withMargin) {
    columns.push(marginColumn);
    const ownedCapacityWh = pre.items.reduce((sum, it) => sum + (it.store?.usableWh ?? 0) * it.candidate.ownedCount, 0);
    upperBounds[marginColumn] = Math.max(0, (1 - c.reserveShare) * ownedCapacityWh * e);
    objective[marginColumn] = 1;
  }
  const capacityTerms = pre.items.flatMap((it, i) =>
    it.store ? countTerms(i, (1 - c.reserveShare) * it.store.usableWh * e) : [],
  );

  // The master problem carries the energy cuts found so far instead of the sky-day rows (see `MasterRows`).
  for (let s = 0; s < (master ? 0 : skyCount); s++) {
    const demand = c.demandWh[s] ?? [];
    const cumDemand = cumulative(demand);
    const cumRoom = cumulative(c.roomDemandWh?.[s] ?? demand);
    const harvested: string[] = [];
    for (let t = 0; t < dayCount; t++) {
      const dayColumns: string[] = [];
      const bounds = boundsOf(s, t);
      pre.groups.forEach((g, gi) => {
        const harvest = bounds.groupHarvest[gi];
        if (!harvest || (g.hasRequirement && g.requiresAnyOf.length === 0)) return;
        const col = nColumn(gi, s, t);
        columns.push(col);
        dayColumns.push(col);
        rows.push({ name: `hv${gi}_${s}_${t}`, terms: [[col, 1], ...negTerms(harvest)], upper: 0 });
        if (g.hasRequirement) {
          rows.push({
            name: `hg${gi}_${s}_${t}`,
            terms: [
              [col, 1],
              ...g.requiresAnyOf.map((_, a) => [wColumn(gi, a), -groupBigM(pre, harvest) * e] as const),
            ],
            upper: 0,
          });
        }
      });
      if (dayColumns.length > 0) {
        const dayTerms = dayColumns.map((col) => [col, 1] as const);
        rows.push({ name: `ac${s}_${t}`, terms: [...dayTerms, ...negTerms(bounds.accept)], upper: 0 });
        bounds.steps.forEach((v, j) =>
          rows.push({ name: `st${s}_${t}_${j}`, terms: [...dayTerms, ...negTerms(v)], upper: 0 }),
        );
        if (bounds.split) {
          // E: the day's stored harvest before its first top-up; it must fit in the room left the day before.
          const early = earlyColumn(s, t);
          columns.push(early);
          bounds.split.early.forEach((v, j) =>
            rows.push({ name: `eb${s}_${t}_${j}`, terms: [[early, 1], ...negTerms(v)], upper: 0 }),
          );
          bounds.split.late.forEach((v, j) =>
            rows.push({ name: `lb${s}_${t}_${j}`, terms: [...dayTerms, [early, -1], ...negTerms(v)], upper: 0 }),
          );
          rows.push({ name: `el${s}_${t}`, terms: [...dayTerms, [early, -1]], lower: 0 });
          // The morning fits in the stores' capacity above the reserve, whatever the room rows counted before.
          if (c.earlyRoomCapped)
            rows.push({
              name: `ec${s}_${t}`,
              terms: [[early, 1], ...capacityTerms.map(([col, w]) => [col, -w] as const)],
              upper: 0,
            });
          rows.push({
            name: `er${s}_${t}`,
            terms: [...harvested.map((col) => [col, 1] as const), [early, 1]],
            upper: (t > 0 ? (cumRoom[t - 1] ?? 0) : 0) * e,
          });
        }
        harvested.push(...dayColumns);
      }
      const roomWh = timing === 'overlapping' ? (cumRoom[t] ?? 0) : t > 0 ? (cumRoom[t - 1] ?? 0) : 0;
      if (harvested.length > 0)
        rows.push({ name: `rm${s}_${t}`, terms: harvested.map((col) => [col, 1] as const), upper: roomWh * e });
      if ((demand[t] ?? 0) > 0) {
        rows.push({
          name: `rs${s}_${t}`,
          terms: [
            ...capacityTerms,
            ...harvested.map((col) => [col, 1] as const),
            ...(withMargin ? [[marginColumn, -1] as const] : []),
          ],
          lower: (cumDemand[t] ?? 0) * e,
        });
      }
    }
  }

  master?.energyCuts.forEach((cut, ci) => {
    // k units of an item give k × its Wh, but never need more than the right-hand side (one count is chosen per item).
    const terms = pre.items.flatMap((_, i) =>
      countTerms(i, (cut.itemWh[i] ?? 0) * e).map(([col, v]) => [col, Math.min(v, cut.lowerWh * e)] as const),
    );
    pre.groups.forEach((g, gi) => {
      const wh = cut.groupWh[gi] ?? 0;
      if (wh !== 0) g.requiresAnyOf.forEach((_, a) => terms.push([wColumn(gi, a), wh * e]));
    });
    rows.push({ name: `ec${ci}`, terms, lower: cut.lowerWh * e });
  });
  if (master?.maxMassG !== undefined)
    rows.push({
      name: 'gramcap',
      terms: pre.items.flatMap((it, i) => countTerms(i, it.candidate.massG / scale.massG)),
      upper: (master.maxMassG + 0.5) / scale.massG,
    });

  // A device with no usable path: no kit is feasible.
  if (pre.missingNeeds.length > 0) rows.push({ name: 'missing', terms: [], lower: 1 });
  // Dominance rows pick one kit among equivalent ones: not part of the daily model itself, so not for a fixed kit.
  for (const [i, j] of phase.phase === 'fixed-kit' ? [] : pre.dominance) {
    const ownedJ = pre.items[j]?.candidate.ownedCount ?? 0;
    rows.push({ name: `dom${i}_${j}`, terms: [...atLeast(i, 1), [yColumn(j, ownedJ), -1]], upper: 0 });
  }
  // Cuts.
  cuts.forEach((cut, ci) => {
    if (cut.kind === 'no-larger-than') {
      const terms = pre.items.flatMap((it, i) => atLeast(i, (cut.counts.get(it.candidate.itemId) ?? 0) + 1));
      rows.push({ name: `cl${ci}`, terms, lower: 1 });
    } else if (cut.kind === 'not-exactly') {
      // Σ_{i: K_i = 0} Σ_k y_{i,k} + Σ_{i: K_i > 0} (Σ_{k ≠ K_i} y_{i,k} − y_{i,K_i}) ≥ 1 − |{i: K_i > 0}|.
      let packed = 0;
      const terms: (readonly [string, number])[] = [];
      pre.items.forEach((it, i) => {
        const kept = Math.min(cut.counts.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount);
        if (kept > 0) packed++;
        for (let k = 1; k <= it.candidate.ownedCount; k++) terms.push([yColumn(i, k), k === kept ? -1 : 1]);
      });
      rows.push({ name: `cx${ci}`, terms, lower: 1 - packed });
    } else {
      const present = [...cut.counts].filter(([, n]) => n > 0);
      // A kit holding an item the model cannot pack can never be exceeded: nothing to exclude.
      if (
        present.some(
          ([id, n]) =>
            !pre.itemIndexById.has(id) ||
            n > (pre.items[pre.itemIndexById.get(id) as number]?.candidate.ownedCount ?? 0),
        )
      )
        return;
      const terms = present.flatMap(([id, n]) => atLeast(pre.itemIndexById.get(id) as number, n));
      rows.push({ name: `cs${ci}`, terms, upper: present.length - 1 });
    }
  });

  const gramTerms = pre.items.flatMap((it, i) => countTerms(i, it.candidate.massG / scale.massG));
  if (phase.phase === 'min-grams') for (const [col, v] of gramTerms) objective[col] = v;
  if (phase.phase === 'max-margin')
    rows.push({ name: 'grams', terms: gramTerms, upper: (phase.maxMassG + 0.5) / scale.massG });
  if (phase.phase === 'fixed-kit') {
    pre.items.forEach((it, i) => {
      const n = Math.min(phase.counts.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount);
      for (let k = 1; k <= it.candidate.ownedCount; k++)
        rows.push({ name: `fx${i}_${k}`, terms: [[yColumn(i, k), 1]], lower: k === n ? 1 : 0, upper: k === n ? 1 : 0 });
    });
  }
  return { sense: phase.phase === 'max-margin' ? 'max' : 'min', objective, columns, binaries, upperBounds, rows };
}

/**
 * The most a group can store in a day with every panel owned packed: the big-M of "no controller, no harvest".
 * @example groupBigM(pre, harvest) // Σ_p harvest[p] × owned_p
 */
export function groupBigM(pre: PresolvedProblem, harvest: BoundVector): number {
  let wh = 0;
  pre.items.forEach((it, i) => (wh += (harvest[i] ?? 0) * it.candidate.ownedCount));
  return wh;
}

/** Integers from `from` to `to` inclusive. */
function range(from: number, to: number): number[] {
  const out: number[] = [];
  for (let k = from; k <= to; k++) out.push(k);
  return out;
}

/**
 * Sets the path and group columns of a master solution from its kit: an alternative is switched on exactly when the
 * kit holds it. In the master every row meets such a column on its "≤ presence" side or with a coefficient ≥ 0 on a
 * "≥" row, so this is the best value each can take; it mends the solver's float slips on them (javascript-lp-solver has
 * returned 0.011 for an alternative whose items were all 0 on a 200-item locker) before the answer is checked.
 * @example completeMasterColumns(pre, values) // values' z and w columns now 0 or 1
 */
export function completeMasterColumns(pre: PresolvedProblem, values: Map<string, number>): void {
  const kit = kitFromValues(pre, values);
  const counts = pre.items.map((it) => kit.get(it.candidate.itemId) ?? 0);
  pre.needs.forEach((need, d) =>
    need.alternatives.forEach((alt, a) => values.set(zColumn(d, a), alternativePresent(alt, counts) ? 1 : 0)),
  );
  pre.groups.forEach((g, gi) =>
    g.requiresAnyOf.forEach((alt, a) => values.set(wColumn(gi, a), alternativePresent(alt, counts) ? 1 : 0)),
  );
}

/**
 * A master solution's columns for a kit by item index: the one-hot count columns, then the path and group columns it
 * implies (`completeMasterColumns`).
 * @example masterValues(pre, [1, 0, 2]).get(yColumn(2, 2)) // 1
 */
export function masterValues(pre: PresolvedProblem, counts: readonly number[]): Map<string, number> {
  const values = new Map<string, number>();
  pre.items.forEach((it, i) => {
    for (let k = 1; k <= it.candidate.ownedCount; k++) values.set(yColumn(i, k), counts[i] === k ? 1 : 0);
  });
  completeMasterColumns(pre, values);
  return values;
}

/**
 * Reads the kit (counts by item id, non-zero only) from a model solution.
 * @example kitFromValues(pre, values).get('bank-a') // 2
 */
export function kitFromValues(pre: PresolvedProblem, values: ReadonlyMap<string, number>): Map<string, number> {
  const counts = new Map<string, number>();
  pre.items.forEach((it, i) => {
    for (let k = 1; k <= it.candidate.ownedCount; k++)
      if ((values.get(yColumn(i, k)) ?? 0) > 0.5) counts.set(it.candidate.itemId, k);
  });
  return counts;
}
