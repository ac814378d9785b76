import { describe, expect, it } from 'vitest';
import type { KitEntry } from '../schemas/kit.js';
import { testRadio } from '../testing/fixtures.js';
import { testController, testDcLead, testPack, testTwelveVoltPanel } from '../testing/station-fixtures.js';
import { syntheticTripSolar } from '../testing/synthetic-solar.js';
import { kitCautions } from './kit-cautions.js';

/** The 12 V path's cautions in a plan. Invented gear (testing/station-fixtures.ts). */

const line = (itemId: string, spec: KitEntry['spec']): KitEntry => ({ itemId, count: 1, spec });
const liveRadio = { deviceId: 'radio', spec: testRadio({ canRunLive: true }) };

describe('cautions of a kit with a 12 V pack', () => {
  const kit = [
    line('pack', testPack()),
    line('ctl', testController()),
    line('panel', testTwelveVoltPanel()),
    line('dc-lead', testDcLead()),
  ];
  const ids = kitCautions({ kit, devices: [liveRadio], solar: syntheticTripSolar({ nights: 2 }) }).map((c) => c.id);

  it('lithium packs need protection and no charging below 0 °C; controller before panel; fuse near the battery', () => {
    expect(ids).toEqual(
      expect.arrayContaining([
        'lithium',
        'station-lithium-protection',
        'station-lithium-cold-charge',
        'station-controller-before-panel',
        'dc-fusing',
        'licence',
        'estimates',
      ]),
    );
    expect(ids).not.toContain('station-lead-acid-gassing');
  });

  it('suggests a fuse from the radio live current and the gauge (ISO 8820-3 blade ratings, 125 % rule)', () => {
    // Live, the radio draws its 1.6 A transmit current from the pack: 1.25 × 1.6 = 2.0 A → the 2 A blade fuse,
    // within the 10 A a 16 AWG cord carries (NEC Table 400.5(A)(1), column B, from memory).
    const fuse = kitCautions({ kit, devices: [liveRadio] }).find((c) => c.id === 'station-fuse-suggestion');
    expect(fuse?.text).toMatch(/^Fuse for this lead: 2 A /);
    expect(fuse?.text).toContain('The lead has a 5 A fuse.');
  });

  it('warns that the pack has no discharge rating to check the transmit current against', () => {
    expect(ids).toContain('station-discharge-rating-missing');
    const rated = kitCautions({
      kit: kit.map((l) => (l.itemId === 'pack' ? line('pack', testPack({ dischargeCRate: 1 })) : l)),
      devices: [liveRadio],
    }).map((c) => c.id);
    expect(rated).not.toContain('station-discharge-rating-missing');
  });

  it('lead-acid vents gas when overcharged', () => {
    const sla = kitCautions({
      kit: [
        line('sla', testPack({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 })),
        line('dc', testDcLead()),
      ],
      devices: [liveRadio],
    }).map((c) => c.id);
    expect(sla).toContain('station-lead-acid-gassing');
    expect(sla).not.toContain('station-lithium-protection');
  });

  it('a 3S lithium polymer pack sits below the radio nominal 13.8 V: it transmits at reduced power', () => {
    // 3 × 3.7 = 11.1 V nominal: the window check warns (our supply-window rule; common practice).
    const lipo = kitCautions({
      kit: [line('lipo', testPack({ chemistry: 'lipo', cellsInSeries: 3 })), line('dc', testDcLead())],
      devices: [{ deviceId: 'radio', spec: testRadio({ supplyVoltsMin: 11.7 }) }],
    }).map((c) => c.id);
    expect(lipo.some((id) => id.startsWith('station-supply-'))).toBe(true);
  });

  it('a controller whose input limit the cold panel exceeds is a danger (NEC 690.7 cold Voc)', () => {
    // −15 °C: 21.6 V × 1.12 = 24.19 V > 23 V.
    const cold = kitCautions({
      kit: [line('ctl', testController({ maxInputVolts: 23 })), line('panel', testTwelveVoltPanel())],
      devices: [liveRadio],
      solar: syntheticTripSolar({ nights: 1, lowC: -15, highC: 0 }),
    });
    expect(cold.find((c) => c.id === 'station-controller-input-over')?.severity).toBe('danger');
    expect(cold[0]?.id).toBe('station-controller-input-over');
  });
});
