import {
  BadRequestException,
  Inject,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import {
  type ItemSpec,
  type KitItemSpec,
  kitItemSpecSchema,
  type PartyPlanning,
  type PlanningGear,
  type PlanningInput,
  toEngineTripDevices,
} from '@gramwatt/shared';
import { and, asc, eq, gt, inArray, ne } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.types';
import { accounts, lockerItems, tripMembers, tripPoolItems, trips } from '../database/schema';
import { tripNotFoundMessage } from '../trips/trip-access.service';
import { TripDevicesService } from '../trips/trip-devices.service';
import { storedSolarInput } from '../trips/trip-view';

/** Shown when a plan or a check is asked for a trip with nothing to power. */
export const noDevicesMessage = 'This trip has no devices yet: add the devices you will carry, then plan';

/** Who carries the kit: until the party's gear is pooled, the leader, whose locker it comes from. */
export interface KitCarrier {
  accountId: string;
  displayName: string;
}

/** A trip's planning input with the carrier of its gear. */
export interface TripPlanningInput {
  input: PlanningInput;
  carrier: KitCarrier;
}

/** Options of {@link PlanningInputBuilder.forTrip}. */
export interface ForTripOptions {
  /** Only these locker items (ids of the pooled power gear); default every item. */
  itemIds?: readonly string[];
}

/** Whether the planner can pack this item (devices come on the trip anyway; kinds the planner does not model yet stay home). */
const isKitItemSpec = (spec: ItemSpec): spec is KitItemSpec => kitItemSpecSchema.safeParse(spec).success;

/**
 * Turns a trip into the planner's input: its sun and sky input, its devices (every member's) with their effective
 * use profiles, its reserve and gram limit, and the candidate gear — the party pool. The one place that decides which
 * gear a plan may pick from:
 * - the leader's whole locker power gear (every non-device item, with the units owned) while the leader has pooled
 *   nothing, else only the leader's pool entries — so a trip nobody pooled into plans exactly as a solo trip;
 * - every partner's pool entries, each at most the units the owner still has.
 * With at least one partner the input carries the party (leader and partners with their own gram limits, and who owns
 * each item), and the plan shares the kit out among them.
 */
@Injectable()
export class PlanningInputBuilder {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    private readonly devices: TripDevicesService,
  ) {}

  /**
   * The planning input of a trip the caller was let into.
   * @throws UnprocessableEntityException (422) when the trip has no devices; BadRequestException (400, path
   * `itemIds.<i>`) when `itemIds` names an item that is not the leader's power gear.
   */
  async forTrip(tripId: string, options: ForTripOptions = {}): Promise<TripPlanningInput> {
    const [trip] = await this.db.select().from(trips).where(eq(trips.id, tripId));
    if (!trip) throw new NotFoundException(tripNotFoundMessage);
    const devices = await this.devices.list(tripId);
    if (devices.length === 0) throw new UnprocessableEntityException(noDevicesMessage);
    const carrier = await this.leaderOf(tripId);
    const pooled = await this.poolFor(tripId, carrier);
    const gear = this.pick(pooled.gear, options.itemIds);
    return {
      input: {
        solarInput: storedSolarInput(trip),
        devices: toEngineTripDevices(devices),
        deviceNames: Object.fromEntries(devices.map((device) => [device.itemId, device.name])),
        gear,
        reserveShare: trip.reserveShare,
        gramLimitG: trip.gramLimitG,
        party: pooled.party,
      },
      carrier,
    };
  }

  /** The trip's leader (every trip has exactly one). */
  async leaderOf(tripId: string): Promise<KitCarrier> {
    const [leader] = await this.db
      .select({ accountId: tripMembers.accountId, displayName: accounts.displayName })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.role, 'leader')));
    if (!leader) throw new Error(`trip ${tripId} has no leader`);
    return leader;
  }

  /**
   * How many items of the gear the trip would plan with now a plan made at `since` never weighed: items that joined it
   * after `since` (added to the leader's locker, or shared into the pool) and are not among the plan's, and items of
   * the plan's with more units now than `weighedUnits` gives them. A lighter kit may now exist.
   */
  async gearAddedSince(tripId: string, since: Date, weighedUnits: ReadonlyMap<string, number>): Promise<number> {
    const { gear, joinedAtByItemId } = await this.poolFor(tripId, await this.leaderOf(tripId));
    return gear.filter((g) => {
      const weighed = weighedUnits.get(g.itemId);
      return weighed === undefined ? (joinedAtByItemId.get(g.itemId) ?? since) > since : g.countOwned > weighed;
    }).length;
  }

  /**
   * The pooled gear and, with partners on the trip, the party that carries it; and when each item joined the trip's
   * gear (a locker item's creation, or its pool entry's).
   */
  private async poolFor(
    tripId: string,
    leader: KitCarrier,
  ): Promise<{ gear: PlanningGear[]; party: PartyPlanning | null; joinedAtByItemId: Map<string, Date> }> {
    const carrierRoles = ['leader', 'partner'] as const;
    const entries = await this.db
      .select({
        item: lockerItems,
        count: tripPoolItems.count,
        ownerId: tripPoolItems.accountId,
        pooledAt: tripPoolItems.createdAt,
      })
      .from(tripPoolItems)
      .innerJoin(lockerItems, eq(lockerItems.id, tripPoolItems.itemId))
      .innerJoin(
        tripMembers,
        and(eq(tripMembers.tripId, tripPoolItems.tripId), eq(tripMembers.accountId, tripPoolItems.accountId)),
      )
      .where(and(eq(tripPoolItems.tripId, tripId), inArray(tripMembers.role, carrierRoles)))
      .orderBy(asc(lockerItems.name), asc(lockerItems.id));
    const leaderPooled = entries.some((entry) => entry.ownerId === leader.accountId);
    const joinedAtByItemId = new Map<string, Date>();
    const gear: PlanningGear[] = leaderPooled ? [] : await this.gearFor(leader, joinedAtByItemId);
    const ownerByItemId: Record<string, string> = Object.fromEntries(gear.map((g) => [g.itemId, leader.accountId]));
    for (const { item, count, ownerId, pooledAt } of entries) {
      const units = Math.min(count, item.countOwned);
      if (!isKitItemSpec(item.spec) || units <= 0 || ownerByItemId[item.id] !== undefined) continue;
      gear.push({ itemId: item.id, name: item.name, countOwned: units, massG: item.massG, spec: item.spec });
      ownerByItemId[item.id] = ownerId;
      joinedAtByItemId.set(item.id, pooledAt);
    }
    const members = await this.db
      .select({
        memberId: tripMembers.accountId,
        name: accounts.displayName,
        gramLimitG: tripMembers.gramLimitG,
        role: tripMembers.role,
      })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(and(eq(tripMembers.tripId, tripId), inArray(tripMembers.role, carrierRoles)))
      .orderBy(asc(tripMembers.joinedAt), asc(tripMembers.accountId));
    if (!members.some((m) => m.role === 'partner')) return { gear, party: null, joinedAtByItemId };
    // The leader first, then the partners in the order they joined.
    const carriers = [...members].sort((a, b) => Number(b.role === 'leader') - Number(a.role === 'leader'));
    return {
      gear,
      party: {
        members: carriers.map(({ memberId, name, gramLimitG }) => ({ memberId, name, gramLimitG })),
        ownerByItemId,
      },
      joinedAtByItemId,
    };
  }

  /** The candidate gear: the carrier's power gear with the units owned, by name; notes when each was added. */
  private async gearFor(carrier: KitCarrier, joinedAtByItemId: Map<string, Date>): Promise<PlanningGear[]> {
    const rows = await this.db
      .select()
      .from(lockerItems)
      .where(
        and(eq(lockerItems.ownerId, carrier.accountId), ne(lockerItems.kind, 'device'), gt(lockerItems.countOwned, 0)),
      )
      .orderBy(asc(lockerItems.name), asc(lockerItems.id));
    for (const row of rows) joinedAtByItemId.set(row.id, row.createdAt);
    return rows.flatMap((row) =>
      isKitItemSpec(row.spec)
        ? [{ itemId: row.id, name: row.name, countOwned: row.countOwned, massG: row.massG, spec: row.spec }]
        : [],
    );
  }

  private pick(gear: PlanningGear[], itemIds: readonly string[] | undefined): PlanningGear[] {
    if (itemIds === undefined) return gear;
    const known = new Set(gear.map((g) => g.itemId));
    const errors = itemIds.flatMap((id, i) =>
      known.has(id) ? [] : [{ path: `itemIds.${i}`, message: 'This item is not among the party’s pooled power gear' }],
    );
    if (errors.length > 0) {
      throw new BadRequestException({
        message: errors.length === 1 ? errors[0]?.message : 'Some fields need attention',
        errors,
      });
    }
    const wanted = new Set(itemIds);
    return gear.filter((g) => wanted.has(g.itemId));
  }
}
