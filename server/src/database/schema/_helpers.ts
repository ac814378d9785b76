import { timestamp } from 'drizzle-orm/pg-core';

/**
 * `created_at` / `updated_at` for every table, as timezone-aware timestamps. `updated_at` is set by
 * the services on every change (from the injected clock), not by a trigger.
 */
export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
};
