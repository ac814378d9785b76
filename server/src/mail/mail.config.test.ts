import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readMailConfig } from './mail.config';
import { retryDelayMs } from './retry-backoff';

describe('mail config', () => {
  it('goes to the local fake by default: on disk in DATA_DIR/mail, in memory under NODE_ENV=test', () => {
    expect(readMailConfig({ DATA_DIR: '/srv/gw' })).toEqual({
      transport: { mode: 'local-fake', fakePort: 0, store: 'disk', fakeDir: join(resolve('/srv/gw'), 'mail') },
      from: 'Gramwatt <gramwatt@outbox.invalid>',
      publicUrl: 'http://localhost:3000',
      retry: { maxAttempts: 5, baseDelayMs: 2000, maxDelayMs: 300000 },
    });
    expect(readMailConfig({ NODE_ENV: 'test' }).transport).toMatchObject({ mode: 'local-fake', store: 'memory' });
    expect(readMailConfig({ NODE_ENV: 'test', MAIL_FAKE_STORE: 'disk' }).transport).toMatchObject({ store: 'disk' });
  });

  it('uses a real server from SMTP_URL or SMTP_HOST, and then needs MAIL_FROM', () => {
    expect(
      readMailConfig({ SMTP_URL: 'smtps://u:p@mail.example.test', MAIL_FROM: 'trips@example.test' }).transport,
    ).toEqual({
      mode: 'smtp',
      smtp: { url: 'smtps://u:p@mail.example.test' },
    });
    expect(
      readMailConfig({
        SMTP_HOST: 'mail.example.test',
        SMTP_USER: 'u',
        SMTP_PASS: 'p',
        MAIL_FROM: 'Trips <trips@example.test>',
      }).transport,
    ).toEqual({ mode: 'smtp', smtp: { host: 'mail.example.test', port: 587, secure: false, user: 'u', pass: 'p' } });
    // Port 465 is implicit TLS (RFC 8314 §3.3).
    expect(
      readMailConfig({ SMTP_HOST: 'mail.example.test', SMTP_PORT: '465', MAIL_FROM: 'a@example.test' }).transport,
    ).toMatchObject({
      smtp: { secure: true },
    });
    expect(() => readMailConfig({ SMTP_HOST: 'mail.example.test' })).toThrow(
      /MAIL_FROM: must be set with a real SMTP server/,
    );
  });

  it('takes PUBLIC_URL for links, without a trailing slash, defaulting to localhost:PORT', () => {
    expect(readMailConfig({ PUBLIC_URL: 'https://gw.example.test/' }).publicUrl).toBe('https://gw.example.test');
    expect(readMailConfig({ PORT: '8080' }).publicUrl).toBe('http://localhost:8080');
  });

  it.each([
    ['SMTP_URL', 'http://mail.example.test'],
    ['SMTP_PORT', '0'],
    ['MAIL_FROM', 'not an address'],
    ['MAIL_FAKE_STORE', 'tape'],
    ['MAIL_MAX_ATTEMPTS', '0'],
    ['MAIL_RETRY_BASE_DELAY_MS', 'soon'],
    ['PUBLIC_URL', 'ftp://gw.example.test'],
  ])('rejects %s=%s, naming the variable', (name, value) => {
    expect(() => readMailConfig({ [name]: value })).toThrow(new RegExp(name));
  });

  it('refuses SMTP_URL with SMTP_HOST, and SMTP_PASS without SMTP_USER', () => {
    expect(() =>
      readMailConfig({ SMTP_URL: 'smtp://a.example.test', SMTP_HOST: 'b', MAIL_FROM: 'a@example.test' }),
    ).toThrow(/SMTP_HOST/);
    expect(() => readMailConfig({ SMTP_HOST: 'b', SMTP_PASS: 'p', MAIL_FROM: 'a@example.test' })).toThrow(/SMTP_USER/);
  });
});

describe('retry backoff', () => {
  const retry = { maxAttempts: 5, baseDelayMs: 2000, maxDelayMs: 10_000 };

  it('doubles the wait after each failed attempt, capped, and stops at the allowance', () => {
    expect([1, 2, 3, 4, 5].map((attempt) => retryDelayMs(attempt, retry))).toEqual([2000, 4000, 8000, 10_000, null]);
  });

  it('allows a single attempt only when maxAttempts is 1', () => {
    expect(retryDelayMs(1, { ...retry, maxAttempts: 1 })).toBeNull();
  });
});
