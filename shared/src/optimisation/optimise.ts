import { adaptiveBatches, tryInBatches } from './batch-trials.js';
import { dailyBalance } from './daily-balance.js';
import { coreBudgetShare, coreLocker, coreSearchMaxMs, coreSearchMinItems, restrictedTo } from './core-locker.js';
import { kitCounts, kitLines, kitMassG, kitNoLarger, withOneSwapped } from './kit.js';
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
export function wholeLocker(problem: OptimisationProblem): Map<string, number> {
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
): JudgedKit {
  let verdict = search.judge(start);
  // A start that works only with a converter left home starts as the kit without it.
  const counts = new Map(verdict.works ?? start);
  if (verdict.works) verdict = search.judge(counts);
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
    // A kit that works only with a converter left home shaves down to the kit without it.
    for (const [k, n] of v.works ?? trial) counts.set(k, n);
    verdict = v.works ? search.judge(v.works) : v;
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
  const startMs = search.now();
  const coreNote = searchCoreFirst(search, judge, options);
  const answer = optimiseLocker(problem, options, search, startMs);
  return coreNote && answer.status === 'best-so-far' ? { ...answer, notes: [...answer.notes, coreNote] } : answer;
}

/**
 * On a large locker (`coreSearchMinItems` active items or more), solves its core first (`coreLocker`) within a share
 * of the time and has `search` judge the core's kit, so the search over the whole locker starts with it as its
 * lightest accepted kit: a stopped search then repairs from it, and a search that accepts nothing never grows a
 * proposal to the whole locker. On the 200-item bench lockers over 30 nights (seeds 200–206) with a 1 s budget the
 * answers went from 4,437–4,531 / 783–837 / 1,870–3,968 / 1,178 / 1,623–4,349 / 2,467–64,214 / 4,479–68,479 g (the
 * whole locker, after 3.3 s) to 1,527–2,200 / 717–769 / 994 / 725–875 / 1,151 / 1,666–1,712 / 933 g over 2–4 runs; with
 * 5 s from 1,526 / 733 / 1,870 / 689 / 1,118 / 1,640 / 924 g to 1,531 / 730 / 994 / 689 / 1,116 / 1,632 / 924 g.
 * Returns a note for a stopped answer, or undefined when no core was searched.
 */
function searchCoreFirst(search: KitSearch, judge: KitJudge, options: KitSearchOptions): string | undefined {
  const pre = search.presolved;
  if (pre.items.length < (options.coreMinItems ?? coreSearchMinItems) || pre.missingNeeds.length > 0) return undefined;
  const core = coreLocker(pre);
  if (core.size >= pre.items.length) return undefined;
  const coreProblem = restrictedTo(pre, core);
  const budgetMs =
    options.timeBudgetMs === undefined
      ? coreSearchMaxMs
      : Math.min(coreSearchMaxMs, options.timeBudgetMs * coreBudgetShare);
  const coreOptions: KitSearchOptions = { ...options, timeBudgetMs: budgetMs };
  const coreSearch = createKitSearch(coreProblem, judge, coreOptions);
  const answer = optimiseLocker(coreProblem, coreOptions, coreSearch, search.now());
  // The plan's figures count the core search's work too.
  search.stats.rounds += coreSearch.stats.rounds;
  search.stats.judgedKits += coreSearch.stats.judgedKits;
  if (answer.status === 'nothing-feasible') return undefined;
  const verdict = search.judge(kitCounts(answer.kit.lines));
  if (!verdict.feasible) return undefined;
  return `A quicker first search over ${core.size} of the ${pre.items.length} usable items (the stores and panels with the most Wh per gram, the lightest ones, and the lightest charging paths) found a ${answer.kit.massG.toLocaleString('en-GB')} g kit${answer.status === 'best-so-far' ? ' before it too stopped' : ''}.`;
}

