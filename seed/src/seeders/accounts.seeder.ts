import { hashPassword, schema, type Database } from '@gramwatt/server';
import { demoAccounts, demoPassword } from '../demo-accounts';

/**
 * Upserts the demo accounts by e-mail (idempotent): running it twice leaves one row per demo person, enabled,
 * with the demo password and role. Returns the account ids by e-mail for the seeders that follow.
 */
export async function seedAccounts(db: Database): Promise<Map<string, string>> {
  const passwordHash = await hashPassword(demoPassword);
  const ids = new Map<string, string>();
  for (const account of demoAccounts) {
    const [row] = await db
      .insert(schema.accounts)
      .values({ email: account.email, displayName: account.displayName, role: account.role, passwordHash })
      .onConflictDoUpdate({
        target: schema.accounts.email,
        set: { displayName: account.displayName, role: account.role, passwordHash, disabled: false },
      })
      .returning({ id: schema.accounts.id });
    if (!row) throw new Error(`seeding ${account.email} returned no row`);
    ids.set(account.email, row.id);
  }
  return ids;
}
