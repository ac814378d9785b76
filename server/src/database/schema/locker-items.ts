import type { ItemSpec } from '@gramwatt/shared';
import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';
import { accounts } from './accounts';

/**
 * One piece of a member's own gear (a panel, bank, battery, converter, controller, lead or device). `spec` holds the shared
 * `itemSpecSchema` value (validated by the service on every write); `kind` and `mass_g` are copied out of
 * it so the locker can be filtered, sorted and summed without reading the JSON.
 */
export const lockerItems = pgTable(
  'locker_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'cascade' }),
    /** panel | bank | battery | converter | controller | lead | device; equals `spec.kind`. */
    kind: text('kind').notNull(),
    name: text('name').notNull(),
    notes: text('notes').notNull().default(''),
    countOwned: integer('count_owned').notNull().default(1),
    spec: jsonb('spec').$type<ItemSpec>().notNull(),
    /** Grams of one item, copied from `spec.massG`. */
    massG: integer('mass_g').notNull().default(0),
    ...timestamps,
    /**
     * When `spec` last changed (set on insert, and on an update only when the spec differs): a device's spec feeds the
     * verdict of every trip it comes on, its name and notes do not.
     */
    specChangedAt: timestamp('spec_changed_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('locker_items_owner_kind_idx').on(t.ownerId, t.kind),
    index('locker_items_owner_name_idx').on(t.ownerId, t.name),
  ],
);

export type LockerItemRow = typeof lockerItems.$inferSelect;
export type NewLockerItemRow = typeof lockerItems.$inferInsert;
