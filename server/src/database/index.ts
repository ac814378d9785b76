export { type CreateDatabaseOptions, type DatabaseHandle, createDatabase } from './create-database';
export { DRIZZLE, type Database, type Schema } from './database.types';
export { migrateDatabase, migrationsFolder } from './migrate-database';
export * as schema from './schema';
export type { AccountRow, NewAccountRow } from './schema';
