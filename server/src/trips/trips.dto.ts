import {
  tripDeviceAddSchema,
  tripDeviceListResponseSchema,
  tripDeviceResponseSchema,
  tripDeviceUpdateSchema,
  tripInputSchema,
  tripListResponseSchema,
  tripMemberListResponseSchema,
  tripResponseSchema,
} from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';

/** Body of POST /api/trips and PUT /api/trips/:id. */
export class TripInputDto extends createZodDto(tripInputSchema) {}
export class TripResponseDto extends createZodDto(tripResponseSchema) {}
export class TripListResponseDto extends createZodDto(tripListResponseSchema) {}
export class TripMemberListResponseDto extends createZodDto(tripMemberListResponseSchema) {}
/** Body of POST /api/trips/:id/devices. */
export class TripDeviceAddDto extends createZodDto(tripDeviceAddSchema) {}
/** Body of PATCH /api/trips/:id/devices/:deviceId. */
export class TripDeviceUpdateDto extends createZodDto(tripDeviceUpdateSchema) {}
export class TripDeviceResponseDto extends createZodDto(tripDeviceResponseSchema) {}
export class TripDeviceListResponseDto extends createZodDto(tripDeviceListResponseSchema) {}
