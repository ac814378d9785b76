import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, parseEnv } from '../config/env';
import { minJwtSecretLength } from '../config/jwt-secret';

/** Default life of a share link, in seconds: 30 days, a trip of a few weeks plus the days before it. */
export const defaultShareLinkLifetimeS = 30 * 24 * 60 * 60;

const shareEnvSchema = z.object({
  SHARE_LINK_LIFETIME_S: z.coerce
    .number({ error: 'must be a number of seconds' })
    .int({ error: 'must be a whole number of seconds' })
    .positive({ error: 'must be positive' })
    .default(defaultShareLinkLifetimeS),
  SHARE_LINK_SECRET: z
    .string()
    .min(minJwtSecretLength, { error: `must have at least ${minJwtSecretLength} characters` })
    .optional(),
});

/** The `share` configuration namespace. */
export interface ShareConfig {
  /** How long a new share link works, in seconds (SHARE_LINK_LIFETIME_S, default 2592000 = 30 days). */
  lifetimeS: number;
  /** HS256 key for share tokens (SHARE_LINK_SECRET); unset: derived from the session secret. */
  secret: string | undefined;
}

export const shareConfigKey = 'share';

export function readShareConfig(env: Env): ShareConfig {
  const parsed = parseEnv(shareEnvSchema, env, 'share');
  return { lifetimeS: parsed.SHARE_LINK_LIFETIME_S, secret: parsed.SHARE_LINK_SECRET };
}

export const shareConfig = (env: Env) => registerAs(shareConfigKey, () => readShareConfig(env));
