/**
 * Planning timings on real trips: the real sun, sky and temperatures and the real hour-by-hour simulation as the judge,
 * for a 50-item locker over 14 nights and a 200-item locker over 30 nights of invented gear (a realistic mix of USB
 * panels, banks, boost converters and leads, up to 2 owned each; a phone, a headlamp and a 12 V radio). Goals on this
 * 2-core machine: the optimum ≤ 100 ms and ≤ 1 s; the full plan (swaps and gram prices) ≤ 2 s more. Then the speed-up
 * over exhaustive search at 10 item types.
 */
import { exhaustiveLightestKit } from '../src/optimisation/oracle.js';
import { optimiseKit } from '../src/optimisation/optimise.js';
import { seededRandom } from '../src/optimisation/synthetic-problem.js';
import { planningContext } from '../src/planning/build-problem.js';
import { planTrip } from '../src/planning/plan-trip.js';
import { summerTripInput } from '../src/planning/invented-trips.js';
import { measure } from './measure.js';

const clock = (): number => performance.now();

/** The bench's input (`summerTripInput` of the testing module). */
export const benchPlanningInput = summerTripInput;

/**
 * Time for one plan in the bench, ms: a plan that needs more stops with its best kit so far (and says so). At 200 items
 * the server's default plan time (PLAN_TIME_LIMIT_MS, 20 s): since the model search lets nodes go instead of stopping
 * when full, a 200-item plan uses whatever time it is given.
 */
const optimumBudgetMs = { 50: 30_000, 200: 20_000 } as const;

/**
 * Time for one full plan in the bench, ms. At 200 items also the goals' 3 s (the optimum's 1 s and 2 s more), where the
 * plan's time shares (`planTimeShares`) give the optimum 1.5 s of it.
 */
const fullPlanBudgetsMs = { 50: [60_000], 200: [3_000, 20_000] } as const;

/** More 200-item lockers for the 1 s answer (the README lists what each answered before the core-first search). */
const otherLockerSeeds = [201, 202, 203, 204, 205, 206];

