/**
 * Engine timings: the sun/sky pass for a trip, and the hour-by-hour simulation of a 10-item kit with three
 * devices in the four design skies, for 14 and 60 nights (the energy engine's goal: ≤ 5 ms for 14 nights).
 * The items are the invented test fixtures; the sun is the real clear-sky model at a mid-latitude summer place.
 */
import { panelPowerSeries } from '../src/harvest/panel-series.js';
import type { UsbPanelSpec } from '../src/schemas/items.js';
import type { KitEntry, TripDevice } from '../src/schemas/kit.js';
import { isKitFeasible, simulateKit } from '../src/simulation/simulate-kit.js';
import { computeTripSolar } from '../src/sun/trip-solar.js';
import { testBank, testBoostConverter, testLead, testPhone, testRadio, testUsbPanel } from '../src/testing/fixtures.js';
import { summerTripSolarInput } from '../src/planning/invented-trips.js';
import { measure } from './measure.js';

function tenItemKit(): KitEntry[] {
  const captiveUsbC = { connector: 'usb-c', captiveCable: true } as const;
  return [
    { itemId: 'panel-a', count: 1, spec: testUsbPanel({ ratedW: 10, outputPort: captiveUsbC }) },
    { itemId: 'panel-b', count: 1, spec: testUsbPanel({ ratedW: 21, portMaxA: 3 }) },
    { itemId: 'panel-c', count: 2, spec: testUsbPanel({ ratedW: 6, outputPort: captiveUsbC }) },
    { itemId: 'bank-a', count: 2, spec: testBank() },
    { itemId: 'bank-b', count: 1, spec: testBank({ capacityMah: 20000, chargeEfficiency: 0.88 }) },
    { itemId: 'bank-c', count: 1, spec: testBank({ capacityMah: 5000, outputEfficiency: 0.8 }) },
    { itemId: 'boost', count: 1, spec: testBoostConverter() },
    { itemId: 'lead-a-c', count: 1, spec: testLead('usb-a', 'usb-c') },
    { itemId: 'lead-c-c', count: 1, spec: testLead('usb-c', 'usb-c') },
    { itemId: 'lead-a-micro', count: 1, spec: testLead('usb-a', 'micro-usb') },
  ];
}

const devices: TripDevice[] = [
  { deviceId: 'radio', spec: testRadio() },
  { deviceId: 'phone', spec: testPhone(0.6) },
  {
    deviceId: 'messenger',
    spec: testPhone(0.15, {
      deviceKind: 'messenger',
      ownBatteryWh: 5,
      chargePort: { connector: 'micro-usb', captiveCable: false },
    }),
  },
];

export function benchEngine(): void {
  console.log('\nEnergy engine (10 kit lines, 3 devices, 4 design skies)');
  for (const nights of [14, 60]) {
    const solarInput = summerTripSolarInput(nights);
    measure(`computeTripSolar, ${nights} nights hourly`, () => computeTripSolar(solarInput));
    const solar = computeTripSolar(solarInput);
    const kit = tenItemKit();
    const input = { solar, kit, devices, reserveShare: 0.1 };
    const cache = new Map(
      kit
        .filter((e) => e.spec.kind === 'panel')
        .map((e) => [e.itemId, panelPowerSeries(e.spec as UsbPanelSpec, solar)] as const),
    );
    measure(`simulateKit, ${nights} nights (full ledger, schedule, series)`, () => simulateKit(input));
    measure(`simulateKit, ${nights} nights, harvest precomputed per panel`, () =>
      simulateKit({ ...input, options: { panelSeriesCache: cache } }),
    );
    measure(`isKitFeasible, ${nights} nights, harvest precomputed`, () =>
      isKitFeasible({ ...input, options: { panelSeriesCache: cache } }),
    );
  }
}
