import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripDevices, tripMembers, trips } from '../src/database/schema';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  insertLockerItem,
  signedInHiker,
  testPhoneSpec,
  testRadioSpec,
  tripBody,
} from './support/trip-fixtures';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

interface TripRoute {
  method: Method;
  /** OpenAPI path, e.g. `/api/trips/{id}/devices/{deviceId}`. */
  path: string;
}

/** The trip routes this module serves; the test also covers any other route under /api/trips/{id}. */
const knownTripRoutes: TripRoute[] = [
  { method: 'get', path: '/api/trips/{id}' },
  { method: 'put', path: '/api/trips/{id}' },
  { method: 'delete', path: '/api/trips/{id}' },
  { method: 'get', path: '/api/trips/{id}/members' },
  { method: 'get', path: '/api/trips/{id}/devices' },
  { method: 'post', path: '/api/trips/{id}/devices' },
  { method: 'patch', path: '/api/trips/{id}/devices/{deviceId}' },
  { method: 'delete', path: '/api/trips/{id}/devices/{deviceId}' },
];

const routeKey = (route: TripRoute) => `${route.method.toUpperCase()} ${route.path}`;

describe('trip access policy', () => {
  let t: TestApp;
  let fern: Hiker;
  let tobin: Hiker;
  let warden: Hiker;
  let tripId: string;
  let fernDeviceId: string;
  let tobinItemId: string;
  let documentedRoutes: TripRoute[];

  beforeAll(async () => {
    t = await startTestApp();
    fern = await signedInHiker(t);
    tobin = await signedInHiker(t);
    warden = await signedInHiker(t, 'admin');
    const trip = await createTrip(t, fern, { name: 'Fern’s ridge walk' });
    tripId = trip.id;
    const radio = await insertLockerItem(t.db, fern.id, testRadioSpec(), 'Fern radio');
    const added = await t
      .http()
      .post(`/api/trips/${tripId}/devices`)
      .set(fern.auth)
      .send({ itemId: radio.id })
      .expect(201);
    fernDeviceId = added.body.device.id;
    tobinItemId = (await insertLockerItem(t.db, tobin.id, testPhoneSpec(), 'Tobin phone')).id;

    const doc = await t.http().get('/api/docs-json').expect(200);
    const paths = doc.body.paths as Record<string, Record<string, unknown>>;
    documentedRoutes = Object.entries(paths)
      .filter(([path]) => path.startsWith('/api/trips/{id}'))
      .flatMap(([path, operations]) =>
        Object.keys(operations)
          .filter((method): method is Method => ['get', 'post', 'put', 'patch', 'delete'].includes(method))
          .map((method) => ({ method, path })),
      );
  });

  afterAll(async () => {
    await t.close();
  });

  /** A plausible body for a route (the policy answers before any body is read). */
  function bodyFor(route: TripRoute): object | undefined {
    if (route.method === 'get' || route.method === 'delete') return undefined;
    if (route.path === '/api/trips/{id}') return tripBody({ name: 'Taken over' });
    if (route.path === '/api/trips/{id}/devices') return { itemId: tobinItemId };
    if (route.path === '/api/trips/{id}/devices/{deviceId}')
      return { useProfileOverride: { transmitMinutesPerDay: 1 } };
    return {};
  }

  function send(route: TripRoute, hiker: Hiker, ids: { tripId: string; deviceId: string }) {
    const url = route.path
      .replace('{id}', ids.tripId)
      .replace('{deviceId}', ids.deviceId)
      .replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');
    const req = t.http()[route.method](url).set(hiker.auth);
    const body = bodyFor(route);
    return body === undefined ? req : req.send(body);
  }

  async function tripSnapshot() {
    return {
      trip: await t.db.select().from(trips).where(eq(trips.id, tripId)),
      members: await t.db.select().from(tripMembers).where(eq(tripMembers.tripId, tripId)),
      devices: await t.db.select().from(tripDevices).where(eq(tripDevices.tripId, tripId)),
    };
  }

  it('the OpenAPI document lists every trip route this module serves', () => {
    expect(documentedRoutes.map(routeKey)).toEqual(expect.arrayContaining(knownTripRoutes.map(routeKey)));
  });

  it('answers 404 to another member on every trip route, and the trip stays untouched', async () => {
    const before = await tripSnapshot();
    for (const route of documentedRoutes) {
      const response = await send(route, tobin, { tripId, deviceId: fernDeviceId });
      expect({ route: routeKey(route), status: response.status }).toEqual({ route: routeKey(route), status: 404 });
      expect(response.body).toEqual({ statusCode: 404, message: 'Trip not found', errors: [] });
    }
    expect(await tripSnapshot()).toEqual(before);
  });

  it('gives an admin account no trip rights: 404 on every trip route', async () => {
    const before = await tripSnapshot();
    for (const route of documentedRoutes) {
      const response = await send(route, warden, { tripId, deviceId: fernDeviceId });
      expect({ route: routeKey(route), status: response.status }).toEqual({ route: routeKey(route), status: 404 });
    }
    expect(await tripSnapshot()).toEqual(before);
    const listed = await t.http().get('/api/trips').set(warden.auth).expect(200);
    expect(listed.body.trips).toEqual([]);
  });

  it('answers the same 404 for a trip that does not exist and for an id that is not a trip id', async () => {
    for (const id of ['5b0c8f4e-3a51-4f7e-9d2b-6c1e0a7f9b3d', 'not-a-trip']) {
      for (const route of documentedRoutes) {
        const response = await send(route, fern, { tripId: id, deviceId: fernDeviceId });
        expect({ route: routeKey(route), id, status: response.status }).toEqual({
          route: routeKey(route),
          id,
          status: 404,
        });
      }
    }
  });

  describe('roles on the trip', () => {
    /** Status per role for each route (the leader's own device; the partner's own device is tested below). */
    const expected: [route: TripRoute, leader: number, partner: number, viewer: number][] = [
      [{ method: 'get', path: '/api/trips/{id}' }, 200, 200, 200],
      [{ method: 'get', path: '/api/trips/{id}/members' }, 200, 200, 200],
      [{ method: 'get', path: '/api/trips/{id}/devices' }, 200, 200, 200],
      [{ method: 'put', path: '/api/trips/{id}' }, 200, 403, 403],
      [{ method: 'patch', path: '/api/trips/{id}/devices/{deviceId}' }, 200, 403, 403],
      [{ method: 'post', path: '/api/trips/{id}/devices' }, 201, 201, 403],
      [{ method: 'delete', path: '/api/trips/{id}/devices/{deviceId}' }, 204, 403, 403],
      [{ method: 'delete', path: '/api/trips/{id}' }, 204, 403, 403],
    ];

    it.each(['leader', 'partner', 'viewer'] as const)('as %s', async (role) => {
      const owner = await signedInHiker(t);
      const caller = role === 'leader' ? owner : await signedInHiker(t);
      const trip = await createTrip(t, owner, { name: `Trip for a ${role}` });
      if (role !== 'leader') await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: caller.id, role });
      const ownerRadio = await insertLockerItem(t.db, owner.id, testRadioSpec());
      const device = await t
        .http()
        .post(`/api/trips/${trip.id}/devices`)
        .set(owner.auth)
        .send({ itemId: ownerRadio.id })
        .expect(201);
      const callerPhone = await insertLockerItem(t.db, caller.id, testPhoneSpec());

      for (const [route, ...statuses] of expected) {
        const status = statuses[['leader', 'partner', 'viewer'].indexOf(role)];
        const body =
          route.path === '/api/trips/{id}/devices' && route.method === 'post'
            ? { itemId: callerPhone.id }
            : bodyFor(route);
        const url = route.path.replace('{id}', trip.id).replace('{deviceId}', device.body.device.id);
        const req = t.http()[route.method](url).set(caller.auth);
        const response = await (body === undefined ? req : req.send(body));
        expect({ route: routeKey(route), status: response.status }).toEqual({ route: routeKey(route), status });
      }
    });

    it('a partner changes and removes their own device but not the leader’s', async () => {
      const leader = await signedInHiker(t);
      const partner = await signedInHiker(t);
      const trip = await createTrip(t, leader);
      await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: partner.id, role: 'partner' });
      const leaderRadio = await insertLockerItem(t.db, leader.id, testRadioSpec());
      const partnerPhone = await insertLockerItem(t.db, partner.id, testPhoneSpec());
      const leaderDevice = await t
        .http()
        .post(`/api/trips/${trip.id}/devices`)
        .set(leader.auth)
        .send({ itemId: leaderRadio.id })
        .expect(201);
      const partnerDevice = await t
        .http()
        .post(`/api/trips/${trip.id}/devices`)
        .set(partner.auth)
        .send({ itemId: partnerPhone.id })
        .expect(201);
      expect(partnerDevice.body.device).toMatchObject({ ownerAccountId: partner.id, carrierAccountId: partner.id });

      const devicesUrl = `/api/trips/${trip.id}/devices`;
      await t
        .http()
        .patch(`${devicesUrl}/${leaderDevice.body.device.id}`)
        .set(partner.auth)
        .send({ carrierAccountId: partner.id })
        .expect(403);
      await t.http().delete(`${devicesUrl}/${leaderDevice.body.device.id}`).set(partner.auth).expect(403);
      const changed = await t
        .http()
        .patch(`${devicesUrl}/${partnerDevice.body.device.id}`)
        .set(partner.auth)
        .send({ useProfileOverride: { batterySharePerDay: 0.9 }, carrierAccountId: leader.id })
        .expect(200);
      expect(changed.body.device).toMatchObject({
        carrierAccountId: leader.id,
        useProfile: { batterySharePerDay: 0.9 },
      });
      // The leader may hand any device to anyone on the trip who walks (not a viewer).
      await t
        .http()
        .patch(`${devicesUrl}/${partnerDevice.body.device.id}`)
        .set(leader.auth)
        .send({ carrierAccountId: partner.id })
        .expect(200);
      await t.http().delete(`${devicesUrl}/${partnerDevice.body.device.id}`).set(partner.auth).expect(204);
      const members = await t.http().get(`/api/trips/${trip.id}/members`).set(partner.auth).expect(200);
      expect(members.body.members.map((m: { role: string }) => m.role)).toEqual(['leader', 'partner']);
    });
  });
});
