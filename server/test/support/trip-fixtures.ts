import { type BankSpec, bankSpecSchema, type DeviceSpec, deviceSpecSchema, type ItemSpec } from '@gramwatt/shared';
import type request from 'supertest';
import type { Database } from '../../src/database/database.types';
import { type LockerItemRow, lockerItems } from '../../src/database/schema';
import { type TestApp, insertAccount, signInToken } from './test-app';

/** Invented test devices (no real products): inputs for tests, never check values. */
export function testRadioSpec(overrides: Partial<DeviceSpec> = {}): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'radio',
    ownBatteryWh: 14.8,
    chargesVia: '12v-dc',
    chargeCurrentA: 0.5,
    chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false },
    supplyVoltsNominal: 13.8,
    supplyVoltsMin: 11,
    supplyVoltsMax: 16,
    transmitCurrentA: 1.6,
    receiveCurrentA: 0.35,
    standbyCurrentA: 0.08,
    massG: 380,
    useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 8 },
    ...overrides,
  });
}

export function testPhoneSpec(overrides: Partial<DeviceSpec> = {}): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'phone',
    ownBatteryWh: 15,
    chargesVia: 'usb-5v',
    chargePowerW: 10,
    chargePort: { connector: 'usb-c', captiveCable: false },
    massG: 190,
    useProfile: { basis: 'battery-share', batterySharePerDay: 0.5 },
    ...overrides,
  });
}

/** An invented 10,000 mAh bank (no real product): an input for tests, never a check value. */
export function testBankSpec(overrides: Partial<BankSpec> = {}): BankSpec {
  return bankSpecSchema.parse({
    kind: 'bank',
    capacityMah: 10000,
    cellVolts: 3.7,
    inputMaxW: 18,
    inputPort: { connector: 'usb-c', captiveCable: false },
    outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3 }],
    outputEfficiency: 0.85,
    chargeEfficiency: 0.9,
    massG: 190,
    ...overrides,
  });
}

/**
 * When items written straight to the database were written: before the test clock's start (`TestClock`), as if the
 * member had set up the locker earlier — the database's own `now()` would put them after every change a test makes.
 */
export const fixtureWrittenAt = new Date('2026-01-01T00:00:00.000Z');

/** A locker item inserted directly (as the seed does). */
export async function insertLockerItem(
  db: Database,
  ownerId: string,
  spec: ItemSpec,
  name = `${spec.kind} ${Math.random().toString(36).slice(2, 6)}`,
): Promise<LockerItemRow> {
  const [row] = await db
    .insert(lockerItems)
    .values({
      ownerId,
      kind: spec.kind,
      name,
      spec,
      countOwned: 1,
      massG: Math.round(spec.massG ?? 0),
      createdAt: fixtureWrittenAt,
      updatedAt: fixtureWrittenAt,
      specChangedAt: fixtureWrittenAt,
    })
    .returning();
  if (!row) throw new Error('insert returned no row');
  return row;
}

/** A minimal valid trip body: the place and dates, everything else by default. */
export function tripBody(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name: 'Lakes traverse',
    latitudeDeg: 61.2,
    longitudeDeg: 8.4,
    timeZone: 'Europe/Oslo',
    startDate: '2026-07-10',
    nights: 4,
    ...overrides,
  };
}

/** A member signed in, with a bearer header for supertest. */
export interface Hiker {
  id: string;
  email: string;
  auth: { Authorization: string };
}

export async function signedInHiker(t: TestApp, role: 'member' | 'admin' = 'member'): Promise<Hiker> {
  const account = await insertAccount(t.db, { role });
  const token = await signInToken(t, account.email);
  return { id: account.id, email: account.email, auth: { Authorization: `Bearer ${token}` } };
}

/** Creates a trip through the API and returns its body. */
export async function createTrip(t: TestApp, hiker: Hiker, overrides: Record<string, unknown> = {}) {
  const response: request.Response = await t
    .http()
    .post('/api/trips')
    .set(hiker.auth)
    .send(tripBody(overrides))
    .expect(201);
  return response.body.trip as { id: string; [key: string]: unknown };
}

/** The field paths of a 400 answer. */
export function errorPaths(response: request.Response): string[] {
  return (response.body.errors as { path: string }[]).map((error) => error.path).sort();
}

/** Changes a locker item's spec through the locker API, as the member would (name, notes and count kept). */
export async function editLockerSpec(
  t: TestApp,
  hiker: Hiker,
  itemId: string,
  change: (spec: Record<string, number>) => object,
): Promise<void> {
  const current = await t.http().get(`/api/locker/items/${itemId}`).set(hiker.auth).expect(200);
  const { name, notes, countOwned, spec } = current.body.item;
  await t
    .http()
    .put(`/api/locker/items/${itemId}`)
    .set(hiker.auth)
    .send({ name, notes, countOwned, spec: change(spec) })
    .expect(200);
}
