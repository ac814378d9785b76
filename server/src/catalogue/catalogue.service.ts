import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import {
  type CatalogueEntryValues,
  type CatalogueKind,
  lockerItemInputSchema,
  lockerItemMassG,
} from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { isUniqueViolation } from '../common/database-errors';
import { DRIZZLE, type Database } from '../database/database.types';
import { type CatalogueEntryRow, type LockerItemRow, catalogueEntries } from '../database/schema';
import { LockerService } from '../locker/locker.service';
import { compareCatalogueEntries } from './catalogue-view';

export const entryNotFoundMessage = 'No such catalogue entry';
const nameTakenMessage = 'The catalogue already has an entry with this name';
const nameConstraint = 'catalogue_entries_name_unique';

/**
 * The reference catalogue: every signed-in account reads it; admins (checked by the controller's roles)
 * create, change and delete entries. Entry specs are validated by the shared schema before they get here.
 */
@Injectable()
export class CatalogueService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly locker: LockerService,
  ) {}

  /** Every entry, or those of one kind, in power-role order then by name. */
  async list(kind?: CatalogueKind): Promise<CatalogueEntryRow[]> {
    const rows = await (kind
      ? this.db.select().from(catalogueEntries).where(eq(catalogueEntries.kind, kind))
      : this.db.select().from(catalogueEntries));
    return rows.sort(compareCatalogueEntries);
  }

  /** One entry; 404 when there is none. */
  async get(id: string): Promise<CatalogueEntryRow> {
    const [row] = await this.db.select().from(catalogueEntries).where(eq(catalogueEntries.id, id));
    if (!row) throw new NotFoundException(entryNotFoundMessage);
    return row;
  }

  /** Adds an entry; 409 (on `name`) when the name is taken regardless of case. */
  async create(values: CatalogueEntryValues, createdBy: string): Promise<CatalogueEntryRow> {
    const now = this.clock.now();
    return this.withNameCheck(async () => {
      const [row] = await this.db
        .insert(catalogueEntries)
        .values({ ...columnsOf(values), createdBy, createdAt: now, updatedAt: now })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return row;
    });
  }

  /** Replaces an entry's name, notes and spec; 404 when there is none, 409 when the new name is taken. */
  async update(id: string, values: CatalogueEntryValues): Promise<CatalogueEntryRow> {
    return this.withNameCheck(async () => {
      const [row] = await this.db
        .update(catalogueEntries)
        .set({ ...columnsOf(values), updatedAt: this.clock.now() })
        .where(eq(catalogueEntries.id, id))
        .returning();
      if (!row) throw new NotFoundException(entryNotFoundMessage);
      return row;
    });
  }

  /** Deletes an entry (items already copied from it stay in their lockers); 404 when there is none. */
  async remove(id: string): Promise<void> {
    const deleted = await this.db
      .delete(catalogueEntries)
      .where(eq(catalogueEntries.id, id))
      .returning({ id: catalogueEntries.id });
    if (deleted.length === 0) throw new NotFoundException(entryNotFoundMessage);
  }

  /**
   * Copies an entry into the caller's own locker as a new item (count owned 1), through the locker's own
   * create so the item passes the same checks as one typed in. 404 when there is no such entry; 409 when
   * the entry no longer passes the item rules (an admin must update it).
   */
  async copyToLocker(id: string, ownerId: string): Promise<LockerItemRow> {
    const entry = await this.get(id);
    const parsed = lockerItemInputSchema.safeParse({
      name: entry.name,
      notes: entry.notes,
      countOwned: 1,
      spec: entry.spec,
    });
    if (!parsed.success) {
      throw new ConflictException({
        message: 'This catalogue entry no longer passes the item checks; ask an admin to update it',
        errors: parsed.error.issues.map((issue) => ({
          path: issue.path.map(String).join('.'),
          message: issue.message,
        })),
      });
    }
    return this.locker.create(ownerId, parsed.data);
  }

  private async withNameCheck<T>(write: () => Promise<T>): Promise<T> {
    try {
      return await write();
    } catch (error) {
      if (isUniqueViolation(error, nameConstraint)) {
        throw new ConflictException({
          message: nameTakenMessage,
          errors: [{ path: 'name', message: nameTakenMessage }],
        });
      }
      throw error;
    }
  }
}

/** The stored columns of validated input: kind and grams copied out of the spec. */
function columnsOf(values: CatalogueEntryValues) {
  return {
    kind: values.spec.kind,
    name: values.name,
    notes: values.notes,
    spec: values.spec,
    massG: lockerItemMassG(values.spec),
  };
}
