import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripDevices, tripInvites, tripMembers } from '../src/database/schema';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  insertLockerItem,
  signedInHiker,
  testBankSpec,
  testPhoneSpec,
  testRadioSpec,
  tripBody,
} from './support/trip-fixtures';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Role = 'leader' | 'partner' | 'viewer' | 'non-member' | 'admin';
const roles: Role[] = ['leader', 'partner', 'viewer', 'non-member', 'admin'];

/** The ids a route's path and body are filled from, made fresh for each caller. */
interface Scene {
  tripId: string;
  ownerDeviceId: string;
  callerPhoneId: string;
  viewerId: string;
  spareMemberId: string;
  inviteId: string;
  /** The leader's pooled bank. */
  poolItemId: string;
  /** A bank in the caller's own locker, for sharing into the pool. */
  callerBankId: string;
  /** A bank in the leader's locker: power gear a plan or a hand-picked kit may hold. */
  ownerBankId: string;
  /** A plan the leader ran. */
  planId: string;
}

interface Row {
  method: Method;
  path: string;
  /** Status for leader, partner, viewer; a non-member and an admin always get 404. */
  expect: [leader: number, partner: number, viewer: number];
  body?: (scene: Scene) => object;
}

/**
 * Every route under /api/trips/{id}, in the order they run (destructive ones last), and the status each
 * trip role gets. The test fails when the API documents a trip route this table does not list.
 */
const table: Row[] = [
  { method: 'get', path: '/api/trips/{id}', expect: [200, 200, 200] },
  { method: 'get', path: '/api/trips/{id}/members', expect: [200, 200, 200] },
  { method: 'get', path: '/api/trips/{id}/devices', expect: [200, 200, 200] },
  { method: 'put', path: '/api/trips/{id}', expect: [200, 403, 403], body: () => tripBody({ name: 'Renamed' }) },
  {
    method: 'post',
    path: '/api/trips/{id}/devices',
    expect: [201, 201, 403],
    body: (s) => ({ itemId: s.callerPhoneId }),
  },
  {
    method: 'patch',
    path: '/api/trips/{id}/devices/{deviceId}',
    expect: [200, 403, 403],
    body: () => ({ useProfileOverride: { transmitMinutesPerDay: 5 } }),
  },
  // Before the pool rows: the leader's pooled bank is the plan's gear while it stays pooled.
  { method: 'get', path: '/api/trips/{id}/plans', expect: [200, 200, 200] },
  { method: 'get', path: '/api/trips/{id}/plans/{planId}', expect: [200, 200, 200] },
  { method: 'get', path: '/api/trips/{id}/kit', expect: [200, 200, 200] },
  { method: 'post', path: '/api/trips/{id}/plans', expect: [201, 201, 403], body: () => ({}) },
  {
    method: 'post',
    path: '/api/trips/{id}/check',
    expect: [200, 200, 403],
    body: (s) => ({ kit: [{ itemId: s.ownerBankId, count: 1 }] }),
  },
  {
    method: 'put',
    path: '/api/trips/{id}/kit',
    expect: [200, 403, 403],
    body: (s) => ({ kit: [{ itemId: s.ownerBankId, count: 1 }], source: 'hand' }),
  },
  { method: 'get', path: '/api/trips/{id}/pool', expect: [200, 200, 200] },
  {
    method: 'post',
    path: '/api/trips/{id}/pool',
    expect: [201, 201, 403],
    body: (s) => ({ itemId: s.callerBankId, count: 1 }),
  },
  { method: 'patch', path: '/api/trips/{id}/pool/{poolItemId}', expect: [200, 403, 403], body: () => ({ count: 1 }) },
  { method: 'delete', path: '/api/trips/{id}/pool/{poolItemId}', expect: [204, 403, 403] },
  {
    method: 'patch',
    path: '/api/trips/{id}/members/{accountId}',
    expect: [200, 403, 403],
    body: () => ({ gramLimitG: 900 }),
  },
  { method: 'get', path: '/api/trips/{id}/invites', expect: [200, 403, 403] },
  {
    method: 'post',
    path: '/api/trips/{id}/invites',
    expect: [201, 403, 403],
    body: () => ({ email: 'someone.new@example.test', role: 'viewer' }),
  },
  { method: 'delete', path: '/api/trips/{id}/invites/{inviteId}', expect: [204, 403, 403] },
  { method: 'get', path: '/api/trips/{id}/share', expect: [200, 403, 403] },
  { method: 'post', path: '/api/trips/{id}/share', expect: [201, 403, 403], body: () => ({}) },
  { method: 'post', path: '/api/trips/{id}/send-home', expect: [200, 403, 403], body: () => ({}) },
  { method: 'delete', path: '/api/trips/{id}/share', expect: [204, 403, 403] },
  { method: 'delete', path: '/api/trips/{id}/devices/{deviceId}', expect: [204, 403, 403] },
  { method: 'delete', path: '/api/trips/{id}/members/{accountId}', expect: [204, 403, 403] },
  { method: 'delete', path: '/api/trips/{id}', expect: [204, 403, 403] },
];

