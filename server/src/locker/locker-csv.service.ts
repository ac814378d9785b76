import { Inject, Injectable } from '@nestjs/common';
import {
  type LockerImportMode,
  type LockerImportResult,
  lockerItemMassG,
  readLockerCsv,
  writeLockerCsv,
} from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { lockerItems } from '../database/schema';
import { markTripsOfItemsChanged } from '../trips/trips-changed';
import { LockerService, lockerItemValues } from './locker.service';

/** Rows per INSERT: well under PostgreSQL's 65,535 bind parameters (10 columns a row). */
const insertChunkRows = 500;

/**
 * Locker CSV import and export around the shared reader and writer: the reader checks every row, and
 * only a file with no problem is written — all rows in one transaction, or none.
 */
@Injectable()
export class LockerCsvService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly locker: LockerService,
  ) {}

  /**
   * Reads `text` as a locker CSV. Without `commit` nothing is written (a preview). With `commit` and a clean
   * file: "add" inserts every row; "replace" deletes the owner's items (and, by cascade, their files and trip
   * devices) and inserts the rows, in one transaction. A file with problems writes nothing in either mode.
   */
  async import(ownerId: string, text: string, mode: LockerImportMode, commit: boolean): Promise<LockerImportResult> {
    const read = readLockerCsv(text);
    const preview = read.rows.map(({ row, item }) => ({
      row,
      kind: item.spec.kind,
      name: item.name,
      countOwned: item.countOwned,
      massG: lockerItemMassG(item.spec),
    }));
    const result: LockerImportResult = {
      ok: read.ok,
      mode,
      committed: false,
      rowCount: read.rowCount,
      report: read.report,
      preview,
    };
    if (!read.ok || !commit) return result;

    const now = this.clock.now();
    const values = read.rows.map(({ item }) => lockerItemValues(ownerId, item, now));
    await this.db.transaction(async (tx) => {
      if (mode === 'replace') {
        // The replaced items leave their trips (devices, by cascade) and chosen kits: those trips count as changed.
        const owned = tx.select({ id: lockerItems.id }).from(lockerItems).where(eq(lockerItems.ownerId, ownerId));
        await markTripsOfItemsChanged(tx, owned.$dynamic(), now);
        await tx.delete(lockerItems).where(eq(lockerItems.ownerId, ownerId));
      }
      for (let i = 0; i < values.length; i += insertChunkRows) {
        await tx.insert(lockerItems).values(values.slice(i, i + insertChunkRows));
      }
    });
    return { ...result, committed: true };
  }

  /** The owner's whole locker as CSV text (the columns the import reads). */
  async export(ownerId: string): Promise<string> {
    const rows = await this.locker.listAll(ownerId);
    return writeLockerCsv(
      rows.map((row) => ({ name: row.name, notes: row.notes, countOwned: row.countOwned, spec: row.spec })),
    );
  }
}
