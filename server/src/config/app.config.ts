import { resolve } from 'node:path';
import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, type NodeEnv, nodeEnvSchema, parseEnv, readDataDir } from './env';

/**
 * Where the built client lives when CLIENT_DIST_DIR is unset: `<repo>/client/dist`, found from this file
 * (`server/src/config` and `server/dist/config` are both three levels below the repository root).
 */
export const defaultClientDistDir = resolve(__dirname, '../../../client/dist');

const appEnvSchema = z.object({
  NODE_ENV: nodeEnvSchema.default('development'),
  PORT: z.coerce
    .number({ error: 'PORT must be a number' })
    .int({ error: 'PORT must be a whole number' })
    .min(0, { error: 'PORT must be 0–65535' })
    .max(65535, { error: 'PORT must be 0–65535' })
    .default(3000),
  HOST: z.string().optional(),
  TRUST_PROXY_HOPS: z.coerce
    .number({ error: 'TRUST_PROXY_HOPS must be a number' })
    .int({ error: 'TRUST_PROXY_HOPS must be a whole number' })
    .min(0, { error: 'TRUST_PROXY_HOPS must be 0 or more' })
    .default(0),
  CLIENT_DIST_DIR: z.string().optional(),
});

/** The `app` configuration namespace. */
export interface AppConfig {
  nodeEnv: NodeEnv;
  /** TCP port the HTTP server listens on (PORT, default 3000). */
  port: number;
  /** Interface to bind (HOST); unset binds every interface. */
  host: string | undefined;
  /** Reverse proxies in front of the server whose X-Forwarded-For is believed (TRUST_PROXY_HOPS, default 0). */
  trustProxyHops: number;
  /** Absolute path of the data folder (DATA_DIR, default ./data): the PGlite files and the generated JWT secret. */
  dataDir: string;
  /** Absolute path of the built client served at `/` (CLIENT_DIST_DIR, default <repo>/client/dist). */
  clientDistDir: string;
}

export const appConfigKey = 'app';

/** Reads and validates the `app` namespace from `env`; throws on a bad value. */
export function readAppConfig(env: Env): AppConfig {
  const parsed = parseEnv(appEnvSchema, env, 'app');
  return {
    nodeEnv: parsed.NODE_ENV,
    port: parsed.PORT,
    host: parsed.HOST,
    trustProxyHops: parsed.TRUST_PROXY_HOPS,
    dataDir: readDataDir(env),
    clientDistDir: resolve(parsed.CLIENT_DIST_DIR ?? defaultClientDistDir),
  };
}

/** `registerAs` factory for the `app` namespace over a given environment. */
export const appConfig = (env: Env) => registerAs(appConfigKey, () => readAppConfig(env));
