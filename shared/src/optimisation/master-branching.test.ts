/**
 * Checks of the master problem's own branch and bound (`master-branching.ts`) against a reference: javascript-lp-solver's
 * branch and bound on the same master rows, as `buildDailyModel` writes them (path, dominance, energy-cut, kit-cut and
 * gram-cap rows, minimum grams). Both must find the same grams, or both no kit, on random synthetic worlds with cuts
 * built from real material (the forward pass's energy cuts, random kits as rejected, excluded or passing kits), and
 * the kit ours returns must meet every row of the MILP; where the locker holds at most 5,000 kits, trying every kit is
 * a third answer that needs neither search. Then: one search kept across solves whose cuts only grow
 * answers as a fresh search does; its limits give up when they should; and the kit search finds the same optimum
 * when the MILP answers every round (node limit 1) as when ours does.
 */
import { describe, expect, it } from 'vitest';
import {
  buildDailyModel,
  completeMasterColumns,
  modelScale,
  type KitCut,
  type ModelScale,
  masterValues,
} from './daily-model.js';
import { dailyBalance } from './daily-balance.js';
import { evaluateDailyModel, type EnergyCut } from './energy-cuts.js';
import { solveWithJsLp } from './js-lp-backend.js';
import { createKitSearch } from './kit-search.js';
import { checkSolution, type LinearModel } from './linear-model.js';
import { createMasterSearch, solveMasterByBranching, type MasterAnswer, type MasterCuts } from './master-branching.js';
import { presolve, type PresolvedProblem } from './presolve.js';
import { randomSyntheticWorld, seededRandom, syntheticProblem } from './synthetic-problem.js';

/** A small random world and its presolved problem (4–10 item types, at most 3 of each). */
function smallWorld(seed: number): { pre: PresolvedProblem; random: () => number } {
  const random = seededRandom(seed);
  const world = randomSyntheticWorld(random, {
    itemTypes: 4 + Math.floor(random() * 7),
    maxOwned: 1 + Math.floor(random() * 3),
    dayCount: 2 + Math.floor(random() * 6),
    skyCount: 1 + Math.floor(random() * 4),
  });
  return { pre: presolve(syntheticProblem(world)), random };
}

/** A random kit of the locker: each item packed with probability `share`, at a random count up to what is owned. */
function randomKit(pre: PresolvedProblem, random: () => number, share: number): Map<string, number> {
  const kit = new Map<string, number>();
  for (const it of pre.items)
    if (random() < share) kit.set(it.candidate.itemId, 1 + Math.floor(random() * it.candidate.ownedCount));
  return kit;
}

/** A kit (counts by item id) from counts by item index. */
function kitOf(pre: PresolvedProblem, counts: readonly number[]): Map<string, number> {
  const kit = new Map<string, number>();
  pre.items.forEach((it, i) => {
    if ((counts[i] ?? 0) > 0) kit.set(it.candidate.itemId, counts[i] ?? 0);
  });
  return kit;
}

/** The forward pass's energy cuts of a kit, those with a positive right-hand side (the kit search keeps only those). */
function energyCutsOf(pre: PresolvedProblem, kit: Map<string, number>): EnergyCut[] {
  return evaluateDailyModel(pre, kit).cuts.filter((cut) => cut.lowerWh > 0);
}

/** The master MILP of an instance, as the kit search hands it to javascript-lp-solver. */
function masterModel(pre: PresolvedProblem, cuts: MasterCuts, scale: ModelScale): LinearModel {
  return buildDailyModel(pre, cuts.cuts, { phase: 'min-grams' }, scale, {
    energyCuts: cuts.energyCuts,
    ...(cuts.maxMassG !== undefined ? { maxMassG: cuts.maxMassG } : {}),
  });
}

/** The MILP's answer in grams: a number, 'infeasible', or 'failed' (the solver's answer broke a row). */
function milpGrams(pre: PresolvedProblem, model: LinearModel, scale: ModelScale): number | 'infeasible' | 'failed' {
  const answer = solveWithJsLp(model, {
    timeoutMs: 60_000,
    now: () => 0,
    complete: (values) => completeMasterColumns(pre, values),
  });
  if (answer.status === 'optimal') return Math.round(answer.objective * scale.massG);
  return answer.status;
}

/** Grams of a kit by item index. */
function gramsOf(pre: PresolvedProblem, counts: readonly number[]): number {
  return pre.items.reduce((sum, it, i) => sum + it.candidate.massG * (counts[i] ?? 0), 0);
}

