import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import {
  type ApiFieldError,
  type DeviceSpec,
  mergeUseProfile,
  type TripDeviceAdd,
  type TripDeviceDetail,
  type TripDeviceUpdate,
  type UseProfileOverride,
} from '@gramwatt/shared';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { z } from 'zod';
import { CLOCK, type Clock } from '../common/clock';
import { isUniqueViolation } from '../common/database-errors';
import { DRIZZLE, type Database } from '../database/database.types';
import { type TripMemberRow, lockerItems, tripDevices, tripMembers, trips } from '../database/schema';
import { type TripDeviceWithItem, isDeviceItem, toTripDeviceDetail } from './trip-view';

const uuidSchema = z.uuid();
const deviceNotFoundMessage = 'This device is not on the trip';
/** Roles that can carry gear (a viewer stays at home). */
const carrierRoles = new Set(['leader', 'partner']);

function badRequest(errors: ApiFieldError[]): BadRequestException {
  return new BadRequestException({
    message: errors.length === 1 ? errors[0]?.message : 'Some fields need attention',
    errors,
  });
}

/**
 * The devices that come on a trip: each a locker device of the member who added it, with the trip's
 * override of its use profile (merged field by field over the locker default) and its carrier.
 * Callers have passed the trip-access policy for the trip already.
 */
