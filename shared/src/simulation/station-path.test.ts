import { describe, expect, it } from 'vitest';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import { scaleSolar, syntheticTripSolar } from '../testing/synthetic-solar.js';
import { controllerHarvestW } from '../station/controller-harvest.js';
import { cellTemperatureC } from '../temperature/cell-temperature.js';
import { testBank, testLead, testPhone, testRadio } from '../testing/fixtures.js';
import {
  testController,
  testDcLead,
  testPack,
  testTwelveVoltPanel,
  testUsbAdapter,
} from '../testing/station-fixtures.js';
import { compileKit } from './compile-kit.js';
import { simulateKit } from './simulate-kit.js';
import { leadPassShare, packStore, stationPanelSeries } from './station-path.js';

/**
 * The 12 V path in the simulation: a pack is a store, a 12 V panel reaches it through a controller, a 12 V radio
 * charges or runs live from it over a DC lead. Invented gear; every expected figure is worked by hand beside it.
 */

const line = (itemId: string, spec: KitEntry['spec'], count = 1): KitEntry => ({ itemId, count, spec });
const radio = (overrides: Parameters<typeof testRadio>[0] = {}): TripDevice => ({
  deviceId: 'radio',
  spec: testRadio(overrides),
});

/** Radio use by hand: 13.8 V × (1.6 A × 20/60 h + 0.35 A × 2 h + 0.08 A × 8 h) = 13.8 × 1.873333 = 25.852 Wh/day. */
const radioDayWh = 13.8 * (1.6 / 3 + 0.35 * 2 + 0.08 * 8);

/**
 * 16 AWG copper, 13.17 Ω/km at 20 °C (NBS Handbook 100, Copper Wire Tables, 1966, table 1: 4.016 Ω/1000 ft; from memory);
 * the 1 m lead's loop is 2 m. The radio charges at 0.5 A × 13.8 V = 6.9 W, i.e. 6.9 / 12.8 = 0.539 A from the pack.
 */
const leadShare = 1 - ((6.9 / 12.8) * 0.002 * 13.17) / 12.8;

describe('a battery pack as a store', () => {
  it('usable energy, round trip and input limit of a 4S 6 Ah LiFePO4 pack', () => {
    const pack = packStore(testPack());
    // 6 Ah × 4 × 3.2 V × 0.9 usable (LiFePO4 drained nearly flat — common practice) = 69.12 Wh.
    expect(pack.usableWh).toBeCloseTo(69.12, 9);
    // Lithium round trip about 95 % (common practice).
    expect(pack.chargeEfficiency).toBe(0.95);
    // Typical LiFePO4 charge rate 0.5C (common practice): 3 A × 12.8 V = 38.4 W.
    expect(pack.packInputMaxW).toBeCloseTo(38.4, 9);
  });

  it('the controllers cap the pack input with their charge current', () => {
    const solar = syntheticTripSolar({ nights: 1 });
    const kit = (maxChargeA: number) =>
      compileKit({
        solar,
        kit: [
          line('pack', testPack()),
          line('ctl', testController({ maxChargeA })),
          line('panel', testTwelveVoltPanel()),
        ],
        devices: [radio()],
        reserveShare: 0,
      });
    // min(pack 38.4 W, controller 5 A × 12.8 V = 64 W) = 38.4 W; a 2 A controller: 25.6 W.
    expect(kit(5).storeInputMaxW[0]).toBeCloseTo(38.4, 9);
    expect(kit(2).storeInputMaxW[0]).toBeCloseTo(25.6, 9);
  });

  it("a lead-acid pack's capacity follows Peukert's law at the radio's charge current", () => {
    // 6 × 2 V = 12 V; draw 6.9 W / 12 V = 0.575 A; C20 of 7 Ah is 0.35 A; exponent 1.15 (common practice for sealed
    // lead-acid): capacity = 7 × (0.35 / 0.575)^0.15 = 6.49 Ah; × 12 V × 0.5 usable = 38.95 Wh.
    const solar = syntheticTripSolar({ nights: 1 });
    const k = compileKit({
      solar,
      kit: [line('sla', testPack({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 }))],
      devices: [radio()],
      reserveShare: 0,
    });
    expect(k.stores[0]?.usableWh).toBeCloseTo(7 * Math.pow(0.35 / 0.575, 0.15) * 12 * 0.5, 2);
  });
});

