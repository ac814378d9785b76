import {
  checkRequestSchema,
  checkResultSchema,
  chooseKitRequestSchema,
  chosenKitResponseSchema,
  planListResponseSchema,
  planRequestSchema,
  planResponseSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';

/** Body of POST /api/trips/:id/plans. */
export class PlanRequestDto extends createZodDto(planRequestSchema) {}
export class PlanResponseDto extends createZodDto(planResponseSchema) {}
export class PlanListResponseDto extends createZodDto(planListResponseSchema) {}
/** Body of POST /api/trips/:id/check. */
export class CheckRequestDto extends createZodDto(checkRequestSchema) {}
export class CheckResultDto extends createZodDto(checkResultSchema) {}
/** Body of PUT /api/trips/:id/kit. */
export class ChooseKitRequestDto extends createZodDto(chooseKitRequestSchema) {}
export class ChosenKitResponseDto extends createZodDto(chosenKitResponseSchema) {}
