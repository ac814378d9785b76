import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { hashPassword } from '../../src/auth/password';
import type { Env } from '../../src/config';
import { createApp } from '../../src/create-app';
import { createDatabase } from '../../src/database/create-database';
import type { Database } from '../../src/database/database.types';
import { type AccountRow, accounts } from '../../src/database/schema';
import { TestClock } from './test-clock';

/** A secret only the tests use (≥ 32 characters). */
export const testJwtSecret = 'test-secret-that-is-only-used-by-the-e2e-tests';

/** Environment every test app starts from: test mode, a fixed secret, rate limits out of the way. */
export const testEnv: Env = {
  NODE_ENV: 'test',
  JWT_SECRET: testJwtSecret,
  AUTH_RATE_LIMIT: '10000',
  DATA_DIR: '/nonexistent-gramwatt-test-data',
  // Threads start on a test's first solve, as the thread tests count on; the warm-up has its own test.
  PLAN_WARM_UP: 'false',
};

export interface TestApp {
  app: NestExpressApplication;
  db: Database;
  clock: TestClock;
  /** A fresh supertest client (no cookies kept). */
  http(): request.Agent;
  /** A supertest agent that keeps cookies, like a browser. */
  agent(): request.Agent;
  close(): Promise<void>;
}

export interface StartTestAppOptions {
  env?: Env;
  serveClient?: boolean;
  /** The plan solver's worker script (see `AppModuleOptions.planWorkerFile`). */
  planWorkerFile?: string;
}

/** The real app (same setup as main.ts) over a fresh migrated in-memory PGlite and a hand-moved clock. */
export async function startTestApp(options: StartTestAppOptions = {}): Promise<TestApp> {
  const database = await createDatabase({ inMemory: true });
  const clock = new TestClock();
  const app = await createApp({
    database: database.db,
    clock,
    env: { ...testEnv, ...options.env },
    serveClient: options.serveClient ?? false,
    ...(options.planWorkerFile ? { planWorkerFile: options.planWorkerFile } : {}),
    logger: false,
  });
  return {
    app,
    db: database.db,
    clock,
    http: () => request(app.getHttpServer()),
    agent: () => request.agent(app.getHttpServer()),
    close: async () => {
      await app.close();
      await database.close();
    },
  };
}

export const testPassword = 'a-long-enough-password';

let sequence = 0;

/** A unique e-mail for this test file's run. */
export function uniqueEmail(prefix = 'hiker'): string {
  sequence += 1;
  return `${prefix}-${sequence}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

/** Inserts an account directly (as the seed does), bypassing HTTP. */
export async function insertAccount(
  db: Database,
  values: { email?: string; role?: 'member' | 'admin'; disabled?: boolean; displayName?: string } = {},
): Promise<AccountRow> {
  const [row] = await db
    .insert(accounts)
    .values({
      email: values.email ?? uniqueEmail(values.role ?? 'member'),
      displayName: values.displayName ?? 'Test Hiker',
      passwordHash: await hashPassword(testPassword),
      role: values.role ?? 'member',
      disabled: values.disabled ?? false,
    })
    .returning();
  if (!row) throw new Error('insert returned no row');
  return row;
}

/** Signs in through HTTP and returns the raw session token from the cookie. */
export async function signInToken(testApp: TestApp, email: string, password = testPassword): Promise<string> {
  const response = await testApp.http().post('/api/auth/sign-in').send({ email, password }).expect(200);
  const token = sessionCookie(response.headers['set-cookie'])?.value;
  if (!token) throw new Error('sign-in set no session cookie');
  return token;
}

export interface ParsedCookie {
  name: string;
  value: string;
  attributes: Map<string, string | true>;
}

/** Finds the session cookie in a Set-Cookie header and splits out its attributes (lower-case names). */
export function sessionCookie(
  setCookie: string | string[] | undefined,
  name = 'gramwatt_session',
): ParsedCookie | undefined {
  const headers = setCookie === undefined ? [] : Array.isArray(setCookie) ? setCookie : [setCookie];
  for (const header of headers) {
    const [pair = '', ...rest] = header.split(';').map((part) => part.trim());
    const eq = pair.indexOf('=');
    if (pair.slice(0, eq) !== name) continue;
    const attributes = new Map<string, string | true>();
    for (const attribute of rest) {
      const i = attribute.indexOf('=');
      if (i < 0) attributes.set(attribute.toLowerCase(), true);
      else attributes.set(attribute.slice(0, i).toLowerCase(), attribute.slice(i + 1));
    }
    return { name, value: decodeURIComponent(pair.slice(eq + 1)), attributes };
  }
  return undefined;
}
