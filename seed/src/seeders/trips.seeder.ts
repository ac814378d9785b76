import { schema, tripRowValues, type Database } from '@gramwatt/server';
import { addDaysIso, mergeUseProfile, parseIsoDate, tripInputSchema } from '@gramwatt/shared';
import { and, eq, inArray, notExists, sql } from 'drizzle-orm';
import { type DemoTrip, demoTrips } from '../demo-trips';

export interface SeedTripsOptions {
  /** The seed's "today", `YYYY-MM-DD` (default: today's UTC date); demo trips start a few weeks after it. */
  today?: string;
}

function todayUtc(): string {
  return new Date().toISOString().slice(0, 10);
}

/**
 * Upserts each demo member's demo trip by (leader, trip name): the trip's fields (its start moved to a
 * few weeks from today), the leader's membership and exactly the demo devices with their overrides, each
 * carried by its owner. Every trip and override is checked with the shared schemas and the override merge
 * first. Trips left with no members at all (after a reset deleted the demo accounts) are deleted. Demo
 * accounts and lockers must exist (seed them first). Returns the trip ids by leader e-mail.
 */
export async function seedTrips(db: Database, options: SeedTripsOptions = {}): Promise<Map<string, string>> {
  const today = parseIsoDate(options.today ?? todayUtc());
  if (!today) throw new Error(`not a date: ${options.today}`);
  // A reset deletes the demo accounts; their memberships go by cascade, leaving trips nobody can reach.
  await db.delete(schema.trips).where(
    notExists(
      db
        .select({ one: sql`1` })
        .from(schema.tripMembers)
        .where(eq(schema.tripMembers.tripId, schema.trips.id)),
    ),
  );
  const ids = new Map<string, string>();
  for (const demo of demoTrips) {
    ids.set(demo.leaderEmail, await seedTrip(db, demo, addDaysIso(today, demo.startInDays)));
  }
  return ids;
}

async function seedTrip(db: Database, demo: DemoTrip, startDate: string): Promise<string> {
  const input = tripInputSchema.parse({ ...demo.trip, startDate });
  const [leader] = await db
    .select({ id: schema.accounts.id })
    .from(schema.accounts)
    .where(eq(schema.accounts.email, demo.leaderEmail))
    .limit(1);
  if (!leader) throw new Error(`demo account ${demo.leaderEmail} is missing: seed the accounts first`);

  const itemNames = demo.devices.map((device) => device.itemName);
  const items = await db
    .select()
    .from(schema.lockerItems)
    .where(and(eq(schema.lockerItems.ownerId, leader.id), inArray(schema.lockerItems.name, itemNames)));
  const devices = demo.devices.map((device) => {
    const item = items.find((candidate) => candidate.name === device.itemName);
    if (!item || item.spec.kind !== 'device') {
      throw new Error(`demo device ${device.itemName} is not in ${demo.leaderEmail}'s locker: seed the lockers first`);
    }
    const merge = mergeUseProfile(item.spec.useProfile, device.useProfileOverride, {
      deviceKind: item.spec.deviceKind,
    });
    if (!merge.ok) throw new Error(`demo override of ${device.itemName} does not fit: ${JSON.stringify(merge.issues)}`);
    return { itemId: item.id, useProfileOverride: device.useProfileOverride ?? null };
  });

  return db.transaction(async (tx) => {
    const now = new Date();
    const values = { ...tripRowValues(input), updatedAt: now };
    const [existing] = await tx
      .select({ id: schema.trips.id })
      .from(schema.trips)
      .innerJoin(schema.tripMembers, eq(schema.tripMembers.tripId, schema.trips.id))
      .where(
        and(
          eq(schema.tripMembers.accountId, leader.id),
          eq(schema.tripMembers.role, 'leader'),
          eq(schema.trips.name, input.name),
        ),
      )
      .limit(1);
    let tripId: string;
    if (existing) {
      tripId = existing.id;
      await tx.update(schema.trips).set(values).where(eq(schema.trips.id, tripId));
    } else {
      const [row] = await tx
        .insert(schema.trips)
        .values({ ...values, createdAt: now })
        .returning({ id: schema.trips.id });
      if (!row) throw new Error(`seeding ${input.name} returned no row`);
      tripId = row.id;
      await tx.insert(schema.tripMembers).values({ tripId, accountId: leader.id, role: 'leader', joinedAt: now });
    }
    // Exactly the demo devices, each carried by its owner; a device already there keeps its id.
    const demoItemIds = devices.map((device) => device.itemId);
    const onTrip = await tx.select().from(schema.tripDevices).where(eq(schema.tripDevices.tripId, tripId));
    for (const row of onTrip) {
      if (!demoItemIds.includes(row.itemId))
        await tx.delete(schema.tripDevices).where(eq(schema.tripDevices.id, row.id));
    }
    for (const [index, device] of devices.entries()) {
      // One second apart, so the trip lists them in the demo's order.
      const addedAt = new Date(now.getTime() + index * 1000);
      const set = {
        useProfileOverride: device.useProfileOverride,
        carrierAccountId: leader.id,
        createdAt: addedAt,
        updatedAt: addedAt,
      };
      await tx
        .insert(schema.tripDevices)
        .values({ tripId, itemId: device.itemId, ...set })
        .onConflictDoUpdate({ target: [schema.tripDevices.tripId, schema.tripDevices.itemId], set });
    }
    return tripId;
  });
}
