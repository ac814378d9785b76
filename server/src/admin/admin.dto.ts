import { accountUpdateSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class AccountUpdateDto extends createZodDto(accountUpdateSchema) {}

/** `:id` of an account route. */
export const accountIdParamsSchema = z.object({ id: z.uuid({ error: 'Not an account id' }) });
export class AccountIdParamsDto extends createZodDto(accountIdParamsSchema) {}
