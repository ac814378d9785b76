import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { drizzle as drizzleNodePg } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import { pgliteDirName } from '../config/database.config';
import type { Database } from './database.types';
import * as schema from './schema';

export interface CreateDatabaseOptions {
  /**
   * The data folder (DATA_DIR); the on-disk PGlite database lives in its `pglite` subfolder (created when
   * missing). Ignored with `databaseUrl` or `inMemory`.
   */
  dataDir?: string;
  /** A `postgres://` URL: use PostgreSQL through node-postgres instead of PGlite. */
  databaseUrl?: string;
  /** A throwaway in-memory PGlite database (tests). */
  inMemory?: boolean;
}

/** An open database and the one way to close it. */
export interface DatabaseHandle {
  db: Database;
  /** Which driver is behind `db`. */
  driver: 'pglite' | 'node-postgres';
  close(): Promise<void>;
}

/**
 * Opens the database without Nest (used by the app, the seed and the start script): PostgreSQL when
 * `databaseUrl` is given, else PGlite in memory or in `<dataDir>/pglite`. Does not migrate: call `migrateDatabase`.
 *
 * @example
 * const { db, close } = await createDatabase({ dataDir: './data' });
 * await migrateDatabase(db);
 * await close();
 */
export async function createDatabase(options: CreateDatabaseOptions = {}): Promise<DatabaseHandle> {
  if (options.databaseUrl) {
    const pool = new Pool({ connectionString: options.databaseUrl });
    const db = drizzleNodePg({ client: pool, schema });
    return { db, driver: 'node-postgres', close: () => pool.end() };
  }
  let client: PGlite;
  if (options.inMemory) {
    client = new PGlite();
  } else {
    if (!options.dataDir) throw new Error('createDatabase needs dataDir, databaseUrl or inMemory');
    const pgliteDir = join(resolve(options.dataDir), pgliteDirName);
    mkdirSync(pgliteDir, { recursive: true });
    client = new PGlite(pgliteDir);
  }
  await client.waitReady;
  const db = drizzlePglite({ client, schema });
  return {
    db,
    driver: 'pglite',
    close: async () => {
      if (!client.closed) await client.close();
    },
  };
}
