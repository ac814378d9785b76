import fc from 'fast-check';
import { bankSpecSchema, converterSpecSchema, leadSpecSchema, usbPanelSpecSchema } from '../schemas/items.js';
import { deviceSpecSchema, type DeviceSpec } from '../schemas/devices.js';
import type { KitEntry, KitItemSpec, TripDevice } from '../schemas/kit.js';
import type { Connector } from '../schemas/ports.js';
import { batterySpecSchema, controllerSpecSchema, twelveVoltPanelSpecSchema } from '../schemas/station-items.js';
import { syntheticTripSolar } from './synthetic-solar.js';

/** fast-check generators of schema-valid items, devices, kits and synthetic trips for property tests. */

const usbConnectors: Connector[] = ['usb-a', 'usb-c', 'micro-usb'];
// Weighted like real gear: USB-C most common, then USB-A, then micro-USB.
const connector = fc.oneof(
  { weight: 5, arbitrary: fc.constant<Connector>('usb-c') },
  { weight: 3, arbitrary: fc.constant<Connector>('usb-a') },
  { weight: 2, arbitrary: fc.constant<Connector>('micro-usb') },
);
const port = fc.record({ connector, captiveCable: fc.boolean() });
/** A number spread evenly over [min, max] (fc.double leans hard towards the ends and tiny values). */
export const share = (min: number, max: number) =>
  fc.integer({ min: 0, max: 10_000 }).map((i) => min + ((max - min) * i) / 10_000);

export const panelArb = fc
  .record({
    ratedW: share(2, 40),
    portMaxA: share(0.5, 3),
    dropoutIrradianceWm2: share(0, 250),
    tempCoeffPctPerC: share(-0.5, -0.2),
    outputPort: port,
    massG: fc.integer({ min: 50, max: 1500 }),
  })
  .map((p) => usbPanelSpecSchema.parse({ kind: 'panel', panelType: 'usb', portVolts: 5, ...p }));

const outputPortArb = fc.record({
  connector: fc.constantFrom<Connector>('usb-a', 'usb-c'),
  captiveCable: fc.boolean(),
  volts: fc.constant(5),
  maxA: share(0.5, 3),
  usbPdVolts: fc.subarray([9, 12]),
});

export const bankArb = fc
  .record({
    capacityMah: fc.integer({ min: 1000, max: 30000 }),
    inputMaxW: share(3, 30),
    inputPort: port,
    outputPorts: fc.array(outputPortArb, { minLength: 1, maxLength: 2 }),
    outputEfficiency: share(0.6, 1),
    chargeEfficiency: share(0.6, 1),
    massG: fc.integer({ min: 50, max: 700 }),
  })
  .map((b) => bankSpecSchema.parse({ kind: 'bank', ...b }));

export const converterArb = fc
  .record({
    inputVolts: fc.constantFrom(5, 9, 12),
    outputVolts: share(12.5, 13.8),
    maxOutputA: share(0.2, 2),
    efficiency: share(0.7, 0.95),
    inputPort: port,
    outputPort: fc.record({
      connector: fc.constantFrom<Connector>('barrel-5.5x2.1', 'radio-dc'),
      captiveCable: fc.boolean(),
    }),
    massG: fc.integer({ min: 20, max: 150 }),
  })
  .map((c) => converterSpecSchema.parse({ kind: 'converter', converterType: 'boost', ...c }));

export const leadArb = fc
  .record({
    fromConnector: fc.constantFrom<Connector>('usb-a', 'usb-c', 'usb-c', 'barrel-5.5x2.1'),
    toConnector: fc.constantFrom<Connector>(...usbConnectors, 'usb-c', 'barrel-5.5x2.1', 'radio-dc'),
    lengthM: share(0.1, 2),
    massG: fc.integer({ min: 5, max: 80 }),
  })
  .map((l) => leadSpecSchema.parse({ kind: 'lead', ...l }));

// The 12 V path's gear, kept out of `kitItemArb` so the USB-only properties keep their seeds; `bothPathsItemArb` mixes it in.

const dcConnector = fc.constantFrom<Connector>('ring-terminal', '12v-accessory', 'barrel-5.5x2.1', 'radio-dc', 'other');
const dcPort = fc.record({ connector: dcConnector, captiveCable: fc.boolean() });

