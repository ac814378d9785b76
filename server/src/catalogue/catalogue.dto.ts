import {
  catalogueEntryInputSchema,
  catalogueEntryResponseSchema,
  catalogueListQuerySchema,
  catalogueListResponseSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CatalogueEntryInputDto extends createZodDto(catalogueEntryInputSchema) {}
export class CatalogueListQueryDto extends createZodDto(catalogueListQuerySchema) {}
export class CatalogueListResponseDto extends createZodDto(catalogueListResponseSchema) {}
export class CatalogueEntryResponseDto extends createZodDto(catalogueEntryResponseSchema) {}

/** `:id` of a catalogue route. */
export const catalogueIdParamsSchema = z.object({ id: z.uuid({ error: 'Not a catalogue entry id' }) });
export class CatalogueIdParamsDto extends createZodDto(catalogueIdParamsSchema) {}
