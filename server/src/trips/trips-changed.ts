import { type SQL, inArray } from 'drizzle-orm';
import type { Database } from '../database/database.types';
import { tripDevices, trips } from '../database/schema';

/** A database or an open transaction on it (both take the same query builder calls). */
type Queryable = Pick<Database, 'select' | 'update'>;

/**
 * Marks as changed (`updatedAt` = now) every trip with a device whose locker item matches `items` — called before those
 * items are deleted, which takes the devices off their trips by cascade, so a kit chosen with them shows as stale.
 */
export async function markTripsOfItemsChanged(db: Queryable, items: SQL, now: Date): Promise<void> {
  const affected = db.select({ id: tripDevices.tripId }).from(tripDevices).where(items);
  await db.update(trips).set({ updatedAt: now }).where(inArray(trips.id, affected));
}
