import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import type { CapturedMail } from '../mail/captured-mail-store';

export const outboxStatusSchema = z.object({
  /** True while mail goes to the in-process fake and the outbox can be read; false with a real SMTP server. */
  local: z.boolean(),
});
export class OutboxStatusResponseDto extends createZodDto(outboxStatusSchema) {}

/** A line of the outbox list. */
export const outboxEntrySchema = z.object({
  id: z.uuid(),
  receivedAt: z.iso.datetime(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  /** The start of the text part. */
  preview: z.string(),
});
export const outboxListResponseSchema = z.object({ messages: z.array(outboxEntrySchema) });
export class OutboxListResponseDto extends createZodDto(outboxListResponseSchema) {}

/** A whole message as the fake received it. */
export const outboxMessageSchema = outboxEntrySchema.extend({
  text: z.string(),
  html: z.string().nullable(),
  messageId: z.string().nullable(),
});
export const outboxMessageResponseSchema = z.object({ message: outboxMessageSchema });
export class OutboxMessageResponseDto extends createZodDto(outboxMessageResponseSchema) {}

export const outboxMessageParamsSchema = z.object({ messageId: z.uuid({ error: 'Not a message id' }) });
export class OutboxMessageParamsDto extends createZodDto(outboxMessageParamsSchema) {}

/** Characters of the text part shown in the list. */
const previewLength = 140;

export function toOutboxEntry(mail: CapturedMail): z.infer<typeof outboxEntrySchema> {
  return {
    id: mail.id,
    receivedAt: mail.receivedAt,
    from: mail.fromHeader,
    to: mail.toHeader,
    subject: mail.subject,
    preview: mail.text.replace(/\s+/g, ' ').trim().slice(0, previewLength),
  };
}

export function toOutboxMessage(mail: CapturedMail): z.infer<typeof outboxMessageSchema> {
  return { ...toOutboxEntry(mail), text: mail.text, html: mail.html, messageId: mail.messageId };
}
