import { ForbiddenException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { TripRole } from '@gramwatt/shared';
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { DRIZZLE, type Database } from '../database/database.types';
import { type TripMemberRow, tripMembers } from '../database/schema';

/** The one answer for a trip the caller is not on, or that does not exist (they are not told apart). */
export const tripNotFoundMessage = 'Trip not found';

const uuidSchema = z.uuid();

/**
 * The trip-access policy: membership decides everything. A trip the caller is not a member of answers
 * 404 (even for an admin account: account roles give no trip rights); a member whose role is not allowed
 * answers 403.
 */
@Injectable()
export class TripAccessService {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** The caller's membership row, or null when they are not on the trip (or the id is not a trip id). */
  async findMembership(tripId: string, accountId: string): Promise<TripMemberRow | null> {
    if (!uuidSchema.safeParse(tripId).success) return null;
    const [row] = await this.db
      .select()
      .from(tripMembers)
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, accountId)));
    return row ?? null;
  }

  /**
   * The caller's membership when their role is one of `allowedRoles`.
   * @throws NotFoundException (404) when they are not on the trip; ForbiddenException (403) when their role is too low.
   */
  async requireTripRole(tripId: string, accountId: string, allowedRoles: readonly TripRole[]): Promise<TripMemberRow> {
    const membership = await this.findMembership(tripId, accountId);
    if (!membership) throw new NotFoundException(tripNotFoundMessage);
    if (!allowedRoles.includes(membership.role)) {
      throw new ForbiddenException(`Your role on this trip (${membership.role}) cannot do this`);
    }
    return membership;
  }
}
