import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, envFlagSchema, parseEnv, readDataDir, readNodeEnv } from './env';
import { minJwtSecretLength, resolveJwtSecret } from './jwt-secret';

/** Default session lifetime, in seconds: 7 days, so a trip planned over a week keeps its session. */
export const defaultTokenLifetimeS = 7 * 24 * 60 * 60;

/** Default sign-in / sign-up attempts allowed per client address per window. */
export const defaultAuthRateLimit = 10;

/** Default rate-limit window, in seconds. */
export const defaultAuthRateWindowS = 60;

const authEnvSchema = z.object({
  JWT_SECRET: z
    .string()
    .min(minJwtSecretLength, { error: `must have at least ${minJwtSecretLength} characters` })
    .optional(),
  AUTH_TOKEN_LIFETIME_S: z.coerce
    .number({ error: 'must be a number of seconds' })
    .int({ error: 'must be a whole number of seconds' })
    .positive({ error: 'must be positive' })
    .default(defaultTokenLifetimeS),
  AUTH_COOKIE_NAME: z
    .string()
    .regex(/^[A-Za-z0-9_-]+$/, { error: 'use letters, digits, _ and - only' })
    .default('gramwatt_session'),
  AUTH_COOKIE_SECURE: envFlagSchema.optional(),
  AUTH_RATE_LIMIT: z.coerce
    .number({ error: 'must be a number' })
    .int({ error: 'must be a whole number' })
    .positive({ error: 'must be positive' })
    .default(defaultAuthRateLimit),
  AUTH_RATE_WINDOW_S: z.coerce
    .number({ error: 'must be a number of seconds' })
    .int({ error: 'must be a whole number of seconds' })
    .positive({ error: 'must be positive' })
    .default(defaultAuthRateWindowS),
});

/** The `auth` configuration namespace. */
export interface AuthConfig {
  /** HS256 key for session tokens (JWT_SECRET; generated into the data folder outside production). */
  jwtSecret: string;
  /** Session lifetime in seconds (AUTH_TOKEN_LIFETIME_S, default 604800 = 7 days). */
  tokenLifetimeS: number;
  /** Name of the httpOnly session cookie (AUTH_COOKIE_NAME, default gramwatt_session). */
  cookieName: string;
  /** Whether the cookie is `Secure` (AUTH_COOKIE_SECURE, default true in production only). */
  cookieSecure: boolean;
  /** Sign-in and sign-up attempts per client address per window (AUTH_RATE_LIMIT, default 10). */
  rateLimit: number;
  /** The rate-limit window in seconds (AUTH_RATE_WINDOW_S, default 60). */
  rateWindowS: number;
}

export const authConfigKey = 'auth';

/** Reads and validates the `auth` namespace from `env`; throws on a bad value or a missing production secret. */
export function readAuthConfig(env: Env): AuthConfig {
  const nodeEnv = readNodeEnv(env);
  const parsed = parseEnv(authEnvSchema, env, 'auth');
  return {
    jwtSecret: resolveJwtSecret({ configured: parsed.JWT_SECRET, nodeEnv, dataDir: readDataDir(env) }),
    tokenLifetimeS: parsed.AUTH_TOKEN_LIFETIME_S,
    cookieName: parsed.AUTH_COOKIE_NAME,
    cookieSecure: parsed.AUTH_COOKIE_SECURE ?? nodeEnv === 'production',
    rateLimit: parsed.AUTH_RATE_LIMIT,
    rateWindowS: parsed.AUTH_RATE_WINDOW_S,
  };
}

/** `registerAs` factory for the `auth` namespace over a given environment. */
export const authConfig = (env: Env) => registerAs(authConfigKey, () => readAuthConfig(env));
