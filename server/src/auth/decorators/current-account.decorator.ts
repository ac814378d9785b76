import { createParamDecorator, type ExecutionContext, UnauthorizedException } from '@nestjs/common';
import type { MaybeAuthenticatedRequest } from '../authenticated-request';

/** The signed-in account (as loaded from the database for this request). */
export const CurrentAccount = createParamDecorator((_data: unknown, context: ExecutionContext) => {
  const request = context.switchToHttp().getRequest<MaybeAuthenticatedRequest>();
  if (!request.user) throw new UnauthorizedException('Sign in to continue');
  return request.user;
});
