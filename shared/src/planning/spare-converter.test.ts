/**
 * Known gap (4) of the simulation (shared README): a slow, efficient boost converter added to a kit with a fast, lossy
 * one, on a bank just big enough that a strong panel refills. The top-ups take the efficient path first, so the bank
 * stays full when the sun comes and spills what the fast path would have passed to the radio: the kit with both
 * converters runs dry where the kit with the fast one alone lasts. A hiker can always leave a converter in the bag, so
 * the planner's judge counts a kit as working when it works with a converter left home, and offers the lighter kit.
 * The case is the first of a sweep (3–10 nights, 0–1,000 W/m², 5–20 W panels, 15–60 Wh radios, 6–20 Wh a day,
 * 0.03–0.3 A slow boosts): the simulation alone broke 46 of its 4,605 kits, all with the 0.03 A boost.
 */
import { describe, expect, it, vi } from 'vitest';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import { tripSolarInputSchema } from '../schemas/trip-solar.js';
import { isKitFeasible } from '../simulation/simulate-kit.js';
import { testBank, testBoostConverter, testLead, testRadio, testUsbPanel } from '../testing/fixtures.js';
import { syntheticTripSolar } from '../testing/synthetic-solar.js';
import { optimiseKit } from '../optimisation/optimise.js';
import { planningContext, type PlanningContext } from './build-problem.js';
import type { PlanningGear, PlanningInput } from './planning-input.js';

/** Simulations the judge runs (the module's own, counted). */
const simulations = vi.hoisted(() => ({ count: 0 }));
vi.mock('../simulation/simulate-kit.js', async (importOriginal) => {
  const original = await importOriginal<typeof import('../simulation/simulate-kit.js')>();
  return {
    ...original,
    kitFeasibility: (...args: Parameters<typeof original.kitFeasibility>) => {
      simulations.count++;
      return original.kitFeasibility(...args);
    },
  };
});

const solar = syntheticTripSolar({ nights: 3, peakWm2: 1000, cloudyShare: 0.3 });
const devices: TripDevice[] = [
  {
    deviceId: 'radio',
    spec: testRadio({ ownBatteryWh: 15, chargeCurrentA: 2, useProfile: { basis: 'energy', energyWhPerDay: 6 } }),
  },
];
const fast = testBoostConverter({ maxOutputA: 1, efficiency: 0.7 });
const slow = testBoostConverter({ maxOutputA: 0.03, efficiency: 0.95 });
const panel = testUsbPanel({ ratedW: 20 });
const lead = testLead('usb-a', 'usb-c');

/** The smallest bank (mAh, to 0.01 mAh) with which the fast converter alone lasts the trip, by bisection. */
function justBigEnoughMah(): number {
  const kitWith = (capacityMah: number): KitEntry[] => [
    { itemId: 'fast', count: 1, spec: fast },
    { itemId: 'bank', count: 1, spec: testBank({ capacityMah }) },
    { itemId: 'panel', count: 1, spec: panel },
    { itemId: 'lead', count: 1, spec: lead },
  ];
  let lo = 100;
  let hi = 60_000;
  for (let i = 0; i < 30; i++) {
    const mid = (lo + hi) / 2;
    if (isKitFeasible({ solar, kit: kitWith(mid), devices, reserveShare: 0 })) hi = mid;
    else lo = mid;
  }
  return hi + 0.01;
}

