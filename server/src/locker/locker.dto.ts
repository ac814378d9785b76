import {
  lockerImportQuerySchema,
  lockerImportResultSchema,
  lockerItemInputSchema,
  lockerItemListResponseSchema,
  lockerItemResponseSchema,
  lockerListQuerySchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** Body of create and update. */
export class LockerItemInputDto extends createZodDto(lockerItemInputSchema) {}
/** Query of the list. */
export class LockerListQueryDto extends createZodDto(lockerListQuerySchema) {}
/** Query of the import. */
export class LockerImportQueryDto extends createZodDto(lockerImportQuerySchema) {}

export class LockerItemResponseDto extends createZodDto(lockerItemResponseSchema) {}
export class LockerItemListResponseDto extends createZodDto(lockerItemListResponseSchema) {}
export class LockerImportResultDto extends createZodDto(lockerImportResultSchema) {}

/** `:id` of an item route. */
export const lockerItemIdParamsSchema = z.object({ id: z.uuid({ error: 'Not an item id' }) });
export class LockerItemIdParamsDto extends createZodDto(lockerItemIdParamsSchema) {}
