import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import { type MailMessageRow, mailKinds, mailStatuses } from '../database/schema';

/** An e-mail's delivery status, without its content (what an admin sees). */
export const mailDeliverySchema = z.object({
  id: z.uuid(),
  kind: z.enum(mailKinds),
  toAddress: z.string(),
  status: z.enum(mailStatuses),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.iso.datetime(),
  sentAt: z.iso.datetime().nullable(),
  nextAttemptAt: z.iso.datetime().nullable(),
});
export type MailDelivery = z.infer<typeof mailDeliverySchema>;

export const mailDeliveryListResponseSchema = z.object({ messages: z.array(mailDeliverySchema) });
export class MailDeliveryListResponseDto extends createZodDto(mailDeliveryListResponseSchema) {}

export function toMailDelivery(row: MailMessageRow): MailDelivery {
  return {
    id: row.id,
    kind: row.kind,
    toAddress: row.toAddress,
    status: row.status,
    attempts: row.attempts,
    lastError: row.lastError,
    createdAt: row.createdAt.toISOString(),
    sentAt: row.sentAt?.toISOString() ?? null,
    nextAttemptAt: row.nextAttemptAt?.toISOString() ?? null,
  };
}
