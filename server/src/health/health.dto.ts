import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

/** `GET /api/health`: `ok` with the database up; `degraded` (HTTP 503) when it does not answer. */
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['up', 'down']),
  version: z.string(),
});
export type Health = z.infer<typeof healthSchema>;
export class HealthDto extends createZodDto(healthSchema) {}
