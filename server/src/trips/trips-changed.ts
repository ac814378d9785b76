import { type SQL, inArray, or, sql } from 'drizzle-orm';
import type { PgSelect } from 'drizzle-orm/pg-core';
import type { Database } from '../database/database.types';
import { tripDevices, tripKits, tripPlans, trips } from '../database/schema';

/** A database or an open transaction on it (both take the same query builder calls). */
type Queryable = Pick<Database, 'select' | 'update'>;

/**
 * Marks as changed (`updatedAt` = now) every trip that a deletion of the locker items `itemIds` (a subquery of one
 * `id` column) touches: a trip with one of them as a device (the cascade takes it off the trip), in its chosen kit, or
 * — when no kit was chosen — in its latest plan's optimum, which then stands as the kit (either lists gear the member no
 * longer has). Called before the delete, while the rows still tell which trips.
 */
export async function markTripsOfItemsChanged(db: Queryable, itemIds: PgSelect, now: Date): Promise<void> {
  const withDevice = db
    .select({ id: tripDevices.tripId })
    .from(tripDevices)
    .where(inArray(tripDevices.itemId, itemIds));
  /** Whether a kit's jsonb `lines` (each with an `itemId`) hold one of the items. */
  const linesHold = (lines: SQL): SQL =>
    sql`exists (select 1 from jsonb_array_elements(${lines}) as line where (line->>'itemId')::uuid in (${itemIds}))`;
  const withKit = db
    .select({ id: tripKits.tripId })
    .from(tripKits)
    .where(linesHold(sql`${tripKits.lines}`));
  const inStandingOptimum: SQL = sql`not exists (select 1 from ${tripKits} where ${tripKits.tripId} = ${tripPlans.tripId})
    and ${tripPlans.createdAt} = (select max(latest.created_at) from ${tripPlans} as latest where latest.trip_id = ${tripPlans.tripId})
    and ${linesHold(sql`${tripPlans.result}->'kit'->'lines'`)}`;
  const withOptimum = db.select({ id: tripPlans.tripId }).from(tripPlans).where(inStandingOptimum);
  await db
    .update(trips)
    .set({ updatedAt: now })
    .where(or(inArray(trips.id, withDevice), inArray(trips.id, withKit), inArray(trips.id, withOptimum)));
}
