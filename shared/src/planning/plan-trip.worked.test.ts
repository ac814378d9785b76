/**
 * Worked planning cases checkable by hand, on real trips with the invented test fixtures (testing/fixtures.ts). The
 * arithmetic is in the comments; where a figure comes from:
 * - the phone (`testPhone`): a 15 Wh battery (from memory: a 4,000 mAh cell at 3.85 V ≈ 15 Wh), charged at 85 %
 *   efficiency (from memory: phone charging circuits 80–90 %) through a USB-C socket;
 * - the bank (`testBank`): 10,000 mAh at 3.7 V (common practice: banks are rated at the cell's nominal 3.6–3.7 V), with
 *   85 % of that reaching the USB port (common practice: 80–90 %), so 10,000 × 3.7 / 1000 × 0.85 = 31.45 Wh usable
 *   (README "Storage": rated mAh × cell volts / 1000 × output efficiency);
 * - a trip of N nights has N + 1 days of 24 h, from the walking window's start (08:00) to the next day's; the zone is
 *   UTC (Etc/GMT), so no day has a clock change.
 */
import { describe, expect, it } from 'vitest';
import { tripSolarInputSchema } from '../schemas/trip-solar.js';
import type { TripDevice } from '../schemas/kit.js';
import { testBank, testLead, testPhone, testRadio, testUsbPanel } from '../testing/fixtures.js';
import { PlanningInputError, type PlanningGear, type PlanningInput } from './planning-input.js';
import { checkKit } from './check-kit.js';
import { planTrip } from './plan-trip.js';

const bank = (countOwned = 1): PlanningGear => ({
  itemId: 'bank',
  name: 'Test bank',
  countOwned,
  massG: 190,
  spec: testBank(),
});
const phoneLead: PlanningGear = {
  itemId: 'lead-a-c',
  name: 'USB-A to USB-C lead',
  countOwned: 1,
  massG: 20,
  spec: testLead('usb-a', 'usb-c'),
};

/** A trip at 46.5° N in July, in the mixed sky, with the given devices and gear. */
function trip(nights: number, devices: TripDevice[], gear: PlanningGear[], reserveShare = 0): PlanningInput {
  return {
    solarInput: tripSolarInputSchema.parse({
      latitudeDeg: 46.5,
      longitudeDeg: 9.8,
      timeZone: 'Etc/GMT',
      startDate: '2027-07-10',
      nights,
      temperatures: { lowC: 6, highC: 18 },
    }),
    devices,
    deviceNames: { phone: 'the phone', radio: 'the radio', headlamp: 'the headlamp' },
    gear,
    reserveShare,
    gramLimitG: null,
  };
}

describe('a phone alone for two nights, one bank, no panel', () => {
  it('80 % of its battery a day: one bank and the phone lead (210 g), and the phone ends the trip with 5.7 Wh', () => {
    // Use: 0.8 × 15 Wh = 12 Wh a day, × 3 days = 36 Wh. The phone starts full, so 36 − 15 = 21 Wh must go in through
    // its charger: 21 / 0.85 = 24.7 Wh from the bank, which holds 31.45 Wh. The phone's socket needs the USB-A to
    // USB-C lead. Kit: 190 g + 20 g = 210 g.
    // The simulation tops the phone up to full in every camp window while the bank has energy, so the bank empties in
    // the last night and the phone ends with 15 + 31.45 × 0.85 − 36 = 5.73 Wh.
    const plan = planTrip(trip(2, [{ deviceId: 'phone', spec: testPhone(0.8) }], [bank(), phoneLead]), {
      withExtras: false,
    });
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.massG).toBe(210);
    expect(plan.kit?.lines.map((l) => [l.itemId, l.count])).toEqual([
      ['bank', 1],
      ['lead-a-c', 1],
    ]);
    expect(plan.evaluation?.verdict.status).toBe('lasts-trip');
    const expected = plan.evaluation?.ledgers.find((l) => l.skyId === 'expected')?.days ?? [];
    expect(expected).toHaveLength(3);
    expect(expected.reduce((sum, d) => sum + d.deliveredWh, 0)).toBeCloseTo(36, 6);
    expect(expected.reduce((sum, d) => sum + d.unmetWh, 0)).toBeCloseTo(0, 9);
    expect(expected[2]?.storedEndWh).toBeCloseTo(15 + 31.45 * 0.85 - 36, 6);
    expect(expected[2]?.storesEndWh).toBeCloseTo(0, 6);
  });

  it('with a 30 % reserve one bank is not enough and the plan packs both owned (400 g)', () => {
    // Above a 30 % reserve one bank gives 0.7 × 31.45 = 22.0 Wh < 24.7 Wh; two give 44.0 Wh ≥ 24.7 Wh.
    // Kit: 2 × 190 g + 20 g = 400 g.
    const plan = planTrip(trip(2, [{ deviceId: 'phone', spec: testPhone(0.8) }], [bank(2), phoneLead], 0.3), {
      withExtras: false,
    });
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.massG).toBe(400);
  });

  it('150 % of its battery a day with one bank owned: nothing feasible, the phone runs dry on day 2', () => {
    // Use: 1.5 × 15 = 22.5 Wh a day, 0.9375 Wh an hour. At most 15 + 31.45 × 0.85 = 41.7 Wh can reach it, which lasts
    // 41.7 / 0.9375 = 44.5 h from 08:00 on day 1: it runs dry at about 04:30 in the second night, still day 2 (a day
    // runs to the next day's 08:00).
    const plan = planTrip(trip(2, [{ deviceId: 'phone', spec: testPhone(1.5) }], [bank(), phoneLead]));
    expect(plan.status).toBe('nothing-feasible');
    expect(plan.kit).toBeNull();
    expect(plan.nothingFeasible?.runsDry).toMatchObject({ deviceId: 'phone', dayIndex: 1 });
    // The sentence names the device that runs dry first (it did not, when the daily model also found a shortfall).
    expect(plan.nothingFeasible?.missing[0]).toMatch(/^With all this gear packed, the phone runs dry on day 2/);
    // The daily model's shortfall, by 16:00 on day 3 (56 h, the next top-up): 56 × 0.9375 = 52.5 Wh used, less the
    // 15 Wh the phone starts with, is 37.5 / 0.85 = 44.1 Wh from the bank, which holds 31.45: 12.7 Wh short on day 2.
    // With no panel every design sky is alike, so it is said once.
    expect(plan.nothingFeasible?.missing.slice(1)).toEqual([
      'Even with all this gear packed, the stores run 12.7 Wh short on day 2 in every design sky.',
    ]);
    expect(plan.headline).toMatch(/^No kit from this gear keeps every device charged/);
  });
});

