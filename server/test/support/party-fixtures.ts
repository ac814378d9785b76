import type { Provider } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import { AppModule } from '../../src/app.module';
import type { Env } from '../../src/config';
import { configureApp } from '../../src/create-app';
import { createDatabase } from '../../src/database/create-database';
import type { CapturedMail, CapturedMailStore } from '../../src/mail/captured-mail-store';
import { CAPTURED_MAIL } from '../../src/mail/mail.module';
import { MailService } from '../../src/mail/mail.service';
import { MAIL_TRANSPORT, type MailTransport, type OutgoingMail } from '../../src/mail/mail-transport';
import { type TestApp, testEnv } from './test-app';
import { TestClock } from './test-clock';

/** The messages the local fake SMTP server received, newest first. */
export function capturedMail(t: TestApp): CapturedMail[] {
  const store = t.app.get<CapturedMailStore | null>(CAPTURED_MAIL);
  if (!store) throw new Error('mail is not going to the local fake');
  return store.list();
}

/** Waits until every send and retry has finished, then returns what the fake received for `address`. */
export async function mailTo(t: TestApp, address: string): Promise<CapturedMail[]> {
  await t.app.get(MailService).whenIdle();
  return capturedMail(t).filter((mail) => mail.envelopeTo.includes(address.toLowerCase()));
}

/** The first link in a text part that starts with `prefix`. */
export function linkIn(text: string, prefix: string): string {
  const escaped = prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`${escaped}[^\\s<>"]+`).exec(text);
  if (!match) throw new Error(`no link starting ${prefix} in:\n${text}`);
  return match[0];
}

/** A transport that fails the first `failures` sends with `error`, then records and accepts every message. */
export class FlakyTransport implements MailTransport {
  readonly accepted: OutgoingMail[] = [];
  calls = 0;

  constructor(
    private failures: number,
    private readonly error = 'connect ECONNREFUSED 127.0.0.1:2525',
  ) {}

  async send(mail: OutgoingMail): Promise<{ messageId: string }> {
    this.calls += 1;
    if (this.failures > 0) {
      this.failures -= 1;
      throw new Error(this.error);
    }
    this.accepted.push(mail);
    return { messageId: `<flaky-${this.calls}@test.invalid>` };
  }

  close(): void {}
}

/**
 * The app through Test.createTestingModule with `MAIL_TRANSPORT` replaced (unless null) and extra root
 * providers (value providers also override a feature module's provider of the same token), otherwise as
 * {@link startTestApp}.
 */
export async function startTestAppWithTransport(
  transport: MailTransport | null,
  env: Env = {},
  providers: Provider[] = [],
): Promise<TestApp> {
  const database = await createDatabase({ inMemory: true });
  const clock = new TestClock();
  const builder = Test.createTestingModule({
    imports: [AppModule.forRoot({ env: { ...testEnv, ...env }, database: database.db, clock, serveClient: false })],
    providers,
  });
  if (transport) builder.overrideProvider(MAIL_TRANSPORT).useValue(transport);
  // A value provider given here also replaces a provider a feature module registers under the same token
  // (e.g. the plans module's TRIP_PLAN_SUMMARY), so the test's stand-in is the one the app injects.
  for (const provider of providers) {
    if (typeof provider === 'object' && 'provide' in provider && 'useValue' in provider) {
      builder.overrideProvider(provider.provide).useValue(provider.useValue);
    }
  }
  const moduleRef = await builder.compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: false });
  configureApp(app);
  await app.init();
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
