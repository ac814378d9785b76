import { resolve } from 'node:path';
import { type LockerItemInputRaw, lockerItemInputSchema } from '@gramwatt/shared';
import type { Database } from '../../src/database/database.types';
import { type LockerItemRow, lockerItems } from '../../src/database/schema';
import type { TestApp } from './test-app';
import { type Hiker, createTrip, fixtureWrittenAt } from './trip-fixtures';

/**
 * An invented radio operator's locker and five-night high route, shaped like the demo scenario (USB panels,
 * banks, two boost converters for a 12 V-charged handheld, leads, a phone, a messenger and a headlamp). Inputs
 * for the plan tests and the plans bench, never check values; every name is our own.
 */

const socket = (connector: 'usb-a' | 'usb-c' | 'micro-usb' | 'barrel-5.5x2.1' | 'radio-dc') => ({
  connector,
  captiveCable: false,
});
const cable = (connector: 'usb-a' | 'usb-c' | 'barrel-5.5x2.1') => ({ connector, captiveCable: true });

/** The power gear: what the plan may pick from. */
export const planGear: readonly LockerItemInputRaw[] = [
  {
    name: 'Brackenfold 10 W panel',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 10,
      portVolts: 5,
      portMaxA: 2,
      dropoutIrradianceWm2: 60,
      tempCoeffPctPerC: -0.4,
      outputPort: socket('usb-a'),
      massG: 290,
    },
  },
  {
    name: 'Wrenleaf 6 W panel',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 6,
      portVolts: 5,
      portMaxA: 1.2,
      dropoutIrradianceWm2: 80,
      tempCoeffPctPerC: -0.45,
      outputPort: socket('usb-a'),
      massG: 165,
    },
  },
  {
    name: 'Harebell 21 W three-fold',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 21,
      portVolts: 5,
      portMaxA: 3,
      dropoutIrradianceWm2: 50,
      tempCoeffPctPerC: -0.38,
      outputPort: socket('usb-c'),
      massG: 520,
    },
  },
  {
    name: 'Knoll 10 000 mAh bank',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 10_000,
      cellVolts: 3.7,
      inputMaxW: 18,
      inputPort: socket('usb-c'),
      outputPorts: [
        { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
        { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] },
      ],
      outputEfficiency: 0.85,
      chargeEfficiency: 0.9,
      massG: 190,
    },
  },
  {
    name: 'Knoll 20 000 mAh bank',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 20_000,
      cellVolts: 3.7,
      inputMaxW: 20,
      inputPort: socket('usb-c'),
      outputPorts: [
        { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
        { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12, 15] },
      ],
      outputEfficiency: 0.86,
      chargeEfficiency: 0.9,
      massG: 350,
    },
  },
  {
    name: 'Acorn 5 000 mAh bank',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 5000,
      cellVolts: 3.7,
      inputMaxW: 10,
      inputPort: socket('usb-c'),
      outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.1 }],
      outputEfficiency: 0.82,
      chargeEfficiency: 0.88,
      massG: 105,
    },
  },
  {
    name: 'Lift 5 V → 13.8 V boost cable',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 5,
      outputVolts: 13.8,
      maxOutputA: 0.6,
      efficiency: 0.83,
      inputPort: cable('usb-a'),
      outputPort: cable('barrel-5.5x2.1'),
      massG: 45,
    },
  },
  {
    name: 'Lift PD 9 V → 12 V boost',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 9,
      outputVolts: 12,
      maxOutputA: 1.25,
      efficiency: 0.88,
      inputPort: cable('usb-c'),
      outputPort: socket('barrel-5.5x2.1'),
      massG: 38,
    },
  },
  {
    name: 'USB-A to USB-C lead, 30 cm',
    countOwned: 2,
    spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 },
  },
  {
    name: 'USB-C to USB-C lead, 1 m',
    countOwned: 1,
    spec: { kind: 'lead', fromConnector: 'usb-c', toConnector: 'usb-c', lengthM: 1, massG: 28 },
  },
  {
    name: 'USB-A to micro-USB lead, 30 cm',
    countOwned: 1,
    spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'micro-usb', lengthM: 0.3, massG: 14 },
  },
  {
    name: 'Barrel to radio DC lead, 1 m',
    countOwned: 1,
    spec: { kind: 'lead', fromConnector: 'barrel-5.5x2.1', toConnector: 'radio-dc', lengthM: 1, massG: 45 },
  },
];