/** The answer in grams, or its status when there is no kit. */
const gramsOrStatus = (answer: MasterAnswer): number | string =>
  answer.status === 'optimal' ? answer.massG : answer.status;

/** The lightest kit meeting every row of the model by trying every kit (Infinity when none does). */
function bruteForceGrams(pre: PresolvedProblem, model: LinearModel): number {
  let best = Infinity;
  const counts = pre.items.map(() => 0);
  const visit = (i: number): void => {
    if (i === pre.items.length) {
      const g = gramsOf(pre, counts);
      if (g < best && checkSolution(model, masterValues(pre, counts)) === null) best = g;
      return;
    }
    for (let k = 0; k <= (pre.items[i]?.candidate.ownedCount ?? 0); k++) {
      counts[i] = k;
      visit(i + 1);
    }
    counts[i] = 0;
  };
  visit(0);
  return best;
}

/** Kits in the locker (Π (owned + 1)). */
const kitSpace = (pre: PresolvedProblem): number => pre.items.reduce((n, it) => n * (it.candidate.ownedCount + 1), 1);

/** Random cuts from real material: energy cuts of short kits, and random kits as the three kinds of kit cut. */
function randomCuts(pre: PresolvedProblem, random: () => number): { cuts: KitCut[]; energyCuts: EnergyCut[] } {
  const energyCuts: EnergyCut[] = [];
  const energyKits = Math.floor(random() * 4);
  for (let k = 0; k < energyKits; k++) energyCuts.push(...energyCutsOf(pre, randomKit(pre, random, 0.4)));
  const cuts: KitCut[] = [];
  const kitCuts = Math.floor(random() * 5);
  for (let k = 0; k < kitCuts; k++) {
    const r = random();
    const kind: KitCut['kind'] = r < 0.6 ? 'no-larger-than' : r < 0.8 ? 'no-superset-of' : 'not-exactly';
    cuts.push({ kind, counts: randomKit(pre, random, kind === 'no-larger-than' ? 0.35 : 0.5) });
  }
  return { cuts, energyCuts };
}

/** Outcomes of a cross-check run. */
interface CrossCheckTally {
  optimal: number;
  /** No kit, the paths allowing one (the cuts or the cap exclude every kit). */
  infeasible: number;
  /** No kit because a device has no path at all (decided before any search). */
  noPath: number;
  capped: number;
  /** The MILP's answer broke a row: no reference. */
  skipped: number;
  bruteForced: number;
  maxNodes: number;
}

/**
 * Compares ours with the MILP on the worlds of these seeds, and with every kit tried where the locker is small; the
 * cuts are `randomCuts` plus, now and then, the optimum under them as a kit cut and a gram cap about it.
 */
function crossCheck(
  seeds: readonly number[],
  worldOf: (seed: number) => { pre: PresolvedProblem; random: () => number },
  maxRejectRounds = 0,
): CrossCheckTally {
  const tally = { optimal: 0, infeasible: 0, noPath: 0, capped: 0, skipped: 0, bruteForced: 0, maxNodes: 0 };
  for (const seed of seeds) {
    const { pre, random } = worldOf(seed);
    const scale = modelScale(pre);
    const base = randomCuts(pre, random);
    // Some rounds of the kit search first: each optimum's energy cuts, or (when it has none) its down-set cut off.
    const rejectRounds = Math.floor(random() * (maxRejectRounds + 1));
    for (let round = 0; round < rejectRounds; round++) {
      const answer = solveMasterByBranching({ pre, ...base });
      if (answer.status !== 'optimal') break;
      const kit = kitOf(pre, answer.counts);
      const found = energyCutsOf(pre, kit);
      if (found.length > 0) base.energyCuts.push(...found);
      else base.cuts.push({ kind: 'no-larger-than', counts: kit });
    }
    // The optimum itself as a kit cut now and then: the cuts then bite where the search ends.
    const first = solveMasterByBranching({ pre, ...base });
    const cuts: KitCut[] = [...base.cuts];
    if (first.status === 'optimal' && random() < 0.5) {
      const r = random();
      const kind: KitCut['kind'] = r < 0.4 ? 'not-exactly' : r < 0.7 ? 'no-superset-of' : 'no-larger-than';
      cuts.push({ kind, counts: kitOf(pre, first.counts) });
    }
    // A gram cap about the optimum: sometimes below it (no kit), sometimes above.
    let maxMassG: number | undefined;
    if (first.status === 'optimal' && random() < 0.35) {
      maxMassG = Math.round(first.massG * (0.9 + random() * 0.3));
      tally.capped++;
    }
    const instance: MasterCuts = { cuts, energyCuts: base.energyCuts, ...(maxMassG !== undefined ? { maxMassG } : {}) };
    const model = masterModel(pre, instance, scale);
    const theirs = milpGrams(pre, model, scale);
    const ours = solveMasterByBranching({ pre, ...instance });
    expect(ours.status, `seed ${seed}`).not.toBe('gave-up');
    tally.maxNodes = Math.max(tally.maxNodes, ours.nodes);
    // Where the locker is small, every kit tried is a third answer (it needs neither search).
    if (kitSpace(pre) <= 5000) {
      const all = bruteForceGrams(pre, model);
      expect(gramsOrStatus(ours), `seed ${seed}`).toBe(all === Infinity ? 'infeasible' : all);
      tally.bruteForced++;
    }
    if (theirs === 'failed') {
      tally.skipped++;
      continue;
    }
    if (theirs === 'infeasible') {
      expect(ours.status, `seed ${seed}`).toBe('infeasible');
      if (pre.missingNeeds.length === 0) tally.infeasible++;
      else tally.noPath++;
      continue;
    }
    expect(ours.status, `seed ${seed}`).toBe('optimal');
    if (ours.status !== 'optimal') continue;
    expect(ours.massG, `seed ${seed}`).toBe(theirs);
    // The kit itself meets every row of the MILP, and its grams are what the answer says.
    expect(checkSolution(model, masterValues(pre, ours.counts)), `seed ${seed}`).toBeNull();
    expect(gramsOf(pre, ours.counts)).toBe(ours.massG);
    tally.optimal++;
  }
  return tally;
}