describe('worked case: a radio on a LiFePO4 pack over a DC lead, two nights, no sun (hand calculation)', () => {
  const solar = syntheticTripSolar({ nights: 2, peakWm2: 0 });
  const result = simulateKit({
    solar,
    kit: [line('pack', testPack()), line('dc-lead', testDcLead())],
    devices: [radio()],
    reserveShare: 0,
  });
  const day = result.skies[0]?.ledger ?? [];

  it('the DC lead loses its copper drop at the charge current', () => {
    expect(result.devices[0]?.paths[0]?.pathEfficiency).toBeCloseTo(leadShare, 6);
    expect(leadPassShare(undefined, 10, 12)).toBe(1);
  });

  it('the pack refills the radio each camp: 25.852 / (0.85 × lead share) Wh a day', () => {
    const drawWh = radioDayWh / (0.85 * leadShare);
    expect(day[0]?.storesEndWh).toBeCloseTo(69.12 - drawWh, 3);
    expect(day[1]?.storesEndWh).toBeCloseTo(69.12 - 2 * drawWh, 3);
    // The lead's loss is booked as path loss from its own efficiency.
    expect(day[0]?.converterLossWh).toBeCloseTo(drawWh * (1 - leadShare), 4);
    expect(result.verdict.status).toBe('lasts-trip');
  });

  it('the schedule tops the radio up from the pack through the lead', () => {
    expect(result.schedule.find((s) => s.kind === 'top-up')).toMatchObject({
      fromId: 'pack#1',
      toId: 'radio',
      converterItemId: null,
      leadItemIds: ['dc-lead'],
    });
  });

  it('without the lead nothing joins the pack to the radio, and the plan names the lead', () => {
    const alone = simulateKit({ solar, kit: [line('pack', testPack())], devices: [radio()], reserveShare: 0 });
    expect(alone.verdict.status).toBe('runs-dry');
    if (alone.verdict.status === 'runs-dry') {
      expect(alone.verdict.reason).toBe('no-charging-path');
      expect(alone.verdict.missing.map((m) => m.text)).toContain('a DC lead from ring-terminal to barrel-5.5x2.1');
    }
  });

  it('a 4S lithium polymer pack (16.8 V full) is never wired to a radio whose maximum is 16 V', () => {
    const lipo = simulateKit({
      solar,
      kit: [line('lipo', testPack({ chemistry: 'lipo', cellsInSeries: 4 })), line('dc-lead', testDcLead())],
      devices: [radio()],
      reserveShare: 0,
    });
    expect(lipo.devices[0]?.paths[0]).toBeNull();
    if (lipo.verdict.status === 'runs-dry') expect(lipo.verdict.missing[0]?.text).toMatch(/16\.8 V/);
    else expect.fail('a radio with no usable pack runs dry');
  });
});

