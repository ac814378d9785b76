/**
 * Optimiser timings on seeded synthetic lockers (invented items; the judge is the synthetic hourly simulation):
 * the optimum alone, and the full answer (optimum, five swaps, a gram price), for 50 items over 14 days and 200 items
 * over 30 days (goals on this machine: optimum ≤ 100 ms and ≤ 1 s; the full answer ≤ 2 s more), and the speed-up over
 * exhaustive search at 10 item types.
 */
import { buildOptimiseBenchCases } from '../src/optimisation/optimise.bench-fixture.js';
import { gramPrice } from '../src/optimisation/gram-price.js';
import { findSwaps, optimiseKit } from '../src/optimisation/optimise.js';
import { createKitSearch } from '../src/optimisation/kit-search.js';
import { exhaustiveLightestKit } from '../src/optimisation/oracle.js';
import {
  randomSyntheticWorld,
  seededRandom,
  syntheticJudge,
  syntheticProblem,
} from '../src/optimisation/synthetic-problem.js';
import { measure } from './measure.js';

const clock = (): number => performance.now();

export function benchOptimise(): void {
  for (const c of buildOptimiseBenchCases()) {
    const big = c.problem.candidates.length > 100;
    const runs = { warmupRuns: big ? 1 : 3, runs: big ? 5 : 30, budgetMs: 60_000 };
    let last = '';
    measure(
      `optimiseKit, ${c.name}`,
      () => {
        const answer = optimiseKit(c.problem, c.judge, { now: clock });
        last = `${answer.status}, ${answer.status === 'nothing-feasible' ? '-' : answer.kit.massG} g, ${answer.stats.rounds} rounds, ${answer.stats.judgedKits} kits judged`;
      },
      runs,
    );
    console.log(`  → ${last}`);
    measure(
      `full answer (optimum + 5 swaps + a gram price), ${c.name}`,
      () => {
        const search = createKitSearch(c.problem, c.judge, { now: clock });
        const answer = optimiseKit(c.problem, c.judge, { now: clock }, search);
        if (answer.status === 'nothing-feasible') return;
        findSwaps(c.problem, c.judge, answer.kit, { now: clock }, search);
        // A gram price: the same world with 10 % more demand.
        const more = { ...c.world, demandScale: 1.1 };
        gramPrice(answer, syntheticProblem(more), syntheticJudge(more), { now: clock });
      },
      runs,
    );
  }
  const world = randomSyntheticWorld(seededRandom(10), {
    itemTypes: 10,
    maxOwned: 2,
    dayCount: 14,
    skyCount: 4,
    deviceCount: 3,
  });
  const problem = syntheticProblem(world);
  const judge = syntheticJudge(world);
  const fast = measure('optimiseKit, 10 item types, 14 days', () => optimiseKit(problem, judge, { now: clock }), {
    warmupRuns: 3,
    runs: 30,
  });
  const slow = measure(
    'exhaustive search (ascending grams, skipping kits below a rejected one), 10 item types, 14 days',
    () => exhaustiveLightestKit(problem.candidates, judge),
    { warmupRuns: 1, runs: 5 },
  );
  console.log(
    `  → the optimiser is ${(slow.medianMs / fast.medianMs).toFixed(1)}× faster than exhaustive search at 10 item types`,
  );
}
