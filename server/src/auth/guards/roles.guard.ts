import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
  UnauthorizedException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { AccountRole } from '@gramwatt/shared';
import { roleRequiredMessage, signInRequiredMessage } from '../auth-messages';
import type { MaybeAuthenticatedRequest } from '../authenticated-request';
import { ROLES_KEY } from '../decorators/roles.decorator';

/** Global guard after the JWT guard: a route marked `@Roles(...)` answers 403 to other roles. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<AccountRole[] | undefined>(ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!roles || roles.length === 0) return true;
    const { user } = context.switchToHttp().getRequest<MaybeAuthenticatedRequest>();
    if (!user) throw new UnauthorizedException(signInRequiredMessage);
    if (!roles.includes(user.role)) throw new ForbiddenException(roleRequiredMessage);
    return true;
  }
}
