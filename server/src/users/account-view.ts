import type { Account } from '@gramwatt/shared';
import type { AccountRow } from '../database';

/** The account as the API shows it: never the password hash. */
export function toAccount(row: AccountRow): Account {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    role: row.role,
    disabled: row.disabled,
    createdAt: row.createdAt.toISOString(),
  };
}
