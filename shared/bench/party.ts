/**
 * Party plan timings on seeded real trips (invented gear, planning/invented-trips.ts; the judge is the hourly
 * simulation): the optimum of a three-person party with limits that force the kit to be shared, against the solo
 * optimum on the same pool, so the cost of the split and its cut rounds reads directly.
 */
import { seededRandom } from '../src/optimisation/synthetic-problem.js';
import { planParty } from '../src/planning/plan-party.js';
import { planTrip } from '../src/planning/plan-trip.js';
import type { PartyPlanning, PlanningInput } from '../src/planning/planning-input.js';
import { randomPlanningInput } from '../src/planning/invented-trips.js';
import { measure } from './measure.js';

const clock = (): number => performance.now();

/** A 12-item pool on a seven-night trip, and a party whose limits add up to a little more than the solo optimum. */
function partyCase(seed: number): { input: PlanningInput; party: PartyPlanning; soloG: number } | null {
  const random = seededRandom(seed);
  const input = randomPlanningInput(random, { itemTypes: 12, nights: [7, 7] });
  const solo = planTrip(input, { withExtras: false });
  if (!solo.kit) return null;
  const soloG = solo.kit.massG;
  const shares = [0.5, 0.35, 0.3];
  return {
    input,
    soloG,
    party: {
      members: shares.map((share, i) => ({
        memberId: `m${i}`,
        name: `Carrier ${i + 1}`,
        gramLimitG: Math.round(soloG * share),
      })),
      ownerByItemId: Object.fromEntries(input.gear.map((g, i) => [g.itemId, `m${i % shares.length}`])),
    },
  };
}

export function benchParty(): void {
  let found = 0;
  for (let seed = 1; seed < 60 && found < 3; seed++) {
    const c = partyCase(seed);
    if (!c) continue;
    found++;
    const runs = { warmupRuns: 5, runs: 5, budgetMs: 30_000 };
    measure(
      `planTrip optimum (solo), seed ${seed}, 12 item types, 7 nights`,
      () => planTrip(c.input, { withExtras: false, now: clock }),
      runs,
    );
    let last = '';
    measure(
      `planParty optimum, 3 carriers (limits 50/35/30 % of the solo kit), seed ${seed}`,
      () => {
        const plan = planParty(c.input, c.party, { withExtras: false, now: clock });
        last = `${plan.status}, ${plan.kit?.massG ?? '-'} g (solo ${c.soloG} g), ${plan.stats.rounds} rounds, ${plan.stats.judgedKits} kits judged`;
      },
      runs,
    );
    console.log(`  → ${last}`);
  }
}
