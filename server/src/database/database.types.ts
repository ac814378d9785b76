import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from './schema';

/** The full Drizzle schema, as the query builder sees it. */
export type Schema = typeof schema;

/**
 * The database handle every service injects (token `DRIZZLE`): the common type of the PGlite and the
 * node-postgres drivers, so code written against it runs on both.
 */
export type Database = PgDatabase<PgQueryResultHKT, Schema>;

/** Injection token of the {@link Database}. */
export const DRIZZLE = Symbol('DRIZZLE');
