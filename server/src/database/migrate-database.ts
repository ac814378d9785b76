import { resolve } from 'node:path';
import { PgliteDatabase } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { NodePgDatabase } from 'drizzle-orm/node-postgres';
import { migrate as migrateNodePg } from 'drizzle-orm/node-postgres/migrator';
import type { Database } from './database.types';
import { errorMessage } from '../common/error-message';

/**
 * The committed migrations (`server/drizzle`), found from this file: `server/src/database` and
 * `server/dist/database` are both two levels below `server/`.
 */
export const migrationsFolder = resolve(__dirname, '../../drizzle');

/**
 * Applies every pending migration; throws (and so stops the start) when one fails. Idempotent:
 * applied migrations are recorded in `drizzle.__drizzle_migrations`.
 */
export async function migrateDatabase(db: Database): Promise<void> {
  try {
    if (db instanceof PgliteDatabase) {
      await migratePglite(db, { migrationsFolder });
    } else if (db instanceof NodePgDatabase) {
      await migrateNodePg(db, { migrationsFolder });
    } else {
      throw new Error('unknown database driver');
    }
  } catch (error) {
    const reason = errorMessage(error);
    throw new Error(`Database migration failed (${migrationsFolder}): ${reason}`, { cause: error });
  }
}
