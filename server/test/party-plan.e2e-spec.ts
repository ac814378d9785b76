import { planResponseSchema, type PlanResult } from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripMembers, tripPlans } from '../src/database/schema';
import { insertLockerItems, planDevices, planGear, planTripBody } from './support/plan-fixtures';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  insertLockerItem,
  signedInHiker,
  testBankSpec,
  testPhoneSpec,
} from './support/trip-fixtures';

/**
 * The party's plan end to end: a partner's pooled bank and phone join the leader's locker gear, the plan shares the
 * kit out among leader and partner within their own gram limits, and the share page says who carries what.
 */
describe('party plans', () => {
  let t: TestApp;
  let leader: Hiker;
  let partner: Hiker;
  let tripId: string;
  let partnerBankId: string;

  async function solve(): Promise<PlanResult> {
    t.clock.advanceS(60);
    const solved = await t.http().post(`/api/trips/${tripId}/plans`).set(partner.auth).send({}).expect(201);
    return planResponseSchema.parse(solved.body).plan.result;
  }

  async function setLimit(hiker: Hiker, gramLimitG: number | null): Promise<void> {
    await t.http().patch(`/api/trips/${tripId}/members/${hiker.id}`).set(leader.auth).send({ gramLimitG }).expect(200);
  }

  beforeAll(async () => {
    t = await startTestApp({ env: { PLAN_WORKER_THREADS: '1' } });
    leader = await signedInHiker(t);
    partner = await signedInHiker(t);
    await insertLockerItems(t.db, leader.id, planGear);
    const devices = await insertLockerItems(
      t.db,
      leader.id,
      planDevices.map((d) => d.item),
    );
    const trip = await createTrip(t, leader, planTripBody({ gramLimitG: null }));
    tripId = trip.id;
    for (const [i, device] of devices.entries()) {
      await t
        .http()
        .post(`/api/trips/${tripId}/devices`)
        .set(leader.auth)
        .send({ itemId: device.id, useProfileOverride: planDevices[i]?.useProfileOverride ?? null })
        .expect(201);
    }
    await t.db.insert(tripMembers).values({ tripId, accountId: partner.id, role: 'partner' });
    const phone = await insertLockerItem(t.db, partner.id, testPhoneSpec(), 'Partner phone');
    await t.http().post(`/api/trips/${tripId}/devices`).set(partner.auth).send({ itemId: phone.id }).expect(201);
    const bank = await insertLockerItem(t.db, partner.id, testBankSpec({ massG: 150 }), 'Partner bank');
    partnerBankId = bank.id;
    await t.http().post(`/api/trips/${tripId}/pool`).set(partner.auth).send({ itemId: bank.id }).expect(201);
  });

  afterAll(async () => {
    await t.close();
  });

  it('pools the leader’s whole locker and the partner’s bank, and plans for both with each carrier’s share', async () => {
    const result = await solve();
    expect(result.status).toBe('optimal');
    const kit = result.kit;
    if (!kit?.carriers) throw new Error('a party plan names its carriers');
    expect(kit.carriers.map((c) => c.memberId)).toEqual([leader.id, partner.id]);
    expect(kit.carriers.reduce((g, c) => g + c.massG, 0)).toBe(kit.massG);
    const [row] = await t.db.select().from(tripPlans).where(eq(tripPlans.tripId, tripId));
    expect(row?.input.gear.map((g) => g.itemId)).toContain(partnerBankId);
    expect(row?.input.gear.length).toBe(planGear.length + 1);
    expect(row?.input.devices).toHaveLength(planDevices.length + 1);
    expect(row?.input.party?.ownerByItemId[partnerBankId]).toBe(partner.id);
    for (const swap of result.swaps) expect(swap.kit.carriers?.reduce((g, c) => g + c.massG, 0)).toBe(swap.kit.massG);
  });

  it('a tight limit moves the load to the other carrier; when both are too tight the plan names whose limit and by how much', async () => {
    await setLimit(leader, 1);
    const shifted = await solve();
    expect(shifted.status).toBe('optimal');
    expect(shifted.kit?.carriers?.map((c) => [c.memberId, c.massG, c.overG])).toEqual([
      [leader.id, 0, 0],
      [partner.id, shifted.kit?.massG, 0],
    ]);

    await setLimit(partner, 1);
    const over = await solve();
    expect(over.status).toBe('over-limit');
    const carriers = over.kit?.carriers ?? [];
    const overs = carriers.filter((c) => c.overG > 0);
    expect(overs.length).toBeGreaterThan(0);
    for (const c of overs) {
      expect(c.overG).toBe(c.massG - 1);
      expect(over.headline).toContain(c.name);
      expect(over.headline).toContain(`${c.overG.toLocaleString('en-GB')} g over a 1 g limit`);
    }
    await setLimit(leader, null);
    await setLimit(partner, null);
  });

  it('the share page says who carries what from the chosen kit; once the leader pools an item, only pooled items count', async () => {
    await setLimit(leader, 1);
    const result = await solve();
    const share = await t.http().post(`/api/trips/${tripId}/share`).set(leader.auth).send({}).expect(201);
    const shared = await t.http().get(`/api${share.body.share.path}`).expect(200);
    const partnerName = result.kit?.carriers?.[1]?.name;
    expect(shared.body.trip.plan.carriers).toEqual([
      {
        name: partnerName,
        massG: result.kit?.massG,
        items: result.kit?.carriers?.[1]?.lines.map((l) => ({ name: l.name, count: l.count })),
      },
    ]);

    const leaderBank = await insertLockerItem(t.db, leader.id, testBankSpec(), 'Leader spare bank');
    await t.http().post(`/api/trips/${tripId}/pool`).set(leader.auth).send({ itemId: leaderBank.id }).expect(201);
    await solve();
    const rows = await t.db.select().from(tripPlans).where(eq(tripPlans.tripId, tripId));
    const newest = rows.sort((a, b) => b.createdAt.getTime() - a.createdAt.getTime())[0];
    expect(newest?.input.gear.map((g) => g.itemId).sort()).toEqual([leaderBank.id, partnerBankId].sort());
  });
});
