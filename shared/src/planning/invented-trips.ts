/**
 * Seeded random planning inputs for the planning-level tests, the benchmarks and a solver thread's warm-up: a trip
 * somewhere between 60° S and 66° N
 * in any season, its sky, temperatures and devices, and a locker of invented USB panels, banks, boost converters and
 * leads (connectors that match, and some that do not). Everything comes from the generator passed in; the same seed
 * gives the same input. The items are invented and their figures are rough ranges of small hiking gear
 * (`common practice` / `from memory`), not products or check values.
 */
import type { PlanningGear, PlanningInput } from './planning-input.js';
import { deviceSpecSchema, type DeviceSpec } from '../schemas/devices.js';
import {
  bankSpecSchema,
  converterSpecSchema,
  leadSpecSchema,
  usbPanelSpecSchema,
  type LeadSpec,
} from '../schemas/items.js';
import type { KitItemSpec, TripDevice } from '../schemas/kit.js';
import type { Connector, OutputPort, Port } from '../schemas/ports.js';
import { batterySpecSchema, controllerSpecSchema, twelveVoltPanelSpecSchema } from '../schemas/station-items.js';
import { tripSolarInputSchema, type TripSolarInput } from '../schemas/trip-solar.js';
import { skyPresets } from '../sky/sky-presets.js';
import { minCloudyPersistence } from '../sky/cloud-chain.js';

/** A uniform generator on [0, 1), e.g. `seededRandom(seed)` of the optimiser's synthetic world. */
export type Random = () => number;

const between = (random: Random, min: number, max: number): number => min + (max - min) * random();
const whole = (random: Random, min: number, max: number): number => Math.floor(between(random, min, max + 1));
const pick = <T>(random: Random, list: readonly T[]): T =>
  list[Math.min(list.length - 1, Math.floor(random() * list.length))] as T;
const chance = (random: Random, p: number): boolean => random() < p;
/** Round to a tenth, so generated inputs print readably and stay exact in JSON. */
const tenth = (x: number): number => Math.round(x * 10) / 10;
const hundredth = (x: number): number => Math.round(x * 100) / 100;

/** Options of a random trip. */
export interface RandomTripOptions {
  /** Nights, inclusive range (default 1–10). */
  nights?: readonly [number, number];
  /** Latitude range, ° (default −60…66). */
  latitudeDeg?: readonly [number, number];
}

/**
 * A random trip's sun and sky input: latitude, longitude with the matching whole-hour `Etc/GMT` zone, a start date in
 * 2027, a sky preset or random chain values (always a valid chain), canopy shade, carry modes, and daily temperatures
 * roughly fitting the latitude and season (one pair for the trip, or one per day).
 * @example randomTripSolarInput(seededRandom(1)).nights // 1…10
 */
