import type { LockerFile, LockerItem, LockerItemKind } from '@gramwatt/shared';
import type { LockerItemRow } from '../database/schema';

/** A stored item as the API shows it, with its files (already owner-checked by the caller). */
export function toLockerItem(row: LockerItemRow, files: LockerFile[] = []): LockerItem {
  return {
    id: row.id,
    kind: row.kind as LockerItemKind,
    name: row.name,
    notes: row.notes,
    countOwned: row.countOwned,
    massG: row.massG,
    spec: row.spec,
    files,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Σ massG × countOwned over the power gear; devices are carried anyway and do not count. */
export function totalPowerGearMassG(items: readonly Pick<LockerItemRow, 'kind' | 'massG' | 'countOwned'>[]): number {
  return items.reduce((sum, item) => (item.kind === 'device' ? sum : sum + item.massG * item.countOwned), 0);
}