describe('running live from the pack', () => {
  // One night, no sun. The radio's own battery holds 2 Wh, but the first walk (8 h) uses 8/24 × 25.852 = 8.62 Wh.
  const solar = syntheticTripSolar({ nights: 1, peakWm2: 0 });
  const kit = [line('pack', testPack()), line('dc-lead', testDcLead())];

  it('a radio that can run live takes what its battery lacks straight from the pack', () => {
    const live = simulateKit({ solar, kit, devices: [radio({ ownBatteryWh: 2, canRunLive: true })], reserveShare: 0 });
    expect(live.verdict.status).not.toBe('runs-dry');
    const liveWh = live.schedule.filter((s) => s.kind === 'live').reduce((a, s) => a + s.energyWh, 0);
    // Day 0's walk: 8.617 Wh of use, 2 Wh from its own battery, the rest live (the last walk is the same again,
    // less what the camp's top-up left in its 2 Wh battery).
    expect(liveWh).toBeGreaterThan((8 / 24) * radioDayWh - 2 - 1e-9);
  });

  it('the same radio charged only in camp runs dry on the first walk', () => {
    const notLive = simulateKit({ solar, kit, devices: [radio({ ownBatteryWh: 2 })], reserveShare: 0 });
    expect(notLive.verdict).toMatchObject({ status: 'runs-dry', dayIndex: 0, reason: 'empty-between-top-ups' });
  });
});

describe('a 12 V panel through a charge controller', () => {
  const sunny = syntheticTripSolar({ nights: 2 });
  const kit = (controllerType: 'pwm' | 'mppt', panel = testTwelveVoltPanel()) => [
    line('pack', testPack()),
    line('ctl', testController({ controllerType })),
    line('panel', panel),
    line('dc-lead', testDcLead()),
  ];

  it('PWM harvest is the panel current at the pack voltage × that voltage (flat current below Vmp)', () => {
    // With no short-circuit current given, the current below Vmp is Imp × G / 1000: PWM power = 12.8 V × 1.67 A ×
    // G / 1000 × the panel's losses (0.98³ × 0.90 = 0.84707), whatever the cell temperature, as long as Vmp stays
    // above 12.8 V. Over a day: 21.376 W × 0.84707 × irradiation (kWh/m² on the panel's plane).
    const result = simulateKit({ solar: sunny, kit: kit('pwm'), devices: [radio()], reserveShare: 0 });
    const plane = sunny.skies[0]?.planeIrradianceWm2 ?? [];
    let irradiationKwh = 0;
    sunny.steps.forEach((s, i) => {
      if (s.dayIndex === 0) irradiationKwh += ((plane[i] ?? 0) * s.durationH) / 1000;
    });
    const lossFactor = 0.98 ** 3 * 0.9;
    expect(result.skies[0]?.ledger[0]?.availableHarvestWh).toBeCloseTo(12.8 * 1.67 * lossFactor * irradiationKwh, 6);
  });

  it('MPPT at 95 % harvests more than PWM for a 12.8 V pack on an 18 V panel (12.8 / 18 = 0.71 < 0.95)', () => {
    const pwm = simulateKit({ solar: sunny, kit: kit('pwm'), devices: [radio()], reserveShare: 0 });
    const mppt = simulateKit({ solar: sunny, kit: kit('mppt'), devices: [radio()], reserveShare: 0 });
    const avail = (r: typeof pwm) => r.skies[0]?.ledger[0]?.availableHarvestWh ?? 0;
    expect(avail(mppt)).toBeGreaterThan(avail(pwm));
  });

  it('the harvest session names the controller; the panel refills what the radio took', () => {
    const result = simulateKit({ solar: sunny, kit: kit('mppt'), devices: [radio()], reserveShare: 0 });
    expect(result.schedule.find((s) => s.kind === 'harvest')).toMatchObject({
      fromId: 'panel',
      toId: 'pack#1',
      converterItemId: 'ctl',
    });
    expect(result.verdict.status).toBe('keeps-up');
    expect(result.unusedItemIds).toEqual([]);
  });

  it('a controller the cold panel could overload is never planned with (NEC 690.7 cold Voc)', () => {
    // At −15 °C: 21.6 V × (1 + 0.003 × 40) = 24.19 V open-circuit, above a 23 V input limit.
    const cold = syntheticTripSolar({ nights: 2, lowC: -15, highC: 5 });
    const over = [
      line('pack', testPack()),
      line('ctl', testController({ maxInputVolts: 23 })),
      line('panel', testTwelveVoltPanel()),
      line('dc-lead', testDcLead()),
    ];
    const result = simulateKit({ solar: cold, kit: over, devices: [radio()], reserveShare: 0 });
    expect(result.unusedItemIds.sort()).toEqual(['ctl', 'panel']);
    const fits = simulateKit({
      solar: cold,
      kit: over.map((l) => (l.itemId === 'ctl' ? line('ctl', testController({ maxInputVolts: 25 })) : l)),
      devices: [radio()],
      reserveShare: 0,
    });
    expect(fits.unusedItemIds).not.toContain('panel');
  });

  it('a 12 V panel never feeds a USB bank, even when its plug fits the bank (no controller between them)', () => {
    const result = simulateKit({
      solar: sunny,
      kit: [
        line('panel', testTwelveVoltPanel({ outputPort: { connector: 'usb-c', captiveCable: true } })),
        line('bank', testBank()),
      ],
      devices: [{ deviceId: 'phone', spec: testPhone(0.5) }],
      reserveShare: 0,
    });
    expect(result.unusedItemIds).toContain('panel');
  });
});