export function randomTripSolarInput(random: Random, options: RandomTripOptions = {}): TripSolarInput {
  const [minNights, maxNights] = options.nights ?? [1, 10];
  const [minLat, maxLat] = options.latitudeDeg ?? [-60, 66];
  const latitudeDeg = tenth(between(random, minLat, maxLat));
  const longitudeDeg = tenth(between(random, -179, 179));
  const offsetH = Math.round(longitudeDeg / 15);
  // Etc/GMT zones have inverted signs: Etc/GMT-5 is UTC+5.
  const timeZone = offsetH === 0 ? 'Etc/GMT' : `Etc/GMT${offsetH > 0 ? '-' : '+'}${Math.abs(offsetH)}`;
  const month = whole(random, 1, 12);
  const day = whole(random, 1, 28);
  const startDate = `2027-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
  let sky;
  if (chance(random, 0.5)) {
    sky = { ...pick(random, skyPresets).values };
  } else {
    const clearShare = hundredth(between(random, 0.1, 0.9));
    const minQ = minCloudyPersistence(clearShare);
    const cloudyPersistence = hundredth(Math.min(0.95, between(random, Math.max(0.05, minQ + 0.01), 0.95)));
    sky = {
      clearShare,
      cloudyPersistence,
      cloudyTransmission: hundredth(between(random, 0.05, 0.4)),
      canopyShade: chance(random, 0.6) ? 0 : hundredth(between(random, 0, 0.6)),
      designLikelihood: pick(random, [0.8, 0.9, 0.95]),
    };
  }
  // A rough daily mean for the latitude and season (from memory: about 26 °C at the equator, falling with latitude,
  // with a seasonal swing that grows towards the poles), a few degrees colder or warmer for height and weather.
  const summerness = Math.cos((2 * Math.PI * (month - 7)) / 12) * Math.sign(latitudeDeg || 1);
  const meanC =
    26 - 0.35 * Math.abs(latitudeDeg) + (Math.abs(latitudeDeg) / 60) * 12 * summerness + between(random, -8, 4);
  const rangeC = between(random, 6, 14);
  const days = whole(random, minNights, maxNights) + 1;
  const perDay = chance(random, 0.2);
  const dayShift = Array.from({ length: days }, () => (perDay ? Math.round(between(random, -3, 3)) : 0));
  const lows = dayShift.map((d) => Math.round(meanC - rangeC / 2) + d);
  const highs = dayShift.map((d) => Math.round(meanC + rangeC / 2) + d);
  return tripSolarInputSchema.parse({
    latitudeDeg,
    longitudeDeg,
    timeZone,
    startDate,
    nights: days - 1,
    sky,
    carry: {
      walking: chance(random, 0.75) ? 'pack' : 'stowed',
      camp: pick(random, ['propped', 'propped', 'flat', 'stowed'] as const),
    },
    temperatures: perDay ? { lowC: lows, highC: highs } : { lowC: lows[0], highC: highs[0] },
  });
}

const socket = (connector: Connector): Port => ({ connector, captiveCable: false });
const captive = (connector: Connector): Port => ({ connector, captiveCable: true });

/** A USB panel: 5–28 W, USB-A socket or a captive USB-C or micro-USB cable; about 20–35 g per W plus 30 g (common practice). */
export function randomUsbPanel(random: Random): KitItemSpec {
  const ratedW = whole(random, 5, 28);
  const outputPort = pick(random, [
    socket('usb-a'),
    socket('usb-a'),
    captive('usb-c'),
    captive('micro-usb'),
    socket('usb-c'),
  ]);
  return usbPanelSpecSchema.parse({
    kind: 'panel',
    panelType: 'usb',
    ratedW,
    portVolts: 5,
    portMaxA: pick(random, [1, 1.5, 2, 2.4, 3]),
    dropoutIrradianceWm2: whole(random, 30, 200),
    tempCoeffPctPerC: hundredth(between(random, -0.5, -0.3)),
    outputPort,
    massG: Math.round(ratedW * between(random, 20, 35) + 30),
  });
}

/**
 * A bank: 3,000–26,800 mAh at 3.6–3.7 V, a USB-C or micro-USB input (5–20 W), a USB-A 5 V output and often a USB-C
 * output with PD; about 16–22 g per 1,000 mAh plus a shell (common practice).
 */
export function randomBank(random: Random): KitItemSpec {
  const capacityMah = pick(random, [3000, 5000, 6700, 10000, 10000, 13400, 20000, 26800]);
  const micro = chance(random, 0.25);
  const outputPorts: OutputPort[] = [
    { connector: 'usb-a', captiveCable: false, volts: 5, maxA: pick(random, [1, 2.1, 2.4]), usbPdVolts: [] },
  ];
  if (!micro && chance(random, 0.7))
    outputPorts.push({
      connector: 'usb-c',
      captiveCable: false,
      volts: 5,
      maxA: 3,
      usbPdVolts: chance(random, 0.6) ? [9, 12] : [],
    });
  return bankSpecSchema.parse({
    kind: 'bank',
    capacityMah,
    cellVolts: pick(random, [3.6, 3.7]),
    inputMaxW: micro ? pick(random, [5, 10]) : pick(random, [10, 15, 18, 20]),
    inputPort: socket(micro ? 'micro-usb' : 'usb-c'),
    outputPorts,
    outputEfficiency: hundredth(between(random, 0.78, 0.9)),
    chargeEfficiency: hundredth(between(random, 0.82, 0.95)),
    massG: Math.round((capacityMah / 1000) * between(random, 16, 22) + 30),
  });
}

/**
 * A boost converter to 12–13.8 V: a captive USB-A plug taking 5 V, or a captive USB-C plug taking 9 V USB PD; a captive 5.5×2.1 mm barrel plug or a 5.5×2.5 mm socket out (the latter does not fit every radio).
 */
export function randomBoostConverter(random: Random): KitItemSpec {
  const usbC = chance(random, 0.35);
  return converterSpecSchema.parse({
    kind: 'converter',
    converterType: 'boost',
    inputVolts: usbC ? 9 : 5,
    outputVolts: pick(random, [12, 13, 13.8]),
    maxOutputA: pick(random, [0.3, 0.5, 0.8, 1, 1.5]),
    efficiency: hundredth(between(random, 0.78, 0.92)),
    inputPort: captive(usbC ? 'usb-c' : 'usb-a'),
    outputPort: chance(random, 0.8) ? captive('barrel-5.5x2.1') : socket('barrel-5.5x2.5'),
    massG: whole(random, 25, 90),
  });
}

/** Leads hikers carry, some of which fit nothing in a given locker. */
const leadEnds: readonly (readonly [Connector, Connector])[] = [
  ['usb-a', 'usb-c'],
  ['usb-a', 'usb-c'],
  ['usb-c', 'usb-c'],
  ['usb-c', 'usb-c'],
  ['usb-a', 'micro-usb'],
  ['usb-c', 'micro-usb'],
  ['barrel-5.5x2.5', 'barrel-5.5x2.1'],
  ['barrel-5.5x2.1', 'radio-dc'],
];

/** A lead between two connectors, 0.2–1 m, 10–40 g. */
export function randomLead(random: Random): LeadSpec {
  const [fromConnector, toConnector] = pick(random, leadEnds);
  return leadSpecSchema.parse({
    kind: 'lead',
    fromConnector,
    toConnector,
    lengthM: pick(random, [0.2, 0.3, 0.5, 1]),
    massG: whole(random, 10, 40),
  });
}

/** The lead most phones charge through: USB-A to USB-C, 0.3 m. */
export function randomPhoneLead(random: Random): LeadSpec {
  return leadSpecSchema.parse({
    kind: 'lead',
    fromConnector: 'usb-a',
    toConnector: 'usb-c',
    lengthM: 0.3,
    massG: whole(random, 12, 25),
  });
}

/**
 * A 12 V-class pack with ring terminals: 4S LiFePO₄, 3S or 4S lithium polymer, or a 6-cell lead-acid battery,
 * 2–10 Ah, with about the mass of such packs (from memory: lithium 110–160 Wh/kg, lead-acid 30–40 Wh/kg).
 */
export function randomPack(random: Random): KitItemSpec {
  const pack = pick(random, [
    { chemistry: 'lifepo4', cellsInSeries: 4, whPerKg: 110 },
    { chemistry: 'lipo', cellsInSeries: 3, whPerKg: 150 },
    { chemistry: 'lipo', cellsInSeries: 4, whPerKg: 150 },
    { chemistry: 'lead-acid', cellsInSeries: 6, whPerKg: 35 },
  ] as const);
  const capacityAh = pick(random, [2, 3, 4, 5, 6, 8, 10]);
  const cellVolts = { lifepo4: 3.2, lipo: 3.7, 'lead-acid': 2 }[pack.chemistry];
  return batterySpecSchema.parse({
    kind: 'battery',
    chemistry: pack.chemistry,
    cellsInSeries: pack.cellsInSeries,
    capacityAh,
    ...(chance(random, 0.4) ? { chargeCRate: pick(random, [0.2, 0.5, 1]) } : {}),
    port: socket('ring-terminal'),
    massG: Math.round(
      ((capacityAh * cellVolts * pack.cellsInSeries) / pack.whPerKg) * 1000 * between(random, 0.9, 1.1),
    ),
  });
}

/** A PWM or MPPT controller from a 12 V accessory socket to captive ring terminals, 22–50 V input, 3–10 A. */
export function randomController(random: Random): KitItemSpec {
  return controllerSpecSchema.parse({
    kind: 'controller',
    controllerType: chance(random, 0.5) ? 'mppt' : 'pwm',
    maxInputVolts: pick(random, [22, 25, 30, 50]),
    maxChargeA: pick(random, [3, 5, 10]),
    efficiency: hundredth(between(random, 0.9, 0.97)),
    inputPort: socket('12v-accessory'),
    outputPort: captive('ring-terminal'),
    massG: whole(random, 60, 250),
  });
}

/** A 12 V-class folding panel, 10–60 W (Vmp 17–18.5 V, Voc 1.2 × Vmp), captive 12 V accessory plug, 25–35 g/W. */
export function randomTwelveVoltPanel(random: Random): KitItemSpec {
  const ratedW = pick(random, [10, 20, 30, 40, 60]);
  const maxPowerVolts = tenth(between(random, 17, 18.5));
  return twelveVoltPanelSpecSchema.parse({
    kind: 'panel',
    panelType: '12v',
    ratedW,
    maxPowerVolts,
    maxPowerAmps: hundredth(ratedW / maxPowerVolts),
    openCircuitVolts: tenth(maxPowerVolts * 1.2),
    outputPort: captive('12v-accessory'),
    massG: Math.round(ratedW * between(random, 25, 35)),
  });
}

/** A fused DC lead from ring terminals to a radio's barrel or DC socket, 16–20 AWG, 0.5–2 m. */
export function randomDcLead(random: Random): LeadSpec {
  return leadSpecSchema.parse({
    kind: 'lead',
    fromConnector: 'ring-terminal',
    toConnector: chance(random, 0.8) ? 'barrel-5.5x2.1' : 'radio-dc',
    lengthM: pick(random, [0.5, 1, 2]),
    gaugeAwg: pick(random, [16, 18, 20]),
    fuseA: 5,
    massG: whole(random, 20, 60),
  });
}

/** A 12 V → USB adapter: captive ring terminals in, a USB-A socket out (5 V, 2–3 A), 85–93 %. */
export function randomUsbAdapter(random: Random): KitItemSpec {
  return converterSpecSchema.parse({
    kind: 'converter',
    converterType: '12v-to-usb',
    inputVolts: 12,
    outputVolts: 5,
    maxOutputA: pick(random, [2, 2.4, 3]),
    efficiency: hundredth(between(random, 0.85, 0.93)),
    inputPort: captive('ring-terminal'),
    outputPort: socket('usb-a'),
    massG: whole(random, 15, 45),
  });
}

const kindMaker = {
  panel: randomUsbPanel,
  bank: randomBank,
  converter: randomBoostConverter,
  lead: randomLead,
  'phone-lead': randomPhoneLead,
  pack: randomPack,
  controller: randomController,
  'panel-12v': randomTwelveVoltPanel,
  'dc-lead': randomDcLead,
  adapter: randomUsbAdapter,
} as const;
export type GearKind = keyof typeof kindMaker;

/** Options of a random locker. */
export interface RandomLockerOptions {
  /** Item types (default 1–7 at random). */
  itemTypes?: number;
  /** Most units owned of one type (default 2). */
  maxOwned?: number;
  /** Share of each kind among the item types (default panels 0.3, banks 0.32, converters 0.1, leads 0.28). */
  mix?: Readonly<Partial<Record<GearKind, number>>>;
  /** Kinds of the first item types, before the random mix (e.g. a bank and a lead, so a phone often has a path). */
  firstKinds?: readonly GearKind[];
}

const defaultMix: Partial<Record<GearKind, number>> = { panel: 0.3, bank: 0.32, converter: 0.1, lead: 0.28 };

/**
 * A locker of invented gear with ids `panel-1`, `bank-2`, … and 1…maxOwned units each.
 * @example randomLocker(seededRandom(3), { itemTypes: 50 }).length // 50
 */
export function randomLocker(random: Random, options: RandomLockerOptions = {}): PlanningGear[] {
  const itemTypes = options.itemTypes ?? whole(random, 1, 7);
  const maxOwned = options.maxOwned ?? 2;
  const mix = options.mix ?? defaultMix;
  const kinds = Object.keys(mix) as GearKind[];
  const share = (k: GearKind): number => mix[k] ?? 0;
  const total = kinds.reduce((s, k) => s + share(k), 0);
  const numbers: Record<string, number> = {};
  const first = options.firstKinds ?? [];
  return Array.from({ length: itemTypes }, (_, i) => {
    let x = random() * total;
    let kind = first[i] ?? (kinds[kinds.length - 1] as GearKind);
    for (const k of i < first.length ? [] : kinds) {
      if (x < share(k)) {
        kind = k;
        break;
      }
      x -= share(k);
    }
    const spec: KitItemSpec = kindMaker[kind](random);
    const n = (numbers[spec.kind] = (numbers[spec.kind] ?? 0) + 1);
    const itemId = `${spec.kind}-${n}`;
    return { itemId, name: `Test ${spec.kind} ${n}`, countOwned: whole(random, 1, maxOwned), massG: spec.massG, spec };
  });
}

/** A phone: 12–19 Wh, USB-C (sometimes PD at 9 V), 10–18 W, 30–100 % of its battery a day. */
export function randomPhone(random: Random): DeviceSpec {
  const pd = chance(random, 0.3);
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'phone',
    ownBatteryWh: tenth(between(random, 12, 19)),
    chargesVia: pd ? 'usb-pd' : 'usb-5v',
    chargePowerW: whole(random, 10, 18),
    chargeEfficiency: hundredth(between(random, 0.8, 0.9)),
    chargePort: socket('usb-c'),
    useProfile: { basis: 'battery-share', batterySharePerDay: hundredth(between(random, 0.3, 1)) },
  });
}

/** A headlamp: 3–6 Wh, a micro-USB or USB-C socket or a captive USB-A plug, 2.5–5 W, 5–40 % of its battery a day. */
export function randomHeadlamp(random: Random): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'headlamp',
    ownBatteryWh: tenth(between(random, 3, 6)),
    chargesVia: 'usb-5v',
    chargePowerW: tenth(between(random, 2.5, 5)),
    chargeEfficiency: hundredth(between(random, 0.8, 0.9)),
    chargePort: pick(random, [socket('micro-usb'), socket('usb-c'), captive('usb-a')]),
    useProfile: { basis: 'battery-share', batterySharePerDay: hundredth(between(random, 0.05, 0.4)) },
  });
}

/**
 * A handheld radio charged from 12 V DC (13.8 V nominal, 11–16 V window) through a 5.5×2.1 mm barrel socket or a
 * radio DC socket: 1.2–1.8 A transmitting, 0.2–0.4 A receiving, 0.03–0.08 A on standby (from memory: 5 W handhelds).
 */
export function randomRadio(random: Random): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'radio',
    ownBatteryWh: tenth(between(random, 10, 22)),
    chargesVia: '12v-dc',
    chargeCurrentA: pick(random, [0.3, 0.5, 0.8]),
    chargeEfficiency: hundredth(between(random, 0.8, 0.9)),
    chargePort: socket(chance(random, 0.8) ? 'barrel-5.5x2.1' : 'radio-dc'),
    supplyVoltsNominal: 13.8,
    supplyVoltsMin: 11,
    supplyVoltsMax: 16,
    transmitCurrentA: tenth(between(random, 1.2, 1.8)),
    receiveCurrentA: hundredth(between(random, 0.2, 0.4)),
    standbyCurrentA: hundredth(between(random, 0.03, 0.08)),
    useProfile: {
      basis: 'radio-hours',
      transmitMinutesPerDay: whole(random, 0, 30),
      receiveHoursPerDay: tenth(between(random, 0, 3)),
      standbyHoursPerDay: tenth(between(random, 0, 10)),
    },
  });
}

/** Options of a random planning input. */
export interface RandomPlanningOptions extends RandomTripOptions, RandomLockerOptions {
  /** Chance that the trip has a 12 V radio (default 0.35). */
  radioChance?: number;
  /** Chance that a locker starts with a bank and a USB-A to USB-C lead (default 0.8), so a phone often has a charging path. */
  coreChance?: number;
  /**
   * Lockers holding both power paths: the trip always has a radio (which may run live from a pack), and the locker
   * holds 12 V packs, controllers, 12 V panels, DC leads and adapters beside the USB gear.
   */
  bothPaths?: boolean;
}

const bothPathsMix: Partial<Record<GearKind, number>> = {
  panel: 0.12,
  bank: 0.18,
  converter: 0.12,
  lead: 0.08,
  pack: 0.16,
  controller: 0.1,
  'panel-12v': 0.1,
  'dc-lead': 0.1,
  adapter: 0.04,
};

/**
 * A random planning input: a trip, 1–3 devices (a phone, often a headlamp, sometimes a 12 V radio), a locker of 3–7
 * item types (most start with a bank and a USB-A to USB-C lead), a reserve of 0–20 % and no gram limit. A locker that may hold a radio
 * gets a boost converter more often.
 * @example randomPlanningInput(seededRandom(7)).gear.length // 1…7
 */
export function randomPlanningInput(random: Random, options: RandomPlanningOptions = {}): PlanningInput {
  // Lockers of both paths hold few banks for the phone (the radio has the pack), so their trips are shorter.
  const solarInput = randomTripSolarInput(random, {
    ...(options.bothPaths ? { nights: [1, 5] as const } : {}),
    ...options,
  });
  const devices: TripDevice[] = [{ deviceId: 'phone', spec: randomPhone(random) }];
  if (chance(random, 0.5)) devices.push({ deviceId: 'headlamp', spec: randomHeadlamp(random) });
  const radio = options.bothPaths || chance(random, options.radioChance ?? 0.35);
  if (radio) {
    const spec = randomRadio(random);
    devices.push({ deviceId: 'radio', spec: options.bothPaths ? { ...spec, canRunLive: chance(random, 0.4) } : spec });
  }
  const mix =
    options.mix ??
    (options.bothPaths ? bothPathsMix : radio ? { panel: 0.27, bank: 0.3, converter: 0.18, lead: 0.25 } : defaultMix);
  const firstKinds: GearKind[] = options.bothPaths
    ? [
        'bank',
        'phone-lead',
        'pack',
        'dc-lead',
        ...(chance(random, 0.5) ? (['panel-12v', 'controller'] as const) : (['converter', 'panel'] as const)),
      ]
    : chance(random, options.coreChance ?? 0.8)
      ? [
          'bank',
          'phone-lead',
          ...(radio ? (['converter'] as const) : []),
          ...(chance(random, 0.5) ? (['panel'] as const) : []),
        ]
      : [];
  const gear = randomLocker(random, {
    itemTypes: options.itemTypes ?? (options.bothPaths ? 7 : whole(random, 3, 7)),
    ...options,
    mix,
    firstKinds,
  });
  return {
    solarInput,
    devices,
    deviceNames: { phone: 'the phone', headlamp: 'the headlamp', radio: 'the radio' },
    gear,
    reserveShare: pick(random, [0, 0, 0.1, 0.2]),
    gramLimitG: null,
  };
}

/**
 * The sun and temperatures of the invented summer trip the benchmarks use: 46.5° N from 10 July 2027, lows of 4 °C and
 * highs of 19 °C.
 * @example summerTripSolarInput(14).nights // 14
 */
export function summerTripSolarInput(nights: number): TripSolarInput {
  return tripSolarInputSchema.parse({
    latitudeDeg: 46.5,
    longitudeDeg: 9.8,
    timeZone: 'Europe/Zurich',
    startDate: '2027-07-10',
    nights,
    temperatures: { lowC: 4, highC: 19 },
  });
}

/**
 * A summer trip at 46.5° N in the "mixed" sky, with a phone, a headlamp and a 12 V radio, and a locker of `items` types
 * of invented USB gear (up to 2 owned each) — the benchmarks' planning input, and the tests' large locker.
 * @example summerTripInput(seededRandom(50), 50, 14).gear.length // 50
 */
export function summerTripInput(random: Random, items: number, nights: number): PlanningInput {
  const devices: TripDevice[] = [
    { deviceId: 'phone', spec: randomPhone(random) },
    { deviceId: 'headlamp', spec: randomHeadlamp(random) },
    { deviceId: 'radio', spec: randomRadio(random) },
  ];
  return {
    solarInput: summerTripSolarInput(nights),
    devices,
    deviceNames: { phone: 'the phone', headlamp: 'the headlamp', radio: 'the radio' },
    gear: randomLocker(random, {
      itemTypes: items,
      maxOwned: 2,
      firstKinds: ['bank', 'phone-lead', 'converter', 'panel'],
      mix: { panel: 0.25, bank: 0.35, converter: 0.12, lead: 0.28 },
    }),
    reserveShare: 0.1,
    gramLimitG: null,
  };
}
