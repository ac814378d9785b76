import { accountSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** `{ account }`: the answer of sign-up, sign-in, me and an admin's change. */
export const accountResponseSchema = z.object({ account: accountSchema });
export class AccountResponseDto extends createZodDto(accountResponseSchema) {}

/** `{ accounts }`: the admin's account list. */
export const accountListResponseSchema = z.object({ accounts: z.array(accountSchema) });
export class AccountListResponseDto extends createZodDto(accountListResponseSchema) {}
