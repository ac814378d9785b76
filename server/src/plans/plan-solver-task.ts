import type { CheckResult, KitEvaluation, KitSelection, PlanKit, PlanningInput, PlanResult } from '@gramwatt/shared';

/**
 * What the server posts to the plan solver's worker thread (`workers/plan-solver.worker.mjs`) and what comes
 * back. Plain data only: it is copied between threads by structured clone.
 */
export type PlanSolverTask =
  /** A whole plan; the worker's budget is `deadlineMs` (epoch ms, this process's clock) minus its start. */
  | { kind: 'plan'; input: PlanningInput; deadlineMs: number; withExtras: boolean }
  /** A hand-picked kit: verdict, ledger and the changes that shave grams, looked for until `deadlineMs` (epoch ms). */
  | { kind: 'check'; input: PlanningInput; selection: KitSelection; deadlineMs: number }
  /** A kit's lines and simulation only (the chosen kit). */
  | { kind: 'evaluate'; input: PlanningInput; selection: KitSelection }
  /** An invented trip planned once, so the thread has compiled the planner before a hiker's first plan. */
  | { kind: 'warm-up' };

/** What each task kind answers. */
export interface PlanSolverValues {
  plan: PlanResult;
  check: CheckResult;
  evaluate: { kit: PlanKit; evaluation: KitEvaluation };
  'warm-up': { massG: number | null };
}

/** The worker's answer: the value with the thread that computed it, or a selection the input does not hold. */
export type PlanSolverAnswer<V = unknown> =
  | { kind: 'done'; threadId: number; value: V }
  | { kind: 'input-error'; threadId: number; path: string; message: string };