/** The devices, each with the trip's change to its use profile (or none). */
export const planDevices: readonly { item: LockerItemInputRaw; useProfileOverride?: Record<string, number> }[] = [
  {
    item: {
      name: 'Handheld radio, 5 W',
      countOwned: 1,
      spec: {
        kind: 'device',
        deviceKind: 'radio',
        ownBatteryWh: 13.3,
        chargesVia: '12v-dc',
        chargeCurrentA: 0.6,
        chargeEfficiency: 0.8,
        chargePort: socket('radio-dc'),
        supplyVoltsNominal: 13.8,
        supplyVoltsMin: 11,
        supplyVoltsMax: 16,
        transmitCurrentA: 1.5,
        receiveCurrentA: 0.15,
        standbyCurrentA: 0.05,
        canRunLive: true,
        massG: 310,
        useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
      },
    },
    useProfileOverride: { transmitMinutesPerDay: 35, receiveHoursPerDay: 3 },
  },
  {
    item: {
      name: 'Route phone',
      countOwned: 1,
      spec: {
        kind: 'device',
        deviceKind: 'phone',
        ownBatteryWh: 17.3,
        chargesVia: 'usb-pd',
        chargePowerW: 18,
        usbPdVolts: 9,
        chargeEfficiency: 0.85,
        chargePort: socket('usb-c'),
        massG: 190,
        useProfile: { basis: 'battery-share', batterySharePerDay: 0.6 },
      },
    },
  },
  {
    item: {
      name: 'Satellite messenger',
      countOwned: 1,
      spec: {
        kind: 'device',
        deviceKind: 'messenger',
        ownBatteryWh: 4.6,
        chargesVia: 'usb-5v',
        chargePowerW: 5,
        chargeEfficiency: 0.85,
        chargePort: socket('usb-c'),
        massG: 115,
        useProfile: { basis: 'battery-share', batterySharePerDay: 0.15 },
      },
    },
  },
  {
    item: {
      name: 'Camp headlamp',
      countOwned: 1,
      spec: {
        kind: 'device',
        deviceKind: 'headlamp',
        ownBatteryWh: 5.6,
        chargesVia: 'usb-5v',
        chargePowerW: 5,
        chargeEfficiency: 0.85,
        chargePort: socket('micro-usb'),
        massG: 82,
        useProfile: { basis: 'energy', energyWhPerDay: 1.2 },
      },
    },
    useProfileOverride: { energyWhPerDay: 0.8 },
  },
];

/** The five-night high route (an invented place in subtropical high country), as a trip body. */
export function planTripBody(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name: 'Lamplight Tarns high route',
    latitudeDeg: -29.45,
    longitudeDeg: 29.35,
    timeZone: 'Africa/Maseru',
    startDate: '2026-12-10',
    nights: 5,
    walkWindow: { start: '08:30', end: '16:00' },
    campWindow: { start: '16:00', end: '08:30' },
    walkingBearingsDeg: [20],
    skyPresetId: 'mixed',
    temperatures: { lowC: 2, highC: 16 },
    elevationM: 2800,
    gramLimitG: 1400,
    ...overrides,
  };
}

/** Inserts locker items for `ownerId` (as the seed does), validated by the locker schema. */
export async function insertLockerItems(
  db: Database,
  ownerId: string,
  items: readonly LockerItemInputRaw[],
): Promise<LockerItemRow[]> {
  const rows: LockerItemRow[] = [];
  for (const raw of items) {
    const item = lockerItemInputSchema.parse(raw);
    const [row] = await db
      .insert(lockerItems)
      .values({
        ownerId,
        kind: item.spec.kind,
        name: item.name,
        notes: item.notes,
        spec: item.spec,
        countOwned: item.countOwned,
        massG: Math.round(item.spec.massG ?? 0),
        createdAt: fixtureWrittenAt,
        updatedAt: fixtureWrittenAt,
        specChangedAt: fixtureWrittenAt,
      })
      .returning();
    if (!row) throw new Error('insert returned no row');
    rows.push(row);
  }
  return rows;
}

/** The held worker (see `held-plan-solver.worker.mjs`): every task holds its thread 2 s, then solves. */
export const heldPlanWorkerFile = resolve(__dirname, 'held-plan-solver.worker.mjs');

/** The invented high route with the leader's gear and devices, as a member sets it up through the API. */
export async function highRoute(t: TestApp, leader: Hiker) {
  const gear = await insertLockerItems(t.db, leader.id, planGear);
  const devices = await insertLockerItems(
    t.db,
    leader.id,
    planDevices.map((d) => d.item),
  );
  const trip = await createTrip(t, leader, planTripBody());
  for (const [i, device] of devices.entries()) {
    await t
      .http()
      .post(`/api/trips/${trip.id}/devices`)
      .set(leader.auth)
      .send({ itemId: device.id, useProfileOverride: planDevices[i]?.useProfileOverride ?? null })
      .expect(201);
  }
  return { trip, gear, devices };
}
