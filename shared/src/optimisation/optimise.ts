import { adaptiveBatches, tryInBatches } from './batch-trials.js';
import { dailyBalance } from './daily-balance.js';
import { kitLines, kitMassG } from './kit.js';
import { createKitSearch, type KitSearch, type KitSearchOptions, type SearchStep } from './kit-search.js';
import type {
  KitCandidate,
  JudgeVerdict,
  KitChoice,
  KitCounts,
  KitJudge,
  KitSwap,
  OptimisationProblem,
  OptimiseAnswer,
  SearchStats,
} from './types.js';

/** How many next-best kits `findSwaps` returns by default. */
export const defaultSwapCount = 5;

function choice(counts: KitCounts, search: KitSearch, verdict: JudgeVerdict): KitChoice {
  return { lines: kitLines(counts), massG: kitMassG(counts, search.problem.candidates), verdict };
}

function statsOf(search: KitSearch): SearchStats {
  return {
    rounds: search.stats.rounds,
    judgedKits: search.stats.judgedKits,
    activeItems: search.presolved.items.length,
    candidateItems: search.problem.candidates.length,
  };
}

/** Every owned unit of every candidate. */
function wholeLocker(problem: OptimisationProblem): Map<string, number> {
  return new Map(problem.candidates.filter((c) => c.ownedCount > 0).map((c) => [c.itemId, c.ownedCount]));
}

/**
 * Shaves a feasible kit down: items heaviest first are taken out in adaptive batches (`tryInBatches`), a single item
 * that cannot go whole losing what units it can, so a locker of spares sheds most of them in a few simulations. The
 * items of `keepLast` are tried only after all the others (a repair keeps what a proposal chose as long as it can).
 * The kit returned was judged feasible and keeps no item the judge would let go whole. Past `deadlineMs` it stops
 * where it is.
 * @example greedyShave(search, wholeLocker, Infinity).verdict.feasible // true
 */
export function greedyShave(
  search: KitSearch,
  start: KitCounts,
  deadlineMs: number,
  keepLast: KitCounts = new Map(),
): { counts: Map<string, number>; verdict: JudgeVerdict } {
  const counts = new Map(start);
  let verdict = search.judge(counts);
  const late = (c: KitCandidate): number => ((keepLast.get(c.itemId) ?? 0) > 0 ? 1 : 0);
  const order = [...search.problem.candidates]
    .filter((c) => (counts.get(c.itemId) ?? 0) > 0)
    .sort((a, b) => late(a) - late(b) || b.massG - a.massG || (a.itemId < b.itemId ? -1 : 1));
  /** The kit with every item of the batch taken out, or cut down to `keep` units. */
  const without = (batch: readonly KitCandidate[], keep = 0): Map<string, number> => {
    const trial = new Map(counts);
    for (const c of batch) {
      if (keep > 0) trial.set(c.itemId, keep);
      else trial.delete(c.itemId);
    }
    return trial;
  };
  const tryKit = (trial: Map<string, number>): boolean => {
    const v = search.judge(trial);
    if (!v.feasible) return false;
    counts.clear();
    for (const [k, n] of trial) counts.set(k, n);
    verdict = v;
    return true;
  };
  const outOfTime = (): boolean => search.now() >= deadlineMs;
  tryInBatches(
    order,
    {
      whole: (batch) => tryKit(without(batch)),
      part: (c) => {
        for (let k = 1; k < (counts.get(c.itemId) ?? 0) && !outOfTime(); k++) if (tryKit(without([c], k))) break;
      },
      stop: outOfTime,
    },
    adaptiveBatches,
  );
  return { counts, verdict };
}

function limitFields(problem: OptimisationProblem, massG: number): { gramLimitG?: number; overLimitG?: number } {
  if (problem.gramLimitG === undefined) return {};
  return massG > problem.gramLimitG
    ? { gramLimitG: problem.gramLimitG, overLimitG: massG - problem.gramLimitG }
    : { gramLimitG: problem.gramLimitG };
}

/**
 * The lightest kit the judge accepts (ties: the most worst-day margin in the daily model), as a never-empty answer:
 * `optimal`; `over-limit` (the lightest feasible kit and the grams over the limit — the limit never changes which kit
 * is lightest, so it is checked, not modelled); `best-so-far` (round cap, time budget or solver failure: a judged
 * feasible kit and the model's lower bound); or `nothing-feasible` (which device has no path; which sky-day runs short
 * by how many Wh with the whole locker in the daily model; the judge's finding for the whole locker).
 * @example optimiseKit(problem, judge).status // 'optimal'
 */
