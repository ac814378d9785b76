import type { Account } from '@gramwatt/shared';
import { buildAccount, testPassword } from '../data';
import { resetLockerDb } from './locker-db';
import { resetPartyDb } from './party-db';

/** The fake server's state: accounts with their passwords, and who holds the session cookie. */
interface MockDb {
  accounts: Account[];
  passwords: Map<string, string>;
  sessionAccountId: string | null;
}

export const db: MockDb = { accounts: [], passwords: new Map(), sessionAccountId: null };

export const resetDb = () => {
  db.accounts = [];
  db.passwords = new Map();
  db.sessionAccountId = null;
  resetLockerDb();
  resetPartyDb();
};

/** Adds an account the fake server knows, optionally signed in. */
export const seedAccount = (overrides: Partial<Account> = {}, { signedIn = false } = {}): Account => {
  const account = buildAccount(overrides);
  db.accounts.push(account);
  db.passwords.set(account.email, testPassword);
  if (signedIn) db.sessionAccountId = account.id;
  return account;
};

export const sessionAccount = (): Account | undefined =>
  db.accounts.find((account) => account.id === db.sessionAccountId && !account.disabled);
