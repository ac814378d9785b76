import {
  type OutboxEntry,
  type OutboxMessage,
  outboxEntrySchema,
  outboxMessageSchema,
  outboxStatusSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import type { CapturedMail } from '../mail/captured-mail-store';

export class OutboxStatusResponseDto extends createZodDto(outboxStatusSchema) {}

export const outboxListResponseSchema = z.object({ messages: z.array(outboxEntrySchema) });
export class OutboxListResponseDto extends createZodDto(outboxListResponseSchema) {}

export const outboxMessageResponseSchema = z.object({ message: outboxMessageSchema });
export class OutboxMessageResponseDto extends createZodDto(outboxMessageResponseSchema) {}

export const outboxMessageParamsSchema = z.object({ messageId: z.uuid({ error: 'Not a message id' }) });
export class OutboxMessageParamsDto extends createZodDto(outboxMessageParamsSchema) {}

/** Characters of the text part shown in the list. */
const previewLength = 140;

export function toOutboxEntry(mail: CapturedMail): OutboxEntry {
  return {
    id: mail.id,
    receivedAt: mail.receivedAt,
    from: mail.fromHeader,
    to: mail.toHeader,
    subject: mail.subject,
    preview: mail.text.replace(/\s+/g, ' ').trim().slice(0, previewLength),
  };
}

export function toOutboxMessage(mail: CapturedMail): OutboxMessage {
  return { ...toOutboxEntry(mail), text: mail.text, html: mail.html, messageId: mail.messageId };
}
