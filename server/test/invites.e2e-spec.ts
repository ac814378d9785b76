import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripInvites, tripMembers } from '../src/database/schema';
import { hashInviteToken } from '../src/invites/invite-token';
import { linkIn, mailTo } from './support/party-fixtures';
import { type TestApp, insertAccount, signInToken, startTestApp, testPassword, uniqueEmail } from './support/test-app';
import { type Hiker, createTrip, signedInHiker } from './support/trip-fixtures';

/** Invite lifetime in this file: one hour. */
const lifetimeS = 3600;

describe('invites by e-mail', () => {
  let t: TestApp;
  let leader: Hiker;
  let tripId: string;

  beforeAll(async () => {
    t = await startTestApp({ env: { INVITE_LIFETIME_S: String(lifetimeS), PUBLIC_URL: 'http://gramwatt.test:4000' } });
    const account = await insertAccount(t.db, { displayName: 'Ash Leader' });
    leader = {
      id: account.id,
      email: account.email,
      auth: { Authorization: `Bearer ${await signInToken(t, account.email)}` },
    };
    tripId = (await createTrip(t, leader, { name: 'Ridge & lakes' })).id;
  });

  afterAll(async () => {
    await t.close();
  });

  /** Invites `email` and returns the token from the link in the e-mail the fake received. */
  async function invite(
    email: string,
    role: 'partner' | 'viewer' = 'partner',
  ): Promise<{ token: string; inviteId: string }> {
    const response = await t
      .http()
      .post(`/api/trips/${tripId}/invites`)
      .set(leader.auth)
      .send({ email, role })
      .expect(201);
    const [mail] = await mailTo(t, email);
    if (!mail) throw new Error('no invite mail');
    const link = linkIn(mail.text, 'http://gramwatt.test:4000/invites/');
    return { token: link.slice(link.lastIndexOf('/') + 1), inviteId: response.body.invite.id };
  }

  it('e-mails the invite with the link, the role and the inviter; the response never holds the token', async () => {
    const email = uniqueEmail('wren');
    const response = await t
      .http()
      .post(`/api/trips/${tripId}/invites`)
      .set(leader.auth)
      .send({ email: email.toUpperCase(), role: 'viewer' })
      .expect(201);
    expect(response.body.invite).toMatchObject({
      email,
      role: 'viewer',
      state: 'pending',
      invitedByName: 'Ash Leader',
      mail: { status: 'sent', attempts: 1, lastError: null },
    });
    expect(
      new Date(response.body.invite.expiresAt).getTime() - new Date(response.body.invite.createdAt).getTime(),
    ).toBe(lifetimeS * 1000);
    expect(JSON.stringify(response.body)).not.toMatch(/[A-Za-z0-9_-]{43}/);

    const [mail] = await mailTo(t, email);
    expect(mail?.subject).toBe('Ash Leader invited you to "Ridge & lakes" on Gramwatt');
    expect(mail?.text).toContain('asked you to join as a viewer');
    expect(mail?.text).toContain('As a viewer you can read the trip');
    const link = linkIn(mail?.text ?? '', 'http://gramwatt.test:4000/invites/');
    expect(link).toMatch(/^http:\/\/gramwatt\.test:4000\/invites\/[A-Za-z0-9_-]{43}$/);
    expect(mail?.html).toContain(`href="${link}"`);
    expect(mail?.html).toContain('&quot;Ridge &amp; lakes&quot;');

    // Only the hash of the token is stored.
    const token = link.slice(link.lastIndexOf('/') + 1);
    const [row] = await t.db.select().from(tripInvites).where(eq(tripInvites.id, response.body.invite.id));
    expect(row?.tokenHash).toBe(hashInviteToken(token));
    expect(JSON.stringify(row)).not.toContain(token);
  });

  it('the public link shows the trip name, role and inviter only', async () => {
    const { token } = await invite(uniqueEmail('moss'));
    const response = await t.http().get(`/api/invites/${token}`).expect(200);
    expect(response.body).toEqual({
      invite: { tripName: 'Ridge & lakes', role: 'partner', inviterName: 'Ash Leader' },
    });
  });

  it('accepting (after signing up with the invited address) joins the trip with the role, once', async () => {
    const email = uniqueEmail('fern');
    const { token } = await invite(email, 'partner');
    await t.http().post(`/api/invites/${token}/accept`).expect(401);
    const agent = t.agent();
    await agent.post('/api/auth/sign-up').send({ email, password: testPassword, displayName: 'Fern' }).expect(201);
    const accepted = await agent.post(`/api/invites/${token}/accept`).expect(200);
    expect(accepted.body).toEqual({ tripId, role: 'partner' });
    const trip = await agent.get(`/api/trips/${tripId}`).expect(200);
    expect(trip.body.trip.myRole).toBe('partner');

    // Used: refused with 410, on the link and on accept.
    expect((await t.http().get(`/api/invites/${token}`).expect(410)).body.message).toBe('This invite was already used');
    const again = await agent.post(`/api/invites/${token}/accept`).expect(410);
    expect(again.body.message).toBe('This invite was already used');
    const listed = await t.http().get(`/api/trips/${tripId}/invites`).set(leader.auth).expect(200);
    expect(listed.body.invites.find((i: { email: string }) => i.email === email)).toMatchObject({ state: 'accepted' });
  });

  it('refuses an expired invite with 410, and a tampered or unknown token with 404', async () => {
    const email = uniqueEmail('late');
    const { token } = await invite(email);
    const account = await insertAccount(t.db, { email });
    const auth = { Authorization: `Bearer ${await signInToken(t, account.email)}` };
    const tampered = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    expect((await t.http().get(`/api/invites/${tampered}`).expect(404)).body.message).toBe('Invite not found');
    await t.http().post(`/api/invites/${tampered}/accept`).set(auth).expect(404);
    await t.http().get('/api/invites/short').expect(404);

    t.clock.advanceS(lifetimeS + 1);
    try {
      const expired = await t.http().post(`/api/invites/${token}/accept`).set(auth).expect(410);
      expect(expired.body.message).toMatch(/expired/);
      await t.http().get(`/api/invites/${token}`).expect(410);
      const rows = await t.db.select().from(tripMembers).where(eq(tripMembers.accountId, account.id));
      expect(rows).toEqual([]);
    } finally {
      t.clock.advanceS(-(lifetimeS + 1));
    }
  });

  it('a withdrawn invite stops working; inviting the same address again replaces the pending one', async () => {
    const email = uniqueEmail('twice');
    const first = await invite(email);
    const second = await t
      .http()
      .post(`/api/trips/${tripId}/invites`)
      .set(leader.auth)
      .send({ email, role: 'viewer' })
      .expect(201);
    expect((await t.http().get(`/api/invites/${first.token}`).expect(410)).body.message).toMatch(/withdrawn/);
    await t.http().delete(`/api/trips/${tripId}/invites/${second.body.invite.id}`).set(leader.auth).expect(204);
    await t.http().delete(`/api/trips/${tripId}/invites/${second.body.invite.id}`).set(leader.auth).expect(204);
    const mails = await mailTo(t, email);
    expect(mails).toHaveLength(2);
    const latestToken = linkIn(mails[0]?.text ?? '', 'http://gramwatt.test:4000/invites/')
      .split('/')
      .pop();
    await t.http().get(`/api/invites/${latestToken}`).expect(410);
    const listed = await t.http().get(`/api/trips/${tripId}/invites`).set(leader.auth).expect(200);
    expect(
      listed.body.invites.filter((i: { email: string }) => i.email === email).map((i: { state: string }) => i.state),
    ).toEqual(['revoked', 'revoked']);
  });

  it('only the invited address may accept; someone already on the trip cannot be invited', async () => {
    const { token } = await invite(uniqueEmail('intended'));
    const other = await signedInHiker(t);
    const refused = await t.http().post(`/api/invites/${token}/accept`).set(other.auth).expect(403);
    expect(refused.body.message).toMatch(/another e-mail address/);
    await t.http().get(`/api/invites/${token}`).expect(200);

    const conflict = await t
      .http()
      .post(`/api/trips/${tripId}/invites`)
      .set(leader.auth)
      .send({ email: leader.email, role: 'viewer' })
      .expect(409);
    expect(conflict.body.message).toContain('already on this trip');
  });

  it('validates the body with field paths', async () => {
    const response = await t
      .http()
      .post(`/api/trips/${tripId}/invites`)
      .set(leader.auth)
      .send({ email: 'nope', role: 'leader' })
      .expect(400);
    expect((response.body.errors as { path: string }[]).map((e) => e.path).sort()).toEqual(['email', 'role']);
  });
});
