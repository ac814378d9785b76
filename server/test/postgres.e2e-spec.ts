import { ConflictException } from '@nestjs/common';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/create-app';
import { type DatabaseHandle, createDatabase } from '../src/database/create-database';
import { migrateDatabase } from '../src/database/migrate-database';
import { accounts } from '../src/database/schema';
import { AccountsService } from '../src/users/accounts.service';
import { insertAccount, testEnv, testPassword, uniqueEmail } from './support/test-app';
import { type ThrowawayPostgres, postgresAvailable, startThrowawayPostgres } from './support/throwaway-postgres';

const pgBinAvailable = postgresAvailable();
if (!pgBinAvailable.ok) {
  console.warn(`\n!!! SKIPPING the PostgreSQL (DATABASE_URL) tests: ${pgBinAvailable.reason}\n`);
}

describe.skipIf(!pgBinAvailable.ok)('on PostgreSQL through node-postgres (DATABASE_URL)', () => {
  let postgres: ThrowawayPostgres | undefined;
  let handle: DatabaseHandle;

  beforeAll(async () => {
    postgres = await startThrowawayPostgres();
    handle = await createDatabase({ databaseUrl: postgres.url });
  });

  afterAll(async () => {
    await handle?.close();
    await postgres?.stop();
  });

  it('applies the same migrations, twice without harm', async () => {
    expect(handle.driver).toBe('node-postgres');
    await migrateDatabase(handle.db);
    await migrateDatabase(handle.db);
    const rows = await handle.db.select().from(accounts);
    expect(rows).toEqual([]);
  });

  it('enforces lower-case unique e-mails in the database itself', async () => {
    await expect(
      handle.db.insert(accounts).values({ email: 'Mixed@Example.test', displayName: 'X', passwordHash: 'x' }),
    ).rejects.toThrow();
  });

  it('runs sign-up, sign-in and me through the same app', async () => {
    const app = await createApp({ database: handle.db, env: testEnv, logger: false, serveClient: false });
    try {
      const email = uniqueEmail();
      const http = request.agent(app.getHttpServer());
      await http.post('/api/auth/sign-up').send({ email, password: testPassword, displayName: 'Pg Hiker' }).expect(201);
      await http.post('/api/auth/sign-up').send({ email, password: testPassword, displayName: 'Again' }).expect(409);
      await request(app.getHttpServer())
        .post('/api/auth/sign-in')
        .send({ email, password: 'wrong-password' })
        .expect(401);
      await http.post('/api/auth/sign-in').send({ email, password: testPassword }).expect(200);
      const me = await http.get('/api/auth/me').expect(200);
      expect(me.body.account.email).toBe(email);
    } finally {
      await app.close();
    }
  });

  it('lets only one of two concurrent demotions of the last two admins through', async () => {
    const app = await createApp({ database: handle.db, env: testEnv, logger: false, serveClient: false });
    try {
      await handle.db.update(accounts).set({ role: 'member' }).where(eq(accounts.role, 'admin'));
      const first = await insertAccount(handle.db, { role: 'admin' });
      const second = await insertAccount(handle.db, { role: 'admin' });
      const service = app.get(AccountsService);

      const results = await Promise.allSettled([
        service.update(first.id, { role: 'member' }),
        service.update(second.id, { role: 'member' }),
      ]);

      expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
      const rejected = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
      expect(rejected).toHaveLength(1);
      expect(rejected[0]?.reason).toBeInstanceOf(ConflictException);
      const admins = await handle.db
        .select()
        .from(accounts)
        .where(and(eq(accounts.role, 'admin'), eq(accounts.disabled, false)));
      expect(admins).toHaveLength(1);
    } finally {
      await app.close();
    }
  });

  it('opens and closes its own pool when given DATABASE_URL', async () => {
    const app = await createApp({
      env: { ...testEnv, DATABASE_URL: postgres?.url },
      logger: false,
      serveClient: false,
    });
    const response = await request(app.getHttpServer()).get('/api/health').expect(200);
    expect(response.body.database).toBe('up');
    await app.close();
  });
});
