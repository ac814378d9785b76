import { tripRoles } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { check, index, integer, pgEnum, pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { trips } from './trips';

/** Trip roles as a PostgreSQL enum, from the one list in shared. */
export const tripRoleEnum = pgEnum('trip_role', tripRoles);

/**
 * Who is on a trip and with which role (the creator is `leader`), with each person's own gram limit for
 * the power gear they carry. Every trip route checks the caller's row here (no row: the trip answers 404).
 */
export const tripMembers = pgTable(
  'trip_members',
  {
    tripId: uuid('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'cascade' }),
    role: tripRoleEnum('role').notNull(),
    /** Grams of power gear this person carries at most, or null for no limit. */
    gramLimitG: integer('gram_limit_g'),
    joinedAt: timestamp('joined_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ name: 'trip_members_pk', columns: [t.tripId, t.accountId] }),
    index('trip_members_account_idx').on(t.accountId),
    check('trip_members_gram_limit_positive', sql`${t.gramLimitG} is null or ${t.gramLimitG} > 0`),
  ],
);

export type TripMemberRow = typeof tripMembers.$inferSelect;
export type NewTripMemberRow = typeof tripMembers.$inferInsert;
