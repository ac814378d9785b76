import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import {
  type KitItemSpec,
  type PoolItem,
  type PoolItemAdd,
  type PoolItemUpdate,
  type PoolListResponse,
} from '@gramwatt/shared';
import { and, asc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { CLOCK, type Clock } from '../common/clock';
import { isUniqueViolation } from '../common/database-errors';
import { DRIZZLE, type Database } from '../database/database.types';
import {
  type LockerItemRow,
  type TripMemberRow,
  type TripPoolItemRow,
  accounts,
  lockerItems,
  tripMembers,
  tripPoolItems,
} from '../database/schema';

const uuidSchema = z.uuid();
const poolItemNotFoundMessage = 'This item is not in the trip’s pool';
/** Kinds of locker item that can be pooled: power gear (devices go on the device list). */
const poolableKinds = new Set(['panel', 'bank', 'battery', 'converter', 'controller', 'lead']);

type PoolableItem = LockerItemRow & { spec: KitItemSpec };
interface PoolRow {
  entry: TripPoolItemRow;
  item: LockerItemRow;
  ownerName: string;
}

function isPoolable(item: LockerItemRow): item is PoolableItem {
  return poolableKinds.has(item.spec.kind);
}

function countTooHigh(countOwned: number): BadRequestException {
  return new BadRequestException({
    message: `You own ${countOwned} of this item`,
    errors: [{ path: 'count', message: `Count may be at most the ${countOwned} you own` }],
  });
}

function toPoolItem(row: PoolRow & { item: PoolableItem }): PoolItem {
  return {
    id: row.entry.id,
    itemId: row.item.id,
    name: row.item.name,
    kind: row.item.spec.kind,
    massG: row.item.massG,
    count: row.entry.count,
    countOwned: row.item.countOwned,
    ownerAccountId: row.entry.accountId,
    ownerName: row.ownerName,
    spec: row.item.spec,
    createdAt: row.entry.createdAt.toISOString(),
    updatedAt: row.entry.updatedAt.toISOString(),
  };
}

/**
 * The party pool of a trip: members share their own locker power gear with a count (at most what they own). A
 * partner changes only their own entries, the leader any. Entries of people no longer on the trip are not listed
 * (and the member removal deletes them). Callers have passed the trip-access policy for the trip already.
 */
@Injectable()
export class PoolService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** The pool in the order it was shared, and whether the leader's whole locker counts (no leader entry yet). */
  async list(tripId: string): Promise<PoolListResponse> {
    const rows = await this.rows(tripId);
    const items = rows.filter((row): row is PoolRow & { item: PoolableItem } => isPoolable(row.item)).map(toPoolItem);
    const [leader] = await this.db
      .select({ accountId: tripMembers.accountId })
      .from(tripMembers)
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.role, 'leader')));
    return { items, leaderWholeLocker: !items.some((item) => item.ownerAccountId === leader?.accountId) };
  }

  /**
   * Shares one of the caller's locker items. 404 when it is not in the caller's locker; 400 when it is a device or
   * the count is above the count owned; 409 when it is in the pool already (change its count instead).
   */
  async add(member: TripMemberRow, body: PoolItemAdd): Promise<PoolItem> {
    const [item] = await this.db
      .select()
      .from(lockerItems)
      .where(and(eq(lockerItems.id, body.itemId), eq(lockerItems.ownerId, member.accountId)));
    if (!item) throw new NotFoundException('No such item in your locker');
    if (!isPoolable(item)) {
      throw new BadRequestException({
        message:
          'Devices go on the device list; the pool holds power gear (panels, banks, batteries, converters, controllers and leads)',
        errors: [{ path: 'itemId', message: 'Only power gear can be pooled' }],
      });
    }
    if (body.count > item.countOwned) throw countTooHigh(item.countOwned);
    const now = this.clock.now();
    try {
      const [row] = await this.db
        .insert(tripPoolItems)
        .values({
          tripId: member.tripId,
          accountId: member.accountId,
          itemId: item.id,
          count: body.count,
          createdAt: now,
          updatedAt: now,
        })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return this.get(member.tripId, row.id);
    } catch (error) {
      if (isUniqueViolation(error, 'trip_pool_items_trip_item_unique')) {
        throw new ConflictException('This item is in the pool already: change its count instead');
      }
      throw error;
    }
  }

  /** A new count (at most the owner's count owned). A partner may change only their own entries. */
  async update(member: TripMemberRow, poolItemId: string, body: PoolItemUpdate): Promise<PoolItem> {
    const row = await this.findForChange(member, poolItemId);
    if (body.count > row.item.countOwned) throw countTooHigh(row.item.countOwned);
    await this.db
      .update(tripPoolItems)
      .set({ count: body.count, updatedAt: this.clock.now() })
      .where(and(eq(tripPoolItems.id, poolItemId), eq(tripPoolItems.tripId, member.tripId)));
    return this.get(member.tripId, poolItemId);
  }

  /** Takes an item out of the pool (the locker item stays). A partner may remove only their own entries. */
  async remove(member: TripMemberRow, poolItemId: string): Promise<void> {
    await this.findForChange(member, poolItemId);
    await this.db
      .delete(tripPoolItems)
      .where(and(eq(tripPoolItems.id, poolItemId), eq(tripPoolItems.tripId, member.tripId)));
  }

  private async get(tripId: string, poolItemId: string): Promise<PoolItem> {
    const { items } = await this.list(tripId);
    const item = items.find((candidate) => candidate.id === poolItemId);
    if (!item) throw new NotFoundException(poolItemNotFoundMessage);
    return item;
  }

  /** Entries of current members with their items and owners' names (an ex-member's entry is not shown). */
  private async rows(tripId: string, poolItemId?: string): Promise<PoolRow[]> {
    return this.db
      .select({ entry: tripPoolItems, item: lockerItems, ownerName: accounts.displayName })
      .from(tripPoolItems)
      .innerJoin(lockerItems, eq(lockerItems.id, tripPoolItems.itemId))
      .innerJoin(accounts, eq(accounts.id, tripPoolItems.accountId))
      .innerJoin(
        tripMembers,
        and(eq(tripMembers.tripId, tripPoolItems.tripId), eq(tripMembers.accountId, tripPoolItems.accountId)),
      )
      .where(
        poolItemId === undefined
          ? eq(tripPoolItems.tripId, tripId)
          : and(eq(tripPoolItems.tripId, tripId), eq(tripPoolItems.id, poolItemId)),
      )
      .orderBy(asc(tripPoolItems.createdAt), asc(lockerItems.name), asc(tripPoolItems.id));
  }

  private async findForChange(member: TripMemberRow, poolItemId: string): Promise<PoolRow> {
    if (!uuidSchema.safeParse(poolItemId).success) throw new NotFoundException(poolItemNotFoundMessage);
    const [row] = await this.rows(member.tripId, poolItemId);
    if (!row) throw new NotFoundException(poolItemNotFoundMessage);
    if (member.role !== 'leader' && row.entry.accountId !== member.accountId) {
      throw new ForbiddenException('Only the leader or the item’s owner can change it');
    }
    return row;
  }
}
