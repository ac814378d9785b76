import { bench, describe } from 'vitest';
import { isKitFeasible, simulateKit } from './simulate-kit.js';
import { panelPowerSeries } from '../harvest/panel-series.js';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import type { UsbPanelSpec } from '../schemas/items.js';
import { syntheticTripSolar } from '../testing/synthetic-solar.js';
import { testBank, testBoostConverter, testLead, testPhone, testRadio, testUsbPanel } from '../testing/fixtures.js';

// 10 kit lines: 3 panels, 3 banks, 1 boost converter, 3 leads; a radio, a phone and a messenger; 4 design skies.
function tenItemKit(): KitEntry[] {
  return [
    {
      itemId: 'panel-a',
      count: 1,
      spec: testUsbPanel({ ratedW: 10, outputPort: { connector: 'usb-c', captiveCable: true } }),
    },
    { itemId: 'panel-b', count: 1, spec: testUsbPanel({ ratedW: 21, portMaxA: 3 }) },
    {
      itemId: 'panel-c',
      count: 2,
      spec: testUsbPanel({ ratedW: 6, outputPort: { connector: 'usb-c', captiveCable: true } }),
    },
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

for (const nights of [14, 60]) {
  const solar = syntheticTripSolar({ nights, cloudyRunDays: 3 });
  const kit = tenItemKit();
  const cache = new Map(
    kit.filter((e) => e.spec.kind === 'panel').map((e) => [e.itemId, panelPowerSeries(e.spec as UsbPanelSpec, solar)]),
  );
  const input = { solar, kit, devices, reserveShare: 0.1 };
  describe(`${nights} nights, 10 items, 4 design skies`, () => {
    bench('simulateKit (full ledger, schedule, series)', () => {
      simulateKit(input);
    });
    bench('simulateKit with harvest precomputed per panel', () => {
      simulateKit({ ...input, options: { panelSeriesCache: cache } });
    });
    bench('isKitFeasible with harvest precomputed', () => {
      isKitFeasible({ ...input, options: { panelSeriesCache: cache } });
    });
  });
}