@Injectable()
export class TripDevicesService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /**
   * The trip's devices with effective use profiles, in the order they were added (then by name). Items that are no longer devices in
   * the locker (their kind was changed) are left out.
   */
  async list(tripId: string): Promise<TripDeviceDetail[]> {
    const rows = await this.db
      .select({ device: tripDevices, item: lockerItems })
      .from(tripDevices)
      .innerJoin(lockerItems, eq(lockerItems.id, tripDevices.itemId))
      .where(eq(tripDevices.tripId, tripId))
      .orderBy(asc(tripDevices.createdAt), asc(lockerItems.name), asc(tripDevices.id));
    const memberIds = await this.memberIds(tripId);
    return rows
      .filter((row): row is TripDeviceWithItem => isDeviceItem(row.item))
      .map((row) => toTripDeviceDetail(row, memberIds));
  }

  async get(tripId: string, deviceId: string): Promise<TripDeviceDetail> {
    const devices = await this.list(tripId);
    const device = devices.find((candidate) => candidate.id === deviceId);
    if (!device) throw new NotFoundException(deviceNotFoundMessage);
    return device;
  }

  /**
   * Adds one of the caller's own locker devices. 404 when the item is not in the caller's locker; 400 when
   * it is not a device, the override does not fit its default or the carrier is not on the trip (as a
   * leader or partner); 409 when it is on the trip already.
   */
  async add(tripId: string, member: TripMemberRow, body: TripDeviceAdd): Promise<TripDeviceDetail> {
    const [item] = await this.db
      .select()
      .from(lockerItems)
      .where(and(eq(lockerItems.id, body.itemId), eq(lockerItems.ownerId, member.accountId)));
    if (!item) throw new NotFoundException('No such item in your locker');
    if (!isDeviceItem(item)) {
      throw badRequest([
        { path: 'itemId', message: 'Only devices go on the device list; the plan picks panels, banks and leads' },
      ]);
    }
    const errors = [
      ...this.overrideErrors(item.spec, body.useProfileOverride),
      ...(await this.carrierErrors(tripId, body.carrierAccountId)),
    ];
    if (errors.length > 0) throw badRequest(errors);
    const now = this.clock.now();
    try {
      const [row] = await this.db
        .insert(tripDevices)
        .values({
          tripId,
          itemId: item.id,
          useProfileOverride: body.useProfileOverride,
          carrierAccountId: body.carrierAccountId ?? member.accountId,
          createdAt: now,
          updatedAt: now,
        })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return this.get(tripId, row.id);
    } catch (error) {
      if (isUniqueViolation(error, 'trip_devices_trip_item_unique')) {
        throw new ConflictException('This device is on the trip already');
      }
      throw error;
    }
  }

  /** Changes the override (null clears it) or the carrier. A partner may change only their own devices. */
  async update(
    tripId: string,
    deviceId: string,
    member: TripMemberRow,
    body: TripDeviceUpdate,
  ): Promise<TripDeviceDetail> {
    const { item } = await this.findForChange(tripId, deviceId, member);
    const errors = [
      ...(body.useProfileOverride === undefined ? [] : this.overrideErrors(item.spec, body.useProfileOverride)),
      ...(await this.carrierErrors(tripId, body.carrierAccountId)),
    ];
    if (errors.length > 0) throw badRequest(errors);
    await this.db
      .update(tripDevices)
      .set({
        ...(body.useProfileOverride === undefined ? {} : { useProfileOverride: body.useProfileOverride }),
        ...(body.carrierAccountId === undefined ? {} : { carrierAccountId: body.carrierAccountId }),
        updatedAt: this.clock.now(),
      })
      .where(and(eq(tripDevices.id, deviceId), eq(tripDevices.tripId, tripId)));
    return this.get(tripId, deviceId);
  }

  /**
   * Takes a device off the trip (the locker item stays). A partner may remove only their own devices. The trip counts
   * as changed then (its row's `updatedAt`), so a kit chosen for the longer device list is flagged as stale.
   */
  async remove(tripId: string, deviceId: string, member: TripMemberRow): Promise<void> {
    await this.findForChange(tripId, deviceId, member);
    await this.db.transaction(async (tx) => {
      await tx.delete(tripDevices).where(and(eq(tripDevices.id, deviceId), eq(tripDevices.tripId, tripId)));
      await tx.update(trips).set({ updatedAt: this.clock.now() }).where(eq(trips.id, tripId));
    });
  }

  /** How many devices each trip has. */
  async countByTrip(tripIds: string[]): Promise<Map<string, number>> {
    const counts = new Map<string, number>();
    if (tripIds.length === 0) return counts;
    const rows = await this.db
      .select({ tripId: tripDevices.tripId })
      .from(tripDevices)
      .where(inArray(tripDevices.tripId, tripIds));
    for (const row of rows) counts.set(row.tripId, (counts.get(row.tripId) ?? 0) + 1);
    return counts;
  }

  private async findForChange(tripId: string, deviceId: string, member: TripMemberRow): Promise<TripDeviceWithItem> {
    if (!uuidSchema.safeParse(deviceId).success) throw new NotFoundException(deviceNotFoundMessage);
    const [row] = await this.db
      .select({ device: tripDevices, item: lockerItems })
      .from(tripDevices)
      .innerJoin(lockerItems, eq(lockerItems.id, tripDevices.itemId))
      .where(and(eq(tripDevices.id, deviceId), eq(tripDevices.tripId, tripId)));
    if (!row || !isDeviceItem(row.item)) throw new NotFoundException(deviceNotFoundMessage);
    if (member.role !== 'leader' && row.item.ownerId !== member.accountId) {
      throw new ForbiddenException('Only the leader or the device’s owner can change it');
    }
    return { device: row.device, item: row.item };
  }

  private overrideErrors(spec: DeviceSpec, override: UseProfileOverride | null): ApiFieldError[] {
    const merge = mergeUseProfile(spec.useProfile, override, { deviceKind: spec.deviceKind });
    if (merge.ok) return [];
    return merge.issues.map((issue) => ({
      path: ['useProfileOverride', ...issue.path].join('.'),
      message: issue.message,
    }));
  }

  private async carrierErrors(tripId: string, carrierAccountId: string | undefined): Promise<ApiFieldError[]> {
    if (carrierAccountId === undefined) return [];
    const [row] = await this.db
      .select({ role: tripMembers.role })
      .from(tripMembers)
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.accountId, carrierAccountId)));
    if (row && carrierRoles.has(row.role)) return [];
    return [{ path: 'carrierAccountId', message: 'The carrier must be a leader or partner on this trip' }];
  }

  private async memberIds(tripId: string): Promise<Set<string>> {
    const rows = await this.db
      .select({ accountId: tripMembers.accountId })
      .from(tripMembers)
      .where(eq(tripMembers.tripId, tripId));
    return new Set(rows.map((row) => row.accountId));
  }
}