export function optimiseKit(
  problem: OptimisationProblem,
  judge: KitJudge,
  options: KitSearchOptions = {},
  search: KitSearch = createKitSearch(problem, judge, options),
): OptimiseAnswer {
  const deadlineMs = options.timeBudgetMs === undefined ? Infinity : search.now() + options.timeBudgetMs;
  const locker = wholeLocker(problem);
  // The judge is monotone: if the whole locker runs dry, every kit does, and a kit accepted proves the locker keeps up.
  // So the locker, the largest simulation of all, is judged only when the search accepts nothing in its first
  // `lockerCheckAfterRejections` rejections or ends without a kit (the 50-item bench locker: 8–13 ms of a 100 ms plan).
  const step = search.next(deadlineMs, {
    afterRejections: lockerCheckAfterRejections,
    allDry: () => !search.judge(locker).feasible,
  });
  const lockerVerdict = step.kind === 'found' ? undefined : search.judge(locker);
  if (lockerVerdict && !lockerVerdict.feasible) {
    const lockerBalance = dailyBalance(search.presolved, locker);
    return {
      status: 'nothing-feasible',
      missingPaths: lockerBalance.missingPaths,
      shortfalls: lockerBalance.shortfalls,
      ...(lockerVerdict.runsDry ? { runsDry: lockerVerdict.runsDry } : {}),
      stats: statsOf(search),
      notes: [
        lockerBalance.missingPaths.length > 0
          ? 'No kit from these items can charge every device that needs it.'
          : 'Even every item owned, packed together, runs dry.',
      ],
    };
  }
  // The shave after a stopped search gets a quarter of the budget more (at most `shaveGraceMs`).
  const shaveDeadlineMs =
    options.timeBudgetMs === undefined ? Infinity : deadlineMs + Math.min(shaveGraceMs, options.timeBudgetMs / 4);
  return answerFromStep(step, search, locker, shaveDeadlineMs);
}

/**
 * Kits the judge may reject, with none accepted, before the whole locker is judged (each costs a simulation and a lift,
 * so a locker that runs dry is found out within a few of them; on the 50-item bench lockers the first kit accepted comes
 * within 3–10 simulations, or after hundreds of rejections).
 */
export const lockerCheckAfterRejections = 8;

/** The most the shave after a stopped search may run past the time budget, ms (a quarter of the budget below that). */
export const shaveGraceMs = 5_000;

function answerFromStep(step: SearchStep, search: KitSearch, locker: KitCounts, deadlineMs: number): OptimiseAnswer {
  const problem = search.problem;
  if (step.kind === 'found') {
    const kit = choice(step.counts, search, step.verdict);
    const notes = step.proven
      ? []
      : ['A model solve stopped on its timeout: the kit is feasible but may not be the lightest.'];
    if (!step.proven)
      return {
        status: 'best-so-far',
        kit,
        lowerBoundG: 0,
        ...limitFields(problem, kit.massG),
        stats: statsOf(search),
        notes,
      };
    if (problem.gramLimitG !== undefined && kit.massG > problem.gramLimitG) {
      return {
        status: 'over-limit',
        kit,
        gramLimitG: problem.gramLimitG,
        overLimitG: kit.massG - problem.gramLimitG,
        stats: statsOf(search),
        notes,
      };
    }
    return {
      status: 'optimal',
      kit,
      ...(problem.gramLimitG !== undefined ? { gramLimitG: problem.gramLimitG } : {}),
      stats: statsOf(search),
      notes,
    };
  }
  // The whole locker was judged feasible, so a kit exists: shave the lightest kit accepted so far down greedily, then
  // repair the model's last proposals from it.
  const fallback = repairNearProposals(
    search,
    greedyShave(search, search.lightestAccepted ?? locker, deadlineMs),
    deadlineMs,
  );
  const kit = choice(fallback.counts, search, fallback.verdict);
  const notes =
    step.kind === 'exhausted'
      ? [
          'The daily model rejects every kit the judge might accept: its coefficients are stricter than the simulation (a bug in building them). This kit is the lightest accepted kit shaved by hand-rules.',
        ]
      : [
          `The search stopped (${step.reason}${step.detail ? `: ${step.detail}` : ''}); this is the lightest kit found by shaving the lightest kit it had accepted and by repairing the model's last proposals.`,
        ];
  return {
    status: 'best-so-far',
    kit,
    lowerBoundG: step.kind === 'stopped' ? Math.min(step.lowerBoundG, kit.massG) : 0,
    ...limitFields(problem, kit.massG),
    stats: statsOf(search),
    notes,
  };
}

