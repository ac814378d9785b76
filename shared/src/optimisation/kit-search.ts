import {
  buildDailyModel,
  completeMasterColumns,
  kitFromValues,
  masterValues,
  modelScale,
  type KitCut,
  type ModelScale,
} from './daily-model.js';
import { clearlyBroken, dailyModelItems, evaluateDailyModel, type EnergyCut } from './energy-cuts.js';
import { kitViewCuts, kitViewsShort } from './kit-views.js';
import { liftBatches, oneAtATime, tryInBatches } from './batch-trials.js';
import { solveWithJsLp } from './js-lp-backend.js';
import { kitKey, kitMassG, kitVector, vectorNoLarger, type KitVector } from './kit.js';
import type { LinearSolution, LinearSolver } from './linear-model.js';
import { createMasterSearch } from './master-branching.js';
import { presolve, type ActiveItem, type PresolvedProblem } from './presolve.js';
import type { JudgeVerdict, KitCounts, KitJudge, OptimisationProblem, OptimiseOptions, RunsDry } from './types.js';

/**
 * Default verify-and-repair rounds per search: a guard against a runaway search, the time budget being the real limit.
 * A round costs a few ms with the master's branch and bound (the 50-item bench trip's receive-hours price needs 874
 * rounds, 8 s; at 400 it stopped with the same grams, unproven).
 */
export const defaultMaxRounds = 2_000;
/** Kits of equal grams the tie-break looks at beyond the first (each a master solve and a judge call). */
export const tieBreakCandidates = 3;
/** The reason a master solve gives when the branch and bound ran out of its time (no MILP is tried then). */
const outOfTime = 'master out of time';
/**
 * The reason when the master's search tree, past `maxOpenNodes`, let nodes go and has none left (the search stops; its
 * best kit is shaved).
 */
const masterTooLarge = 'the model search grew too large for memory';
/** The note of a kit found after the master let nodes go with lesser bounds (see `maxOpenNodes`). */
const lettingGoNote =
  'The search reached its memory limit and set aside the kits it judged least likely to be lighter: this kit works, but a lighter one may exist.';
/** The note of a lighter kit the judge found working once a spare converter stays home. */
const leftHomeNote = 'This kit works once a spare converter stays home; the search did not prove it the lightest.';
/** The note of a kit found by a MILP solve that stopped on its timeout. */
const timeoutNote = 'A model solve stopped on its timeout: the kit is feasible but may not be the lightest.';
/** Rejected proposals a search keeps for the repair after a stop (each repair costs about twenty simulations). */
export const keptProposals = 6;
/** Default timeout of one MILP solve, ms. */
export const defaultSolverTimeoutMs = 10_000;

/** One step of the search. */
export type SearchStep =
  /**
   * The lightest kit not yet excluded that the judge accepts. `proven` is false if a solve stopped on its timeout or
   * the master let nodes go; then `lowerBoundG` is the least any kit not excluded may weigh (else `massG`) and `note`
   * says why.
   */
  | {
      kind: 'found';
      counts: Map<string, number>;
      massG: number;
      verdict: JudgeVerdict;
      proven: boolean;
      lowerBoundG: number;
      note?: string;
    }
  /** The model has no kit left: every kit not excluded was rejected. */
  | { kind: 'exhausted' }
  /** Round cap, time budget or a solver failure: `lowerBoundG` is the model's bound when it stopped. */
  | { kind: 'stopped'; reason: 'round-cap' | 'time-budget' | 'solver-failed'; lowerBoundG: number; detail?: string };