const key = (route: { method: Method; path: string }) => `${route.method.toUpperCase()} ${route.path}`;

describe('trip roles × every trip route', () => {
  let t: TestApp;
  let documented: string[];

  beforeAll(async () => {
    t = await startTestApp();
    const doc = await t.http().get('/api/docs-json').expect(200);
    const paths = doc.body.paths as Record<string, Record<string, unknown>>;
    documented = Object.entries(paths)
      .filter(([path]) => path.startsWith('/api/trips/{id}'))
      .flatMap(([path, operations]) =>
        Object.keys(operations)
          .filter((method) => ['get', 'post', 'put', 'patch', 'delete'].includes(method))
          .map((method) => `${method.toUpperCase()} ${path}`),
      );
  });

  afterAll(async () => {
    await t.close();
  });

  it('the table lists every documented trip route (add a row for a new one)', () => {
    expect(documented.filter((route) => !table.some((row) => key(row) === route))).toEqual([]);
    expect(table.map(key).filter((route) => !documented.includes(route))).toEqual([]);
  });

  /** A trip with a leader, a partner, a viewer and a spare partner; the caller in `role` (an outsider for the last two). */
  async function scene(role: Role): Promise<{ caller: Hiker; scene: Scene }> {
    const owner = await signedInHiker(t);
    const partner = await signedInHiker(t);
    const viewer = await signedInHiker(t);
    const spare = await signedInHiker(t);
    const trip = await createTrip(t, owner);
    await t.db.insert(tripMembers).values([
      { tripId: trip.id, accountId: partner.id, role: 'partner' },
      { tripId: trip.id, accountId: viewer.id, role: 'viewer' },
      { tripId: trip.id, accountId: spare.id, role: 'partner' },
    ]);
    const radio = await insertLockerItem(t.db, owner.id, testRadioSpec());
    const device = await t
      .http()
      .post(`/api/trips/${trip.id}/devices`)
      .set(owner.auth)
      .send({ itemId: radio.id })
      .expect(201);
    const invite = await t
      .http()
      .post(`/api/trips/${trip.id}/invites`)
      .set(owner.auth)
      .send({ email: `pending-${trip.id}@example.test`, role: 'partner' })
      .expect(201);
    const caller =
      role === 'leader'
        ? owner
        : role === 'partner'
          ? partner
          : role === 'viewer'
            ? viewer
            : await signedInHiker(t, role === 'admin' ? 'admin' : 'member');
    const phone = await insertLockerItem(t.db, caller.id, testPhoneSpec());
    const callerBank = await insertLockerItem(t.db, caller.id, testBankSpec());
    const ownerBank = await insertLockerItem(t.db, owner.id, testBankSpec());
    const pooled = await t
      .http()
      .post(`/api/trips/${trip.id}/pool`)
      .set(owner.auth)
      .send({ itemId: ownerBank.id })
      .expect(201);
    const plan = await t.http().post(`/api/trips/${trip.id}/plans`).set(owner.auth).send({}).expect(201);
    return {
      caller,
      scene: {
        tripId: trip.id,
        ownerDeviceId: device.body.device.id,
        callerPhoneId: phone.id,
        viewerId: viewer.id,
        spareMemberId: spare.id,
        inviteId: invite.body.invite.id,
        poolItemId: pooled.body.item.id,
        callerBankId: callerBank.id,
        ownerBankId: ownerBank.id,
        planId: plan.body.plan.id,
      },
    };
  }

  function url(row: Row, s: Scene): string {
    return row.path
      .replace('{id}', s.tripId)
      .replace('{deviceId}', s.ownerDeviceId)
      .replace('{inviteId}', s.inviteId)
      .replace('{poolItemId}', s.poolItemId)
      .replace('{planId}', s.planId)
      .replace('{accountId}', row.method === 'delete' ? s.spareMemberId : s.viewerId);
  }

  it.each(roles)('as %s', async (role) => {
    const { caller, scene: s } = await scene(role);
    const got: Record<string, number> = {};
    const want: Record<string, number> = {};
    for (const row of table) {
      const status =
        role === 'non-member' || role === 'admin' ? 404 : row.expect[['leader', 'partner', 'viewer'].indexOf(role)];
      const request = t.http()[row.method](url(row, s)).set(caller.auth);
      const response = await (row.body ? request.send(row.body(s)) : request);
      got[key(row)] = response.status;
      want[key(row)] = status ?? 0;
    }
    expect(got).toEqual(want);
  });

  it('an admin who is on a trip has their trip role there, nothing more', async () => {
    const owner = await signedInHiker(t);
    const admin = await signedInHiker(t, 'admin');
    const trip = await createTrip(t, owner);
    await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: admin.id, role: 'viewer' });
    await t.http().get(`/api/trips/${trip.id}`).set(admin.auth).expect(200);
    await t.http().put(`/api/trips/${trip.id}`).set(admin.auth).send(tripBody()).expect(403);
    await t
      .http()
      .post(`/api/trips/${trip.id}/invites`)
      .set(admin.auth)
      .send({ email: 'x@example.test', role: 'viewer' })
      .expect(403);
    await t.http().post(`/api/trips/${trip.id}/share`).set(admin.auth).expect(403);
  });

  it('a removed member loses access on their next request; their devices leave with them', async () => {
    const leader = await signedInHiker(t);
    const partner = await signedInHiker(t);
    const trip = await createTrip(t, leader);
    await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: partner.id, role: 'partner' });
    const phone = await insertLockerItem(t.db, partner.id, testPhoneSpec());
    await t.http().post(`/api/trips/${trip.id}/devices`).set(partner.auth).send({ itemId: phone.id }).expect(201);
    await t.http().get(`/api/trips/${trip.id}`).set(partner.auth).expect(200);

    await t.http().delete(`/api/trips/${trip.id}/members/${partner.id}`).set(leader.auth).expect(204);
    await t.http().get(`/api/trips/${trip.id}`).set(partner.auth).expect(404);
    await t.http().get(`/api/trips/${trip.id}/devices`).set(partner.auth).expect(404);
    const listed = await t.http().get('/api/trips').set(partner.auth).expect(200);
    expect(listed.body.trips).toEqual([]);
    expect(await t.db.select().from(tripDevices).where(eq(tripDevices.tripId, trip.id))).toEqual([]);
    // The locker item is the partner's and stays.
    const locker = await t.http().get('/api/locker/items').set(partner.auth).expect(200);
    expect(JSON.stringify(locker.body)).toContain(phone.id);
  });

  it('a role change applies on the next request; the leader’s own role and membership cannot be taken', async () => {
    const leader = await signedInHiker(t);
    const partner = await signedInHiker(t);
    const trip = await createTrip(t, leader);
    await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: partner.id, role: 'partner' });
    const phone = await insertLockerItem(t.db, partner.id, testPhoneSpec());
    const changed = await t
      .http()
      .patch(`/api/trips/${trip.id}/members/${partner.id}`)
      .set(leader.auth)
      .send({ role: 'viewer', gramLimitG: 1200 })
      .expect(200);
    expect(changed.body.member).toMatchObject({ accountId: partner.id, role: 'viewer', gramLimitG: 1200 });
    await t.http().post(`/api/trips/${trip.id}/devices`).set(partner.auth).send({ itemId: phone.id }).expect(403);

    await t
      .http()
      .patch(`/api/trips/${trip.id}/members/${leader.id}`)
      .set(leader.auth)
      .send({ role: 'viewer' })
      .expect(409);
    await t
      .http()
      .patch(`/api/trips/${trip.id}/members/${leader.id}`)
      .set(leader.auth)
      .send({ gramLimitG: 1500 })
      .expect(200);
    await t.http().delete(`/api/trips/${trip.id}/members/${leader.id}`).set(leader.auth).expect(409);
    await t
      .http()
      .patch(`/api/trips/${trip.id}/members/${partner.id}`)
      .set(leader.auth)
      .send({ role: 'leader' })
      .expect(400);
    const stranger = await signedInHiker(t);
    await t.http().delete(`/api/trips/${trip.id}/members/${stranger.id}`).set(leader.auth).expect(404);
  });

  it('the invite and share link routes are public, and refuse what they do not know', async () => {
    await t.http().get('/api/invites/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA').expect(404);
    await t.http().post('/api/invites/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA/accept').expect(401);
    await t.http().get('/api/share/abc.def.ghi').expect(404);
    const pending = await t.db
      .select()
      .from(tripInvites)
      .where(and(eq(tripInvites.role, 'partner')));
    expect(pending.length).toBeGreaterThan(0);
  });
});
