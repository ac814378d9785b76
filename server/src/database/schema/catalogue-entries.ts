import type { ItemSpec, LockerItemKind } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';
import { accounts } from './accounts';

/**
 * The reference catalogue: generic example items admins keep and members copy into their lockers. `spec`
 * is a shared `itemSpecSchema` value (validated on write); `kind` and `mass_g` are copied out of it.
 * Names are unique regardless of case so the catalogue never lists two look-alike entries.
 */
export const catalogueEntries = pgTable(
  'catalogue_entries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: text('kind').$type<LockerItemKind>().notNull(),
    name: text('name').notNull(),
    notes: text('notes').notNull().default(''),
    spec: jsonb('spec').$type<ItemSpec>().notNull(),
    /** Grams of the item, copied from `spec.massG` (0 for a device without one). */
    massG: integer('mass_g').notNull().default(0),
    /** The admin who created the entry; kept (as null) when that account goes. */
    createdBy: uuid('created_by').references(() => accounts.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('catalogue_entries_name_unique').on(sql`lower(${t.name})`),
    index('catalogue_entries_kind_name_idx').on(t.kind, t.name),
  ],
);

export type CatalogueEntryRow = typeof catalogueEntries.$inferSelect;
export type NewCatalogueEntryRow = typeof catalogueEntries.$inferInsert;