/** The search over the whole locker of `search` (see `optimiseKit`), its time budget counted from `startMs`. */
function optimiseLocker(
  problem: OptimisationProblem,
  options: KitSearchOptions,
  search: KitSearch,
  startMs: number,
): OptimiseAnswer {
  const deadlineMs = options.timeBudgetMs === undefined ? Infinity : startMs + options.timeBudgetMs;
  const locker = wholeLocker(problem);
  // The judge is monotone: if the whole locker runs dry, every kit does, and a kit accepted proves the locker keeps up.
  // So the locker, the largest simulation of all, is not judged up front (the 50-item bench locker: 8–13 ms of a 100 ms
  // plan). When the search accepts nothing in its first `lockerCheckAfterRejections` rejections or
  // `lockerCheckAfterMs`, its newest proposal is grown to a kit the judge accepts (small kits first, the locker last):
  // a kit found proves the locker keeps up and is the search's first accepted kit; none, and the locker runs dry.
  const step = search.next(deadlineMs, {
    afterRejections: lockerCheckAfterRejections,
    afterMs: stuckGrowthAfterMs(options.timeBudgetMs),
    allDry: () => !growToFeasible(search, search.lastProposals.at(-1) ?? new Map(), locker, Infinity),
  });
  // The shave after a stopped search gets a quarter of the budget more (at most `shaveGraceMs`).
  const shaveDeadlineMs =
    options.timeBudgetMs === undefined ? Infinity : deadlineMs + Math.min(shaveGraceMs, options.timeBudgetMs / 4);
  if (step.kind === 'found') return foundAnswer(lighterAccepted(step, search), search);
  // A stopped search repairs its last proposals first (from the lightest kit it accepted, shaved, if any): a kit the
  // judge accepts there proves the locker keeps up, so the locker is judged only when none does (the 200-item bench
  // locker takes 0.6–0.9 s to simulate) or when the search ran out of kits.
  const accepted = search.lightestAccepted;
  const repaired =
    step.kind === 'stopped'
      ? repairNearProposals(search, accepted && greedyShave(search, accepted, shaveDeadlineMs), locker, shaveDeadlineMs)
      : undefined;
  const lockerVerdict = repaired ? undefined : search.judge(locker);
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
  // The whole locker keeps up, so a kit exists: when no repair gave one, the locker itself, shaved.
  return stoppedAnswer(step, search, repaired ?? greedyShave(search, locker, shaveDeadlineMs));
}

/**
 * Kits the judge may reject, with none accepted, before the whole locker is judged (each costs a simulation and a lift,
 * so a locker that runs dry is found out within a few of them; on the 50-item bench lockers the first kit accepted comes
 * within 3–10 simulations, or after hundreds of rejections).
 */
export const lockerCheckAfterRejections = 8;

/**
 * Search time with nothing accepted after which the newest proposal is grown all the same, ms: on the 200-item bench
 * locker the search goes many rounds on the daily model and its views alone before the judge sees a kit, so a locker
 * that runs dry would be found out only when the search stops, and a feasible one would have no kit to fall back on.
 */
export const lockerCheckAfterMs = 1_000;

/** The share of a time budget after which a search with nothing accepted grows its newest proposal all the same. */
export const lockerCheckBudgetShare = 0.25;

/**
 * Search time after which a search with nothing accepted grows its newest proposal: `lockerCheckAfterMs`, or a quarter
 * of a shorter time budget. Without the quarter, a 1 s plan on the 200-item bench locker reached its deadline with
 * nothing accepted, simulated the whole locker and answered it (67,658 g in 2.8 s); with it, 3,300–5,100 g in 1.2 s.
 * @example stuckGrowthAfterMs(1_000) // 250
 */
export function stuckGrowthAfterMs(timeBudgetMs: number | undefined): number {
  return Math.min(lockerCheckAfterMs, (timeBudgetMs ?? Infinity) * lockerCheckBudgetShare);
}

/** The most the shave after a stopped search may run past the time budget, ms (a quarter of the budget below that). */
export const shaveGraceMs = 5_000;

/**
 * A found kit that is not proven the lightest, or the lightest kit the search accepted before when that one is lighter:
 * once the master has let nodes go it may no longer see that kit (a core search's kit, judged up front; on a synthetic
 * 23-type world the master answered 638 g after the search had accepted a 521 g kit, `optimise.stopped.test.ts`).
 */
function lighterAccepted(step: Extract<SearchStep, { kind: 'found' }>, search: KitSearch): typeof step {
  const accepted = search.lightestAccepted;
  if (step.proven || !accepted) return step;
  const acceptedG = kitMassG(accepted, search.problem.candidates);
  if (acceptedG >= step.massG) return step;
  return { ...step, counts: new Map(accepted), massG: acceptedG, verdict: search.judge(accepted) };
}