/** A 12 V battery pack of any chemistry, with or without the maker's ratings. */
export const batteryArb = fc
  .record({
    chemistry: fc.constantFrom('lipo', 'li-ion', 'lifepo4', 'lead-acid') as fc.Arbitrary<
      'lipo' | 'li-ion' | 'lifepo4' | 'lead-acid'
    >,
    cellsInSeries: fc.integer({ min: 1, max: 12 }),
    capacityAh: share(0.5, 40),
    chargeCRate: fc.option(share(0.05, 3), { nil: undefined }),
    dischargeCRate: fc.option(share(0.2, 30), { nil: undefined }),
    ratedHours: fc.option(share(1, 20), { nil: undefined }),
    peukertExponent: fc.option(share(1, 1.4), { nil: undefined }),
    port: dcPort,
    massG: fc.integer({ min: 100, max: 5000 }),
  })
  .map((b) => batterySpecSchema.parse({ kind: 'battery', ...b }));

/** A PWM or MPPT charge controller. */
export const controllerArb = fc
  .record({
    controllerType: fc.constantFrom('pwm', 'mppt') as fc.Arbitrary<'pwm' | 'mppt'>,
    maxInputVolts: share(20, 100),
    maxChargeA: share(1, 30),
    efficiency: share(0.85, 0.99),
    inputPort: dcPort,
    outputPort: dcPort,
    massG: fc.integer({ min: 30, max: 800 }),
  })
  .map((c) => controllerSpecSchema.parse({ kind: 'controller', ...c }));

/** A 12 V panel whose Vmp × Imp matches its rating (within the schema's 10 %). */
export const twelveVoltPanelArb = fc
  .record({
    ratedW: share(5, 120),
    maxPowerVolts: share(15, 19),
    vocOverVmp: share(1.1, 1.35),
    labelSlack: share(0.95, 1.05),
    iscOverImp: fc.option(share(1, 1.15), { nil: undefined }),
    tempCoeffPctPerC: share(-0.5, -0.3),
    tempCoeffVocPctPerC: share(-0.4, -0.25),
    dropoutIrradianceWm2: share(0, 100),
    outputPort: dcPort,
    massG: fc.integer({ min: 200, max: 4000 }),
  })
  .map(({ vocOverVmp, labelSlack, iscOverImp, ...p }) => {
    const maxPowerAmps = (p.ratedW / p.maxPowerVolts) * labelSlack;
    return twelveVoltPanelSpecSchema.parse({
      kind: 'panel',
      panelType: '12v',
      ...p,
      maxPowerAmps,
      openCircuitVolts: p.maxPowerVolts * vocOverVmp,
      ...(iscOverImp === undefined ? {} : { shortCircuitAmps: maxPowerAmps * iscOverImp }),
    });
  });

/** A DC lead with its gauge and fuse (each sometimes left out). */
export const dcLeadArb = fc
  .record({
    fromConnector: dcConnector,
    toConnector: dcConnector,
    lengthM: share(0.2, 5),
    gaugeAwg: fc.option(fc.integer({ min: 10, max: 24 }), { nil: undefined }),
    fuseA: fc.option(fc.constantFrom(3, 5, 7.5, 10, 15, 20), { nil: undefined }),
    massG: fc.integer({ min: 10, max: 300 }),
  })
  .map((l) => leadSpecSchema.parse({ kind: 'lead', ...l }));

export const kitItemArb: fc.Arbitrary<KitItemSpec> = fc.oneof(
  { weight: 3, arbitrary: panelArb },
  { weight: 4, arbitrary: bankArb },
  { weight: 2, arbitrary: converterArb },
  { weight: 3, arbitrary: leadArb },
);

const usbDeviceArb = fc
  .record({
    deviceKind: fc.constantFrom('phone', 'messenger', 'headlamp', 'camera') as fc.Arbitrary<DeviceSpec['deviceKind']>,
    ownBatteryWh: share(1, 25),
    chargesVia: fc.constantFrom('usb-5v', 'usb-pd') as fc.Arbitrary<DeviceSpec['chargesVia']>,
    chargePowerW: share(2, 20),
    chargeEfficiency: share(0.7, 0.95),
    chargePort: port,
    share: share(0, 1.5),
  })
  .map(({ share: batterySharePerDay, ...d }) =>
    deviceSpecSchema.parse({ kind: 'device', ...d, useProfile: { basis: 'battery-share', batterySharePerDay } }),
  );