export function benchPlanning(): void {
  console.log(
    '\nPlanning on real trips (real sun and simulation; invented gear; each plan capped in time, see the status)',
  );
  for (const { items, nights, seed } of [
    { items: 50, nights: 14, seed: 50 },
    { items: 200, nights: 30, seed: 200 },
  ] as const) {
    const input = benchPlanningInput(seededRandom(seed), items, nights);
    const budgetMs = optimumBudgetMs[items];
    // At 50 items, warm-up runs first: each plan builds its own search and caches, but the JIT takes about ten plans to
    // settle (the first 0.6 s, then 0.3, 0.2… to about 0.12 s), and a server's solver threads run warm. Then enough
    // runs for a median and a p95 (30: with 10 the p95 was the slowest run, one noisy moment of the machine). A 200-item
    // plan takes seconds: one run.
    const runs =
      items > 100 ? { warmupRuns: 0, runs: 1, budgetMs: 600_000 } : { warmupRuns: 8, runs: 30, budgetMs: 600_000 };
    const fullRuns = items > 100 ? runs : { ...runs, warmupRuns: 1, runs: 5 };
    let last = '';
    const describe = (plan: ReturnType<typeof planTrip>): string =>
      `${plan.status}, ${plan.kit?.massG ?? '-'} g, ${plan.stats.rounds} rounds, ${plan.stats.judgedKits} kits judged, ${plan.stats.activeItems} of ${plan.stats.candidateItems} items after presolve${plan.notes.length ? ` — ${plan.notes.map((n) => n.replace(/\.$/, '')).join('; ')}` : ''}`;
    measure(
      `planningContext (sun, harvest, paths, coefficients), ${items} items, ${nights} nights`,
      () => planningContext(input),
      {
        warmupRuns: 1,
        runs: items > 100 ? 3 : 10,
      },
    );
    if (items <= 100) {
      const startMs = clock();
      planTrip(input, { withExtras: false, now: clock, timeBudgetMs: budgetMs });
      console.log(`  first optimum in this process (the JIT cold): ${(clock() - startMs).toFixed(0)} ms`);
    }
    measure(
      `optimum alone (planTrip without extras, cap ${budgetMs / 1000} s), ${items} items, ${nights} nights`,
      () => {
        last = describe(planTrip(input, { withExtras: false, now: clock, timeBudgetMs: budgetMs }));
      },
      runs,
    );
    console.log(`  → ${last}`);
    // Where the optimum is out of reach in the goal's time, what a plan gets within it (and a little more): the kit the
    // stopped search repairs, and the model's bound below which no kit works.
    if (items > 100) {
      for (const capMs of [1_000, 2_000, 5_000]) {
        const startMs = clock();
        const plan = planTrip(input, { withExtras: false, now: clock, timeBudgetMs: capMs });
        console.log(
          `  with a ${capMs / 1000} s budget: ${(clock() - startMs).toFixed(0)} ms, ${plan.status}, ${plan.kit?.massG ?? '-'} g — ${plan.headline.split('.')[0]}`,
        );
      }
      // The 1 s answer on more lockers of the same kind: one locker's figure moves with the clock.
      const others = otherLockerSeeds.map((other) => {
        const startMs = clock();
        const plan = planTrip(benchPlanningInput(seededRandom(other), items, nights), {
          withExtras: false,
          now: clock,
          timeBudgetMs: 1_000,
        });
        return `${plan.kit?.massG ?? '-'} g in ${(clock() - startMs).toFixed(0)} ms`;
      });
      console.log(`  with a 1 s budget on the lockers of seeds ${otherLockerSeeds.join(', ')}: ${others.join('; ')}`);
    }
    for (const fullBudgetMs of fullPlanBudgetsMs[items]) {
      measure(
        `full plan (optimum, 5 swaps, gram prices; cap ${fullBudgetMs / 1000} s), ${items} items, ${nights} nights`,
        () => {
          const plan = planTrip(input, { now: clock, timeBudgetMs: fullBudgetMs });
          last = `${describe(plan)}; optimum ${plan.stats.optimumMs.toFixed(0)} ms; ${plan.swaps.length} swaps; gram prices: ${plan.gramPrices.map((p) => `${p.requirement} ${p.kind}${p.extraG ? ` ${p.extraG} g` : ''}`).join(', ')}`;
        },
        fullRuns,
      );
      console.log(`  → ${last}`);
    }
  }

  // Speed-up over exhaustive search at 10 item types (3^10 kits at most): a few slow runs are enough.
  // The first seed from 10 on whose whole locker keeps every device going (a locker that fails is answered at once).
  let seed = 10;
  let input = benchPlanningInput(seededRandom(seed), 10, 14);
  let context = planningContext(input);
  while (seed < 200 && !context.judge(new Map(input.gear.map((g) => [g.itemId, g.countOwned]))).feasible) {
    seed++;
    input = benchPlanningInput(seededRandom(seed), 10, 14);
    context = planningContext(input);
  }
  let found = '';
  const fast = measure(
    'optimum (optimiseKit on a built context), 10 item types, 14 nights',
    () => {
      const answer = optimiseKit(context.problem, context.judge, { now: clock });
      found = `${answer.status}, ${answer.status === 'nothing-feasible' ? '-' : answer.kit.massG} g`;
    },
    // Each run takes milliseconds: enough warm-up for the JIT of a fresh process (bench/index.ts).
    { warmupRuns: 20, runs: 20, budgetMs: 60_000 },
  );
  console.log(`  → ${found}`);
  let judged = 0;
  const slow = measure(
    'exhaustive search (ascending grams, skipping kits below a rejected one), 10 item types, 14 nights',
    () => {
      const answer = exhaustiveLightestKit(context.problem.candidates, context.judge);
      judged = answer.judged;
      found = `${answer.best?.massG ?? '-'} g`;
    },
    { warmupRuns: 0, runs: 3, budgetMs: 120_000 },
  );
  console.log(
    `  → ${found}, ${judged} kits simulated; the optimiser is ${(slow.medianMs / fast.medianMs).toFixed(1)}× faster than exhaustive search at 10 item types`,
  );
}