function foundAnswer(step: Extract<SearchStep, { kind: 'found' }>, search: KitSearch): OptimiseAnswer {
  const problem = search.problem;
  const kit = choice(step.counts, search, step.verdict);
  const notes = step.proven || !step.note ? [] : [step.note];
  if (!step.proven)
    return {
      status: 'best-so-far',
      kit,
      lowerBoundG: Math.min(step.lowerBoundG, kit.massG),
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

/** The answer of a search that stopped or ran out of kits, with the kit found instead (`fallback`, judged feasible). */
function stoppedAnswer(
  step: Exclude<SearchStep, { kind: 'found' }>,
  search: KitSearch,
  fallback: JudgedKit,
): OptimiseAnswer {
  const problem = search.problem;
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
 * first, joined to the best kit so far — feasible, as it holds that kit — or, before there is one, grown to a feasible
 * kit (`growToFeasible`), then shaved with the proposal's own items tried last, so what is left is the proposal plus
 * what it lacked. Keeps the lightest; undefined when no proposal gave a kit in time. On the 200-item bench locker,
 * whose search stops at 1,348 g with nothing accepted, the shaved locker weighs 2,964 g and the repairs 1,526 g.
 * Source: proximity search around the relaxation's solution is the usual MILP primal heuristic (M. Fischetti and
 * A. Lodi, Local branching, Mathematical Programming 98, 2003; E. Danna, E. Rothberg and C. Le Pape, Exploring
 * relaxation induced neighborhoods to improve MIP solutions, Mathematical Programming 102, 2005).
 * @example repairNearProposals(search, greedyShave(search, locker, Infinity), Infinity).counts // no heavier
 */
export function repairNearProposals(
  search: KitSearch,
  start: JudgedKit | undefined,
  locker: KitCounts,
  deadlineMs: number,
): JudgedKit | undefined {
  const grams = (counts: KitCounts): number => kitMassG(counts, search.problem.candidates);
  let best = start;
  for (const proposal of [...search.lastProposals].reverse()) {
    if (search.now() >= deadlineMs) break;
    let joined: Map<string, number> | undefined;
    if (best) {
      joined = new Map(best.counts);
      for (const [id, n] of proposal) if (n > (joined.get(id) ?? 0)) joined.set(id, n);
    } else joined = growToFeasible(search, proposal, locker, deadlineMs);
    // No growth: out of time, or the whole locker runs dry (then no proposal grows).
    if (!joined) break;
    const repaired = greedyShave(search, joined, deadlineMs, proposal);
    if (!repaired.verdict.feasible) continue;
    search.noteShaved(repaired.counts);
    if (!best || grams(repaired.counts) < grams(best.counts)) best = repaired;
  }
  return best;
}

/** A kit with the judge's verdict on it. */
export interface JudgedKit {
  counts: Map<string, number>;
  verdict: JudgeVerdict;
}

/**
 * A kit the judge accepts that holds `proposal`: the proposal plus the shortest run, in a fixed order, of the other
 * items at their counts owned — stores and panels first, then leads, converters and controllers, each lightest first
 * (the master's proposal already holds a path for every device, so energy is what it most often lacks; leads and
 * converters first filled a 1 s plan on the 200-item bench locker with them: 7,000–8,750 g against 3,300–5,100 g) —
 * found by galloping and bisection on the run's length (all of it gives the whole locker, which the caller has judged
 * feasible; the judge is monotone, so a longer run is never worse). About 2 log₂(run) simulations of kits little
 * larger than the proposal instead of a shave from the whole locker. Undefined past `deadlineMs`, or when even the
 * whole locker runs dry.
 * @example growToFeasible(search, proposal, locker, Infinity) // holds proposal; the judge accepts it
 */
export function growToFeasible(
  search: KitSearch,
  proposal: KitCounts,
  locker: KitCounts,
  deadlineMs: number,
): Map<string, number> | undefined {
  const powered = (c: KitCandidate): number =>
    c.kind === 'bank' || c.kind === 'battery' || c.kind === 'panel' ? 1 : 0;
  const rest = search.problem.candidates
    .filter((c) => (locker.get(c.itemId) ?? 0) > (proposal.get(c.itemId) ?? 0))
    .sort((a, b) => powered(b) - powered(a) || a.massG - b.massG || (a.itemId < b.itemId ? -1 : 1));
  const withRun = (length: number): Map<string, number> => {
    const kit = new Map(proposal);
    for (const c of rest.slice(0, length)) kit.set(c.itemId, locker.get(c.itemId) ?? 0);
    return kit;
  };
  // Galloping, then bisection: runs of 1, 2, 4… until the judge accepts one (a short run is a small kit, quick to
  // simulate, and the proposal most often lacks little), then the shortest accepted run within (lo, hi]. The whole run
  // is the locker.
  let lo = 0;
  let hi = rest.length;
  for (let length = 1; length < rest.length; length *= 2) {
    if (search.now() >= deadlineMs) return undefined;
    if (search.judge(withRun(length)).feasible) {
      hi = length;
      break;
    }
    lo = length;
  }
  while (hi - lo > 1) {
    if (search.now() >= deadlineMs) return undefined;
    const mid = (lo + hi) >> 1;
    if (search.judge(withRun(mid)).feasible) hi = mid;
    else lo = mid;
  }
  // The whole run is the locker, accepted only if it keeps up (judged once, then read from the judge's cache).
  const grown = withRun(hi);
  return hi < rest.length || search.judge(grown).feasible ? grown : undefined;
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
 * When the search stops (a best-so-far answer's always does), the kits its repairs shaved fill the list: other kits that
 * work, lightest first, not proven the next best.
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
  const swapOf = (counts: KitCounts, verdict: JudgeVerdict): KitSwap => {
    const kit = choice(counts, search, verdict);
    const ids = new Set([...base.keys(), ...counts.keys()]);
    const added = [];
    const removed = [];
    for (const id of [...ids].sort()) {
      const d = (counts.get(id) ?? 0) - (base.get(id) ?? 0);
      if (d > 0) added.push({ itemId: id, count: d });
      if (d < 0) removed.push({ itemId: id, count: -d });
    }
    return { kit, extraG: kit.massG - optimum.massG, added, removed, buys: buysOf(search, optimum, kit) };
  };
  const taken: KitCounts[] = [base];
  search.excludeSupersetsOf(base);
  let step: SearchStep | undefined;
  while (swaps.length < count) {
    step = search.next(deadlineMs);
    if (step.kind !== 'found') break;
    swaps.push(swapOf(step.counts, step.verdict));
    taken.push(step.counts);
    search.excludeSupersetsOf(step.counts);
  }
  // A search that cannot go on (time, round cap, its tree too large — a best-so-far answer's is) offers the kits its
  // repairs shaved, and the answer with one unit swapped for the next heavier items of its kind, lightest first, under
  // the same rule: none holds the answer's kit or an earlier swap. A swapped kit is judged (in time) before it is offered.
  if (step?.kind === 'stopped') {
    const grams = (counts: KitCounts): number => kitMassG(counts, search.problem.candidates);
    const shaved = new Set(search.shavedKits);
    const offers = [...search.shavedKits, ...heavierSwapsOf(search.problem.candidates, base)].sort(
      (a, b) => grams(a) - grams(b),
    );
    for (const counts of offers) {
      if (swaps.length >= count) break;
      if (taken.some((kit) => kitNoLarger(kit, counts))) continue;
      if (!shaved.has(counts) && search.now() >= deadlineMs) continue;
      const verdict = search.judge(counts);
      if (!verdict.feasible || verdict.works) continue;
      swaps.push(swapOf(counts, verdict));
      taken.push(counts);
    }
  }
  return swaps;
}

/** Heavier items a stopped search's swaps try in place of each unit of the answer's kit, per line. */
export const heavierSwapsPerLine = 2;

/**
 * The kit with one unit of a line swapped for one of the next heavier items of the same kind that are not all packed
 * (`heavierSwapsPerLine` each): kits near the answer that do not hold it, so a stopped search whose repairs shaved few
 * distinct kits still has swaps to offer (the 200-item bench plan had 4 of 5). The judge decides which work.
 * @example heavierSwapsOf(candidates, new Map([['bank-small', 1]])) // [Map { 'bank-mid' => 1 }, …]
 */
export function heavierSwapsOf(candidates: readonly KitCandidate[], kit: KitCounts): Map<string, number>[] {
  const byId = new Map(candidates.map((c) => [c.itemId, c]));
  const swapped: Map<string, number>[] = [];
  for (const [id, n] of kit) {
    const item = byId.get(id);
    if (!item || n <= 0) continue;
    const heavier = candidates
      .filter((c) => c.kind === item.kind && c.massG > item.massG && (kit.get(c.itemId) ?? 0) < c.ownedCount)
      .sort((a, b) => a.massG - b.massG || (a.itemId < b.itemId ? -1 : 1))
      .slice(0, heavierSwapsPerLine);
    for (const other of heavier) swapped.push(withOneSwapped(kit, id, other.itemId));
  }
  return swapped;
}
