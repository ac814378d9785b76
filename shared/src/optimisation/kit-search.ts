import { buildDailyModel, kitFromValues, modelScale, type KitCut, type ModelScale } from './daily-model.js';
import { solveWithJsLp } from './js-lp-backend.js';
import { kitKey, kitMassG, kitNoLarger } from './kit.js';
import type { LinearSolver } from './linear-model.js';
import { presolve, type PresolvedProblem } from './presolve.js';
import type { JudgeVerdict, KitCounts, KitJudge, OptimisationProblem, OptimiseOptions, RunsDry } from './types.js';

/** Default verify-and-repair rounds per search. */
export const defaultMaxRounds = 400;
/** Default timeout of one MILP solve, ms. */
export const defaultSolverTimeoutMs = 10_000;

/** One step of the search. */
export type SearchStep =
  /** The lightest kit not yet excluded that the judge accepts. `proven` is false if a solve stopped on its timeout. */
  | { kind: 'found'; counts: Map<string, number>; massG: number; verdict: JudgeVerdict; proven: boolean }
  /** The model has no kit left: every kit not excluded was rejected. */
  | { kind: 'exhausted' }
  /** Round cap, time budget or a solver failure: `lowerBoundG` is the model's bound when it stopped. */
  | { kind: 'stopped'; reason: 'round-cap' | 'time-budget' | 'solver-failed'; lowerBoundG: number; detail?: string };

/** A verify-and-repair search: the model's cuts and the judge's verdicts are kept between steps (optimum, swaps). */
export interface KitSearch {
  readonly problem: OptimisationProblem;
  readonly presolved: PresolvedProblem;
  /** Next lightest kit the judge accepts and no cut excludes. `deadlineMs` is on the `now` clock. */
  next(deadlineMs: number): SearchStep;
  /** Exclude `counts` and every kit that holds at least `counts`. */
  excludeSupersetsOf(counts: KitCounts): void;
  /** The judge, with a cache (kits are judged once). */
  judge(counts: KitCounts): JudgeVerdict;
  readonly now: () => number;
  readonly stats: { rounds: number; judgedKits: number };
  /** The earliest dry finding among rejected kits (for reports). */
  readonly lastRunsDry: RunsDry | undefined;
}

/** Options of a search, beyond `OptimiseOptions`. */
export interface KitSearchOptions extends OptimiseOptions {
  /** The MILP back end (default javascript-lp-solver); tests may pass another. */
  solver?: LinearSolver;
}

const stillClock = (): number => 0;

/**
 * Creates a verify-and-repair search over a problem: the daily model proposes the lightest kit (ties: most worst-day
 * margin), the judge simulates it; a rejected kit is cut off with every kit no larger in any item (sound because the
 * judge is monotone), and the model is solved again. Only kits the judge accepted are returned.
 * @example createKitSearch(problem, judge).next(Infinity).kind // 'found'
 */
export function createKitSearch(problem: OptimisationProblem, judgeKit: KitJudge, options: KitSearchOptions = {}): KitSearch {
  const presolved = presolve(problem);
  const scale: ModelScale = modelScale(presolved);
  const now = options.now ?? stillClock;
  const maxRounds = options.maxRounds ?? defaultMaxRounds;
  const solverTimeoutMs = options.solverTimeoutMs ?? defaultSolverTimeoutMs;
  const tieBreak = options.tieBreakByMargin ?? true;
  const solve = options.solver ?? solveWithJsLp;
  const cuts: KitCut[] = [];
  const cache = new Map<string, JudgeVerdict>();
  const rejected: KitCounts[] = [];
  const stats = { rounds: 0, judgedKits: 0 };
  let lastRunsDry: RunsDry | undefined;
  let roundsThisSearch = 0;

  const judge = (counts: KitCounts): JudgeVerdict => {
    const key = kitKey(counts);
    const hit = cache.get(key);
    if (hit) return hit;
    const verdict = judgeKit(counts);
    cache.set(key, verdict);
    stats.judgedKits++;
    return verdict;
  };

  const reject = (counts: KitCounts, verdict: JudgeVerdict): void => {
    rejected.push(counts);
    cuts.push({ kind: 'no-larger-than', counts });
    if (verdict.runsDry && (!lastRunsDry || verdict.runsDry.dayIndex < lastRunsDry.dayIndex)) lastRunsDry = verdict.runsDry;
  };

  const next = (deadlineMs: number): SearchStep => {
    let lowerBoundG = 0;
    roundsThisSearch = 0;
    for (;;) {
      if (roundsThisSearch >= maxRounds) return { kind: 'stopped', reason: 'round-cap', lowerBoundG };
      const remainingMs = deadlineMs - now();
      if (remainingMs <= 0) return { kind: 'stopped', reason: 'time-budget', lowerBoundG };
      const timeoutMs = Math.min(solverTimeoutMs, remainingMs);
      roundsThisSearch++;
      stats.rounds++;
      const first = solve(buildDailyModel(presolved, cuts, { phase: 'min-grams' }, scale), { timeoutMs, now });
      if (first.status === 'infeasible') return { kind: 'exhausted' };
      if (first.status === 'failed') return { kind: 'stopped', reason: 'solver-failed', lowerBoundG, detail: first.reason };
      let counts = kitFromValues(presolved, first.values);
      const massG = kitMassG(counts, problem.candidates);
      let proven = first.proven;
      if (proven) lowerBoundG = massG;
      if (tieBreak) {
        const left = Math.min(solverTimeoutMs, deadlineMs - now());
        if (left > 0) {
          const second = solve(buildDailyModel(presolved, cuts, { phase: 'max-margin', maxMassG: massG }, scale), { timeoutMs: left, now });
          if (second.status === 'optimal') {
            const tied = kitFromValues(presolved, second.values);
            // Keep the tie-break only if it truly weighs the same (the grams row has half a gram of slack).
            if (kitMassG(tied, problem.candidates) === massG) counts = tied;
            proven = proven && second.proven;
          }
        }
      }
      // A kit no larger than one already rejected is cut off by the model; meeting one means the solver erred.
      if (rejected.some((r) => kitNoLarger(counts, r))) return { kind: 'stopped', reason: 'solver-failed', lowerBoundG, detail: 'model proposed a cut-off kit' };
      const verdict = judge(counts);
      if (verdict.feasible) return { kind: 'found', counts, massG, verdict, proven };
      reject(counts, verdict);
    }
  };

  return {
    problem,
    presolved,
    next,
    excludeSupersetsOf: (counts) => {
      cuts.push({ kind: 'no-superset-of', counts: new Map(counts) });
    },
    judge,
    now,
    stats,
    get lastRunsDry() {
      return lastRunsDry;
    },
  };
}
