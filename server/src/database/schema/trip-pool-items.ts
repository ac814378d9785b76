import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';
import { accounts } from './accounts';
import { lockerItems } from './locker-items';
import { trips } from './trips';

/**
 * Power gear a member shares into a trip's party pool: one of their locker items and how many of it. The plan
 * draws on the pool (and on the leader's whole locker while the leader has pooled nothing; see the shared
 * `poolListResponseSchema`). An entry leaves with its member, its item or its trip.
 */
export const tripPoolItems = pgTable(
  'trip_pool_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    tripId: uuid('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    /** The member who shares it (the locker item's owner). */
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'cascade' }),
    itemId: uuid('item_id')
      .notNull()
      .references(() => lockerItems.id, { onDelete: 'cascade' }),
    /** Units shared, 1 … the count owned when pooled. */
    count: integer('count').notNull(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('trip_pool_items_trip_item_unique').on(t.tripId, t.itemId),
    index('trip_pool_items_trip_account_idx').on(t.tripId, t.accountId),
    index('trip_pool_items_item_idx').on(t.itemId),
    check('trip_pool_items_count_positive', sql`${t.count} > 0`),
  ],
);

export type TripPoolItemRow = typeof tripPoolItems.$inferSelect;
export type NewTripPoolItemRow = typeof tripPoolItems.$inferInsert;