const radioArb = fc
  .record({
    ownBatteryWh: share(5, 20),
    chargeCurrentA: share(0.2, 1.5),
    chargeEfficiency: share(0.7, 0.95),
    chargePort: fc.record({
      connector: fc.constantFrom<Connector>('barrel-5.5x2.1', 'radio-dc'),
      captiveCable: fc.boolean(),
    }),
    transmitCurrentA: share(0.8, 2),
    receiveCurrentA: share(0.1, 0.5),
    standbyCurrentA: share(0.01, 0.1),
    tx: share(0, 60),
    rx: share(0, 4),
    sb: share(0, 12),
  })
  .map(({ tx, rx, sb, ...d }) =>
    deviceSpecSchema.parse({
      kind: 'device',
      deviceKind: 'radio',
      chargesVia: '12v-dc',
      supplyVoltsNominal: 13.8,
      supplyVoltsMin: 11,
      supplyVoltsMax: 16,
      ...d,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: tx, receiveHoursPerDay: rx, standbyHoursPerDay: sb },
    }),
  );

export const deviceArb: fc.Arbitrary<DeviceSpec> = fc.oneof(
  { weight: 3, arbitrary: usbDeviceArb },
  { weight: 1, arbitrary: radioArb },
);

/** Leads most hikers carry; half the generated kits hold them, so that charging paths exist often enough to matter. */
const commonLeads = [
  leadSpecSchema.parse({ kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 }),
  leadSpecSchema.parse({ kind: 'lead', fromConnector: 'usb-c', toConnector: 'usb-c', lengthM: 0.3, massG: 15 }),
  leadSpecSchema.parse({ kind: 'lead', fromConnector: 'usb-a', toConnector: 'micro-usb', lengthM: 0.3, massG: 15 }),
];

/** A kit from a list of item specs (each its own line, count 1–2), half the time with the common leads. */
export const kitArb = (maxLines = 6, itemArb: fc.Arbitrary<KitItemSpec> = kitItemArb): fc.Arbitrary<KitEntry[]> =>
  fc
    .tuple(
      fc.array(fc.record({ spec: itemArb, count: fc.integer({ min: 1, max: 2 }) }), {
        maxLength: maxLines,
        size: 'max',
      }),
      fc.boolean(),
    )
    .map(([lines, withCommonLeads]) => [
      ...lines.map((l, i) => ({ itemId: `item-${i}`, count: l.count, spec: l.spec })),
      ...(withCommonLeads ? commonLeads.map((spec, i) => ({ itemId: `common-lead-${i}`, count: 1, spec })) : []),
    ]);

export const devicesArb: fc.Arbitrary<TripDevice[]> = fc
  .array(deviceArb, { minLength: 1, maxLength: 2 })
  .map((ds) => ds.map((spec, i) => ({ deviceId: `device-${i}`, spec })));

/** A synthetic trip: nights, peak irradiance, temperatures (some freezing), cloudy share, step length. */
export const tripArb = fc
  .record({
    nights: fc.integer({ min: 1, max: 8 }),
    peakWm2: share(0, 1100),
    lowC: share(-10, 15),
    spanC: share(0, 20),
    cloudyShare: share(0, 0.6),
    expectedShare: share(0.3, 1),
    cloudyRunDays: fc.integer({ min: 1, max: 4 }),
    walkStartHour: fc.integer({ min: 5, max: 10 }),
    walkHours: fc.integer({ min: 4, max: 11 }),
  })
  .map((t) =>
    syntheticTripSolar({
      nights: t.nights,
      peakWm2: t.peakWm2,
      lowC: t.lowC,
      highC: t.lowC + t.spanC,
      cloudyShare: t.cloudyShare,
      expectedShare: t.expectedShare,
      cloudyRunDays: t.cloudyRunDays,
      walkStartHour: t.walkStartHour,
      walkEndHour: t.walkStartHour + t.walkHours,
    }),
  );

