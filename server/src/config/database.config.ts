import { join } from 'node:path';
import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, parseEnv, readDataDir } from './env';

/** Folder inside the data folder that holds the embedded PGlite database. */
export const pgliteDirName = 'pglite';

const databaseEnvSchema = z.object({
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, {
      error: 'must be a postgres:// or postgresql:// URL (leave unset for the embedded database)',
    })
    .optional(),
});

/** The `database` configuration namespace. */
export interface DatabaseConfig {
  /** A PostgreSQL URL (DATABASE_URL); unset means the embedded PGlite database. */
  url: string | undefined;
  /** Absolute path of the PGlite folder used when `url` is unset: `<DATA_DIR>/pglite`. */
  pgliteDir: string;
}

export const databaseConfigKey = 'database';

/** Reads and validates the `database` namespace from `env`. */
export function readDatabaseConfig(env: Env): DatabaseConfig {
  const parsed = parseEnv(databaseEnvSchema, env, 'database');
  return { url: parsed.DATABASE_URL, pgliteDir: join(readDataDir(env), pgliteDirName) };
}

/** `registerAs` factory for the `database` namespace over a given environment. */
export const databaseConfig = (env: Env) => registerAs(databaseConfigKey, () => readDatabaseConfig(env));
