import {
  sendHomeResultSchema,
  sendHomeSchema,
  shareCreateSchema,
  sharedTripSchema,
  shareLinkSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** The share and send-home routes' DTOs, built from the party schemas in `@gramwatt/shared`. */

export class ShareLinkResponseDto extends createZodDto(z.object({ share: shareLinkSchema })) {}
export class ShareCreateDto extends createZodDto(shareCreateSchema) {}
export class SharedTripResponseDto extends createZodDto(z.object({ trip: sharedTripSchema })) {}
export class SendHomeDto extends createZodDto(sendHomeSchema) {}
export class SendHomeResponseDto extends createZodDto(sendHomeResultSchema) {}
