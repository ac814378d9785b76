import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { MemberUpdate, TripMember } from '@gramwatt/shared';
import { and, eq, inArray } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.types';
import { accounts, lockerItems, tripDevices, tripMembers, tripPoolItems } from '../database/schema';
import { toTripMember } from '../trips/trip-view';

export const memberNotFoundMessage = 'Member not found';

/**
 * The leader's changes to the party: a member's role or gram limit, and removing a member. Access is
 * checked on every request from `trip_members`, so a removed member is refused at their next request.
 */
@Injectable()
export class TripMembersService {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /**
   * Changes a member's role (partner ↔ viewer) or gram limit. The leader's own role stays (a trip always
   * has its leader); the leader may set their own gram limit.
   */
  async update(tripId: string, accountId: string, change: MemberUpdate): Promise<TripMember> {
    const target = await this.find(tripId, accountId);
    if (change.role !== undefined && target.role === 'leader') {
      throw new ConflictException('The leader’s role cannot change');
    }
    await this.db
      .update(tripMembers)
      .set({
        ...(change.role === undefined ? {} : { role: change.role }),
        ...(change.gramLimitG === undefined ? {} : { gramLimitG: change.gramLimitG }),
      })
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, accountId)));
    const [row] = await this.db
      .select({ member: tripMembers, displayName: accounts.displayName, email: accounts.email })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, accountId)));
    if (!row) throw new NotFoundException(memberNotFoundMessage);
    return toTripMember({ ...row.member, displayName: row.displayName, email: row.email });
  }

  /**
   * Takes a member off the trip with the devices they brought from their locker (their locker is no
   * longer the party's); devices they carried for others go back to their owners.
   */
  async remove(tripId: string, accountId: string): Promise<void> {
    const target = await this.find(tripId, accountId);
    if (target.role === 'leader') throw new ConflictException('The leader cannot be removed: delete the trip instead');
    await this.db.transaction(async (tx) => {
      const owned = tx.select({ id: lockerItems.id }).from(lockerItems).where(eq(lockerItems.ownerId, accountId));
      await tx.delete(tripDevices).where(and(eq(tripDevices.tripId, tripId), inArray(tripDevices.itemId, owned)));
      await tx
        .update(tripDevices)
        .set({ carrierAccountId: null })
        .where(and(eq(tripDevices.tripId, tripId), eq(tripDevices.carrierAccountId, accountId)));
      await tx
        .delete(tripPoolItems)
        .where(and(eq(tripPoolItems.tripId, tripId), eq(tripPoolItems.accountId, accountId)));
      await tx.delete(tripMembers).where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, accountId)));
    });
  }

  private async find(tripId: string, accountId: string) {
    const [row] = await this.db
      .select()
      .from(tripMembers)
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, accountId)));
    if (!row) throw new NotFoundException(memberNotFoundMessage);
    return row;
  }
}
