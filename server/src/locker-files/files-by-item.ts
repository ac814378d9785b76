import type { LockerFile } from '@gramwatt/shared';
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../database/database.types';
import { lockerItemFiles } from '../database/schema';
import { toLockerFile } from './file-view';

/**
 * Files of many of the owner's items at once, by item id, oldest first. Items without files, and ids that are
 * not the owner's, map to nothing. One query serves the locker's item answers and the files routes.
 */
export async function listFilesByItem(
  db: Database,
  ownerId: string,
  itemIds: readonly string[],
): Promise<Map<string, LockerFile[]>> {
  const byItem = new Map<string, LockerFile[]>();
  if (itemIds.length === 0) return byItem;
  const rows = await db
    .select()
    .from(lockerItemFiles)
    .where(and(eq(lockerItemFiles.ownerId, ownerId), inArray(lockerItemFiles.itemId, [...itemIds])))
    .orderBy(asc(lockerItemFiles.createdAt), asc(lockerItemFiles.id));
  for (const row of rows) {
    const list = byItem.get(row.itemId) ?? [];
    list.push(toLockerFile(row));
    byItem.set(row.itemId, list);
  }
  return byItem;
}
