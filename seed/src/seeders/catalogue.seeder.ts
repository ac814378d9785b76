import { schema, type Database } from '@gramwatt/server';
import { catalogueEntryInputSchema, lockerItemMassG } from '@gramwatt/shared';
import { eq, sql } from 'drizzle-orm';
import { demoAccounts } from '../demo-accounts';
import { demoCatalogue } from '../demo-catalogue';

/**
 * Upserts the demo catalogue by name, regardless of case (idempotent): running it twice leaves one entry
 * per demo name with the demo's values. Entries are checked with the API's own schema first, so a bad
 * demo entry stops the seed instead of landing in the database. Entries are credited to the demo admin.
 */
export async function seedCatalogue(db: Database): Promise<void> {
  const adminEmail = demoAccounts.find((a) => a.role === 'admin')?.email;
  const [admin] = adminEmail
    ? await db.select({ id: schema.accounts.id }).from(schema.accounts).where(eq(schema.accounts.email, adminEmail))
    : [];
  for (const [index, input] of demoCatalogue.entries()) {
    const parsed = catalogueEntryInputSchema.safeParse(input);
    if (!parsed.success) {
      const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
      throw new Error(`demo catalogue entry ${index} (${input.name}) is invalid: ${problems}`);
    }
    const entry = parsed.data;
    const values = {
      kind: entry.spec.kind,
      name: entry.name,
      notes: entry.notes,
      spec: entry.spec,
      massG: lockerItemMassG(entry.spec),
    };
    const updated = await db
      .update(schema.catalogueEntries)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(sql`lower(${schema.catalogueEntries.name})`, entry.name.toLowerCase()))
      .returning({ id: schema.catalogueEntries.id });
    if (updated.length === 0) {
      await db.insert(schema.catalogueEntries).values({ ...values, createdBy: admin?.id ?? null });
    }
  }
}
