import type { LockerFileContentType, LockerFilePurpose } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { bigint, check, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { lockerItems } from './locker-items';

/**
 * A photo or spec sheet attached to a locker item. The bytes live in the object store under `object_key`
 * (and a photo's thumbnail under `thumb_key`); this row is the owner-checked index of them. `owner_id`
 * repeats the item's owner so every query can be scoped without a join.
 */
export const lockerItemFiles = pgTable(
  'locker_item_files',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    itemId: uuid('item_id')
      .notNull()
      .references(() => lockerItems.id, { onDelete: 'cascade' }),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'cascade' }),
    purpose: text('purpose').$type<LockerFilePurpose>().notNull(),
    /** The type found in the bytes (never the one the browser declared). */
    contentType: text('content_type').$type<LockerFileContentType>().notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    /** The uploaded name, cleaned of paths and control characters; shown and offered on download. */
    fileName: text('file_name').notNull(),
    objectKey: text('object_key').notNull(),
    thumbKey: text('thumb_key'),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('locker_item_files_owner_item_idx').on(t.ownerId, t.itemId),
    check('locker_item_files_purpose', sql`${t.purpose} in ('photo', 'spec-sheet')`),
    check('locker_item_files_size', sql`${t.sizeBytes} >= 0`),
  ],
);

export type LockerItemFileRow = typeof lockerItemFiles.$inferSelect;
export type NewLockerItemFileRow = typeof lockerItemFiles.$inferInsert;

/**
 * Stored objects whose file rows are gone, waiting to be removed from the object store. A trigger
 * (migration `queue-deleted-file-objects`) adds the keys of every deleted `locker_item_files` row, however
 * it went: one file deleted, its item deleted, a locker replaced by an import, an account deleted. The
 * files service drains the queue, so a deleted photo does not linger in the bucket.
 */
export const storedObjectDeletions = pgTable('stored_object_deletions', {
  id: bigint('id', { mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
  objectKey: text('object_key').notNull(),
  queuedAt: timestamp('queued_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
});

export type StoredObjectDeletionRow = typeof storedObjectDeletions.$inferSelect;