describe('a converter left home (known gap (4))', () => {
  const gear: PlanningGear[] = [
    { itemId: 'bank', name: 'Bank', countOwned: 1, massG: 190, spec: testBank({ capacityMah: justBigEnoughMah() }) },
    { itemId: 'fast', name: 'Fast boost', countOwned: 1, massG: 40, spec: fast },
    { itemId: 'slow', name: 'Slow boost', countOwned: 1, massG: 30, spec: slow },
    { itemId: 'panel', name: 'Panel', countOwned: 1, massG: 280, spec: panel },
    { itemId: 'lead', name: 'Lead', countOwned: 1, massG: 20, spec: lead },
  ];
  // The synthetic sun stands in for the trip's own (a context shares the sun of one made for the same trip input).
  const solarInput = tripSolarInputSchema.parse({
    latitudeDeg: 0,
    longitudeDeg: 0,
    timeZone: 'Etc/GMT',
    startDate: '2027-03-20',
    nights: 3,
    temperatures: { lowC: 10, highC: 20 },
  });
  const input: PlanningInput = {
    solarInput,
    devices,
    deviceNames: { radio: 'the radio' },
    gear,
    reserveShare: 0,
    gramLimitG: null,
  };
  const sameSun = { input, solarOptions: {}, solar, gearById: new Map(), panelSeriesCache: new Map() };
  const context = planningContext(input, {}, sameSun as unknown as PlanningContext);
  const base = new Map([
    ['bank', 1],
    ['fast', 1],
    ['panel', 1],
    ['lead', 1],
  ]);
  const withSlow = new Map([...base, ['slow', 1]]);

  it('the simulation: the kit lasts with the fast boost alone and runs dry with the slow one added', () => {
    expect(context.simulate(base).verdict.status).not.toBe('runs-dry');
    expect(context.simulate(withSlow).verdict.status).toBe('runs-dry');
  });

  it('the judge: the kit with both works with the slow boost left home, and says which kit that is', () => {
    expect(context.judge(base)).toMatchObject({ feasible: true });
    const verdict = context.judge(withSlow);
    expect(verdict.feasible).toBe(true);
    expect(verdict.works).toEqual(base);
  });

  it('the search never offers the kit with an unused converter: the optimum works as packed', () => {
    const answer = optimiseKit(context.problem, context.judge);
    expect(answer.status).toBe('optimal');
    if (answer.status === 'nothing-feasible') throw new Error('a kit works');
    const counts = new Map(answer.kit.lines.map((l) => [l.itemId, l.count]));
    expect(counts.has('slow')).toBe(false);
    expect(context.simulate(counts).verdict.status).not.toBe('runs-dry');
  });

  it('two slow boosts held: the judge still finds the kit with the fast one alone', () => {
    const slower = testBoostConverter({ maxOutputA: 0.05, efficiency: 0.93 });
    const withTwo = new Map([...withSlow, ['slower', 1]]);
    const twoContext = planningContext(
      { ...input, gear: [...gear, { itemId: 'slower', name: 'Slower boost', countOwned: 1, massG: 30, spec: slower }] },
      {},
      sameSun as unknown as PlanningContext,
    );
    expect(twoContext.simulate(withTwo).verdict.status).toBe('runs-dry');
    const verdict = twoContext.judge(withTwo);
    expect(verdict.feasible).toBe(true);
    expect(twoContext.simulate(verdict.works ?? withTwo).verdict.status).not.toBe('runs-dry');
  });

  it('a kit that runs dry for want of energy, holding a dozen spare boosts, costs the judge three simulations', () => {
    // Twelve boosts, each slower and more efficient than the last: eleven are spare. Trying every set of them left home
    // took 2^11 simulations; the judge tries the kit as packed, without the most efficient one, and without all.
    const boosts = Array.from({ length: 12 }, (_, i) => ({
      itemId: `boost-${i}`,
      name: `Boost ${i}`,
      countOwned: 1,
      massG: 30,
      spec: testBoostConverter({ maxOutputA: 1 - i * 0.08, efficiency: 0.7 + i * 0.02 }),
    }));
    const dozen = planningContext(
      { ...input, gear: [...gear.filter((g) => g.itemId !== 'fast' && g.itemId !== 'slow'), ...boosts] },
      {},
      sameSun as unknown as PlanningContext,
    );
    // No panel: the bank alone cannot carry the radio for three nights, whatever converter charges it.
    const kit = new Map<string, number>([
      ['bank', 1],
      ['lead', 1],
      ...boosts.map((b) => [b.itemId, 1] as [string, number]),
    ]);
    simulations.count = 0;
    expect(dozen.judge(kit).feasible).toBe(false);
    expect(simulations.count).toBe(3);
  });
});
