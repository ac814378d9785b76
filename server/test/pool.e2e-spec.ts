import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripMembers, tripPoolItems } from '../src/database/schema';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  errorPaths,
  insertLockerItem,
  signedInHiker,
  testBankSpec,
  testPhoneSpec,
} from './support/trip-fixtures';

describe('the party pool', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  /** A trip led by `leader` with a partner and a viewer on it. */
  async function party(): Promise<{ leader: Hiker; partner: Hiker; viewer: Hiker; tripId: string; poolUrl: string }> {
    const leader = await signedInHiker(t);
    const partner = await signedInHiker(t);
    const viewer = await signedInHiker(t);
    const trip = await createTrip(t, leader);
    await t.db.insert(tripMembers).values([
      { tripId: trip.id, accountId: partner.id, role: 'partner' },
      { tripId: trip.id, accountId: viewer.id, role: 'viewer' },
    ]);
    return { leader, partner, viewer, tripId: trip.id, poolUrl: `/api/trips/${trip.id}/pool` };
  }

  async function ownedBank(hiker: Hiker, countOwned: number, name = 'Scree bank') {
    const bank = await insertLockerItem(t.db, hiker.id, testBankSpec(), name);
    await t
      .http()
      .put(`/api/locker/items/${bank.id}`)
      .set(hiker.auth)
      .send({ name, notes: '', countOwned, spec: testBankSpec() })
      .expect(200);
    return bank;
  }

  it('a partner shares their own bank with a count; the list names the owner; the leader’s whole locker counts until the leader pools', async () => {
    const { leader, partner, poolUrl } = await party();
    const empty = await t.http().get(poolUrl).set(partner.auth).expect(200);
    expect(empty.body).toEqual({ items: [], leaderWholeLocker: true });

    const bank = await ownedBank(partner, 2);
    const added = await t.http().post(poolUrl).set(partner.auth).send({ itemId: bank.id, count: 2 }).expect(201);
    expect(added.body.item).toMatchObject({
      itemId: bank.id,
      name: 'Scree bank',
      kind: 'bank',
      massG: 190,
      count: 2,
      countOwned: 2,
      ownerAccountId: partner.id,
    });
    const listed = await t.http().get(poolUrl).set(leader.auth).expect(200);
    expect(listed.body.items).toHaveLength(1);
    expect(listed.body.leaderWholeLocker).toBe(true);

    const leaderBank = await ownedBank(leader, 1, 'Moraine bank');
    await t.http().post(poolUrl).set(leader.auth).send({ itemId: leaderBank.id }).expect(201);
    const after = await t.http().get(poolUrl).set(partner.auth).expect(200);
    expect(after.body.leaderWholeLocker).toBe(false);
    // The test clock stands still, so entries shared at the same instant come by name.
    expect(after.body.items.map((i: { name: string; count: number }) => [i.name, i.count])).toEqual([
      ['Moraine bank', 1],
      ['Scree bank', 2],
    ]);
  });

  it('refuses more than owned, a device, another member’s item, a second entry and a bad body', async () => {
    const { leader, partner, poolUrl } = await party();
    const bank = await ownedBank(partner, 1);
    const tooMany = await t.http().post(poolUrl).set(partner.auth).send({ itemId: bank.id, count: 2 }).expect(400);
    expect(errorPaths(tooMany)).toEqual(['count']);
    const phone = await insertLockerItem(t.db, partner.id, testPhoneSpec());
    const device = await t.http().post(poolUrl).set(partner.auth).send({ itemId: phone.id }).expect(400);
    expect(errorPaths(device)).toEqual(['itemId']);
    // The leader cannot pool the partner's bank: it is not in the leader's locker.
    await t.http().post(poolUrl).set(leader.auth).send({ itemId: bank.id }).expect(404);
    await t.http().post(poolUrl).set(partner.auth).send({ itemId: bank.id }).expect(201);
    await t.http().post(poolUrl).set(partner.auth).send({ itemId: bank.id }).expect(409);
    const bad = await t.http().post(poolUrl).set(partner.auth).send({ itemId: 'nope', count: 0 }).expect(400);
    expect(errorPaths(bad)).toEqual(['count', 'itemId']);
  });

  it('a partner changes only their own entries, the leader any; a viewer only reads; a non-member gets 404', async () => {
    const { leader, partner, viewer, tripId, poolUrl } = await party();
    const partnerBank = await ownedBank(partner, 3);
    const leaderBank = await ownedBank(leader, 1);
    const mine = await t.http().post(poolUrl).set(partner.auth).send({ itemId: partnerBank.id, count: 1 }).expect(201);
    const theirs = await t.http().post(poolUrl).set(leader.auth).send({ itemId: leaderBank.id }).expect(201);
    const mineUrl = `${poolUrl}/${mine.body.item.id}`;
    const theirsUrl = `${poolUrl}/${theirs.body.item.id}`;

    await t.http().patch(theirsUrl).set(partner.auth).send({ count: 1 }).expect(403);
    await t.http().delete(theirsUrl).set(partner.auth).expect(403);
    const raised = await t.http().patch(mineUrl).set(partner.auth).send({ count: 3 }).expect(200);
    expect(raised.body.item.count).toBe(3);
    const over = await t.http().patch(mineUrl).set(leader.auth).send({ count: 4 }).expect(400);
    expect(errorPaths(over)).toEqual(['count']);
    await t.http().patch(mineUrl).set(leader.auth).send({ count: 2 }).expect(200);

    const viewerBank = await ownedBank(viewer, 1);
    await t.http().get(poolUrl).set(viewer.auth).expect(200);
    await t.http().post(poolUrl).set(viewer.auth).send({ itemId: viewerBank.id }).expect(403);
    await t.http().patch(mineUrl).set(viewer.auth).send({ count: 1 }).expect(403);

    const stranger = await signedInHiker(t);
    await t.http().get(poolUrl).set(stranger.auth).expect(404);
    await t.http().delete(mineUrl).set(stranger.auth).expect(404);

    // An entry id from another trip is not found here, and stays untouched.
    const other = await createTrip(t, leader);
    await t
      .http()
      .patch(`/api/trips/${other.id}/pool/${mine.body.item.id}`)
      .set(leader.auth)
      .send({ count: 1 })
      .expect(404);
    await t.http().delete(`/api/trips/${other.id}/pool/${mine.body.item.id}`).set(leader.auth).expect(404);
    await t.http().delete(`${poolUrl}/not-a-uuid`).set(leader.auth).expect(404);
    const [kept] = await t.db.select().from(tripPoolItems).where(eq(tripPoolItems.id, mine.body.item.id));
    expect(kept?.count).toBe(2);

    await t.http().delete(theirsUrl).set(leader.auth).expect(204);
    await t.http().delete(mineUrl).set(partner.auth).expect(204);
    const left = await t.http().get(poolUrl).set(leader.auth).expect(200);
    expect(left.body).toEqual({ items: [], leaderWholeLocker: true });
    expect(tripId).toBeTruthy();
  });

  it('a removed partner’s entries leave with them; the leader’s stay', async () => {
    const { leader, partner, tripId, poolUrl } = await party();
    const partnerBank = await ownedBank(partner, 1);
    const leaderBank = await ownedBank(leader, 1);
    await t.http().post(poolUrl).set(partner.auth).send({ itemId: partnerBank.id }).expect(201);
    await t.http().post(poolUrl).set(leader.auth).send({ itemId: leaderBank.id }).expect(201);
    await t.http().delete(`/api/trips/${tripId}/members/${partner.id}`).set(leader.auth).expect(204);
    const rows = await t.db.select().from(tripPoolItems).where(eq(tripPoolItems.tripId, tripId));
    expect(rows.map((r) => r.accountId)).toEqual([leader.id]);
    await t.http().get(poolUrl).set(partner.auth).expect(404);
  });

  it('a locker count lowered after pooling shows beside the pooled count', async () => {
    const { partner, poolUrl } = await party();
    const bank = await ownedBank(partner, 3);
    await t.http().post(poolUrl).set(partner.auth).send({ itemId: bank.id, count: 3 }).expect(201);
    await t
      .http()
      .put(`/api/locker/items/${bank.id}`)
      .set(partner.auth)
      .send({ name: 'Scree bank', notes: '', countOwned: 1, spec: testBankSpec() })
      .expect(200);
    const listed = await t.http().get(poolUrl).set(partner.auth).expect(200);
    expect(listed.body.items[0]).toMatchObject({ count: 3, countOwned: 1 });
  });
});
