import { accountRoles } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { boolean, check, index, pgEnum, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';

/** Account roles as a PostgreSQL enum, from the one list in shared. */
export const accountRoleEnum = pgEnum('account_role', accountRoles);

/** A person who signs in. E-mails are stored lower-case (a check constraint holds it) and are unique. */
export const accounts = pgTable(
  'accounts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: text('email').notNull(),
    displayName: text('display_name').notNull(),
    /** argon2id PHC string; never leaves the server. */
    passwordHash: text('password_hash').notNull(),
    role: accountRoleEnum('role').notNull().default('member'),
    disabled: boolean('disabled').notNull().default(false),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('accounts_email_unique').on(t.email),
    index('accounts_role_idx').on(t.role),
    check('accounts_email_lower_case', sql`${t.email} = lower(${t.email})`),
  ],
);

export type AccountRow = typeof accounts.$inferSelect;
export type NewAccountRow = typeof accounts.$inferInsert;
