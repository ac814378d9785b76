import { type MailDelivery, mailDeliverySchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import type { MailMessageRow } from '../database/schema';

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
