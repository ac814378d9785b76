import { seededRandom } from '../optimisation/synthetic-problem.js';
import { summerTripInput } from './invented-trips.js';
import { checkKit } from './check-kit.js';
import { planTrip } from './plan-trip.js';

/**
 * The invented trip a new solver thread plans once before any hiker's plan (seeded; 24 item types, 5 nights): big
 * enough to run every part a plan runs (sun, harvest, daily model, master search, simulation, swaps, gram prices, a
 * hand check's shaves), small enough to take well under a second warm.
 */
const warmUpSeed = 1;
const warmUpItems = 24;
const warmUpNights = 5;
/**
 * The warm-up's own time limit, ms: it stops there whatever it has compiled (a slow machine must not hold the thread).
 */
const warmUpBudgetMs = 3_000;

/**
 * Plans and checks the warm-up trip, so the JavaScript engine has loaded and compiled the planner before a hiker's
 * first plan on this thread. Returns the grams of the warm-up kit (nothing a hiker sees; it shows the plan ran).
 * @example warmUpPlanner(() => performance.now()) // 1,234
 */
export function warmUpPlanner(now: () => number): number | null {
  const input = summerTripInput(seededRandom(warmUpSeed), warmUpItems, warmUpNights);
  const startMs = now();
  const plan = planTrip(input, { withExtras: true, now, timeBudgetMs: warmUpBudgetMs });
  const leftMs = warmUpBudgetMs - (now() - startMs);
  if (plan.kit && leftMs > 0)
    checkKit(
      input,
      plan.kit.lines.map((line) => ({ itemId: line.itemId, count: line.count })),
      { deadlineMs: now() + leftMs, now },
    );
  return plan.kit?.massG ?? null;
}
