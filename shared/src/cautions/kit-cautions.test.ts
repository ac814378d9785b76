import { describe, expect, it } from 'vitest';
import { kitCautions } from './kit-cautions.js';
import type { KitEntry } from '../schemas/kit.js';
import { simulateKit } from '../simulation/simulate-kit.js';
import { syntheticTripSolar } from '../testing/synthetic-solar.js';
import { testBank, testBoostConverter, testLead, testPhone, testRadio } from '../testing/fixtures.js';

const ids = (c: { id: string }[]) => c.map((x) => x.id);

describe('kit cautions', () => {
  it('IATA Lithium Battery Guidance Document: over 100 Wh needs approval, over 160 Wh is not carried', () => {
    const kit: KitEntry[] = [
      { itemId: 'small', count: 1, spec: testBank({ capacityMah: undefined, capacityWh: 99 }) },
      { itemId: 'mid', count: 1, spec: testBank({ capacityMah: undefined, capacityWh: 130 }) },
      { itemId: 'big', count: 1, spec: testBank({ capacityMah: undefined, capacityWh: 200 }) },
    ];
    const cautions = kitCautions({ kit, devices: [] });
    expect(cautions.find((c) => c.id === 'airline-approval')?.itemIds).toEqual(['mid']);
    expect(cautions.find((c) => c.id === 'airline-forbidden')?.itemIds).toEqual(['big']);
    expect(cautions[0]?.severity).toBe('danger');
    // A 10,000 mAh bank is 37 Wh: no airline caution.
    expect(ids(kitCautions({ kit: [{ itemId: 'b', count: 1, spec: testBank() }], devices: [] }))).not.toContain(
      'airline-approval',
    );
  });
  it('a radio brings the licence caution; a boost converter the noise and fusing cautions', () => {
    const kit: KitEntry[] = [
      { itemId: 'bank', count: 1, spec: testBank() },
      { itemId: 'boost', count: 1, spec: testBoostConverter() },
    ];
    const got = ids(kitCautions({ kit, devices: [{ deviceId: 'radio', spec: testRadio() }] }));
    expect(got).toEqual(expect.arrayContaining(['licence', 'boost-noise', 'dc-fusing', 'lithium', 'estimates']));
  });
  it('freezing hours bring the freezing caution with their count', () => {
    const solar = syntheticTripSolar({ nights: 2, lowC: -5, highC: 3 });
    const freezing = kitCautions({ kit: [{ itemId: 'bank', count: 1, spec: testBank() }], devices: [], solar }).find(
      (c) => c.id === 'freezing',
    );
    expect(freezing?.text).toMatch(/about \d+ hours/);
    const warm = syntheticTripSolar({ nights: 2, lowC: 5, highC: 20 });
    expect(
      ids(kitCautions({ kit: [{ itemId: 'bank', count: 1, spec: testBank() }], devices: [], solar: warm })),
    ).not.toContain('freezing');
  });
  it('heat is a warning on hot trips; a DC lead asks for a fuse', () => {
    const solar = syntheticTripSolar({ nights: 2, lowC: 22, highC: 38 });
    const kit: KitEntry[] = [
      { itemId: 'bank', count: 1, spec: testBank() },
      { itemId: 'dc', count: 1, spec: testLead('barrel-5.5x2.1', 'radio-dc') },
    ];
    const cautions = kitCautions({ kit, devices: [], solar });
    expect(cautions.find((c) => c.id === 'heat')?.severity).toBe('warning');
    expect(ids(cautions)).toContain('dc-fusing');
  });
  it('a thin margin from the simulation (hand worked); "estimates" always, last', () => {
    // No sun, 2 nights (24 + 24 + 8 h). Bank 3000 mAh × 3.7 V × 0.85 = 9.435 Wh; phone 15 Wh using 0.6 × 15 = 9 Wh/day.
    // Night 0 empties the bank into the phone (9.435 × 0.85 = 8.02 Wh); the phone ends the trip at
    // 15 − 9 − 9 − 3 + 8.02 = 2.02 Wh, i.e. 2.02 / (9.435 + 15) = 8 % to spare — thin. A 20,000 mAh bank keeps it full.
    const solar = syntheticTripSolar({ nights: 2, peakWm2: 0 });
    const lead: KitEntry = { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') };
    const devices = [{ deviceId: 'phone', spec: testPhone(0.6) }];
    const thinKit: KitEntry[] = [{ itemId: 'bank', count: 1, spec: testBank({ capacityMah: 3000 }) }, lead];
    const thin = simulateKit({ solar, kit: thinKit, devices, reserveShare: 0 });
    expect(thin.verdict.status).toBe('lasts-trip');
    if (thin.verdict.status !== 'runs-dry') expect(thin.verdict.worstMarginShare).toBeCloseTo(2.02 / 24.435, 2);
    const cautions = kitCautions({ kit: thinKit, devices, solar, simulation: thin });
    expect(ids(cautions)).toContain('thin-margin');
    expect(cautions[cautions.length - 1]?.id).toBe('estimates');
    const roomyKit: KitEntry[] = [{ itemId: 'bank', count: 1, spec: testBank({ capacityMah: 20000 }) }, lead];
    const roomy = simulateKit({ solar, kit: roomyKit, devices, reserveShare: 0 });
    expect(ids(kitCautions({ kit: roomyKit, devices, solar, simulation: roomy }))).not.toContain('thin-margin');
    expect(ids(kitCautions({ kit: [], devices: [] }))).toEqual(['estimates']);
  });
});
