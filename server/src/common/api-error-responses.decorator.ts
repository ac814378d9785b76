import { applyDecorators } from '@nestjs/common';
import { ApiBearerAuth, ApiCookieAuth, ApiResponse } from '@nestjs/swagger';
import { apiErrorSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';

/** The one API error shape, for the OpenAPI document. */
export class ApiErrorDto extends createZodDto(apiErrorSchema) {}

/** What each error status means here (product brief "Conventions"). */
const errorDescriptions: Readonly<Record<number, string>> = {
  400: 'Validation failed; `errors` names each field',
  401: 'Not signed in, session expired, or account disabled',
  403: 'Your account lacks the role this needs',
  404: 'Not yours or not there',
  409: 'Conflicts with the current state',
  413: 'The request body is too large',
  422: 'Cannot be done as asked (e.g. a trip with nothing to plan)',
  429: 'Too many attempts',
  503: 'Busy or degraded; retry later',
};

/** Documents error answers in the API error shape. */
export function ApiErrorResponses(...statuses: number[]) {
  return applyDecorators(
    ...statuses.map((status) =>
      ApiResponse({ status, type: ApiErrorDto.Output, description: errorDescriptions[status] ?? 'Error' }),
    ),
  );
}

/** Marks a route as needing a session: the cookie, or a Bearer token. Documents the 401. */
export function ApiSession() {
  return applyDecorators(ApiCookieAuth(), ApiBearerAuth(), ApiErrorResponses(401));
}
