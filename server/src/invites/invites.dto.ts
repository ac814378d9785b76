import { gramLimitGSchema, tripMemberSchema, tripRoleSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';
import { mailStatuses } from '../database/schema';

/** Roles an invite can give. */
export const inviteRoleSchema = z.enum(['partner', 'viewer'], { error: 'Role must be partner or viewer' });

/** Body of `POST /api/trips/:id/invites`. */
export const inviteCreateSchema = z.object({
  email: z
    .string({ error: 'E-mail is required' })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: 'Enter a valid e-mail address' }).max(254, { error: 'E-mail is too long' })),
  role: inviteRoleSchema,
});
export type InviteCreate = z.infer<typeof inviteCreateSchema>;
export class InviteCreateDto extends createZodDto(inviteCreateSchema) {}

export const inviteStates = ['pending', 'accepted', 'revoked', 'expired'] as const;

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
    .object({ status: z.enum(mailStatuses), attempts: z.number().int(), lastError: z.string().nullable() })
    .nullable(),
});
export type InviteView = z.infer<typeof inviteSchema>;
export class InviteResponseDto extends createZodDto(z.object({ invite: inviteSchema })) {}
export class InviteListResponseDto extends createZodDto(z.object({ invites: z.array(inviteSchema) })) {}

/** What the invite link shows before signing in: nothing but the trip's name, the role and who invited. */
export const invitePreviewSchema = z.object({
  tripName: z.string(),
  role: inviteRoleSchema,
  inviterName: z.string(),
});
export class InvitePreviewResponseDto extends createZodDto(z.object({ invite: invitePreviewSchema })) {}

export const inviteAcceptedSchema = z.object({ tripId: z.uuid(), role: tripRoleSchema });
export class InviteAcceptedResponseDto extends createZodDto(inviteAcceptedSchema) {}

export class InviteIdParamsDto extends createZodDto(
  z.object({ id: z.string(), inviteId: z.uuid({ error: 'Not an invite id' }) }),
) {}

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
export class MemberUpdateDto extends createZodDto(memberUpdateSchema) {}

export class MemberResponseDto extends createZodDto(z.object({ member: tripMemberSchema })) {}

export class MemberParamsDto extends createZodDto(
  z.object({ id: z.string(), accountId: z.uuid({ error: 'Not an account id' }) }),
) {}
