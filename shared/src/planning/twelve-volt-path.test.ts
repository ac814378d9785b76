/**
 * The solver with both power paths for a 12 V radio: USB banks with a boost converter, or a 12 V pack over a DC lead
 * (with a controller and a 12 V panel when the sun can refill it). Invented gear (testing/fixtures.ts and
 * testing/station-fixtures.ts); the arithmetic is beside each case:
 * - the radio (`testRadio`): 13.8 V × (1.6 A × 20 min + 0.35 A × 2 h + 0.08 A × 8 h) = 25.852 Wh a day, 14.8 Wh own
 *   battery, charged at 85 %; a trip of N nights has N + 1 days of 24 h;
 * - a bank (`testBank`): 31.45 Wh usable; through the 85 % boost converter 26.73 Wh reach the radio's charger;
 * - the 3S lithium polymer pack here: 9 Ah × 11.1 V × 0.8 usable (common practice) = 79.92 Wh, over a DC lead that
 *   loses about 0.1 %.
 */
import { describe, expect, it } from 'vitest';
import { presolve } from '../optimisation/presolve.js';
import type { KitItemSpec } from '../schemas/kit.js';
import { tripSolarInputSchema } from '../schemas/trip-solar.js';
import { testBank, testBoostConverter, testRadio } from '../testing/fixtures.js';
import { testController, testDcLead, testPack, testTwelveVoltPanel } from '../testing/station-fixtures.js';
import { planningContext } from './build-problem.js';
import { planTrip } from './plan-trip.js';
import type { PlanningGear, PlanningInput } from './planning-input.js';

const gear = (itemId: string, spec: KitItemSpec, countOwned = 1): PlanningGear => ({
  itemId,
  name: itemId,
  countOwned,
  massG: Math.round(spec.massG),
  spec,
});

const lipoPack = testPack({ chemistry: 'lipo', cellsInSeries: 3, capacityAh: 9, massG: 500 });
/** Three banks (190 g), a boost converter (45 g), the 500 g lithium polymer pack and a 40 g DC lead. */
const bothPaths: PlanningGear[] = [
  gear('bank', testBank(), 3),
  gear('boost', testBoostConverter()),
  gear('pack', lipoPack),
  gear('dc-lead', testDcLead()),
];

function trip(nights: number, gearList: PlanningGear[], lowC = 6): PlanningInput {
  return {
    solarInput: tripSolarInputSchema.parse({
      latitudeDeg: 46.5,
      longitudeDeg: 9.8,
      timeZone: 'Etc/GMT',
      startDate: '2027-07-10',
      nights,
      temperatures: { lowC, highC: lowC + 12 },
    }),
    devices: [{ deviceId: 'radio', spec: testRadio() }],
    deviceNames: { radio: 'the radio' },
    gear: gearList,
    reserveShare: 0,
    gramLimitG: null,
  };
}

