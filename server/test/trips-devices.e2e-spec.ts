import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { lockerItems, tripDevices } from '../src/database/schema';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  editLockerSpec,
  errorPaths,
  insertLockerItem,
  signedInHiker,
  testPhoneSpec,
  testRadioSpec,
} from './support/trip-fixtures';

describe('trip devices and use-profile overrides', () => {
  let t: TestApp;
  let fern: Hiker;

  beforeAll(async () => {
    t = await startTestApp();
    fern = await signedInHiker(t);
  });

  afterAll(async () => {
    await t.close();
  });

  /** Changes a locker item's spec through the locker API, as the member would. */
  const putLockerSpec = (hiker: Hiker, itemId: string, spec: object) => editLockerSpec(t, hiker, itemId, () => spec);

  it('adds locker devices with and without an override; the effective profile falls back field by field', async () => {
    const trip = await createTrip(t, fern);
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec(), 'Ridge radio');
    const phone = await insertLockerItem(t.db, fern.id, testPhoneSpec(), 'Map phone');
    const devicesUrl = `/api/trips/${trip.id}/devices`;

    const added = await t
      .http()
      .post(devicesUrl)
      .set(fern.auth)
      .send({ itemId: radio.id, useProfileOverride: { transmitMinutesPerDay: 45 } })
      .expect(201);
    expect(added.body.device).toMatchObject({
      itemId: radio.id,
      name: 'Ridge radio',
      massG: 380,
      ownerAccountId: fern.id,
      carrierAccountId: fern.id,
      defaultUseProfile: {
        basis: 'radio-hours',
        transmitMinutesPerDay: 20,
        receiveHoursPerDay: 2,
        standbyHoursPerDay: 8,
      },
      useProfileOverride: { transmitMinutesPerDay: 45 },
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 45, receiveHoursPerDay: 2, standbyHoursPerDay: 8 },
      overriddenFields: ['transmitMinutesPerDay'],
      overrideIssues: [],
    });
    expect(added.body.device.spec).toMatchObject({ kind: 'device', deviceKind: 'radio', transmitCurrentA: 1.6 });
    t.clock.advanceS(1);
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: phone.id }).expect(201);

    const read = await t.http().get(`/api/trips/${trip.id}`).set(fern.auth).expect(200);
    expect(read.body.trip.devices.map((d: { name: string }) => d.name)).toEqual(['Ridge radio', 'Map phone']);
    expect(read.body.trip.devices[1]).toMatchObject({
      useProfileOverride: null,
      useProfile: { basis: 'battery-share', batterySharePerDay: 0.5 },
      overriddenFields: [],
    });
    const listed = await t.http().get(devicesUrl).set(fern.auth).expect(200);
    expect(listed.body.devices).toEqual(read.body.trip.devices);
  });

  it('a changed locker default reaches every trip field that was not overridden, through the API', async () => {
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec(), 'Shared radio');
    const phone = await insertLockerItem(t.db, fern.id, testPhoneSpec(), 'Shared phone');
    const overriding = await createTrip(t, fern, { name: 'overrides receive' });
    const plain = await createTrip(t, fern, { name: 'no override' });
    const post = async (tripId: string, body: object) => {
      t.clock.advanceS(1);
      await t.http().post(`/api/trips/${tripId}/devices`).set(fern.auth).send(body).expect(201);
    };
    await post(overriding.id, { itemId: radio.id, useProfileOverride: { receiveHoursPerDay: 4 } });
    await post(overriding.id, { itemId: phone.id, useProfileOverride: { batterySharePerDay: 0.3 } });
    await post(plain.id, { itemId: radio.id });
    await post(plain.id, { itemId: phone.id });

    await putLockerSpec(fern, radio.id, {
      ...testRadioSpec(),
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 30, receiveHoursPerDay: 3, standbyHoursPerDay: 6 },
    });
    await putLockerSpec(
      fern,
      phone.id,
      testPhoneSpec({ useProfile: { basis: 'battery-share', batterySharePerDay: 0.8 } }),
    );

    const effective = async (tripId: string) => {
      const response = await t.http().get(`/api/trips/${tripId}`).set(fern.auth).expect(200);
      return response.body.trip.devices.map((d: { useProfile: unknown }) => d.useProfile);
    };
    expect(await effective(overriding.id)).toEqual([
      { basis: 'radio-hours', transmitMinutesPerDay: 30, receiveHoursPerDay: 4, standbyHoursPerDay: 6 },
      { basis: 'battery-share', batterySharePerDay: 0.3 },
    ]);
    expect(await effective(plain.id)).toEqual([
      { basis: 'radio-hours', transmitMinutesPerDay: 30, receiveHoursPerDay: 3, standbyHoursPerDay: 6 },
      { basis: 'battery-share', batterySharePerDay: 0.8 },
    ]);
  });

  it('changes and clears an override; refuses overrides that do not fit the default, with field paths', async () => {
    const trip = await createTrip(t, fern);
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec());
    const added = await t
      .http()
      .post(`/api/trips/${trip.id}/devices`)
      .set(fern.auth)
      .send({ itemId: radio.id })
      .expect(201);
    const deviceUrl = `/api/trips/${trip.id}/devices/${added.body.device.id}`;
    const patch = (body: object) => t.http().patch(deviceUrl).set(fern.auth).send(body);

    const changed = await patch({ useProfileOverride: { standbyHoursPerDay: 12, receiveHoursPerDay: 1 } }).expect(200);
    expect(changed.body.device.useProfile).toEqual({
      basis: 'radio-hours',
      transmitMinutesPerDay: 20,
      receiveHoursPerDay: 1,
      standbyHoursPerDay: 12,
    });
    expect(changed.body.device.overriddenFields.sort()).toEqual(['receiveHoursPerDay', 'standbyHoursPerDay']);

    const refusals: [body: object, paths: string[]][] = [
      // A different basis must be complete for that basis.
      [{ useProfileOverride: { basis: 'energy' } }, ['useProfileOverride.energyWhPerDay']],
      // A field of another basis.
      [{ useProfileOverride: { batterySharePerDay: 0.4 } }, ['useProfileOverride.batterySharePerDay']],
      // Each field in range, but the radio's day adds up to more than 24 h.
      [{ useProfileOverride: { standbyHoursPerDay: 23 } }, ['useProfileOverride.standbyHoursPerDay']],
      // Out of range and unknown fields are refused by the schema.
      [{ useProfileOverride: { transmitMinutesPerDay: -5 } }, ['useProfileOverride.transmitMinutesPerDay']],
      [{ useProfileOverride: { talkMinutes: 5 } }, ['useProfileOverride']],
      // The carrier must be on the trip.
      [{ carrierAccountId: '00000000-0000-4000-8000-000000000000' }, ['carrierAccountId']],
    ];
    for (const [body, paths] of refusals) {
      const response = await patch(body).expect(400);
      expect({ body, paths: errorPaths(response) }).toEqual({ body, paths });
    }
    const unchanged = await t.http().get(`/api/trips/${trip.id}/devices`).set(fern.auth).expect(200);
    expect(unchanged.body.devices[0].useProfileOverride).toEqual({ standbyHoursPerDay: 12, receiveHoursPerDay: 1 });

    const complete = await patch({ useProfileOverride: { basis: 'energy', energyWhPerDay: 6 } }).expect(200);
    expect(complete.body.device).toMatchObject({
      useProfile: { basis: 'energy', energyWhPerDay: 6 },
      overriddenFields: ['basis', 'energyWhPerDay'],
    });

    const cleared = await patch({ useProfileOverride: null }).expect(200);
    expect(cleared.body.device).toMatchObject({
      useProfileOverride: null,
      useProfile: testRadioSpec().useProfile,
      overriddenFields: [],
    });
  });

  it('when a locker change leaves an override that no longer fits, the default applies and the trip says why', async () => {
    const trip = await createTrip(t, fern);
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec());
    await t
      .http()
      .post(`/api/trips/${trip.id}/devices`)
      .set(fern.auth)
      .send({ itemId: radio.id, useProfileOverride: { transmitMinutesPerDay: 60 } })
      .expect(201);
    await putLockerSpec(fern, radio.id, testRadioSpec({ useProfile: { basis: 'energy', energyWhPerDay: 3 } }));
    const listed = await t.http().get(`/api/trips/${trip.id}/devices`).set(fern.auth).expect(200);
    expect(listed.body.devices[0]).toMatchObject({
      useProfile: { basis: 'energy', energyWhPerDay: 3 },
      overriddenFields: [],
      overrideIssues: [
        { path: 'useProfileOverride.transmitMinutesPerDay', message: 'Not a field of the energy use profile' },
      ],
    });
  });

  it('refuses items that are not the caller’s devices, and a device twice', async () => {
    const trip = await createTrip(t, fern);
    const tobin = await signedInHiker(t);
    const devicesUrl = `/api/trips/${trip.id}/devices`;
    const tobinRadio = await insertLockerItem(t.db, tobin.id, testRadioSpec());
    const notFound = await t.http().post(devicesUrl).set(fern.auth).send({ itemId: tobinRadio.id }).expect(404);
    expect(notFound.body.message).toBe('No such item in your locker');

    const panel = await insertLockerItem(t.db, fern.id, {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 10,
      portVolts: 5,
      portMaxA: 2,
      dropoutIrradianceWm2: 100,
      tempCoeffPctPerC: -0.4,
      outputPort: { connector: 'usb-a', captiveCable: false },
      massG: 280,
    });
    const notDevice = await t.http().post(devicesUrl).set(fern.auth).send({ itemId: panel.id }).expect(400);
    expect(errorPaths(notDevice)).toEqual(['itemId']);

    const phone = await insertLockerItem(t.db, fern.id, testPhoneSpec());
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: phone.id }).expect(201);
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: phone.id }).expect(409);
    const radioOverrideOnPhone = await t
      .http()
      .post(devicesUrl)
      .set(fern.auth)
      .send({
        itemId: (await insertLockerItem(t.db, fern.id, testPhoneSpec())).id,
        useProfileOverride: {
          basis: 'radio-hours',
          transmitMinutesPerDay: 5,
          receiveHoursPerDay: 1,
          standbyHoursPerDay: 1,
        },
      })
      .expect(400);
    expect(errorPaths(radioOverrideOnPhone)).toEqual(['useProfileOverride.basis']);
    const notCarrier = await t
      .http()
      .post(devicesUrl)
      .set(fern.auth)
      .send({ itemId: (await insertLockerItem(t.db, fern.id, testPhoneSpec())).id, carrierAccountId: tobin.id })
      .expect(400);
    expect(errorPaths(notCarrier)).toEqual(['carrierAccountId']);
  });

  it('removing a device keeps the locker item; deleting the locker item takes it off every trip', async () => {
    const trip = await createTrip(t, fern);
    const phone = await insertLockerItem(t.db, fern.id, testPhoneSpec());
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec());
    const devicesUrl = `/api/trips/${trip.id}/devices`;
    const added = await t.http().post(devicesUrl).set(fern.auth).send({ itemId: phone.id }).expect(201);
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: radio.id }).expect(201);

    await t.http().delete(`${devicesUrl}/${added.body.device.id}`).set(fern.auth).expect(204);
    await t.http().delete(`${devicesUrl}/${added.body.device.id}`).set(fern.auth).expect(404);
    expect(await t.db.select().from(lockerItems).where(eq(lockerItems.id, phone.id))).toHaveLength(1);

    await t.http().delete(`/api/locker/items/${radio.id}`).set(fern.auth).expect(204);
    expect(await t.db.select().from(tripDevices).where(eq(tripDevices.tripId, trip.id))).toEqual([]);
    await t.http().patch(`${devicesUrl}/not-a-device`).set(fern.auth).send({}).expect(404);
  });

  it("every change that can stale a chosen kit moves the trip's or a device's change time", async () => {
    const trip = await createTrip(t, fern);
    const devicesUrl = `/api/trips/${trip.id}/devices`;
    const tripUrl = `/api/trips/${trip.id}`;
    const phone = await insertLockerItem(t.db, fern.id, testPhoneSpec());
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec());
    const lamp = await insertLockerItem(t.db, fern.id, testPhoneSpec({ ownBatteryWh: 3 }));
    const added = await t.http().post(devicesUrl).set(fern.auth).send({ itemId: phone.id }).expect(201);
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: radio.id }).expect(201);
    await t.http().post(devicesUrl).set(fern.auth).send({ itemId: lamp.id }).expect(201);
    const read = async () => (await t.http().get(tripUrl).set(fern.auth).expect(200)).body.trip;

    // Taking a device off the trip: the trip's own time moves (the device's row is gone).
    t.clock.advanceS(60);
    await t.http().delete(`${devicesUrl}/${added.body.device.id}`).set(fern.auth).expect(204);
    const afterRemoval = await read();
    expect(afterRemoval.updatedAt).toBe(t.clock.now().toISOString());

    // Renaming a device in the locker (same spec): nothing the verdict reads changed, so no time moves.
    const radioOnTrip = (trip: { devices: { itemId: string; updatedAt: string }[] }) =>
      trip.devices.find((d) => d.itemId === radio.id)?.updatedAt;
    const beforeRename = radioOnTrip(afterRemoval);
    t.clock.advanceS(60);
    const current = (await t.http().get(`/api/locker/items/${radio.id}`).set(fern.auth).expect(200)).body.item;
    await t
      .http()
      .put(`/api/locker/items/${radio.id}`)
      .set(fern.auth)
      .send({ name: 'Renamed radio', notes: 'new notes', countOwned: 2, spec: current.spec })
      .expect(200);
    const afterRename = await read();
    expect(radioOnTrip(afterRename)).toBe(beforeRename);
    expect(afterRename.updatedAt).toBe(afterRemoval.updatedAt);

    // Editing a device in the locker (a bigger battery): that device's time on the trip moves.
    t.clock.advanceS(60);
    await putLockerSpec(fern, radio.id, testRadioSpec({ ownBatteryWh: 40 }));
    const afterEdit = await read();
    expect(afterEdit.devices.find((d: { itemId: string }) => d.itemId === radio.id).updatedAt).toBe(
      t.clock.now().toISOString(),
    );

    // Deleting a device from the locker takes it off the trip by cascade: the trip's own time moves.
    t.clock.advanceS(60);
    await t.http().delete(`/api/locker/items/${lamp.id}`).set(fern.auth).expect(204);
    const afterDelete = await read();
    expect(afterDelete.devices.map((d: { itemId: string }) => d.itemId)).toEqual([radio.id]);
    expect(afterDelete.updatedAt).toBe(t.clock.now().toISOString());

    // Replacing the whole locker from a CSV file (here its own export) takes the last device off too.
    t.clock.advanceS(60);
    const exported = await t.http().get('/api/locker/export').set(fern.auth).expect(200);
    await t
      .http()
      .post('/api/locker/import?mode=replace&commit=true')
      .set(fern.auth)
      .attach('file', Buffer.from(exported.text, 'utf8'), { filename: 'locker.csv', contentType: 'text/csv' })
      .expect(200);
    const afterReplace = await read();
    expect(afterReplace.devices).toEqual([]);
    expect(afterReplace.updatedAt).toBe(t.clock.now().toISOString());
  });
});
