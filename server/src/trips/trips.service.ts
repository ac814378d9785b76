import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { compareTripsForList, type Trip, type TripInput, type TripMember, type TripSummary } from '@gramwatt/shared';
import { asc, eq, inArray } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type TripMemberRow, accounts, tripMembers, trips } from '../database/schema';
import { TripDevicesService } from './trip-devices.service';
import { tripNotFoundMessage } from './trip-access.service';
import { type TripMemberWithAccount, toTrip, toTripMember, toTripSummary } from './trip-view';
import { tripRowValues } from './trip-values';

/**
 * Trips and their members. Every method that takes a membership row is called after the trip-access
 * policy let the caller in (the controller's guard); `list` and `create` need no trip.
 */
@Injectable()
export class TripsService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly devices: TripDevicesService,
  ) {}

  /** The caller's trips (any role): upcoming and ongoing first, soonest first; then past, latest first. */
  async list(accountId: string): Promise<TripSummary[]> {
    const rows = await this.db
      .select({ trip: trips, role: tripMembers.role })
      .from(tripMembers)
      .innerJoin(trips, eq(trips.id, tripMembers.tripId))
      .where(eq(tripMembers.accountId, accountId));
    const tripIds = rows.map((row) => row.trip.id);
    const memberCounts = new Map<string, number>();
    if (tripIds.length > 0) {
      const members = await this.db
        .select({ tripId: tripMembers.tripId })
        .from(tripMembers)
        .where(inArray(tripMembers.tripId, tripIds));
      for (const member of members) memberCounts.set(member.tripId, (memberCounts.get(member.tripId) ?? 0) + 1);
    }
    const deviceCounts = await this.devices.countByTrip(tripIds);
    const now = this.clock.now();
    return rows
      .map(({ trip, role }) =>
        toTripSummary(trip, role, now, {
          memberCount: memberCounts.get(trip.id) ?? 0,
          deviceCount: deviceCounts.get(trip.id) ?? 0,
        }),
      )
      .sort(compareTripsForList);
  }

  /** The whole trip as the caller sees it. */
  async get(member: TripMemberRow): Promise<Trip> {
    const [row] = await this.db.select().from(trips).where(eq(trips.id, member.tripId));
    if (!row) throw new NotFoundException(tripNotFoundMessage);
    const members = await this.memberRows(member.tripId);
    const devices = await this.devices.list(member.tripId);
    return toTrip(row, member.role, this.clock.now(), members, devices);
  }

  /** A new trip with the caller as its leader. */
  async create(accountId: string, input: TripInput): Promise<Trip> {
    const now = this.clock.now();
    const membership = await this.db.transaction(async (tx) => {
      const [trip] = await tx
        .insert(trips)
        .values({ ...tripRowValues(input), createdAt: now, updatedAt: now })
        .returning({ id: trips.id });
      if (!trip) throw new Error('insert returned no row');
      const [leader] = await tx
        .insert(tripMembers)
        .values({ tripId: trip.id, accountId, role: 'leader', joinedAt: now })
        .returning();
      if (!leader) throw new Error('insert returned no row');
      return leader;
    });
    return this.get(membership);
  }

  /** Replaces every trip field (PUT): an omitted field takes its default; an omitted zone is derived again. */
  async replace(member: TripMemberRow, input: TripInput): Promise<Trip> {
    await this.db
      .update(trips)
      .set({ ...tripRowValues(input), updatedAt: this.clock.now() })
      .where(eq(trips.id, member.tripId));
    return this.get(member);
  }

  /** Deletes the trip with its members and devices (the locker items stay). */
  async remove(member: TripMemberRow): Promise<void> {
    await this.db.delete(trips).where(eq(trips.id, member.tripId));
  }

  /** The trip's members, leader first, then by when they joined. */
  async members(tripId: string): Promise<TripMember[]> {
    return (await this.memberRows(tripId)).map(toTripMember);
  }

  private async memberRows(tripId: string): Promise<TripMemberWithAccount[]> {
    const rows = await this.db
      .select({ member: tripMembers, displayName: accounts.displayName, email: accounts.email })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(eq(tripMembers.tripId, tripId))
      .orderBy(asc(tripMembers.joinedAt), asc(tripMembers.accountId));
    const rank = { leader: 0, partner: 1, viewer: 2 } as const;
    return rows
      .map((row) => ({ ...row.member, displayName: row.displayName, email: row.email }))
      .sort((a, b) => rank[a.role] - rank[b.role]);
  }
}