const seedsFrom = (first: number, count: number): number[] => Array.from({ length: count }, (_, k) => first + k);

/** Small worlds in the MILP cross-check (most also tried kit by kit). */
const crossCheckCount = 150;
/** Larger worlds in the MILP cross-check (12–20 item types, two devices): deeper trees. */
const largerCount = 60;

describe('the master branch and bound and the master MILP', () => {
  it(`find the same grams on ${crossCheckCount} small random worlds with random cuts`, () => {
    const tally = crossCheck(seedsFrom(20_001, crossCheckCount), smallWorld, 4);
    // Both outcomes must occur, or the check says little; the MILP must answer nearly every instance.
    expect(tally.optimal).toBeGreaterThan(crossCheckCount / 3);
    expect(tally.infeasible).toBeGreaterThan(crossCheckCount / 10);
    expect(tally.capped).toBeGreaterThan(crossCheckCount / 10);
    expect(tally.skipped).toBeLessThanOrEqual(crossCheckCount / 50);
    expect(tally.bruteForced).toBeGreaterThan(crossCheckCount / 2);
    expect(tally.optimal + tally.infeasible + tally.noPath + tally.skipped).toBe(crossCheckCount);
  });

  it(`find the same grams on ${largerCount} larger random worlds with random cuts`, () => {
    const tally = crossCheck(
      seedsFrom(25_001, largerCount),
      (seed) => {
        const random = seededRandom(seed);
        const world = randomSyntheticWorld(random, {
          itemTypes: 12 + Math.floor(random() * 9),
          maxOwned: 3,
          dayCount: 3 + Math.floor(random() * 5),
          skyCount: 2 + Math.floor(random() * 3),
          deviceCount: 2,
        });
        return { pre: presolve(syntheticProblem(world)), random };
      },
      12,
    );
    expect(tally.optimal).toBeGreaterThan(largerCount / 3);
    expect(tally.infeasible).toBeGreaterThan(0);
    expect(tally.skipped).toBeLessThanOrEqual(largerCount / 10);
    expect(tally.optimal + tally.infeasible + tally.noPath + tally.skipped).toBe(largerCount);
  });
});

/** Worlds in the persistence check. */
const persistenceCount = 30;