describe('a USB device from a pack through a 12 V → USB adapter', () => {
  it('tops the phone up through the adapter at its efficiency', () => {
    const solar = syntheticTripSolar({ nights: 2, peakWm2: 0 });
    const result = simulateKit({
      solar,
      kit: [line('pack', testPack()), line('adapter', testUsbAdapter()), line('lead', testLead('usb-a', 'usb-c'))],
      devices: [{ deviceId: 'phone', spec: testPhone(0.5) }],
      reserveShare: 0,
    });
    expect(result.devices[0]?.paths[0]).toMatchObject({ converterItemId: 'adapter', pathEfficiency: 0.9 });
    // Phone 7.5 Wh a day through 0.9 × 0.85: 9.8039 Wh from the pack a full day.
    expect(result.skies[0]?.ledger[0]?.storesEndWh).toBeCloseTo(69.12 - 7.5 / (0.9 * 0.85), 4);
  });
});

describe('a 12 V panel whose harvest would fall with more sun', () => {
  // A 5 W panel at 15 V maximum power (16.5 V open-circuit, −0.5 and −0.4 %/°C) through PWM into a 4S lithium
  // polymer pack (14.8 V): more light heats the cell, its voltage sinks towards the pack's, and the PWM current falls
  // with it (the straight-segment curve) — the shrunk case of a "more sun" soak.
  const panel = testTwelveVoltPanel({
    ratedW: 5,
    maxPowerVolts: 15,
    maxPowerAmps: 5 / 15,
    openCircuitVolts: 16.5,
    tempCoeffPctPerC: -0.5,
    tempCoeffVocPctPerC: -0.4,
  });
  const controller = testController({ controllerType: 'pwm' });
  const trip = syntheticTripSolar({ nights: 2, peakWm2: 280, lowC: 8, highC: 20 });

  it('the raw physics: at 20 °C air, 840 W/m² harvests less than 280 W/m²', () => {
    const at = (g: number) =>
      controllerHarvestW(
        panel,
        controller,
        14.8,
        { irradianceWm2: g, cellTempC: cellTemperatureC(20, g) },
        { panelLossFactor: 1 },
      );
    expect(at(840)).toBeLessThan(at(280));
  });

  it('the series keeps the peak light harvest, so three times the sun never harvests less in any step', () => {
    const base = stationPanelSeries(panel, controller, 14.8, trip);
    const sunnier = stationPanelSeries(panel, controller, 14.8, scaleSolar(trip, 3));
    let worstDropW = 0;
    base.forEach((sky, k) => sky.forEach((w, i) => (worstDropW = Math.max(worstDropW, w - (sunnier[k]?.[i] ?? 0)))));
    expect(worstDropW).toBe(0);
  });
});