// ── The 12 V path wired to fit ─────────────────────────────────────────────────────────────────────────────────
// Random DC connectors seldom join, so these generate station gear that fits together most of the time: a 12 V-class
// pack with ring terminals, a controller from a 12 V accessory socket to captive rings, a 12 V panel with a captive
// accessory plug, a DC lead from rings to the radios' sockets, and a 12 V → USB adapter.

/** A 12 V-class pack (3S or 4S lithium, 4S LiFePO₄, 6-cell lead-acid) with ring terminals. */
export const wiredPackArb = fc
  .record({
    pack: fc.constantFrom(
      { chemistry: 'lifepo4', cellsInSeries: 4 },
      { chemistry: 'lipo', cellsInSeries: 3 },
      { chemistry: 'lipo', cellsInSeries: 4 },
      { chemistry: 'li-ion', cellsInSeries: 3 },
      { chemistry: 'lead-acid', cellsInSeries: 6 },
    ),
    capacityAh: share(1, 12),
    chargeCRate: fc.option(share(0.1, 2), { nil: undefined }),
    dischargeCRate: fc.option(share(0.5, 10), { nil: undefined }),
    massG: fc.integer({ min: 200, max: 3000 }),
  })
  .map(({ pack, ...b }) =>
    batterySpecSchema.parse({
      kind: 'battery',
      ...pack,
      ...b,
      port: { connector: 'ring-terminal', captiveCable: false },
    }),
  );

/** A controller between a 12 V accessory socket and captive ring terminals. */
export const wiredControllerArb = controllerArb.map((c) => ({
  ...c,
  inputPort: { connector: '12v-accessory' as const, captiveCable: false },
  outputPort: { connector: 'ring-terminal' as const, captiveCable: true },
}));

/** A 12 V panel with a captive 12 V accessory plug. */
export const wiredTwelveVoltPanelArb = twelveVoltPanelArb.map((p) => ({
  ...p,
  outputPort: { connector: '12v-accessory' as const, captiveCable: true },
}));

/** A DC lead from ring terminals to a radio's barrel or DC socket. */
export const wiredDcLeadArb = dcLeadArb.chain((l) =>
  fc
    .constantFrom<Connector>('barrel-5.5x2.1', 'radio-dc')
    .map((to) => ({ ...l, fromConnector: 'ring-terminal' as const, toConnector: to })),
);

/** A 12 V → USB adapter: captive rings in, a USB-A socket out. */
export const usbAdapterArb = fc
  .record({ maxOutputA: share(1, 3), efficiency: share(0.8, 0.95), massG: fc.integer({ min: 15, max: 80 }) })
  .map((a) =>
    converterSpecSchema.parse({
      kind: 'converter',
      converterType: '12v-to-usb',
      inputVolts: 12,
      outputVolts: 5,
      ...a,
      inputPort: { connector: 'ring-terminal', captiveCable: true },
      outputPort: { connector: 'usb-a', captiveCable: false },
    }),
  );

/** Any item of either path: the USB items of `kitItemArb` and the 12 V gear, mostly wired to fit. */
export const bothPathsItemArb: fc.Arbitrary<KitItemSpec> = fc.oneof(
  { weight: 6, arbitrary: kitItemArb },
  { weight: 2, arbitrary: wiredPackArb },
  { weight: 2, arbitrary: wiredControllerArb },
  { weight: 2, arbitrary: wiredTwelveVoltPanelArb },
  { weight: 2, arbitrary: wiredDcLeadArb },
  { weight: 1, arbitrary: usbAdapterArb },
  { weight: 1, arbitrary: fc.oneof(batteryArb, controllerArb, twelveVoltPanelArb, dcLeadArb) },
);

/** A kit of both paths (each line count 1–2), half the time with the common leads. */
export const bothPathsKitArb = (maxLines = 7): fc.Arbitrary<KitEntry[]> => kitArb(maxLines, bothPathsItemArb);

/** Trip devices where radios may run live from a pack. */
export const bothPathsDevicesArb: fc.Arbitrary<TripDevice[]> = fc
  .array(fc.tuple(deviceArb, fc.boolean()), { minLength: 1, maxLength: 2 })
  .map((ds) =>
    ds.map(([spec, live], i) => ({
      deviceId: `device-${i}`,
      spec: spec.chargesVia === '12v-dc' ? { ...spec, canRunLive: live } : spec,
    })),
  );