describe('one master search kept across solves', () => {
  it(`answers as a fresh search at every step on ${persistenceCount} worlds, a gram cap or a peek losing no node`, () => {
    let steps = 0;
    let capChecks = 0;
    let peeks = 0;
    for (let seed = 1; seed <= persistenceCount; seed++) {
      const { pre, random } = smallWorld(30_000 + seed);
      const search = createMasterSearch(pre);
      const cuts: KitCut[] = [];
      const energyCuts: EnergyCut[] = [];
      const stepCount = 5 + Math.floor(random() * 6);
      for (let step = 0; step < stepCount; step++) {
        const instance: MasterCuts = { cuts: [...cuts], energyCuts: [...energyCuts] };
        const kept = search.next(instance);
        const fresh = solveMasterByBranching({ pre, ...instance });
        expect(gramsOrStatus(kept), `seed ${seed} step ${step}`).toBe(gramsOrStatus(fresh));
        steps++;
        if (kept.status !== 'optimal') break;
        if (random() < 0.5) {
          // A peek with a passing cut (as a tie-break asks) answers as a fresh search and leaves the kept tree as it was:
          // the next steps' answers are checked against fresh searches too.
          const passing: MasterCuts = {
            cuts: [...cuts, { kind: 'not-exactly', counts: kitOf(pre, kept.counts) }],
            energyCuts: [...energyCuts],
          };
          expect(gramsOrStatus(search.peek(passing)), `seed ${seed} step ${step}`).toBe(
            gramsOrStatus(solveMasterByBranching({ pre, ...passing })),
          );
          peeks++;
        }
        if (random() < 0.3) {
          // Below the optimum no kit; then, without the cap, the same optimum again (the nodes above the cap kept).
          expect(search.next({ ...instance, maxMassG: kept.massG - 1 }).status, `seed ${seed} step ${step}`).toBe(
            'infeasible',
          );
          const again = search.next(instance);
          expect(gramsOrStatus(again), `seed ${seed} step ${step}`).toBe(kept.massG);
          capChecks++;
        }
        // The next cuts, as the kit search makes them: the kit's energy cuts, or the kit rejected, excluded or passed.
        const kit = kitOf(pre, kept.counts);
        const found = energyCutsOf(pre, kit);
        const r = random();
        if (found.length > 0 && r < 0.4) energyCuts.push(...found);
        else if (r < 0.7) cuts.push({ kind: 'no-larger-than', counts: kit });
        else if (r < 0.85) cuts.push({ kind: 'not-exactly', counts: kit });
        else cuts.push({ kind: 'no-superset-of', counts: kit });
        // Now and then energy cuts of an unrelated kit too.
        if (random() < 0.2) energyCuts.push(...energyCutsOf(pre, randomKit(pre, random, 0.5)));
      }
    }
    expect(steps).toBeGreaterThan(persistenceCount * 4);
    expect(capChecks).toBeGreaterThan(5);
    expect(peeks).toBeGreaterThan(20);
  }, 30_000);
});

/**
 * A world whose optimum takes more than `minNodes` nodes, with the cuts that make it so: the lightest kits one by one
 * excluded exactly (each "not exactly" cut splits the node that held the kit), found by a seeded scan. On the way, the
 * kits must come in order of grams: each solve's cuts only add to the last's.
 */
function worldNeeding(minNodes: number): { pre: PresolvedProblem; cuts: MasterCuts; answer: MasterAnswer } {
  for (let seed = 1; seed <= 50; seed++) {
    const random = seededRandom(40_000 + seed);
    const world = randomSyntheticWorld(random, { itemTypes: 8, maxOwned: 3, dayCount: 4, skyCount: 2 });
    const pre = presolve(syntheticProblem(world));
    const search = createMasterSearch(pre);
    const cuts: KitCut[] = [];
    let lastG = 0;
    for (let round = 0; round < 600; round++) {
      const instance = { cuts: [...cuts], energyCuts: [] };
      if (round % 25 === 0) {
        const answer = solveMasterByBranching({ pre, ...instance });
        if (answer.nodes > minNodes && answer.status === 'optimal') return { pre, cuts: instance, answer };
      }
      const kept = search.next(instance);
      if (kept.status !== 'optimal') break;
      expect(kept.massG).toBeGreaterThanOrEqual(lastG);
      lastG = kept.massG;
      cuts.push({ kind: 'not-exactly', counts: kitOf(pre, kept.counts) });
    }
  }
  throw new Error(`no world needs more than ${minNodes} nodes`);
}

