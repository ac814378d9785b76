import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/create-app';
import { type DatabaseHandle, createDatabase } from '../src/database/create-database';
import { DRIZZLE } from '../src/database/database.types';
import { testEnv, testPassword, uniqueEmail } from './support/test-app';

/** The Nest testing-module route: AppModule with DRIZZLE overridden by a fresh in-memory PGlite (migrated at init). */
describe('AppModule through Test.createTestingModule', () => {
  let handle: DatabaseHandle;
  let app: NestExpressApplication;

  beforeAll(async () => {
    handle = await createDatabase({ inMemory: true });
    const moduleRef = await Test.createTestingModule({
      imports: [AppModule.forRoot({ env: testEnv, serveClient: false })],
    })
      .overrideProvider(DRIZZLE)
      .useValue(handle.db)
      .compile();
    app = moduleRef.createNestApplication<NestExpressApplication>({ logger: false });
    configureApp(app);
    await app.init();
  });

  afterAll(async () => {
    await app.close();
    await handle.close();
  });

  it('migrates the overriding database and serves the same routes', async () => {
    await request(app.getHttpServer()).get('/api/health').expect(200);
    const agent = request.agent(app.getHttpServer());
    const email = uniqueEmail();
    await agent
      .post('/api/auth/sign-up')
      .send({ email, password: testPassword, displayName: 'Module Route' })
      .expect(201);
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.account.email).toBe(email);
  });
});
