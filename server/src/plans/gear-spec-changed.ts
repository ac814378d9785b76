import { inArray, max } from 'drizzle-orm';
import type { Database } from '../database/database.types';
import { lockerItems } from '../database/schema';

/**
 * When the locker spec of any of these items last changed (`locker_items.spec_changed_at`), or null when none is in a
 * locker any more: a plan or a chosen kit made before it is for gear as it was.
 */
export async function gearSpecChangedAt(db: Database, itemIds: readonly string[]): Promise<Date | null> {
  if (itemIds.length === 0) return null;
  const [latest] = await db
    .select({ at: max(lockerItems.specChangedAt) })
    .from(lockerItems)
    .where(inArray(lockerItems.id, [...itemIds]));
  return latest?.at ?? null;
}
