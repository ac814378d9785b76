import {
  type CanActivate,
  createParamDecorator,
  type ExecutionContext,
  Injectable,
  InternalServerErrorException,
  SetMetadata,
  UnauthorizedException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { MaybeAuthenticatedRequest } from '../auth/authenticated-request';
import type { TripMemberRow } from '../database/schema';
import { TripAccessService } from './trip-access.service';
import { type TripPermission, rolesFor } from './trip-permissions';

const TRIP_PERMISSION_KEY = 'gramwatt:tripPermission';

/** The trip action a route performs on the trip in its `:id` parameter (see `tripPermissions`). */
export const TripAction = (permission: TripPermission) => SetMetadata(TRIP_PERMISSION_KEY, permission);

/** A request after the trip guard: the caller's membership of the trip in `:id`. */
type TripRequest = MaybeAuthenticatedRequest & { tripMember?: TripMemberRow };

/**
 * Checks every route with a trip `:id` against the trip-access policy before any pipe runs (so a
 * non-member learns nothing, not even whether their body was valid). A route with `:id` but no
 * `@TripAction` fails closed.
 */
@Injectable()
export class TripAccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly access: TripAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<TripRequest>();
    const param: unknown = request.params.id;
    if (param === undefined) return true;
    const tripId = typeof param === 'string' ? param : '';
    const permission = this.reflector.getAllAndOverride<TripPermission | undefined>(TRIP_PERMISSION_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!permission) throw new InternalServerErrorException('Trip route without a trip action');
    if (!request.user) throw new UnauthorizedException('Sign in to continue');
    request.tripMember = await this.access.requireTripRole(tripId, request.user.id, rolesFor(permission));
    return true;
  }
}

/** The caller's membership of the route's trip, as the trip guard found it. */
export const CurrentTripMember = createParamDecorator((_data: unknown, context: ExecutionContext): TripMemberRow => {
  const request = context.switchToHttp().getRequest<TripRequest>();
  if (!request.tripMember) throw new InternalServerErrorException('Trip guard did not run');
  return request.tripMember;
});
