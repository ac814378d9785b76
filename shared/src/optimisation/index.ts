/**
 * The kit optimiser: a daily mixed-integer model proposes, the caller's hourly judge disposes (see types.ts for the
 * contract that keeps the answer exact).
 */
export * from './types.js';
export * from './kit.js';
export {
  presolve,
  validateProblem,
  type PresolvedProblem,
  type ActiveItem,
  type ActiveGroup,
  type ActiveNeed,
  type DroppedItem,
} from './presolve.js';
export {
  buildDailyModel,
  modelScale,
  kitFromValues,
  type KitCut,
  type ModelPhase,
  type ModelScale,
} from './daily-model.js';
export { dailyBalance, type DailyBalance } from './daily-balance.js';
export {
  checkSolution,
  type LinearModel,
  type LinearRow,
  type LinearSolution,
  type LinearSolver,
  type LinearSolveOptions,
} from './linear-model.js';
export { solveWithJsLp, toJsLpModel } from './js-lp-backend.js';
export { toLpText } from './lp-text.js';
export {
  createKitSearch,
  defaultMaxRounds,
  defaultSolverTimeoutMs,
  type KitSearch,
  type KitSearchOptions,
  type SearchStep,
} from './kit-search.js';
export { optimiseKit, findSwaps, defaultSwapCount } from './optimise.js';
export { shaveGrams, type ShaveAnswer, type ShaveLimits } from './shave-grams.js';
export { gramPrice, freeSteps } from './gram-price.js';
export { exhaustiveLightestKit, type ExhaustiveAnswer, type ExhaustiveOptions } from './oracle.js';
