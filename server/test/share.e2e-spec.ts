import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripMembers } from '../src/database/schema';
import { TRIP_PLAN_SUMMARY, type TripPlanSummary, type TripPlanSummarySource } from '../src/share/trip-plan-summary';
import { linkIn, mailTo, startTestAppWithTransport } from './support/party-fixtures';
import { type TestApp, insertAccount, signInToken, startTestApp } from './support/test-app';
import { type Hiker, createTrip, insertLockerItem, signedInHiker, testRadioSpec } from './support/trip-fixtures';

const dayS = 86_400;

async function namedHiker(t: TestApp, displayName: string): Promise<Hiker> {
  const account = await insertAccount(t.db, { displayName });
  return {
    id: account.id,
    email: account.email,
    auth: { Authorization: `Bearer ${await signInToken(t, account.email)}` },
  };
}

function tokenOf(path: string): string {
  return path.slice('/share/'.length);
}

describe('share link', () => {
  let t: TestApp;
  let leader: Hiker;
  let tripId: string;

  beforeAll(async () => {
    t = await startTestApp({
      env: { PUBLIC_URL: 'https://gw.example.test', SHARE_LINK_LIFETIME_S: String(10 * dayS) },
    });
    leader = await namedHiker(t, 'Ash Leader');
    tripId = (await createTrip(t, leader, { name: 'Lakes traverse', startDate: '2026-07-10', nights: 4 })).id;
    const radio = await insertLockerItem(t.db, leader.id, testRadioSpec(), 'Hand radio');
    await t.http().post(`/api/trips/${tripId}/devices`).set(leader.auth).send({ itemId: radio.id }).expect(201);
  });

  afterAll(async () => {
    await t.close();
  });

  it('makes a signed, expiring link that opens the trip read-only without an account', async () => {
    expect((await t.http().get(`/api/trips/${tripId}/share`).set(leader.auth).expect(200)).body.share.state).toBe(
      'none',
    );
    const created = await t.http().post(`/api/trips/${tripId}/share`).set(leader.auth).expect(201);
    const share = created.body.share;
    expect(share).toMatchObject({ state: 'active', path: expect.stringMatching(/^\/share\/[\w-]+\.[\w-]+\.[\w-]+$/) });
    expect(share.url).toBe(`https://gw.example.test${share.path}`);
    expect(new Date(share.expiresAt).getTime() - new Date(share.createdAt).getTime()).toBe(10 * dayS * 1000);
    // Shown again, the same link.
    expect((await t.http().get(`/api/trips/${tripId}/share`).set(leader.auth).expect(200)).body.share.url).toBe(
      share.url,
    );

    const opened = await t
      .http()
      .get(`/api/share/${tokenOf(share.path)}`)
      .expect(200);
    expect(opened.body.trip).toMatchObject({
      name: 'Lakes traverse',
      startDate: '2026-07-10',
      endDate: '2026-07-14',
      nights: 4,
      members: [{ displayName: 'Ash Leader', role: 'leader' }],
      devices: [{ name: 'Hand radio', deviceKind: 'radio', carrierName: 'Ash Leader' }],
      plan: null,
      linkExpiresAt: share.expiresAt,
    });
    // Read-only and private: no addresses, no ids.
    expect(JSON.stringify(opened.body)).not.toContain(leader.email);
    expect(JSON.stringify(opened.body)).not.toContain(leader.id);
  });

  it('expires', async () => {
    const created = await t
      .http()
      .post(`/api/trips/${tripId}/share`)
      .set(leader.auth)
      .send({ expiresInDays: 2 })
      .expect(201);
    const token = tokenOf(created.body.share.path);
    t.clock.advanceS(2 * dayS - 60);
    await t.http().get(`/api/share/${token}`).expect(200);
    t.clock.advanceS(120);
    try {
      const expired = await t.http().get(`/api/share/${token}`).expect(410);
      expect(expired.body.message).toMatch(/expired/);
      expect((await t.http().get(`/api/trips/${tripId}/share`).set(leader.auth).expect(200)).body.share).toMatchObject({
        state: 'expired',
        url: null,
      });
    } finally {
      t.clock.advanceS(-(2 * dayS + 60));
    }
  });

  it('is revocable, and a new link stops the older ones', async () => {
    const first = tokenOf(
      (await t.http().post(`/api/trips/${tripId}/share`).set(leader.auth).expect(201)).body.share.path,
    );
    const second = tokenOf(
      (await t.http().post(`/api/trips/${tripId}/share`).set(leader.auth).expect(201)).body.share.path,
    );
    expect(second).not.toBe(first);
    expect((await t.http().get(`/api/share/${first}`).expect(410)).body.message).toMatch(/revoked/);
    await t.http().get(`/api/share/${second}`).expect(200);
    await t.http().delete(`/api/trips/${tripId}/share`).set(leader.auth).expect(204);
    await t.http().get(`/api/share/${second}`).expect(410);
    expect((await t.http().get(`/api/trips/${tripId}/share`).set(leader.auth).expect(200)).body.share.state).toBe(
      'revoked',
    );
  });

  it('answers 404 to a tampered token, a session token and a token signed with another key', async () => {
    const token = tokenOf(
      (await t.http().post(`/api/trips/${tripId}/share`).set(leader.auth).expect(201)).body.share.path,
    );
    const [header, payload, signature] = token.split('.') as [string, string, string];
    const claims = JSON.parse(Buffer.from(payload, 'base64url').toString()) as Record<string, unknown>;
    const forged = `${header}.${Buffer.from(JSON.stringify({ ...claims, exp: (claims.exp as number) + 1000 * dayS })).toString('base64url')}.${signature}`;
    expect((await t.http().get(`/api/share/${forged}`).expect(404)).body.message).toBe('Share link not found');
    await t
      .http()
      .get(`/api/share/${token.slice(0, -2)}xx`)
      .expect(404);
    await t
      .http()
      .get(`/api/share/${leader.auth.Authorization.slice('Bearer '.length)}`)
      .expect(404);
    await t.http().get('/api/share/not-a-token').expect(404);
  });

  it('sends the plan home: every viewer gets the summary and the link; 422 with no viewers', async () => {
    const lone = await signedInHiker(t);
    const loneTrip = await createTrip(t, lone);
    const none = await t.http().post(`/api/trips/${loneTrip.id}/send-home`).set(lone.auth).expect(422);
    expect(none.body.message).toMatch(/No viewers/);

    const home = await namedHiker(t, 'Rowan at home');
    const partner = await namedHiker(t, 'Sage Partner');
    await t.db.insert(tripMembers).values([
      { tripId, accountId: home.id, role: 'viewer' },
      { tripId, accountId: partner.id, role: 'partner' },
    ]);
    await t.http().delete(`/api/trips/${tripId}/share`).set(leader.auth).expect(204);
    const response = await t
      .http()
      .post(`/api/trips/${tripId}/send-home`)
      .set(leader.auth)
      .send({ note: 'Back by Tuesday.' })
      .expect(200);
    expect(response.body.sent).toEqual([{ displayName: 'Rowan at home', email: home.email, status: 'sent' }]);
    expect(response.body.share.state).toBe('active');

    const [mail] = await mailTo(t, home.email);
    expect(mail?.subject).toBe('Trip plan: Lakes traverse, 2026-07-10 to 2026-07-14');
    expect(mail?.text).toContain('2026-07-10 to 2026-07-14 (4 nights)');
    expect(mail?.text).toContain('61.2000° N, 8.4000° E');
    expect(mail?.text).toContain('Ash Leader writes: Back by Tuesday.');
    expect(mail?.text).toContain('Hand radio (radio), carried by Ash Leader');
    expect(mail?.text).toContain('No kit has been chosen yet');
    expect(mail?.text).toContain('Figures are estimates, not a guarantee');
    const link = linkIn(mail?.text ?? '', 'https://gw.example.test/share/');
    expect(link).toBe(response.body.share.url);
    await t
      .http()
      .get(`/api/share/${link.slice('https://gw.example.test/share/'.length)}`)
      .expect(200);
    expect(await mailTo(t, partner.email)).toEqual([]);
  });
});