/** A verify-and-repair search: the model's cuts and the judge's verdicts are kept between steps (optimum, swaps). */
export interface KitSearch {
  readonly problem: OptimisationProblem;
  readonly presolved: PresolvedProblem;
  /**
   * Next lightest kit the judge accepts and no cut excludes. `deadlineMs` is on the `now` clock. With `stuck`, once the
   * judge has rejected `afterRejections` kits in this call, or the call has run `afterMs`, and the search has accepted
   * none, `allDry` is asked once; true ends the search as `exhausted` (the caller's proof that no kit can be accepted,
   * e.g. the whole locker dry).
   */
  next(deadlineMs: number, stuck?: StuckCheck): SearchStep;
  /** Exclude `counts` and every kit that holds at least `counts`. */
  excludeSupersetsOf(counts: KitCounts): void;
  /** Exclude exactly `counts` (a kit rejected for a reason that more gear might mend, e.g. the party's split). */
  excludeKit(counts: KitCounts): void;
  /** The judge, with a cache (kits are judged once). */
  judge(counts: KitCounts): JudgeVerdict;
  readonly now: () => number;
  readonly stats: {
    rounds: number;
    judgedKits: number;
    dailyRejected: number;
    /** Branch-and-bound nodes of the master, and how often it gave up and the MILP solver answered. */
    masterNodes?: number;
    masterFallbacks?: number;
  };
  /** The earliest dry finding among rejected kits (for reports). */
  readonly lastRunsDry: RunsDry | undefined;
  /**
   * The maximal kits rejected so far (each stands for its whole down-set): the judge's and the daily model's, never
   * the kits a caller excluded. A search under a raised requirement may start from them (`knownRejected`).
   */
  readonly rejectedKits: readonly KitCounts[];
  /** The lightest kit the judge has accepted so far, in any call (a stopped search shaves it, not the whole locker). */
  readonly lightestAccepted: KitCounts | undefined;
  /**
   * The last kits the master proposed and the daily model, a view or the judge then rejected, oldest first (at most
   * `keptProposals`): the lightest kits still in the running when a search stops, so a kit repaired from one of them
   * is near the model's lower bound (`optimise.ts`).
   */
  readonly lastProposals: readonly KitCounts[];
  /**
   * Kits the judge accepts that a shave left with no item to spare, as callers note them (`noteShaved`): a stopped
   * search's repairs. Its swaps fall back on them when the search cannot go on (`findSwaps`).
   */
  readonly shavedKits: readonly KitCounts[];
  noteShaved(counts: KitCounts): void;
}

/** When a search that accepts nothing asks whether any kit can be accepted at all (see `KitSearch.next`). */
export interface StuckCheck {
  afterRejections: number;
  afterMs: number;
  allDry: () => boolean;
}

/** Options of a search, beyond `OptimiseOptions`. */
export interface KitSearchOptions extends OptimiseOptions {
  /** The MILP back end (default javascript-lp-solver); tests may pass another. */
  solver?: LinearSolver;
  /**
   * Kits this judge is known to reject, each with every kit no larger (a gram price passes the trip's own search's
   * `rejectedKits`: a kit that fails the trip as it is fails a raised requirement too, the judge being monotone in
   * the requirement). They answer for the judge inside their down-sets (lifting never simulates a kit inside one), and
   * join the master at once as "no larger than" cuts.
   */
  knownRejected?: readonly KitCounts[];
  /**
   * Check each kit the daily model passes against its own views too (`kit-views.ts`; default true). Off, the search
   * finds the daily model's own optimum (the HiGHS cross-check compares that).
   */
  kitViews?: boolean;
  /** Nodes the master's branch and bound may open before the MILP solver takes over (tests lower it). */
  masterNodeLimit?: number;
  /** Open nodes the master may hold before the search stops (default `maxOpenNodes`; tests lower it). */
  masterOpenLimit?: number;
  /** Active items from which `optimiseKit` solves a core of the locker first (default `coreSearchMinItems`). */
  coreMinItems?: number;
}

const stillClock = (): number => 0;

/**
 * Creates a verify-and-repair search over a problem: the daily model proposes the lightest kit (ties: most worst-day
 * margin), the judge simulates it; a rejected kit is cut off with every kit no larger in any item (sound because the
 * judge is monotone), and the model is solved again. Only kits the judge accepted are returned.
 * @example createKitSearch(problem, judge).next(Infinity).kind // 'found'
 */
