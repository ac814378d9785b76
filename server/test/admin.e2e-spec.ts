import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { accounts } from '../src/database/schema';
import { AccountsService } from '../src/users/accounts.service';
import { type TestApp, insertAccount, signInToken, startTestApp, testPassword } from './support/test-app';

describe('admin accounts', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  // Each test builds its own set of admins and members from an empty table.
  beforeEach(async () => {
    await t.db.delete(accounts);
  });

  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  /** `PATCH /api/admin/accounts/:id` with `body`, as the holder of `token`. */
  const patchAccount = (id: string, token: string, body: object) =>
    t.http().patch(`/api/admin/accounts/${id}`).set(bearer(token)).send(body);

  it('answers 401 without a session and 403 to a member', async () => {
    const member = await insertAccount(t.db);
    await t.http().get('/api/admin/accounts').expect(401);
    const token = await signInToken(t, member.email);
    const response = await t.http().get('/api/admin/accounts').set(bearer(token)).expect(403);
    expect(response.body).toEqual({
      statusCode: 403,
      message: 'Your account does not have the role this needs',
      errors: [],
    });
    await patchAccount(member.id, token, { role: 'admin' }).expect(403);
    const [row] = await t.db.select().from(accounts).where(eq(accounts.id, member.id));
    expect(row?.role).toBe('member');
  });

  it('lists every account, oldest first, without password hashes', async () => {
    const admin = await insertAccount(t.db, { role: 'admin' });
    t.clock.advanceS(1);
    const member = await insertAccount(t.db);
    const token = await signInToken(t, admin.email);
    const response = await t.http().get('/api/admin/accounts').set(bearer(token)).expect(200);
    expect(response.body.accounts.map((a: { id: string }) => a.id)).toEqual([admin.id, member.id]);
    expect(Object.keys(response.body.accounts[0]).sort()).toEqual(
      ['createdAt', 'disabled', 'displayName', 'email', 'id', 'role'].sort(),
    );
  });

  it('disables a member, whose next request is refused, and enables them again', async () => {
    const admin = await insertAccount(t.db, { role: 'admin' });
    const member = await insertAccount(t.db);
    const adminToken = await signInToken(t, admin.email);
    const memberAgent = t.agent();
    await memberAgent.post('/api/auth/sign-in').send({ email: member.email, password: testPassword }).expect(200);

    const disabled = await patchAccount(member.id, adminToken, { disabled: true }).expect(200);
    expect(disabled.body.account).toMatchObject({ id: member.id, disabled: true, role: 'member' });
    await memberAgent.get('/api/auth/me').expect(401);

    await patchAccount(member.id, adminToken, { disabled: false }).expect(200);
    await memberAgent.get('/api/auth/me').expect(200);
  });

  it('a role change takes effect on the next request', async () => {
    const first = await insertAccount(t.db, { role: 'admin' });
    const second = await insertAccount(t.db, { role: 'admin' });
    const firstToken = await signInToken(t, first.email);
    const secondToken = await signInToken(t, second.email);

    await patchAccount(second.id, firstToken, { role: 'member' }).expect(200);
    await t.http().get('/api/admin/accounts').set(bearer(secondToken)).expect(403);
    await t.http().get('/api/auth/me').set(bearer(secondToken)).expect(200);
  });

  describe('the last active admin', () => {
    it('cannot be demoted or disabled (409), and stays an admin', async () => {
      const admin = await insertAccount(t.db, { role: 'admin' });
      await insertAccount(t.db);
      const token = await signInToken(t, admin.email);

      const demote = await patchAccount(admin.id, token, { role: 'member' }).expect(409);
      expect(demote.body).toEqual({
        statusCode: 409,
        message: 'The last active admin cannot be demoted or disabled',
        errors: [],
      });
      await patchAccount(admin.id, token, { disabled: true }).expect(409);

      const [row] = await t.db.select().from(accounts).where(eq(accounts.id, admin.id));
      expect(row).toMatchObject({ role: 'admin', disabled: false });
      await t.http().get('/api/admin/accounts').set(bearer(token)).expect(200);
    });

    it('a disabled admin does not count as the other admin', async () => {
      const admin = await insertAccount(t.db, { role: 'admin' });
      await insertAccount(t.db, { role: 'admin', disabled: true });
      const token = await signInToken(t, admin.email);
      await patchAccount(admin.id, token, { role: 'member' }).expect(409);
    });

    it('with two admins one may step down, then the other may not', async () => {
      const first = await insertAccount(t.db, { role: 'admin' });
      const second = await insertAccount(t.db, { role: 'admin' });
      const token = await signInToken(t, first.email);

      await patchAccount(second.id, token, { disabled: true }).expect(200);
      await patchAccount(first.id, token, { role: 'member' }).expect(409);
      // Re-enabling the second makes stepping down possible again.
      await patchAccount(second.id, token, { disabled: false }).expect(200);
      await patchAccount(first.id, token, { role: 'member' }).expect(200);
    });

    it('lets only one of two concurrent demotions of the last two admins through', async () => {
      const first = await insertAccount(t.db, { role: 'admin' });
      const second = await insertAccount(t.db, { role: 'admin' });
      const service = t.app.get(AccountsService);
      const results = await Promise.allSettled([
        service.update(first.id, { role: 'member' }),
        service.update(second.id, { disabled: true }),
      ]);
      expect(results.map((r) => r.status).sort()).toEqual(['fulfilled', 'rejected']);
      const active = await t.db
        .select()
        .from(accounts)
        .where(and(eq(accounts.role, 'admin'), eq(accounts.disabled, false)));
      expect(active).toHaveLength(1);
    });

    it('an admin may re-confirm their own role (no change is not a demotion)', async () => {
      const admin = await insertAccount(t.db, { role: 'admin' });
      const token = await signInToken(t, admin.email);
      await patchAccount(admin.id, token, { role: 'admin', disabled: false }).expect(200);
    });
  });

  it('validates the change and the id', async () => {
    const admin = await insertAccount(t.db, { role: 'admin' });
    const member = await insertAccount(t.db);
    const token = await signInToken(t, admin.email);

    const empty = await patchAccount(member.id, token, {}).expect(400);
    expect(empty.body.errors).toEqual([{ path: 'role', message: 'Give a role or a disabled flag' }]);

    const badRole = await patchAccount(member.id, token, { role: 'owner' }).expect(400);
    expect(badRole.body.errors[0].path).toBe('role');

    const badId = await patchAccount('not-a-uuid', token, { role: 'admin' }).expect(400);
    expect(badId.body.errors).toEqual([{ path: 'id', message: 'Not an account id' }]);

    const missing = await patchAccount('1b4e28ba-2fa1-41d2-883f-0016d3cca427', token, { role: 'admin' }).expect(404);
    expect(missing.body).toEqual({ statusCode: 404, message: 'No such account', errors: [] });
  });
});
