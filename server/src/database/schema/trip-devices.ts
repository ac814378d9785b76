import type { UseProfileOverride } from '@gramwatt/shared';
import { index, jsonb, pgTable, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';
import { accounts } from './accounts';
import { lockerItems } from './locker-items';
import { trips } from './trips';

/**
 * A device that comes on a trip: a locker item of kind `device` (owned by the member who added it), the
 * trip's partial change to its locker use profile (null: the default applies in full) and who carries it.
 */
export const tripDevices = pgTable(
  'trip_devices',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    tripId: uuid('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    itemId: uuid('item_id')
      .notNull()
      .references(() => lockerItems.id, { onDelete: 'cascade' }),
    /** Partial use profile (`useProfileOverrideSchema`), merged field by field over the locker default. */
    useProfileOverride: jsonb('use_profile_override').$type<UseProfileOverride>(),
    /** Who carries it; when that account is gone the owner carries it. */
    carrierAccountId: uuid('carrier_account_id').references(() => accounts.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('trip_devices_trip_item_unique').on(t.tripId, t.itemId),
    index('trip_devices_item_idx').on(t.itemId),
  ],
);

export type TripDeviceRow = typeof tripDevices.$inferSelect;
export type NewTripDeviceRow = typeof tripDevices.$inferInsert;