describe('the limits of a master solve', () => {
  it('give up one node short of the optimum and find it with exactly its nodes', () => {
    const { pre, cuts, answer } = worldNeeding(1);
    expect(solveMasterByBranching({ pre, ...cuts }, { nodeLimit: 1 }).status).toBe('gave-up');
    expect(solveMasterByBranching({ pre, ...cuts }, { nodeLimit: answer.nodes - 1 }).status).toBe('gave-up');
    const exact = solveMasterByBranching({ pre, ...cuts }, { nodeLimit: answer.nodes });
    expect(gramsOrStatus(exact)).toBe(gramsOrStatus(answer));
  });

  it('let the open nodes with the highest bounds go at their limit, and bound what they held', () => {
    const { pre, cuts, answer } = worldNeeding(256);
    if (answer.status !== 'optimal') throw new Error('worldNeeding answers an optimum');
    const outcomes = new Set<string>();
    for (const openLimit of [1, 2, 3, 4, 8, 16, 32, 64]) {
      const limited = solveMasterByBranching({ pre, ...cuts }, { openLimit });
      outcomes.add(
        limited.status === 'optimal' ? (limited.lowerBoundG < limited.massG ? 'bounded' : 'proven') : limited.status,
      );
      if (limited.status !== 'optimal') {
        // Nothing left to search: never "infeasible", as the nodes let go may hold kits.
        expect(limited.status).toBe('too-large');
        continue;
      }
      // The kit is one the cuts allow, no lighter than the optimum; the bound no heavier.
      expect(limited.massG).toBeGreaterThanOrEqual(answer.massG);
      expect(limited.lowerBoundG).toBeLessThanOrEqual(answer.massG);
      if (limited.lowerBoundG === limited.massG) expect(limited.massG).toBe(answer.massG);
    }
    expect(outcomes).toEqual(new Set(['too-large', 'bounded', 'proven']));
    // With room for the whole tree the answer is the unlimited one, proven.
    const roomy = solveMasterByBranching({ pre, ...cuts }, { openLimit: 1_000_000 });
    expect(gramsOrStatus(roomy)).toBe(gramsOrStatus(answer));
    expect(roomy.status === 'optimal' && roomy.lowerBoundG).toBe(answer.massG);
  });

  it('give up at the 256th node when the deadline has passed, and a kept search goes on from there', () => {
    const { pre, cuts, answer } = worldNeeding(256);
    const late = { deadlineMs: 0, now: () => 1 };
    const fresh = solveMasterByBranching({ pre, ...cuts }, late);
    expect(fresh).toEqual({ status: 'gave-up', nodes: 256 });
    // A search that gave up keeps its open nodes: the next solve without a deadline ends where a fresh one does.
    const search = createMasterSearch(pre);
    expect(search.next(cuts, late).status).toBe('gave-up');
    expect(gramsOrStatus(search.next(cuts))).toBe(gramsOrStatus(answer));
    // A past deadline is only read every 256 nodes: a solve of fewer nodes still ends.
    const { pre: small, cuts: smallCuts, answer: smallAnswer } = worldNeeding(1);
    expect(smallAnswer.nodes).toBeLessThan(256);
    expect(gramsOrStatus(solveMasterByBranching({ pre: small, ...smallCuts }, late))).toBe(gramsOrStatus(smallAnswer));
  });
});

/** Worlds in the whole-search check. */
const searchCount = 40;

describe('the kit search with the MILP master every round and with the branch and bound', () => {
  it(`finds the same lightest kit on ${searchCount} random worlds (and with its tie-break)`, () => {
    let found = 0;
    let fallbacks = 0;
    for (let seed = 1; seed <= searchCount; seed++) {
      const random = seededRandom(50_000 + seed);
      const world = randomSyntheticWorld(random, {
        itemTypes: 4 + Math.floor(random() * 6),
        maxOwned: 3,
        dayCount: 3 + Math.floor(random() * 5),
        skyCount: 3,
      });
      const problem = syntheticProblem(world);
      const pre = presolve(problem);
      const judge = (kit: ReadonlyMap<string, number>): { feasible: boolean } => ({
        feasible: dailyBalance(pre, kit).feasible,
      });
      const options = { tieBreakByMargin: false, kitViews: false };
      const viaMilp = createKitSearch(problem, judge, { ...options, masterNodeLimit: 1 });
      const viaBranching = createKitSearch(problem, judge, options);
      // The tie-break's solves (a "not exactly" cut and a gram cap, on a tree of their own) change no grams.
      const withTieBreak = createKitSearch(problem, judge, { kitViews: false });
      const a = viaMilp.next(Infinity);
      const b = viaBranching.next(Infinity);
      const c = withTieBreak.next(Infinity);
      expect(b.kind, `seed ${seed}`).toBe(a.kind);
      expect(c.kind, `seed ${seed}`).toBe(a.kind);
      if (a.kind === 'found' && b.kind === 'found' && c.kind === 'found') {
        expect(b.massG, `seed ${seed}`).toBe(a.massG);
        expect(c.massG, `seed ${seed}`).toBe(a.massG);
        found++;
      }
      fallbacks += viaMilp.stats.masterFallbacks ?? 0;
      expect(viaBranching.stats.masterFallbacks, `seed ${seed}`).toBe(0);
    }
    expect(found).toBeGreaterThan(searchCount / 2);
    // The node limit of 1 did send rounds to the MILP.
    expect(fallbacks).toBeGreaterThan(searchCount);
  }, 30_000);
});
