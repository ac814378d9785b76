import { isDeepStrictEqual } from 'node:util';
import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import {
  type LockerFile,
  type LockerItemInput,
  type LockerListQuery,
  type LockerSortKey,
  lockerItemKinds,
  lockerItemMassG,
} from '@gramwatt/shared';
import { type SQL, and, asc, desc, eq, ilike, sql } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type LockerItemRow, type NewLockerItemRow, lockerItems } from '../database/schema';
import { markTripsOfItemsChanged } from '../trips/trips-changed';
import { listFilesByItem } from '../locker-files/files-by-item';

export const itemNotFoundMessage = 'No such item in your locker';
export const kindChangeMessage = "An item's kind cannot change; add a new item instead";

/** Power-role order of the kinds (Collect, Store, Convert, Connect, Use), for sorting by kind. */
const kindOrder = sql.join(
  [
    sql`case ${lockerItems.kind}`,
    ...lockerItemKinds.map((kind, i) => sql`when ${kind} then ${i}`),
    sql`else ${lockerItemKinds.length} end`,
  ],
  sql` `,
);

const sortColumns: Record<LockerSortKey, SQL> = {
  name: sql`lower(${lockerItems.name})`,
  kind: kindOrder,
  massG: sql`${lockerItems.massG}`,
  countOwned: sql`${lockerItems.countOwned}`,
  updatedAt: sql`${lockerItems.updatedAt}`,
};

/** `%`, `_` and `\` match literally in a search (PostgreSQL LIKE's default escape is `\`). */
function likeContains(text: string): string {
  return `%${text.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;
}

/** The row values of a validated item for its owner. */
export function lockerItemValues(ownerId: string, input: LockerItemInput, now: Date): NewLockerItemRow {
  return {
    ownerId,
    kind: input.spec.kind,
    name: input.name,
    notes: input.notes,
    countOwned: input.countOwned,
    spec: input.spec,
    massG: lockerItemMassG(input.spec),
    createdAt: now,
    updatedAt: now,
    specChangedAt: now,
  };
}

/**
 * A member's locker: list, read, create, change and delete their own items. Every query is scoped to the
 * owner, so another member's item is simply not found (404), never "forbidden".
 */
@Injectable()
export class LockerService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** The owner's items, filtered by kind and name, sorted (ties by name, then id). */
  async list(ownerId: string, query: LockerListQuery): Promise<LockerItemRow[]> {
    const conditions: SQL[] = [eq(lockerItems.ownerId, ownerId)];
    if (query.kind) conditions.push(eq(lockerItems.kind, query.kind));
    if (query.q) conditions.push(ilike(lockerItems.name, likeContains(query.q)));
    const direction = query.order === 'desc' ? desc : asc;
    return this.db
      .select()
      .from(lockerItems)
      .where(and(...conditions))
      .orderBy(direction(sortColumns[query.sort]), asc(sql`lower(${lockerItems.name})`), asc(lockerItems.id));
  }

  /** Every item of the owner in power-role order, then by name (the export's order). */
  async listAll(ownerId: string): Promise<LockerItemRow[]> {
    return this.list(ownerId, { sort: 'kind', order: 'asc' });
  }

  /** One of the owner's items; 404 when it is not theirs or not there. */
  async get(ownerId: string, id: string): Promise<LockerItemRow> {
    const [row] = await this.db
      .select()
      .from(lockerItems)
      .where(and(eq(lockerItems.id, id), eq(lockerItems.ownerId, ownerId)))
      .limit(1);
    if (!row) throw new NotFoundException(itemNotFoundMessage);
    return row;
  }

  async create(ownerId: string, input: LockerItemInput): Promise<LockerItemRow> {
    const [row] = await this.db
      .insert(lockerItems)
      .values(lockerItemValues(ownerId, input, this.clock.now()))
      .returning();
    if (!row) throw new Error('insert returned no row');
    return row;
  }

  /**
   * Replaces the item's fields. 404 when it is not the owner's; 409 when the kind would change (trips
   * refer to a device as a device).
   */
  async update(ownerId: string, id: string, input: LockerItemInput): Promise<LockerItemRow> {
    return this.db.transaction(async (tx) => {
      const [current] = await tx
        .select({ kind: lockerItems.kind, spec: lockerItems.spec })
        .from(lockerItems)
        .where(and(eq(lockerItems.id, id), eq(lockerItems.ownerId, ownerId)))
        .limit(1)
        .for('update');
      if (!current) throw new NotFoundException(itemNotFoundMessage);
      if (current.kind !== input.spec.kind) {
        throw new ConflictException({
          message: kindChangeMessage,
          errors: [{ path: 'spec.kind', message: kindChangeMessage }],
        });
      }
      const {
        ownerId: _owner,
        createdAt: _created,
        specChangedAt,
        ...values
      } = lockerItemValues(ownerId, input, this.clock.now());
      // A renamed item keeps its spec's time, so trips with the device do not show as changed.
      const specChanged = !isDeepStrictEqual(current.spec, input.spec);
      const [row] = await tx
        .update(lockerItems)
        .set(specChanged ? { ...values, specChangedAt } : values)
        .where(and(eq(lockerItems.id, id), eq(lockerItems.ownerId, ownerId)))
        .returning();
      if (!row) throw new NotFoundException(itemNotFoundMessage);
      return row;
    });
  }

  /** Deletes the owner's item (its files' rows go with it by cascade); 404 when it is not theirs. */
  async delete(ownerId: string, id: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const owned = tx
        .select({ id: lockerItems.id })
        .from(lockerItems)
        .where(and(eq(lockerItems.id, id), eq(lockerItems.ownerId, ownerId)));
      // A device deleted from the locker leaves its trips by cascade, and gear leaves the kits chosen with it: those trips
      // count as changed (marked first, while the rows still tell which trips; a 404 below rolls it back).
      await markTripsOfItemsChanged(tx, owned.$dynamic(), this.clock.now());
      const deleted = await tx
        .delete(lockerItems)
        .where(and(eq(lockerItems.id, id), eq(lockerItems.ownerId, ownerId)))
        .returning({ id: lockerItems.id });
      if (deleted.length === 0) throw new NotFoundException(itemNotFoundMessage);
    });
  }

  /** The files of the owner's items, by item id, oldest first. */
  async filesByItem(ownerId: string, itemIds: readonly string[]): Promise<Map<string, LockerFile[]>> {
    return listFilesByItem(this.db, ownerId, itemIds);
  }
}