describe('share link with the plans feature present', () => {
  const summary: TripPlanSummary = {
    verdict: 'Keeps up: 31 % to spare on the worst day',
    kitMassG: 612,
    carriers: [
      {
        name: 'Ash Leader',
        massG: 612,
        items: [
          { name: 'Fold panel', count: 1 },
          { name: 'Pocket bank', count: 2 },
        ],
      },
    ],
    cautions: ['Never charge lithium below 0 °C.'],
    earlierPlanner: false,
    tripChanged: false,
  };
  const source: TripPlanSummarySource = { summaryFor: async () => summary };
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestAppWithTransport(null, { PUBLIC_URL: 'https://gw.example.test' }, [
      { provide: TRIP_PLAN_SUMMARY, useValue: source },
    ]);
  });

  afterAll(async () => {
    await t.close();
  });

  /** A leader sends the plan home to one viewer; the share page as opened from the link, and the viewer's e-mail. */
  const sendHome = async (leaderName: string, homeName: string) => {
    const leader = await namedHiker(t, leaderName);
    const home = await namedHiker(t, homeName);
    const trip = await createTrip(t, leader);
    await t.db.insert(tripMembers).values({ tripId: trip.id, accountId: home.id, role: 'viewer' });
    const response = await t.http().post(`/api/trips/${trip.id}/send-home`).set(leader.auth).expect(200);
    const opened = await t
      .http()
      .get(`/api/share/${tokenOf(response.body.share.path)}`)
      .expect(200);
    const [mail] = await mailTo(t, home.email);
    return { plan: opened.body.trip.plan, mailText: mail?.text ?? '' };
  };

  it('puts the chosen kit’s verdict, carriers and cautions in the share page and the e-mail', async () => {
    const { plan, mailText } = await sendHome('Ash Leader', 'Rowan at home');
    expect(plan).toEqual(summary);
    expect(mailText).toContain('Keeps up: 31 % to spare on the worst day');
    expect(mailText).toContain('Ash Leader carries Fold panel, 2 × Pocket bank (612 g)');
    expect(mailText).toContain('Never charge lithium below 0 °C.');
    expect(mailText).not.toContain('earlier version of the planner');
  });

  it('says in the page and the e-mail when an earlier planner judged the chosen kit, or the trip changed since', async () => {
    summary.earlierPlanner = true;
    summary.tripChanged = true;
    try {
      const { plan, mailText } = await sendHome('Ash Elder', 'Rowan Elder');
      expect(plan).toMatchObject({ earlierPlanner: true, tripChanged: true });
      expect(mailText).toContain('An earlier version of the planner judged this kit');
      expect(mailText).toContain('The trip or its gear changed after this kit was chosen');
    } finally {
      summary.earlierPlanner = false;
      summary.tripChanged = false;
    }
  });
});
