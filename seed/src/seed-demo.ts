import { schema, type Database } from '@gramwatt/server';
import { count, inArray } from 'drizzle-orm';
import { demoAccounts, demoPassword } from './demo-accounts';
import { seedAccounts } from './seeders/accounts.seeder';
import { seedCatalogue } from './seeders/catalogue.seeder';
import { demoParty } from './demo-party';
import { seedLockers } from './seeders/locker.seeder';
import { seedParty } from './seeders/party.seeder';
import { seedTrips } from './seeders/trips.seeder';

/** Loads the whole invented demo scenario, seeder by seeder in dependency order. Idempotent. */
export async function seedDemo(db: Database): Promise<void> {
  await seedAccounts(db);
  await seedCatalogue(db);
  await seedLockers(db);
  await seedTrips(db);
  await seedParty(db);
}

/** Seeds the demo only into a database with no accounts at all; true when it did. */
export async function seedDemoIfEmpty(db: Database): Promise<boolean> {
  const [row] = await db.select({ accounts: count() }).from(schema.accounts);
  if ((row?.accounts ?? 0) > 0) return false;
  await seedDemo(db);
  return true;
}

/** Deletes the demo accounts (and, by cascade, everything they own), then seeds the demo again. */
export async function resetDemo(db: Database): Promise<void> {
  await db.delete(schema.accounts).where(
    inArray(
      schema.accounts.email,
      demoAccounts.map((a) => a.email),
    ),
  );
  await seedDemo(db);
}

const nameOf = (email: string): string => demoAccounts.find((a) => a.email === email)?.displayName ?? email;

/** The lines printed on start so a visitor can sign in to the demo. */
export function demoSignInLines(): string[] {
  return [
    'Demo sign-in (invented accounts, local demo only):',
    ...demoAccounts.map((a) => `  ${a.role.padEnd(6)}  ${a.email.padEnd(28)} ${a.displayName}`),
    `  password for all: ${demoPassword}`,
    `Demo party: ${demoParty.tripName}, led by ${nameOf(demoParty.leaderEmail)}, with ${demoParty.members
      .map((m) => `${nameOf(m.email)} (${m.role})`)
      .join(' and ')}.`,
  ];
}
