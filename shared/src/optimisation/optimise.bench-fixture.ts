/**
 * Benchmark fixtures for `npm run bench`: synthetic (invented) problems of the sizes the solver must handle.
 */
import {
  randomSyntheticWorld,
  seededRandom,
  syntheticJudge,
  syntheticProblem,
  type SyntheticWorld,
} from './synthetic-problem.js';
import type { KitJudge, OptimisationProblem } from './types.js';

/** One benchmark case. */
export interface OptimiseBenchCase {
  name: string;
  problem: OptimisationProblem;
  judge: KitJudge;
  /** The world behind it, for changed requirements (gram prices). */
  world: SyntheticWorld;
}

/**
 * A 50-item / 14-day and a 200-item / 30-day synthetic problem (4 design skies, up to 2 owned each), seeded.
 * @example buildOptimiseBenchCases()[0].problem.candidates.length // 50
 */
export function buildOptimiseBenchCases(): OptimiseBenchCase[] {
  return [
    { name: '50 items, 14 days', items: 50, days: 14, seed: 50 },
    { name: '200 items, 30 days', items: 200, days: 30, seed: 200 },
  ].map(({ name, items, days, seed }) => {
    const world = randomSyntheticWorld(seededRandom(seed), {
      itemTypes: items,
      maxOwned: 2,
      dayCount: days,
      skyCount: 4,
      deviceCount: 3,
    });
    return { name, problem: syntheticProblem(world), judge: syntheticJudge(world), world };
  });
}
