import { type MailKind, mailDeliveryStatuses } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { check, index, integer, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';
import { trips } from './trips';

/** Delivery states of an outgoing e-mail: the wire's list, so the column and the API cannot drift apart. */
export const mailStatusEnum = pgEnum('mail_status', mailDeliveryStatuses);

/**
 * The outbox record of every e-mail the server sends: written before the first attempt, so a message is
 * never lost — a crash leaves it `queued` and it is retried at the next start; bounded retries end in
 * `failed` with the last error kept.
 */
export const mailMessages = pgTable(
  'mail_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: text('kind').$type<MailKind>().notNull(),
    /** Lower-case recipient address. */
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body').notNull(),
    /** The trip the message is about, if any (kept as null when the trip is deleted). */
    tripId: uuid('trip_id').references(() => trips.id, { onDelete: 'set null' }),
    status: mailStatusEnum('status').notNull().default('queued'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    /** When the next attempt is due (null once sent or failed). */
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true, mode: 'date' }),
    sentAt: timestamp('sent_at', { withTimezone: true, mode: 'date' }),
    /** The Message-ID the SMTP server accepted. */
    smtpMessageId: text('smtp_message_id'),
    ...timestamps,
  },
  (t) => [
    index('mail_messages_status_idx').on(t.status),
    index('mail_messages_created_idx').on(t.createdAt),
    check('mail_messages_attempts_non_negative', sql`${t.attempts} >= 0`),
    check('mail_messages_to_lower_case', sql`${t.toAddress} = lower(${t.toAddress})`),
  ],
);

export type MailMessageRow = typeof mailMessages.$inferSelect;
export type NewMailMessageRow = typeof mailMessages.$inferInsert;
