import { sql } from 'drizzle-orm';
import { check, integer, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { trips } from './trips';

/**
 * A trip's read-only share link. The link carries a signed token naming the trip and `version`; a token
 * is good only while its version is the row's, the row is not revoked and not past `expires_at`. Making a
 * new link bumps the version, so every older token stops working.
 */
export const tripShareLinks = pgTable(
  'trip_share_links',
  {
    tripId: uuid('trip_id')
      .primaryKey()
      .references(() => trips.id, { onDelete: 'cascade' }),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => accounts.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true, mode: 'date' }).notNull(),
    revokedAt: timestamp('revoked_at', { withTimezone: true, mode: 'date' }),
  },
  (t) => [check('trip_share_links_version_positive', sql`${t.version} > 0`)],
);

export type TripShareLinkRow = typeof tripShareLinks.$inferSelect;
export type NewTripShareLinkRow = typeof tripShareLinks.$inferInsert;
