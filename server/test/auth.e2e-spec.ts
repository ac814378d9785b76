import { eq } from 'drizzle-orm';
import { JwtService } from '@nestjs/jwt';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { accounts } from '../src/database/schema';
import {
  type TestApp,
  insertAccount,
  sessionCookie,
  signInToken,
  startTestApp,
  testPassword,
  uniqueEmail,
} from './support/test-app';

const errorShape = {
  statusCode: expect.any(Number),
  message: expect.any(String),
  errors: expect.any(Array),
};

describe('auth', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  describe('sign-up', () => {
    it('creates a member, answers 201 with the account and signs it in', async () => {
      const email = uniqueEmail();
      const response = await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email: `  ${email.toUpperCase()} `, password: testPassword, displayName: ' Ridge Walker ' })
        .expect(201);

      expect(response.body).toEqual({
        account: {
          id: expect.any(String),
          email,
          displayName: 'Ridge Walker',
          role: 'member',
          disabled: false,
          createdAt: t.clock.now().toISOString(),
        },
      });
      expect(JSON.stringify(response.body)).not.toContain('argon2');
      expect(sessionCookie(response.headers['set-cookie'])?.value).toBeTruthy();
    });

    it('stores an argon2id hash, never the password', async () => {
      const email = uniqueEmail();
      await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email, password: testPassword, displayName: 'Hasher' })
        .expect(201);
      const [row] = await t.db.select().from(accounts).where(eq(accounts.email, email));
      expect(row?.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
      expect(row?.passwordHash).not.toContain(testPassword);
    });

    it('names the password field when it is shorter than 10 characters', async () => {
      const response = await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email: uniqueEmail(), password: 'short', displayName: 'Shorty' })
        .expect(400);
      expect(response.body).toEqual({
        statusCode: 400,
        message: 'Password needs at least 10 characters',
        errors: [{ path: 'password', message: 'Password needs at least 10 characters' }],
      });
    });

    it('names the email field for an invalid e-mail', async () => {
      const response = await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email: 'not-an-email', password: testPassword, displayName: 'Nobody' })
        .expect(400);
      expect(response.body.errors).toEqual([{ path: 'email', message: 'Enter a valid e-mail address' }]);
    });

    it('lists every missing field', async () => {
      const response = await t.http().post('/api/auth/sign-up').send({}).expect(400);
      expect(response.body).toMatchObject(errorShape);
      const paths = (response.body.errors as { path: string }[]).map((e) => e.path).sort();
      expect(paths).toEqual(['displayName', 'email', 'password']);
    });

    it('answers 409 for a taken e-mail, whatever its case', async () => {
      const email = uniqueEmail();
      await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email, password: testPassword, displayName: 'First' })
        .expect(201);
      const response = await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email: email.toUpperCase(), password: testPassword, displayName: 'Second' })
        .expect(409);
      expect(response.body).toEqual({
        statusCode: 409,
        message: 'An account with this e-mail already exists',
        errors: [{ path: 'email', message: 'An account with this e-mail already exists' }],
      });
    });

    it('ignores a role smuggled into the body', async () => {
      const response = await t
        .http()
        .post('/api/auth/sign-up')
        .send({ email: uniqueEmail(), password: testPassword, displayName: 'Climber', role: 'admin' })
        .expect(201);
      expect(response.body.account.role).toBe('member');
    });
  });

  describe('sign-in', () => {
    it('sets an httpOnly, SameSite=Lax session cookie and returns only the account', async () => {
      const account = await insertAccount(t.db);
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: account.email, password: testPassword })
        .expect(200);

      expect(Object.keys(response.body)).toEqual(['account']);
      expect(response.body.account.id).toBe(account.id);
      const cookie = sessionCookie(response.headers['set-cookie']);
      expect(cookie?.attributes.get('httponly')).toBe(true);
      expect(cookie?.attributes.get('samesite')).toBe('Lax');
      expect(cookie?.attributes.get('path')).toBe('/');
      expect(cookie?.attributes.has('secure')).toBe(false);
      // Max-Age follows the token lifetime (7 days by default).
      expect(cookie?.attributes.get('max-age')).toBe(String(7 * 24 * 3600));
      expect(JSON.stringify(response.body)).not.toContain(cookie?.value ?? 'no-cookie');
    });

    it('answers 401 with a plain message for a wrong password', async () => {
      const account = await insertAccount(t.db);
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: account.email, password: 'not-the-password' })
        .expect(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'E-mail or password is wrong', errors: [] });
      expect(response.headers['set-cookie']).toBeUndefined();
    });

    it('answers an unknown e-mail exactly like a wrong password', async () => {
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: uniqueEmail('ghost'), password: testPassword })
        .expect(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'E-mail or password is wrong', errors: [] });
    });

    it('refuses a disabled account even with the right password', async () => {
      const account = await insertAccount(t.db, { disabled: true });
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: account.email, password: testPassword })
        .expect(401);
      expect(response.body.message).toBe('This account is disabled');
    });

    it('accepts the e-mail in any case', async () => {
      const account = await insertAccount(t.db);
      await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: account.email.toUpperCase(), password: testPassword })
        .expect(200);
    });
  });

  describe('session', () => {
    it('answers me with the cookie', async () => {
      const account = await insertAccount(t.db);
      const agent = t.agent();
      await agent.post('/api/auth/sign-in').send({ email: account.email, password: testPassword }).expect(200);
      const response = await agent.get('/api/auth/me').expect(200);
      expect(response.body.account).toMatchObject({ id: account.id, email: account.email, role: 'member' });
    });

    it('answers me with an Authorization: Bearer token', async () => {
      const account = await insertAccount(t.db);
      const token = await signInToken(t, account.email);
      const response = await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
      expect(response.body.account.id).toBe(account.id);
    });

    it('answers 401 in the error shape without a session', async () => {
      const response = await t.http().get('/api/auth/me').expect(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'Sign in to continue', errors: [] });
    });

    it('refuses a tampered token and one signed with another secret', async () => {
      const account = await insertAccount(t.db);
      const token = await signInToken(t, account.email);
      const [header, payload, signature = ''] = token.split('.');
      const flipped = `${signature.slice(0, -2)}${signature.endsWith('AA') ? 'BB' : 'AA'}`;
      await t.http().get('/api/auth/me').set('Authorization', `Bearer ${header}.${payload}.${flipped}`).expect(401);

      const nowS = Math.floor(t.clock.now().getTime() / 1000);
      const forged = new JwtService({ secret: 'another-secret-of-at-least-32-characters' }).sign({
        sub: account.id,
        iat: nowS,
        exp: nowS + 3600,
      });
      await t.http().get('/api/auth/me').set('Authorization', `Bearer ${forged}`).expect(401);
    });

    it('refuses an unsigned (alg none) token', async () => {
      const account = await insertAccount(t.db);
      const nowS = Math.floor(t.clock.now().getTime() / 1000);
      const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
      const unsigned = `${encode({ alg: 'none', typ: 'JWT' })}.${encode({ sub: account.id, iat: nowS, exp: nowS + 60 })}.`;
      await t.http().get('/api/auth/me').set('Authorization', `Bearer ${unsigned}`).expect(401);
    });

    it('sign-out answers 204, clears the cookie, and the browser is signed out', async () => {
      const account = await insertAccount(t.db);
      const agent = t.agent();
      await agent.post('/api/auth/sign-in').send({ email: account.email, password: testPassword }).expect(200);
      await agent.get('/api/auth/me').expect(200);

      const response = await agent.post('/api/auth/sign-out').expect(204);
      expect(response.text).toBe('');
      const cleared = sessionCookie(response.headers['set-cookie']);
      expect(cleared?.value).toBe('');
      expect(new Date(String(cleared?.attributes.get('expires'))).getTime()).toBeLessThan(Date.now());
      expect(cleared?.attributes.get('httponly')).toBe(true);

      await agent.get('/api/auth/me').expect(401);
    });

    it('sign-out works without a session', async () => {
      await t.http().post('/api/auth/sign-out').expect(204);
    });

    it('refuses a disabled account on its next request, mid-session', async () => {
      const account = await insertAccount(t.db);
      const agent = t.agent();
      await agent.post('/api/auth/sign-in').send({ email: account.email, password: testPassword }).expect(200);
      await agent.get('/api/auth/me').expect(200);

      await t.db.update(accounts).set({ disabled: true }).where(eq(accounts.id, account.id));

      const response = await agent.get('/api/auth/me').expect(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'This account is disabled', errors: [] });
    });

    it('refuses a token whose account was deleted', async () => {
      const account = await insertAccount(t.db);
      const token = await signInToken(t, account.email);
      await t.db.delete(accounts).where(eq(accounts.id, account.id));
      await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    });

    it('expires the session after the token lifetime, by the injected clock', async () => {
      const account = await insertAccount(t.db);
      const token = await signInToken(t, account.email);
      const lifetimeS = 7 * 24 * 3600;

      t.clock.advanceS(lifetimeS - 60);
      await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);

      t.clock.advanceS(61);
      const response = await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
      expect(response.body.message).toBe('Your session has expired; sign in again');
    });
  });
});

