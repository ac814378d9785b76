import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { mailMessages } from './mail-messages';
import { tripRoleEnum } from './trip-members';
import { trips } from './trips';

/**
 * An invitation to join a trip, sent to an address. The token itself is never stored: only its SHA-256
 * (a 256-bit random token needs no slow hash, unlike a password). An invite is used once (`accepted_at`),
 * can be withdrawn (`revoked_at`) and lapses at `expires_at`.
 */
export const tripInvites = pgTable(
  'trip_invites',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    tripId: uuid('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    /** Lower-case address the invite went to; only the account with this address may accept it. */
    email: text('email').notNull(),
    role: tripRoleEnum('role').notNull(),
    /** Hex SHA-256 of the token in the invite link. */
    tokenHash: text('token_hash').notNull(),
    invitedBy: uuid('invited_by').references(() => accounts.id, { onDelete: 'set null' }),
    /** The e-mail that carried the link (its delivery status is shown to the leader). */
    mailMessageId: uuid('mail_message_id').references(() => mailMessages.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true, mode: 'date' }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true, mode: 'date' }),
    acceptedBy: uuid('accepted_by').references(() => accounts.id, { onDelete: 'set null' }),
    revokedAt: timestamp('revoked_at', { withTimezone: true, mode: 'date' }),
  },
  (t) => [
    uniqueIndex('trip_invites_token_hash_unique').on(t.tokenHash),
    index('trip_invites_trip_idx').on(t.tripId),
    check('trip_invites_email_lower_case', sql`${t.email} = lower(${t.email})`),
    /** An invite gives one of the shared `inviteRoles`: the leader is whoever made the trip. */
    check('trip_invites_role_not_leader', sql`${t.role} <> 'leader'`),
  ],
);

export type TripInviteRow = typeof tripInvites.$inferSelect;
export type NewTripInviteRow = typeof tripInvites.$inferInsert;