/**
 * Repairs the master's last proposals (the lightest kits a stopped search still had in the running): each, newest
 * first, joined to the best kit so far — feasible, as it holds that kit — and shaved with the proposal's own items tried
 * last, so what is left is the proposal plus what it lacked. Keeps the lightest. On the 200-item bench locker, whose
 * search stops at 1,348 g with nothing accepted, the shaved locker weighs 2,964 g and the repairs 1,531 g.
 * Source: proximity search around the relaxation's solution is the usual MILP primal heuristic (M. Fischetti and
 * A. Lodi, Local branching, Mathematical Programming 98, 2003; E. Danna, E. Rothberg and C. Le Pape, Exploring
 * relaxation induced neighborhoods to improve MIP solutions, Mathematical Programming 102, 2005).
 * @example repairNearProposals(search, greedyShave(search, locker, Infinity), Infinity).counts // no heavier
 */
export function repairNearProposals(
  search: KitSearch,
  start: { counts: Map<string, number>; verdict: JudgeVerdict },
  deadlineMs: number,
): { counts: Map<string, number>; verdict: JudgeVerdict } {
  const grams = (counts: KitCounts): number => kitMassG(counts, search.problem.candidates);
  let best = start;
  for (const proposal of [...search.lastProposals].reverse()) {
    if (search.now() >= deadlineMs) break;
    const joined = new Map(best.counts);
    for (const [id, n] of proposal) if (n > (joined.get(id) ?? 0)) joined.set(id, n);
    const repaired = greedyShave(search, joined, deadlineMs, proposal);
    if (repaired.verdict.feasible && grams(repaired.counts) < grams(best.counts)) best = repaired;
  }
  return best;
}

function buysOf(search: KitSearch, optimum: KitChoice, swap: KitChoice): string[] {
  const kinds = new Map(search.problem.candidates.map((c) => [c.itemId, c.kind]));
  const has = (k: KitChoice, kind: string): boolean => k.lines.some((l) => kinds.get(l.itemId) === kind);
  const units = (k: KitChoice): number => k.lines.reduce((n, l) => n + l.count, 0);
  const buys: string[] = [];
  if (
    swap.verdict.margin !== undefined &&
    optimum.verdict.margin !== undefined &&
    swap.verdict.margin > optimum.verdict.margin
  )
    buys.push('more-margin');
  if (units(swap) < units(optimum)) buys.push('fewer-items');
  if (has(optimum, 'converter') && !has(swap, 'converter')) buys.push('no-converter');
  if (has(optimum, 'lead') && !has(swap, 'lead')) buys.push('no-lead');
  if (has(optimum, 'panel') && !has(swap, 'panel')) buys.push('no-panel');
  return buys;
}

/**
 * The next best distinct kits after `optimum`: each round cuts off the previous kit and every kit holding it (so "the
 * optimum plus a spare lead" is never a swap), then finds the lightest kit the judge accepts. Each swap carries its
 * extra grams, what was added and removed, and what it buys. Pass the search used for the optimum to reuse its cuts.
 * @example findSwaps(problem, judge, answer.kit).length // up to 5
 */
export function findSwaps(
  problem: OptimisationProblem,
  judge: KitJudge,
  optimum: KitChoice,
  options: KitSearchOptions & { count?: number } = {},
  search: KitSearch = createKitSearch(problem, judge, options),
): KitSwap[] {
  const deadlineMs = options.timeBudgetMs === undefined ? Infinity : search.now() + options.timeBudgetMs;
  const count = options.count ?? defaultSwapCount;
  const swaps: KitSwap[] = [];
  const base = new Map(optimum.lines.map((l) => [l.itemId, l.count]));
  search.excludeSupersetsOf(base);
  while (swaps.length < count) {
    const step = search.next(deadlineMs);
    if (step.kind !== 'found') break;
    const kit = choice(step.counts, search, step.verdict);
    const ids = new Set([...base.keys(), ...step.counts.keys()]);
    const added = [];
    const removed = [];
    for (const id of [...ids].sort()) {
      const d = (step.counts.get(id) ?? 0) - (base.get(id) ?? 0);
      if (d > 0) added.push({ itemId: id, count: d });
      if (d < 0) removed.push({ itemId: id, count: -d });
    }
    swaps.push({ kit, extraG: kit.massG - optimum.massG, added, removed, buys: buysOf(search, optimum, kit) });
    search.excludeSupersetsOf(step.counts);
  }
  return swaps;
}
