import {
  inviteAcceptedSchema,
  inviteCreateSchema,
  invitePreviewSchema,
  inviteSchema,
  memberUpdateSchema,
  tripMemberSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** The invite routes' DTOs, built from the party schemas in `@gramwatt/shared` that the client's forms use too. */

export class InviteCreateDto extends createZodDto(inviteCreateSchema) {}
export class InviteResponseDto extends createZodDto(z.object({ invite: inviteSchema })) {}
export class InviteListResponseDto extends createZodDto(z.object({ invites: z.array(inviteSchema) })) {}
export class InvitePreviewResponseDto extends createZodDto(z.object({ invite: invitePreviewSchema })) {}
export class InviteAcceptedResponseDto extends createZodDto(inviteAcceptedSchema) {}

export class InviteIdParamsDto extends createZodDto(
  z.object({ id: z.string(), inviteId: z.uuid({ error: 'Not an invite id' }) }),
) {}

export class MemberUpdateDto extends createZodDto(memberUpdateSchema) {}
export class MemberResponseDto extends createZodDto(z.object({ member: tripMemberSchema })) {}

export class MemberParamsDto extends createZodDto(
  z.object({ id: z.string(), accountId: z.uuid({ error: 'Not an account id' }) }),
) {}
