import { deviceKindSchema, tripRoleSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import { mailStatuses } from '../database/schema';

/** The trip's share link as the leader sees it. */
export const shareLinkSchema = z.object({
  state: z.enum(['active', 'revoked', 'expired', 'none']),
  /** The whole link (PUBLIC_URL + path) while active, else null. */
  url: z.string().nullable(),
  /** `/share/<token>` while active, else null. */
  path: z.string().nullable(),
  createdAt: z.iso.datetime().nullable(),
  expiresAt: z.iso.datetime().nullable(),
});
export type ShareLinkView = z.infer<typeof shareLinkSchema>;
export class ShareLinkResponseDto extends createZodDto(z.object({ share: shareLinkSchema })) {}

/** Longest life a leader may ask for, in days. */
export const maxShareLinkDays = 365;

/** Body of `POST /api/trips/:id/share` (optional): how many days the new link works. */
export const shareCreateSchema = z
  .object({
    expiresInDays: z
      .number({ error: 'Days must be a number' })
      .int({ error: 'Days must be a whole number' })
      .min(1, { error: `Days must be 1–${maxShareLinkDays}` })
      .max(maxShareLinkDays, { error: `Days must be 1–${maxShareLinkDays}` })
      .optional(),
  })
  .default({});
export class ShareCreateDto extends createZodDto(shareCreateSchema) {}

export const planSummarySchema = z.object({
  verdict: z.string(),
  kitMassG: z.number(),
  carriers: z.array(
    z.object({
      name: z.string(),
      massG: z.number(),
      items: z.array(z.object({ name: z.string(), count: z.number().int() })),
    }),
  ),
  cautions: z.array(z.string()),
});

/** What a share link shows: read-only, no e-mail addresses, no locker. */
export const sharedTripSchema = z.object({
  name: z.string(),
  startDate: z.iso.date(),
  endDate: z.iso.date(),
  nights: z.number().int(),
  latitudeDeg: z.number(),
  longitudeDeg: z.number(),
  timeZone: z.string(),
  gramLimitG: z.number().int().nullable(),
  members: z.array(z.object({ displayName: z.string(), role: tripRoleSchema })),
  devices: z.array(z.object({ name: z.string(), deviceKind: deviceKindSchema, carrierName: z.string() })),
  /** The chosen kit's summary, or null while the trip has no plan. */
  plan: planSummarySchema.nullable(),
  linkExpiresAt: z.iso.datetime(),
});
export type SharedTrip = z.infer<typeof sharedTripSchema>;
export class SharedTripResponseDto extends createZodDto(z.object({ trip: sharedTripSchema })) {}

/** Body of `POST /api/trips/:id/send-home` (optional): a note from the leader placed at the top. */
export const sendHomeSchema = z
  .object({ note: z.string().trim().max(1000, { error: 'The note may have at most 1000 characters' }).optional() })
  .default({});
export class SendHomeDto extends createZodDto(sendHomeSchema) {}

export const sendHomeResultSchema = z.object({
  sent: z.array(z.object({ displayName: z.string(), email: z.string(), status: z.enum(mailStatuses) })),
  share: shareLinkSchema,
});
export class SendHomeResponseDto extends createZodDto(sendHomeResultSchema) {}
