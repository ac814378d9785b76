import { schema, type Database } from '@gramwatt/server';
import { lockerItemInputSchema, lockerItemMassG } from '@gramwatt/shared';
import { and, eq, inArray } from 'drizzle-orm';
import { demoLockers } from '../demo-lockers';

/**
 * Upserts the demo members' locker items by (owner, name), so running it again keeps each item's id (trips
 * refer to them) and puts back its demo values; a member's own other items are left alone. Every item is
 * checked against the shared schema first (a bad demo item stops the seed). Returns the item ids by
 * e-mail and item name for the seeders that follow. Demo accounts must exist (seed accounts first).
 */
export async function seedLockers(db: Database): Promise<Map<string, Map<string, string>>> {
  const idsByMember = new Map<string, Map<string, string>>();
  for (const [email, rawItems] of Object.entries(demoLockers)) {
    const items = rawItems.map((raw) => lockerItemInputSchema.parse(raw));
    const names = items.map((item) => item.name);
    if (new Set(names).size !== names.length) throw new Error(`demo locker of ${email} repeats an item name`);

    const [owner] = await db
      .select({ id: schema.accounts.id })
      .from(schema.accounts)
      .where(eq(schema.accounts.email, email))
      .limit(1);
    if (!owner) throw new Error(`demo account ${email} is missing: seed the accounts first`);

    const ids = new Map<string, string>();
    await db.transaction(async (tx) => {
      const existing = await tx
        .select({ id: schema.lockerItems.id, name: schema.lockerItems.name })
        .from(schema.lockerItems)
        .where(and(eq(schema.lockerItems.ownerId, owner.id), inArray(schema.lockerItems.name, names)));
      const existingIds = new Map(existing.map((row) => [row.name, row.id]));
      const now = new Date();
      for (const item of items) {
        const values = {
          kind: item.spec.kind,
          name: item.name,
          notes: item.notes,
          countOwned: item.countOwned,
          spec: item.spec,
          massG: lockerItemMassG(item.spec),
          updatedAt: now,
        };
        const id = existingIds.get(item.name);
        if (id) {
          await tx.update(schema.lockerItems).set(values).where(eq(schema.lockerItems.id, id));
          ids.set(item.name, id);
        } else {
          const [row] = await tx
            .insert(schema.lockerItems)
            .values({ ...values, ownerId: owner.id, createdAt: now })
            .returning({ id: schema.lockerItems.id });
          if (!row) throw new Error(`seeding ${item.name} returned no row`);
          ids.set(item.name, row.id);
        }
      }
    });
    idsByMember.set(email, ids);
  }
  return idsByMember;
}