describe('a 12 V radio and no converter in the locker', () => {
  it('nothing is feasible, and the answer names the missing boost converter', () => {
    // The radio uses 13.8 V × (1.6 A × 20/60 h + 0.35 A × 2 h + 0.08 A × 8 h) = 25.8 Wh a day against its own 14.8 Wh,
    // so over 4 days it needs charging, and from a USB bank only a boost converter can charge it.
    const plan = planTrip(
      trip(
        3,
        [{ deviceId: 'radio', spec: testRadio() }],
        [bank(2), phoneLead, { itemId: 'panel', name: 'Test panel', countOwned: 1, massG: 280, spec: testUsbPanel() }],
      ),
    );
    expect(plan.status).toBe('nothing-feasible');
    expect(plan.kit).toBeNull();
    expect(plan.swaps).toEqual([]);
    const text = plan.nothingFeasible?.text ?? '';
    expect(text).toContain('the radio');
    expect(text).toMatch(/boost converter/);
    expect(plan.nothingFeasible?.missing.some((m) => m.includes('the radio') && m.includes('boost converter'))).toBe(
      true,
    );
    expect(plan.headline).toContain('boost converter');
  });
});

describe('a short trip whose devices need no charging', () => {
  it('one night, phone at 30 % a day and a headlamp at 20 % a day: the empty kit, 0 g', () => {
    // Over 2 days the phone uses 2 × 0.3 × 15 = 9 Wh of its 15 Wh and the headlamp 2 × 0.2 × 5 = 2 Wh of its 5 Wh:
    // neither needs a charging path, so the lightest kit is no kit at all.
    const devices: TripDevice[] = [
      { deviceId: 'phone', spec: testPhone(0.3) },
      {
        deviceId: 'headlamp',
        spec: testPhone(0.2, {
          deviceKind: 'headlamp',
          ownBatteryWh: 5,
          chargePowerW: 5,
          chargePort: { connector: 'micro-usb', captiveCable: false },
        }),
      },
    ];
    const plan = planTrip(
      trip(1, devices, [
        bank(),
        phoneLead,
        { itemId: 'panel', name: 'Test panel', countOwned: 1, massG: 280, spec: testUsbPanel() },
      ]),
    );
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.lines).toEqual([]);
    expect(plan.kit?.massG).toBe(0);
    expect(plan.evaluation?.verdict.status).not.toBe('runs-dry');
    expect(plan.headline).toMatch(/^The lightest kit that works weighs 0 g/);
  });
});

describe('checkKit: bad input', () => {
  const input = trip(2, [{ deviceId: 'phone', spec: testPhone(0.8) }], [bank(), phoneLead]);
  const pathOf = (run: () => unknown): string | null => {
    try {
      run();
      return null;
    } catch (error) {
      expect(error).toBeInstanceOf(PlanningInputError);
      return (error as PlanningInputError).path;
    }
  };
  it('an item that is not among the gear: PlanningInputError at kit.N.itemId', () => {
    expect(
      pathOf(() =>
        checkKit(input, [
          { itemId: 'bank', count: 1 },
          { itemId: 'someone-elses-bank', count: 1 },
        ]),
      ),
    ).toBe('kit.1.itemId');
  });
  it('more units than owned: PlanningInputError at kit.N.count', () => {
    expect(
      pathOf(() =>
        checkKit(input, [
          { itemId: 'lead-a-c', count: 1 },
          { itemId: 'bank', count: 2 },
        ]),
      ),
    ).toBe('kit.1.count');
  });
  it('a valid kit picked by hand is simulated: one bank and the lead keep the phone going', () => {
    const check = checkKit(input, [
      { itemId: 'bank', count: 1 },
      { itemId: 'lead-a-c', count: 1 },
    ]);
    expect(check.kit.massG).toBe(210);
    expect(check.evaluation.verdict.status).toBe('lasts-trip');
    // Both units are needed (no bank: 36 Wh > 15 Wh; no lead: no path), so nothing can be shaved.
    expect(check.shaves).toEqual([]);
  });
});
