import { schema, type Database } from '@gramwatt/server';
import { and, eq, inArray, notInArray } from 'drizzle-orm';
import { type DemoParty, demoParty } from '../demo-party';

async function accountId(db: Database, email: string): Promise<string> {
  const [row] = await db
    .select({ id: schema.accounts.id })
    .from(schema.accounts)
    .where(eq(schema.accounts.email, email));
  if (!row) throw new Error(`demo account ${email} is missing: seed the accounts first`);
  return row.id;
}

/** The member's locker items by name (only theirs: two lockers may hold items of the same name). */
async function itemsByName(db: Database, ownerId: string, names: readonly string[]): Promise<Map<string, string>> {
  if (names.length === 0) return new Map();
  const rows = await db
    .select({ id: schema.lockerItems.id, name: schema.lockerItems.name })
    .from(schema.lockerItems)
    .where(and(eq(schema.lockerItems.ownerId, ownerId), inArray(schema.lockerItems.name, [...names])));
  const byName = new Map(rows.map((row) => [row.name, row.id]));
  for (const name of names)
    if (!byName.has(name)) throw new Error(`demo item ${name} is not in the locker: seed the lockers first`);
  return byName;
}

/**
 * Makes the demo trip a party (idempotent): the leader's gram limit; each member's role and gram limit (upserted on
 * the membership); exactly their demo pool entries (upserted on trip and item, others of theirs removed) and their
 * demo devices, carried by themselves. The demo trip, accounts and lockers must exist (seed them first).
 */
export async function seedParty(db: Database, party: DemoParty = demoParty): Promise<void> {
  const leaderId = await accountId(db, party.leaderEmail);
  const [trip] = await db
    .select({ id: schema.trips.id })
    .from(schema.trips)
    .innerJoin(schema.tripMembers, eq(schema.tripMembers.tripId, schema.trips.id))
    .where(
      and(
        eq(schema.tripMembers.accountId, leaderId),
        eq(schema.tripMembers.role, 'leader'),
        eq(schema.trips.name, party.tripName),
      ),
    );
  if (!trip) throw new Error(`demo trip ${party.tripName} is missing: seed the trips first`);
  const tripId = trip.id;

  await db.transaction(async (tx) => {
    await tx
      .update(schema.tripMembers)
      .set({ gramLimitG: party.leaderGramLimitG })
      .where(and(eq(schema.tripMembers.tripId, tripId), eq(schema.tripMembers.accountId, leaderId)));
    for (const member of party.members) {
      const memberId = await accountId(tx, member.email);
      await tx
        .insert(schema.tripMembers)
        .values({ tripId, accountId: memberId, role: member.role, gramLimitG: member.gramLimitG })
        .onConflictDoUpdate({
          target: [schema.tripMembers.tripId, schema.tripMembers.accountId],
          set: { role: member.role, gramLimitG: member.gramLimitG },
        });

      const poolItems = await itemsByName(
        tx,
        memberId,
        member.pool.map((p) => p.itemName),
      );
      const pooledIds = [...poolItems.values()];
      await tx
        .delete(schema.tripPoolItems)
        .where(
          and(
            eq(schema.tripPoolItems.tripId, tripId),
            eq(schema.tripPoolItems.accountId, memberId),
            ...(pooledIds.length > 0 ? [notInArray(schema.tripPoolItems.itemId, pooledIds)] : []),
          ),
        );
      for (const entry of member.pool) {
        const itemId = poolItems.get(entry.itemName) as string;
        await tx
          .insert(schema.tripPoolItems)
          .values({ tripId, accountId: memberId, itemId, count: entry.count })
          .onConflictDoUpdate({
            target: [schema.tripPoolItems.tripId, schema.tripPoolItems.itemId],
            set: { accountId: memberId, count: entry.count, updatedAt: new Date() },
          });
      }

      const devices = await itemsByName(tx, memberId, member.devices);
      for (const itemId of devices.values()) {
        await tx
          .insert(schema.tripDevices)
          .values({ tripId, itemId, carrierAccountId: memberId })
          .onConflictDoUpdate({
            target: [schema.tripDevices.tripId, schema.tripDevices.itemId],
            set: { carrierAccountId: memberId },
          });
      }
    }
  });
}
