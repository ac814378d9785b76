import { resolve } from 'node:path';
import { z } from 'zod';

/** The environment the server reads its configuration from: `process.env`, or overrides given to `createApp`. */
export type Env = Readonly<Record<string, string | undefined>>;

/** Runtime modes; production tightens cookies and refuses to invent a JWT secret. */
export const nodeEnvs = ['development', 'production', 'test'] as const;
export type NodeEnv = (typeof nodeEnvs)[number];

/** Default data folder, relative to the working directory (where `npm start` runs: the repository root). */
export const defaultDataDir = './data';

/** An unset variable and an empty one mean the same thing: use the default. */
export function withoutEmptyValues(env: Env): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(env)) {
    if (value !== undefined && value.trim() !== '') out[key] = value.trim();
  }
  return out;
}

/** Parses `env` with `schema`, or throws one readable error naming every bad variable. */
export function parseEnv<T extends z.ZodType>(schema: T, env: Env, concern: string): z.output<T> {
  const result = schema.safeParse(withoutEmptyValues(env));
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join('.') || '(env)'}: ${issue.message}`);
    throw new Error(`Invalid ${concern} configuration:\n${lines.join('\n')}`);
  }
  return result.data;
}

export const nodeEnvSchema = z.enum(nodeEnvs, { error: `NODE_ENV must be one of ${nodeEnvs.join(', ')}` });

/** The runtime mode; `development` when NODE_ENV is unset. */
export function readNodeEnv(env: Env): NodeEnv {
  return parseEnv(z.object({ NODE_ENV: nodeEnvSchema.default('development') }), env, 'app').NODE_ENV;
}

/** The data folder as an absolute path (DATA_DIR, default ./data, resolved against the working directory). */
export function readDataDir(env: Env): string {
  const { DATA_DIR } = parseEnv(z.object({ DATA_DIR: z.string().default(defaultDataDir) }), env, 'app');
  return resolve(DATA_DIR);
}

/** "true"/"false" (also 1/0, yes/no) as an environment flag. */
export const envFlagSchema = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'use true or false' })
  .transform((v) => v === 'true' || v === '1' || v === 'yes');