describe('the solver chooses the power path by grams', () => {
  it('two nights: the pack path (540 g) beats three banks and a boost converter (615 g)', () => {
    // Use 3 × 25.852 = 77.56 Wh, less the 14.8 Wh the radio starts with: 62.76 Wh into its battery, 62.76 / 0.85 =
    // 73.8 Wh at its charger. Banks: 2 × 26.73 = 53.5 Wh < 73.8, so three (80.2 Wh; 3 × 190 + 45 = 615 g).
    // Pack: 79.92 × 0.999 ≥ 73.8, so the pack and its lead (500 + 40 = 540 g): 75 g lighter.
    const plan = planTrip(trip(2, bothPaths), { withExtras: false });
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.lines.map((l) => [l.itemId, l.count]).sort()).toEqual([
      ['dc-lead', 1],
      ['pack', 1],
    ]);
    expect(plan.kit?.massG).toBe(540);
    expect(plan.pathChoice).toMatchObject({ path: 'pack', otherMassG: 615, savedG: 75 });
    expect(plan.pathChoice?.text).toBe(
      'The lithium polymer pack path is 75 g lighter than three banks and a boost converter for this trip.',
    );
  });

  it('one night: two banks and the boost converter (425 g) beat the pack path (540 g)', () => {
    // Use 2 × 25.852 = 51.70 Wh − 14.8 Wh = 36.9 Wh into its battery, 43.4 Wh at its charger: two banks (53.5 Wh).
    const plan = planTrip(trip(1, bothPaths), { withExtras: false });
    expect(plan.kit?.lines.map((l) => [l.itemId, l.count]).sort()).toEqual([
      ['bank', 2],
      ['boost', 1],
    ]);
    expect(plan.pathChoice).toMatchObject({ path: 'banks', otherMassG: 540, savedG: 115 });
    expect(plan.pathChoice?.text).toBe(
      'Two banks and a boost converter are 115 g lighter than the lithium polymer pack path for this trip.',
    );
  });

  it('without a boost converter the pack path is the only one, and there is no comparison to make', () => {
    const plan = planTrip(
      trip(
        1,
        bothPaths.filter((g) => g.itemId !== 'boost'),
      ),
      { withExtras: false },
    );
    expect(plan.kit?.lines.map((l) => l.itemId).sort()).toEqual(['dc-lead', 'pack']);
    expect(plan.pathChoice).toBeNull();
  });

  it('a long sunny trip: the pack refilled by a 12 V panel through its controller', () => {
    // Nine nights use 10 × 25.852 ≈ 259 Wh: no owned set of banks (3 × 26.73 Wh) or the pack alone (80 Wh)
    // lasts, so the panel, its controller and the pack make the kit; the plan says only that path works.
    const sunny = [...bothPaths, gear('ctl', testController()), gear('panel-12v', testTwelveVoltPanel())];
    const plan = planTrip(trip(9, sunny), { withExtras: false });
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.lines.map((l) => l.itemId)).toEqual(expect.arrayContaining(['ctl', 'pack', 'panel-12v']));
    const harvest = plan.evaluation?.schedule.find((s) => s.kind === 'harvest');
    expect(harvest).toMatchObject({ fromId: 'panel-12v', toId: 'pack#1', converterItemId: 'ctl' });
    expect(plan.pathChoice?.path).toBe('pack');
    expect(plan.pathChoice?.text).toMatch(/^Only the lithium polymer pack path keeps the 12 V radio charged/);
  });
});

describe('the 12 V path in the daily model', () => {
  const sunny = [...bothPaths, gear('ctl', testController()), gear('panel-12v', testTwelveVoltPanel())];
  it('the pack is a store and the 12 V panel harvests only with a controller and a pack it reaches', () => {
    const { problem } = planningContext(trip(3, sunny));
    const pack = problem.coefficients.stores.find((s) => s.itemId === 'pack');
    expect(pack?.usableWh).toBeCloseTo(9 * 11.1 * 0.8, 9);
    expect(pack?.chargeEfficiency).toBe(0.95);
    const panel = problem.coefficients.panels.find((p) => p.itemId === 'panel-12v');
    const group = problem.coefficients.harvestGroups?.find((g) => g.groupId === panel?.groupId);
    expect(group?.requiresAnyOf?.map((a) => [...a.itemIds])).toEqual([['ctl', 'pack']]);
    expect(presolve(problem).dropped.map((d) => d.itemId)).not.toEqual(
      expect.arrayContaining(['pack', 'ctl', 'panel-12v']),
    );
  });

  it('below 0 °C all day the 12 V panel adds nothing (lithium is never charged below freezing)', () => {
    const { problem } = planningContext(trip(3, sunny, -20));
    const panel = problem.coefficients.panels.find((p) => p.itemId === 'panel-12v');
    expect(panel?.harvestWh.flat().reduce((a, b) => a + b, 0)).toBe(0);
  });
});
