import { join } from 'node:path';
import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, envFlagSchema, parseEnv, readDataDir, readNodeEnv } from '../config/env';

/** Folder inside the data folder where the local fake SMTP server keeps the messages it received. */
export const localMailDirName = 'mail';

/** Sender used with the local fake when MAIL_FROM is unset (`.invalid` is reserved and never delivers: RFC 2606 §2). */
export const defaultFakeMailFrom = 'Gramwatt <gramwatt@outbox.invalid>';

/** Default port for SMTP submission with STARTTLS (RFC 6409 §3.1). */
export const defaultSmtpPort = 587;

/** Attempts per message before it is marked failed (the first try included). */
export const defaultMailMaxAttempts = 5;

/** Wait before the first retry, in milliseconds; doubled per attempt (exponential backoff). */
export const defaultMailRetryBaseDelayMs = 2_000;

/** Longest wait between two attempts, in milliseconds (5 minutes). */
export const defaultMailRetryMaxDelayMs = 5 * 60_000;

const addressSchema = z.string().refine(
  (value) => {
    const match = /<([^<>]+)>\s*$/.exec(value);
    return z.email().safeParse((match?.[1] ?? value).trim()).success;
  },
  { error: 'must be an e-mail address, optionally with a name: Name <address@example.org>' },
);

const positiveInt = (what: string) =>
  z.coerce.number({ error: `must be a number ${what}` }).int({ error: `must be a whole number ${what}` });

const mailEnvSchema = z
  .object({
    SMTP_URL: z
      .url({ protocol: /^smtps?$/, error: 'must be an smtp:// or smtps:// URL (leave unset for the local fake)' })
      .optional(),
    SMTP_HOST: z.string().optional(),
    SMTP_PORT: positiveInt('')
      .min(1, { error: 'must be 1–65535' })
      .max(65535, { error: 'must be 1–65535' })
      .default(defaultSmtpPort),
    SMTP_SECURE: envFlagSchema.optional(),
    SMTP_USER: z.string().optional(),
    SMTP_PASS: z.string().optional(),
    MAIL_FROM: addressSchema.optional(),
    MAIL_FAKE_PORT: positiveInt('')
      .min(0, { error: 'must be 0–65535 (0 picks a free port)' })
      .max(65535, { error: 'must be 0–65535 (0 picks a free port)' })
      .default(0),
    MAIL_FAKE_STORE: z.enum(['disk', 'memory'], { error: 'use disk or memory' }).optional(),
    MAIL_MAX_ATTEMPTS: positiveInt('of attempts')
      .min(1, { error: 'must be at least 1' })
      .max(20, { error: 'must be at most 20' })
      .default(defaultMailMaxAttempts),
    MAIL_RETRY_BASE_DELAY_MS: positiveInt('of milliseconds')
      .min(0, { error: 'must be 0 or more' })
      .default(defaultMailRetryBaseDelayMs),
    MAIL_RETRY_MAX_DELAY_MS: positiveInt('of milliseconds')
      .min(0, { error: 'must be 0 or more' })
      .default(defaultMailRetryMaxDelayMs),
    PUBLIC_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
    PORT: z.string().optional(),
  })
  .superRefine((env, ctx) => {
    const real = env.SMTP_URL !== undefined || env.SMTP_HOST !== undefined;
    if (env.SMTP_URL !== undefined && env.SMTP_HOST !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['SMTP_HOST'], message: 'give SMTP_URL or SMTP_HOST, not both' });
    }
    if (real && env.MAIL_FROM === undefined) {
      ctx.addIssue({ code: 'custom', path: ['MAIL_FROM'], message: 'must be set with a real SMTP server' });
    }
    if (env.SMTP_PASS !== undefined && env.SMTP_USER === undefined) {
      ctx.addIssue({ code: 'custom', path: ['SMTP_USER'], message: 'must be set with SMTP_PASS' });
    }
  });

/** How to reach a real SMTP server. */
export type SmtpSettings =
  { url: string } | { host: string; port: number; secure: boolean; user: string | undefined; pass: string | undefined };

/** Bounded retries with exponential backoff. */
export interface MailRetrySettings {
  /** Attempts per message, the first included (MAIL_MAX_ATTEMPTS, default 5). */
  maxAttempts: number;
  /** Wait before the first retry, ms (MAIL_RETRY_BASE_DELAY_MS, default 2000); doubled each time. */
  baseDelayMs: number;
  /** Cap on any one wait, ms (MAIL_RETRY_MAX_DELAY_MS, default 300000). */
  maxDelayMs: number;
}

/** The `mail` configuration namespace. */
export interface MailConfig {
  transport:
    | { mode: 'smtp'; smtp: SmtpSettings }
    /** The in-process fake SMTP server on 127.0.0.1, messages in `<DATA_DIR>/mail` or in memory. */
    | { mode: 'local-fake'; fakePort: number; store: 'disk' | 'memory'; fakeDir: string };
  /** The From header (MAIL_FROM). */
  from: string;
  /** Origin of the app in links inside e-mails (PUBLIC_URL, default http://localhost:PORT), no trailing slash. */
  publicUrl: string;
  retry: MailRetrySettings;
}

export const mailConfigKey = 'mail';

/**
 * Reads and validates the `mail` namespace. With SMTP_URL or SMTP_HOST mail goes to that server;
 * otherwise to the local fake, which keeps messages on disk — in memory under NODE_ENV=test.
 */
export function readMailConfig(env: Env): MailConfig {
  const parsed = parseEnv(mailEnvSchema, env, 'mail');
  const nodeEnv = readNodeEnv(env);
  const retry = {
    maxAttempts: parsed.MAIL_MAX_ATTEMPTS,
    baseDelayMs: parsed.MAIL_RETRY_BASE_DELAY_MS,
    maxDelayMs: Math.max(parsed.MAIL_RETRY_MAX_DELAY_MS, 0),
  };
  const publicUrl = (parsed.PUBLIC_URL ?? `http://localhost:${parsed.PORT ?? '3000'}`).replace(/\/+$/, '');
  let transport: MailConfig['transport'];
  if (parsed.SMTP_URL !== undefined) {
    transport = { mode: 'smtp', smtp: { url: parsed.SMTP_URL } };
  } else if (parsed.SMTP_HOST !== undefined) {
    transport = {
      mode: 'smtp',
      smtp: {
        host: parsed.SMTP_HOST,
        port: parsed.SMTP_PORT,
        // Port 465 is implicit TLS (RFC 8314 §3.3); other ports upgrade with STARTTLS.
        secure: parsed.SMTP_SECURE ?? parsed.SMTP_PORT === 465,
        user: parsed.SMTP_USER,
        pass: parsed.SMTP_PASS,
      },
    };
  } else {
    transport = {
      mode: 'local-fake',
      fakePort: parsed.MAIL_FAKE_PORT,
      store: parsed.MAIL_FAKE_STORE ?? (nodeEnv === 'test' ? 'memory' : 'disk'),
      fakeDir: join(readDataDir(env), localMailDirName),
    };
  }
  return { transport, from: parsed.MAIL_FROM ?? defaultFakeMailFrom, publicUrl, retry };
}

/** `registerAs` factory for the `mail` namespace over a given environment. */
export const mailConfig = (env: Env) => registerAs(mailConfigKey, () => readMailConfig(env));
