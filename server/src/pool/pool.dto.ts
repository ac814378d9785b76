import {
  poolItemAddSchema,
  poolItemResponseSchema,
  poolItemUpdateSchema,
  poolListResponseSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';

/** Body of POST /api/trips/:id/pool. */
export class PoolItemAddDto extends createZodDto(poolItemAddSchema) {}
/** Body of PATCH /api/trips/:id/pool/:poolItemId. */
export class PoolItemUpdateDto extends createZodDto(poolItemUpdateSchema) {}
export class PoolItemResponseDto extends createZodDto(poolItemResponseSchema) {}
export class PoolListResponseDto extends createZodDto(poolListResponseSchema) {}
