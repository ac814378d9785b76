import { type CatalogueEntry, lockerItemKinds } from '@gramwatt/shared';
import type { CatalogueEntryRow } from '../database/schema';

/** A stored entry as the API shows it. */
export function toCatalogueEntry(row: CatalogueEntryRow): CatalogueEntry {
  return {
    id: row.id,
    kind: row.kind,
    name: row.name,
    notes: row.notes,
    massG: row.massG,
    spec: row.spec,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Entries in power-role order (Collect, Store, Convert, Connect, Use), then by name regardless of case. */
export function compareCatalogueEntries(a: CatalogueEntryRow, b: CatalogueEntryRow): number {
  const byKind = lockerItemKinds.indexOf(a.kind) - lockerItemKinds.indexOf(b.kind);
  return byKind !== 0
    ? byKind
    : a.name.localeCompare(b.name, 'en', { sensitivity: 'base' }) || a.id.localeCompare(b.id);
}