describe('auth configuration', () => {
  it('rate-limits sign-in per client with 429 in the error shape', async () => {
    const t = await startTestApp({ env: { AUTH_RATE_LIMIT: '3', AUTH_RATE_WINDOW_S: '60' } });
    try {
      const body = { email: uniqueEmail(), password: testPassword };
      for (let i = 0; i < 3; i += 1) await t.http().post('/api/auth/sign-in').send(body).expect(401);
      const response = await t.http().post('/api/auth/sign-in').send(body).expect(429);
      const retryAfterS = Number(response.headers['retry-after']);
      expect(retryAfterS).toBeGreaterThan(0);
      expect(retryAfterS).toBeLessThanOrEqual(60);
      expect(response.body).toEqual({
        statusCode: 429,
        message: 'Too many attempts; wait a minute and try again',
        errors: [],
      });
      // Other routes are not limited.
      await t.http().get('/api/health').expect(200);
    } finally {
      await t.close();
    }
  });

  it('marks the cookie Secure in production and honours a shorter token lifetime', async () => {
    const t = await startTestApp({
      env: { NODE_ENV: 'production', AUTH_TOKEN_LIFETIME_S: '600', AUTH_COOKIE_NAME: 'gw' },
    });
    try {
      const account = await insertAccount(t.db);
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: account.email, password: testPassword })
        .expect(200);
      const cookie = sessionCookie(response.headers['set-cookie'], 'gw');
      expect(cookie?.attributes.has('secure')).toBe(true);
      expect(cookie?.attributes.get('max-age')).toBe('600');
      const token = cookie?.value ?? '';
      t.clock.advanceS(601);
      await t.http().get('/api/auth/me').set('Cookie', `gw=${token}`).expect(401);
    } finally {
      await t.close();
    }
  });
});
