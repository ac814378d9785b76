import { z } from 'zod';
import { deviceKindSchema } from './devices.js';
import { gramLimitGSchema, tripRoleSchema } from './trips.js';

/**
 * The party's wire shapes: invites by e-mail, members' roles and gram limits, the read-only share link,
 * the plan sent home, and the local outbox. The server's routes (`server/src/invites`, `share`, `outbox`,
 * `mail`) answer in these shapes; the client's forms validate with the same request schemas.
 */

/** Roles an invite can give (a trip has exactly one leader, its creator). */
export const inviteRoles = ['partner', 'viewer'] as const;
export const inviteRoleSchema = z.enum(inviteRoles, { error: 'Role must be partner or viewer' });
export type InviteRole = z.infer<typeof inviteRoleSchema>;

/** Longest e-mail address accepted (RFC 5321's path limit, 256 octets, less the angle brackets). */
export const maxEmailLength = 254;

/** Body of `POST /api/trips/:id/invites`. */
export const inviteCreateSchema = z.object({
  email: z
    .string({ error: 'E-mail is required' })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: 'Enter a valid e-mail address' }).max(maxEmailLength, { error: 'E-mail is too long' })),
  role: inviteRoleSchema,
});
export type InviteCreate = z.infer<typeof inviteCreateSchema>;

/** Where an e-mail stands: waiting for (another) attempt, handed to the SMTP server, or given up on. */
export const mailDeliveryStatuses = ['queued', 'sent', 'failed'] as const;
export const mailDeliveryStatusSchema = z.enum(mailDeliveryStatuses);
export type MailDeliveryStatus = z.infer<typeof mailDeliveryStatusSchema>;

export const inviteStates = ['pending', 'accepted', 'revoked', 'expired'] as const;
export type InviteState = (typeof inviteStates)[number];

/** An invite as the leader sees it (never the token: that only travels in the e-mail). */
export const inviteSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: inviteRoleSchema,
  state: z.enum(inviteStates),
  invitedByName: z.string().nullable(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime(),
  acceptedAt: z.iso.datetime().nullable(),
  /** Delivery of the invite e-mail. */
  mail: z
    .object({ status: mailDeliveryStatusSchema, attempts: z.number().int(), lastError: z.string().nullable() })
    .nullable(),
});
export type Invite = z.infer<typeof inviteSchema>;

/** What the invite link shows before signing in: the trip's name, the role and who invited — nothing more. */
export const invitePreviewSchema = z.object({
  tripName: z.string(),
  role: inviteRoleSchema,
  inviterName: z.string(),
});
export type InvitePreview = z.infer<typeof invitePreviewSchema>;

/** Answer of `POST /api/invites/:token/accept`. */
export const inviteAcceptedSchema = z.object({ tripId: z.uuid(), role: tripRoleSchema });
export type InviteAccepted = z.infer<typeof inviteAcceptedSchema>;

/** Body of `PATCH /api/trips/:id/members/:accountId`: a new role and/or gram limit (null clears it). */
export const memberUpdateSchema = z
  .object({
    role: inviteRoleSchema.optional(),
    gramLimitG: gramLimitGSchema.optional(),
  })
  .refine((v) => v.role !== undefined || v.gramLimitG !== undefined, {
    error: 'Give a role or a gram limit',
    path: ['role'],
  });
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

/** The trip's share link as the leader sees it. */
export const shareLinkSchema = z.object({
  state: z.enum(['active', 'revoked', 'expired', 'none']),
  /** The whole link (the server's public URL + path) while active, else null. */
  url: z.string().nullable(),
  /** `/share/<token>` while active, else null. */
  path: z.string().nullable(),
  createdAt: z.iso.datetime().nullable(),
  expiresAt: z.iso.datetime().nullable(),
});
export type ShareLink = z.infer<typeof shareLinkSchema>;

/** Longest life a leader may give a share link, in days. */
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
export type ShareCreate = z.infer<typeof shareCreateSchema>;

/** The chosen kit in a few lines: verdict sentence, grams, who carries what, the cautions. */
export const sharedPlanSummarySchema = z.object({
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
  /** Whether an earlier version of the planner judged the kit (its verdict may no longer be the planner's). */
  earlierPlanner: z.boolean(),
  /** Whether the trip or one of its devices changed after the kit was chosen (the verdict is for the trip as it was). */
  tripChanged: z.boolean(),
});
export type SharedPlanSummary = z.infer<typeof sharedPlanSummarySchema>;

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
  plan: sharedPlanSummarySchema.nullable(),
  linkExpiresAt: z.iso.datetime(),
});
export type SharedTrip = z.infer<typeof sharedTripSchema>;

/** Longest note a leader may put at the top of the plan sent home. */
export const maxSendHomeNoteLength = 1000;

/** Body of `POST /api/trips/:id/send-home` (optional): a note from the leader placed at the top. */
export const sendHomeSchema = z
  .object({
    note: z
      .string()
      .trim()
      .max(maxSendHomeNoteLength, { error: `The note may have at most ${maxSendHomeNoteLength} characters` })
      .optional(),
  })
  .default({});
export type SendHome = z.infer<typeof sendHomeSchema>;

/** Answer of `POST /api/trips/:id/send-home`: who it went to and the link it carried. */
export const sendHomeResultSchema = z.object({
  sent: z.array(z.object({ displayName: z.string(), email: z.string(), status: mailDeliveryStatusSchema })),
  share: shareLinkSchema,
});
export type SendHomeResult = z.infer<typeof sendHomeResultSchema>;

/** `GET /api/outbox/status`: true while mail goes to the in-process fake and the outbox can be read. */
export const outboxStatusSchema = z.object({ local: z.boolean() });
export type OutboxStatus = z.infer<typeof outboxStatusSchema>;

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
export type OutboxEntry = z.infer<typeof outboxEntrySchema>;

/** A whole message as the local fake received it. */
export const outboxMessageSchema = outboxEntrySchema.extend({
  text: z.string(),
  html: z.string().nullable(),
  messageId: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

/** What an e-mail is for. */
export const mailKinds = ['trip-invite', 'trip-plan'] as const;
export type MailKind = (typeof mailKinds)[number];

/** An e-mail's delivery status without its content: what an admin sees. */
export const mailDeliverySchema = z.object({
  id: z.uuid(),
  kind: z.enum(mailKinds),
  toAddress: z.string(),
  status: mailDeliveryStatusSchema,
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.iso.datetime(),
  sentAt: z.iso.datetime().nullable(),
  nextAttemptAt: z.iso.datetime().nullable(),
});
export type MailDelivery = z.infer<typeof mailDeliverySchema>;
