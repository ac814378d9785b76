import { lockerFileListResponseSchema, lockerFileResponseSchema, lockerFileUploadSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** Text fields of an upload (`purpose`); the file itself is the multipart field `file`. */
export class LockerFileUploadDto extends createZodDto(lockerFileUploadSchema) {}
export class LockerFileResponseDto extends createZodDto(lockerFileResponseSchema) {}
export class LockerFileListResponseDto extends createZodDto(lockerFileListResponseSchema) {}

/** `:itemId` of the files routes. */
export const itemFilesParamsSchema = z.object({ itemId: z.uuid({ error: 'Not an item id' }) });
export class ItemFilesParamsDto extends createZodDto(itemFilesParamsSchema) {}

/** `:itemId/files/:fileId`. */
export const itemFileParamsSchema = itemFilesParamsSchema.extend({ fileId: z.uuid({ error: 'Not a file id' }) });
export class ItemFileParamsDto extends createZodDto(itemFileParamsSchema) {}
