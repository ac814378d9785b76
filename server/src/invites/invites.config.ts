import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, parseEnv } from '../config/env';

/** Default life of an invite, in seconds: 7 days, time to read the mail before a trip. */
export const defaultInviteLifetimeS = 7 * 24 * 60 * 60;

const invitesEnvSchema = z.object({
  INVITE_LIFETIME_S: z.coerce
    .number({ error: 'must be a number of seconds' })
    .int({ error: 'must be a whole number of seconds' })
    .positive({ error: 'must be positive' })
    .default(defaultInviteLifetimeS),
});

/** The `invites` configuration namespace. */
export interface InvitesConfig {
  /** How long an invite link works, in seconds (INVITE_LIFETIME_S, default 604800 = 7 days). */
  lifetimeS: number;
}

export const invitesConfigKey = 'invites';

export function readInvitesConfig(env: Env): InvitesConfig {
  return { lifetimeS: parseEnv(invitesEnvSchema, env, 'invites').INVITE_LIFETIME_S };
}

export const invitesConfig = (env: Env) => registerAs(invitesConfigKey, () => readInvitesConfig(env));