export function createKitSearch(
  problem: OptimisationProblem,
  judgeKit: KitJudge,
  options: KitSearchOptions = {},
): KitSearch {
  const presolved = presolve(problem);
  const scale: ModelScale = modelScale(presolved);
  const now = options.now ?? stillClock;
  const maxRounds = options.maxRounds ?? defaultMaxRounds;
  const solverTimeoutMs = options.solverTimeoutMs ?? defaultSolverTimeoutMs;
  const tieBreak = options.tieBreakByMargin ?? true;
  const solve = options.solver ?? solveWithJsLp;
  const useViews = options.kitViews ?? true;
  const cuts: KitCut[] = [];
  const cache = new Map<string, JudgeVerdict>();
  const rejected: KitCounts[] = [];
  /** Every candidate's position in a kit vector (rejected, known and accepted kits are compared as vectors). */
  const vectorIndex = new Map(problem.candidates.map((c, i) => [c.itemId, i]));
  const vectorOf = (counts: KitCounts): KitVector => kitVector(counts, vectorIndex);
  /** `rejected` as vectors, in the same order. */
  const rejectedVectors: KitVector[] = [];
  /** Whether a kit is no larger than one already rejected (then the model should have cut it off). */
  const insideRejected = (counts: KitCounts): boolean => {
    const v = vectorOf(counts);
    return rejectedVectors.some((r) => vectorNoLarger(v, r)) || knownVectors.some((known) => vectorNoLarger(v, known));
  };
  /** Maximal kits their own views reject (so the judge does too), cut off by their view cuts. */
  const viewRejected: KitCounts[] = [];
  const stats: KitSearch['stats'] = { rounds: 0, judgedKits: 0, dailyRejected: 0, masterNodes: 0, masterFallbacks: 0 };
  const energyCuts: EnergyCut[] = [];
  const master = createMasterSearch(presolved);
  let lastRunsDry: RunsDry | undefined;
  let lightestAccepted: { counts: KitCounts; massG: number } | undefined;
  let roundsThisSearch = 0;
  /** Kits the judge has rejected (simulated, not answered from the cache). */
  let judgeRejections = 0;
  const lastProposals: KitCounts[] = [];
  const shavedKits: KitCounts[] = [];

  const judge = (counts: KitCounts): JudgeVerdict => {
    const key = kitKey(counts);
    const hit = cache.get(key);
    if (hit) return hit;
    const verdict = judgeKit(counts);
    cache.set(key, verdict);
    stats.judgedKits++;
    if (!verdict.feasible) judgeRejections++;
    if (verdict.feasible) {
      const works = verdict.works ?? counts;
      const massG = kitMassG(works, problem.candidates);
      if (!lightestAccepted || massG < lightestAccepted.massG) lightestAccepted = { counts: new Map(works), massG };
    }
    return verdict;
  };

  const knownRejected = options.knownRejected ?? [];
  /** The minimal kits the judge accepted while lifting. */
  const acceptedKits: KitVector[] = [];
  const knownVectors = knownRejected.map(vectorOf);

  // The master's branch and bound checks a node against a row only when it comes up, so the known rejected kits join
  // it at once as cuts (a proposed kit inside one would only be cut off then): the 50-item bench trip's full plan took
  // 10 s before, 7 s after.
  for (const known of knownRejected) cuts.push({ kind: 'no-larger-than', counts: new Map(known) });

  /**
   * The judge rejects a kit (for lifting); a known rejected kit holding it, or an accepted kit it holds, answer first.
   */
  const judgeRejects = (trial: KitCounts): boolean => {
    const v = vectorOf(trial);
    if (knownVectors.some((known) => vectorNoLarger(v, known))) return true;
    // The judge is monotone: a kit holding one it accepted is accepted too (no simulation needed).
    if (acceptedKits.some((kit) => vectorNoLarger(kit, v))) return false;
    // No daily-model check first: the judge lifts only kits the daily model passed, and it passes every larger one.
    if (judge(trial).feasible) {
      // Kept minimal: a kit holding another already listed adds nothing, and one it holds leaves.
      for (let k = acceptedKits.length - 1; k >= 0; k--)
        if (vectorNoLarger(v, acceptedKits[k] as KitVector)) acceptedKits.splice(k, 1);
      acceptedKits.push(v);
      return false;
    }
    return true;
  };

  /** Items the daily forward pass reads (the others cannot change its answer). */
  const dailyRole = new Set(dailyModelItems(presolved));

  // Lighter items first: the model escapes a cut by adding the cheapest unit it can, so those are absorbed first.
  const liftOrder = [...presolved.items].sort(
    (a, b) => a.candidate.massG - b.candidate.massG || (a.candidate.itemId < b.candidate.itemId ? -1 : 1),
  );

  /**
   * Grows a rejected kit to a larger rejected kit, each item (lightest first) raised to the most units that still leave
   * the kit rejected. Every kit no larger than the grown kit is rejected too (the judge is monotone), so its cut removes
   * a whole down-set at once instead of one kit plus every kit with a useless extra (a controller with no 12 V panel, a
   * lead no path uses).
   * - With cheap checks (`how: 'each'`) every item is tried, one at a time: a maximal kit. With the daily model's own
   *   check (`how: 'daily'`) the items it never reads go in unchecked first.
   * - With the judge (`how: 'batches'`, a simulation each) only items that are not stores or panels are tried: a kit the
   *   judge has just rejected is most often only just short, so one more bank or panel nearly always makes it keep up
   *   — a simulation each for no growth — while leads, converters and controllers mostly change nothing. Those are
   *   tried all together first, then in halves where that fails (`tryInBatches` with `liftBatches`), so the spares
   *   most often cost one simulation. On the 50-item bench locker this took the judge's calls from 935 to 58.
   * Source: lifting no-good cuts to maximal infeasible sets is the "combinatorial Benders" idea (G. Codato and
   * M. Fischetti, Combinatorial Benders' cuts for mixed-integer linear programming, Operations Research 54(4), 2006).
   */
  const lift = (
    counts: KitCounts,
    deadlineMs: number,
    rejects: (trial: KitCounts) => boolean = judgeRejects,
    how: 'each' | 'batches' | 'daily' = rejects === judgeRejects ? 'batches' : 'each',
  ): Map<string, number> => {
    const grown = new Map(counts);
    const owned = (it: ActiveItem): number => it.candidate.ownedCount;
    // The daily forward pass reads only stores, panels and what switches a panel group on: the rest go in unchecked.
    if (how === 'daily')
      presolved.items.forEach((it, i) => {
        if (!dailyRole.has(i)) grown.set(it.candidate.itemId, owned(it));
      });
    const open = liftOrder.filter(
      (it) => (grown.get(it.candidate.itemId) ?? 0) < owned(it) && (how !== 'batches' || (!it.store && !it.panel)),
    );
    tryInBatches(
      open,
      {
        // Every item of the batch at its count owned; kept when the kit is still rejected.
        whole: (batch) => {
          const trial = new Map(grown);
          for (const it of batch) trial.set(it.candidate.itemId, owned(it));
          if (!rejects(trial)) return false;
          for (const it of batch) grown.set(it.candidate.itemId, owned(it));
          return true;
        },
        // Fewer units of the one item (an item that could not be raised now never can later: the kit only grows).
        part: (it) => {
          const id = it.candidate.itemId;
          for (let k = owned(it) - 1; k > (grown.get(id) ?? 0); k--) {
            const fewer = new Map(grown);
            fewer.set(id, k);
            if (rejects(fewer)) {
              grown.set(id, k);
              break;
            }
          }
        },
        stop: () => now() >= deadlineMs,
      },
      how === 'batches' ? liftBatches : oneAtATime,
    );
    return grown;
  };

  const reject = (counts: KitCounts, verdict: JudgeVerdict, deadlineMs: number): void => {
    const grown = lift(counts, deadlineMs);
    cutDownSet(grown);
    if (verdict.runsDry && (!lastRunsDry || verdict.runsDry.dayIndex < lastRunsDry.dayIndex))
      lastRunsDry = verdict.runsDry;
  };

  /**
   * Records `grown` as rejected and cuts it off with every kit no larger. Cuts it implies are left in: the master keeps every row it has made
   * anyway (a row stays valid), and on a locker that needs hundreds of rounds, testing each new kit against every cut
   * to drop the implied ones cost more than the rows they would have saved.
   */
  const cutDownSet = (grown: KitCounts): void => {
    rejected.push(grown);
    rejectedVectors.push(vectorOf(grown));
    cuts.push({ kind: 'no-larger-than', counts: grown });
  };

  /**
   * Adds energy cuts to the master, each strengthened (a coefficient above the right-hand side is lowered to it: one
   * unit of that item meets the cut alone either way, every other term being ≥ 0) and kept only when no cut already
   * there implies it; cuts it implies leave. Fewer, tighter rows make each master solve cheaper.
   * Source: coefficient reduction of knapsack rows, textbook MILP preprocessing (L. A. Wolsey, Integer Programming,
   * Wiley 1998, §7.2).
   */
  const addEnergyCuts = (found: readonly EnergyCut[]): void => {
    for (const cut of found) {
      if (!(cut.lowerWh > 0)) continue;
      const strong = strengthenedCut(cut);
      if (energyCuts.some((other) => implies(other, strong))) continue;
      for (let k = energyCuts.length - 1; k >= 0; k--)
        if (implies(strong, energyCuts[k] as EnergyCut)) energyCuts.splice(k, 1);
      energyCuts.push(strong);
    }
  };

  /** Whether the daily model rejects a kit, adding its feasibility cuts to the master when it does. */
  const dailyRejects = (counts: KitCounts): boolean => {
    const evaluation = evaluateDailyModel(presolved, counts);
    if (evaluation.cuts.length === 0) {
      if (!useViews || !kitViewsShort(presolved, counts)) return false;
      // Only the cuts of a maximal kit its views still reject go to the master: it has fewer blockers, so they hold
      // off a larger region, and every kit no larger holds none of them (its whole down-set is cut off). The kit's own
      // cuts add big-M rows that slow each master solve more than they save rounds.
      const grown = lift(
        counts,
        Infinity,
        // The kit passed the daily model, and so does every larger one: only its views can still reject a trial.
        (trial) => kitViewsShort(presolved, trial),
        // Views cost a daily pass per path: tried like the judge (no stores or panels, in batches).
        'batches',
      );
      const grownCuts = [...evaluateDailyModel(presolved, grown).cuts, ...kitViewCuts(presolved, grown)];
      if (grownCuts.some((cut) => clearlyBroken(presolved, cut, counts))) {
        stats.dailyRejected++;
        addEnergyCuts(grownCuts);
        viewRejected.push(grown);
        return true;
      }
      // The grown kit's cuts hold this kit off by float noise only. Its own views' cuts (their blockers lifted) decide:
      // none clearly broken either, and the views are short by noise — the judge decides; otherwise the grown kit fails
      // its views, so the judge rejects it and every kit no larger, and its down-set is cut off outright. (Read only
      // here: on the 50-item bench locker the kit's own cuts cost 5–10 ms a plan when worked out for every kit.)
      if (!kitViewCuts(presolved, counts).some((cut) => clearlyBroken(presolved, cut, counts))) return false;
      stats.dailyRejected++;
      addEnergyCuts(grownCuts);
      cutDownSet(grown);
      return true;
    }
    stats.dailyRejected++;
    addEnergyCuts(evaluation.cuts);
    // The cut at a maximal short kit (grown from this one) holds the master off a larger region near the boundary.
    const grown = lift(
      counts,
      Infinity,
      (trial) => evaluateDailyModel(presolved, trial, { anyShortfall: true }).shortfalls.length > 0,
      'daily',
    );
    addEnergyCuts(evaluateDailyModel(presolved, grown).cuts);
    // A cut the kit breaks only by float noise could let the master propose it again: exclude its down-set as well.
    if (!evaluation.cuts.some((cut) => clearlyBroken(presolved, cut, counts))) {
      cutDownSet(grown);
    }
    return true;
  };

  /**
   * The lightest kit the master allows (with `extra` cuts and a gram cap for the tie-break): our branch and bound
   * first, the MILP solver when it gives up on its node limit or when a solver was passed in.
   */
  const propose = (timeoutMs: number, extra: readonly KitCut[] = [], maxMassG?: number): LinearSolution => {
    const allCuts = [...cuts, ...extra];
    const startMs = now();
    if (!options.solver) {
      const instance = { cuts: allCuts, energyCuts, ...(maxMassG !== undefined ? { maxMassG } : {}) };
      // The search's own cuts only grow, so one tree serves every solve; a tie-break's passing cuts search a copy of its
      // open nodes (a fresh tree from the root cost the 50-item bench trip 36 of its 260 ms).
      const limits = {
        deadlineMs: startMs + timeoutMs,
        now,
        ...(options.masterNodeLimit ? { nodeLimit: options.masterNodeLimit } : {}),
        ...(options.masterOpenLimit ? { openLimit: options.masterOpenLimit } : {}),
      };
      const answer =
        extra.length === 0 && maxMassG === undefined ? master.next(instance, limits) : master.peek(instance, limits);
      stats.masterNodes = (stats.masterNodes ?? 0) + answer.nodes;
      if (answer.status === 'infeasible') return { status: 'infeasible' };
      if (answer.status === 'too-large') return { status: 'failed', reason: masterTooLarge };
      if (answer.status === 'optimal')
        return {
          status: 'optimal',
          objective: answer.massG / scale.massG,
          values: masterValues(presolved, answer.counts),
          proven: answer.lowerBoundG >= answer.massG,
          lowerBound: answer.lowerBoundG / scale.massG,
        };
      // Out of time: the MILP would have less than nothing; the caller stops on its budget.
      if (now() - startMs >= timeoutMs) return { status: 'failed', reason: outOfTime };
      stats.masterFallbacks = (stats.masterFallbacks ?? 0) + 1;
    }
    return solve(
      buildDailyModel(presolved, allCuts, { phase: 'min-grams' }, scale, {
        energyCuts,
        ...(maxMassG !== undefined ? { maxMassG } : {}),
      }),
      {
        timeoutMs: Math.max(1, timeoutMs - (now() - startMs)),
        now,
        complete: (values) => completeMasterColumns(presolved, values),
      },
    );
  };

  /**
   * Among kits of the same grams as `found`, the one the judge gives the most worst-day margin: a few more master
   * solves with the kits seen so far excluded and the grams capped.
   */
  const tieBreakAmong = (
    found: Map<string, number>,
    massG: number,
    verdict: JudgeVerdict,
    deadlineMs: number,
  ): { counts: Map<string, number>; verdict: JudgeVerdict } => {
    let best = { counts: found, verdict };
    const seen: KitCut[] = [{ kind: 'not-exactly', counts: found }];
    for (let k = 0; k < tieBreakCandidates; k++) {
      const left = Math.min(solverTimeoutMs, deadlineMs - now());
      if (left <= 0) break;
      const answer = propose(left, seen, massG);
      if (answer.status !== 'optimal') break;
      const tied = kitFromValues(presolved, answer.values);
      if (kitMassG(tied, problem.candidates) !== massG) break;
      seen.push({ kind: 'not-exactly', counts: tied });
      if (dailyRejects(tied)) continue;
      const tiedVerdict = judge(tied);
      if (!tiedVerdict.feasible) {
        reject(tied, tiedVerdict, deadlineMs);
        continue;
      }
      // Works only with an item left home: not a kit to offer (a lighter one works).
      if (tiedVerdict.works) continue;
      if ((tiedVerdict.margin ?? -Infinity) > (best.verdict.margin ?? -Infinity))
        best = { counts: tied, verdict: tiedVerdict };
    }
    return best;
  };

  const keepProposal = (counts: KitCounts): void => {
    lastProposals.push(counts);
    if (lastProposals.length > keptProposals) lastProposals.shift();
  };

  /**
   * The decomposed search: the master (counts, paths, cuts, no energy rows) proposes the lightest kit; the daily
   * model's forward pass checks it and, when it runs short, adds its Benders cuts; a kit that passes goes to the judge,
   * whose rejection is cut off with its lifted down-set. The master's optimum is a lower bound on grams, so the first
   * kit the judge accepts is the lightest.
   */
  const next = (deadlineMs: number, stuck?: StuckCheck): SearchStep => {
    let lowerBoundG = 0;
    roundsThisSearch = 0;
    const rejectionsBefore = judgeRejections;
    const startMs = now();
    let stuckAsked = false;
    for (;;) {
      if (
        stuck &&
        !stuckAsked &&
        !lightestAccepted &&
        (judgeRejections - rejectionsBefore >= stuck.afterRejections || now() - startMs >= stuck.afterMs)
      ) {
        stuckAsked = true;
        if (stuck.allDry()) return { kind: 'exhausted' };
      }
      if (roundsThisSearch >= maxRounds) return { kind: 'stopped', reason: 'round-cap', lowerBoundG };
      const remainingMs = deadlineMs - now();
      if (remainingMs <= 0) return { kind: 'stopped', reason: 'time-budget', lowerBoundG };
      const timeoutMs = Math.min(solverTimeoutMs, remainingMs);
      roundsThisSearch++;
      stats.rounds++;
      const first = propose(timeoutMs);
      if (first.status === 'infeasible') return { kind: 'exhausted' };
      if (first.status === 'failed' && first.reason === outOfTime)
        return { kind: 'stopped', reason: 'time-budget', lowerBoundG };
      if (first.status === 'failed' && first.reason === masterTooLarge)
        return { kind: 'stopped', reason: 'solver-failed', lowerBoundG, detail: masterTooLarge };
      if (first.status === 'failed') {
        // A point that breaks the model proves nothing about grams, but a kit in it that the judge rejects may still be
        // cut off (the cut holds whatever found the kit); a kit it would accept cannot be trusted as the lightest.
        const broken = first.brokenValues ? kitFromValues(presolved, first.brokenValues) : undefined;
        if (broken && !insideRejected(broken)) {
          if (dailyRejects(broken)) continue;
          const brokenVerdict = judge(broken);
          if (!brokenVerdict.feasible) {
            reject(broken, brokenVerdict, deadlineMs);
            continue;
          }
        }
        return { kind: 'stopped', reason: 'solver-failed', lowerBoundG, detail: first.reason };
      }
      const counts = kitFromValues(presolved, first.values);
      const massG = kitMassG(counts, problem.candidates);
      const proven = first.proven;
      // The master's bound holds for every kit its cuts allow, so for every kit the judge may still accept.
      const boundG = proven ? massG : Math.ceil((first.lowerBound ?? 0) * scale.massG - 1e-6);
      lowerBoundG = Math.max(lowerBoundG, Math.min(boundG, massG));
      const note = proven ? undefined : first.lowerBound !== undefined ? lettingGoNote : timeoutNote;
      // A kit no larger than one already rejected (or known rejected: those are cuts from the start) is cut off by the
      // model; meeting one means the solver erred.
      if (insideRejected(counts))
        return { kind: 'stopped', reason: 'solver-failed', lowerBoundG, detail: 'model proposed a cut-off kit' };
      if (dailyRejects(counts)) {
        keepProposal(counts);
        continue;
      }
      const verdict = judge(counts);
      if (!verdict.feasible) {
        reject(counts, verdict, deadlineMs);
        keepProposal(counts);
        continue;
      }
      // A kit that works only with a converter left home gives way to the lighter kit without it (the model, a relaxation,
      // would have proposed that one first had it proven its grams the least).
      if (verdict.works) {
        const works = new Map(verdict.works);
        // The verdict of the lighter kit, which works as packed (its margin is the one the judge found for it).
        const { works: _asked, ...asPacked } = verdict;
        return {
          kind: 'found',
          counts: works,
          massG: kitMassG(works, problem.candidates),
          verdict: asPacked,
          proven: false,
          // The cuts held off a kit that works once its spare converter stays home: they bound nothing here.
          lowerBoundG: 0,
          note: leftHomeNote,
        };
      }
      const chosen = tieBreak ? tieBreakAmong(counts, massG, verdict, deadlineMs) : { counts, verdict };
      return {
        kind: 'found',
        counts: chosen.counts,
        massG,
        verdict: chosen.verdict,
        proven,
        lowerBoundG: proven ? massG : lowerBoundG,
        ...(note ? { note } : {}),
      };
    }
  };

  return {
    problem,
    presolved,
    next,
    excludeSupersetsOf: (counts) => {
      cuts.push({ kind: 'no-superset-of', counts: new Map(counts) });
    },
    excludeKit: (counts) => {
      cuts.push({ kind: 'not-exactly', counts: new Map(counts) });
    },
    judge,
    now,
    stats,
    get lastRunsDry() {
      return lastRunsDry;
    },
    get rejectedKits() {
      return [...rejected, ...viewRejected];
    },
    get lightestAccepted() {
      return lightestAccepted?.counts;
    },
    lastProposals,
    shavedKits,
    noteShaved: (counts) => {
      const verdict = judge(counts);
      if (verdict.feasible && !verdict.works && !shavedKits.some((k) => kitKey(k) === kitKey(counts)))
        shavedKits.push(new Map(counts));
    },
  };
}

/** A cut with every coefficient at most its right-hand side (see `addEnergyCuts`). */
function strengthenedCut(cut: EnergyCut): EnergyCut {
  const cap = (v: Float64Array): Float64Array => v.map((x) => Math.min(x, cut.lowerWh));
  return { ...cut, itemWh: cap(cut.itemWh), groupWh: cap(cut.groupWh) };
}

/**
 * Whether cut `a` implies cut `b` for every kit: with both divided by their right-hand sides, every coefficient of `a`
 * is at most `b`'s (then b's left side ≥ a's ≥ 1).
 */
function implies(a: EnergyCut, b: EnergyCut): boolean {
  const ra = 1 / a.lowerWh;
  const rb = 1 / b.lowerWh;
  for (let i = 0; i < a.itemWh.length; i++) if ((a.itemWh[i] ?? 0) * ra > (b.itemWh[i] ?? 0) * rb + 1e-12) return false;
  for (let g = 0; g < a.groupWh.length; g++)
    if ((a.groupWh[g] ?? 0) * ra > (b.groupWh[g] ?? 0) * rb + 1e-12) return false;
  return true;
}
