import type { CatalogueEntry, LockerItem } from '@gramwatt/shared';

/** The fake server's lockers (items keyed by owner) and the reference catalogue. */
interface LockerDb {
  items: Array<LockerItem & { ownerId: string }>;
  catalogue: CatalogueEntry[];
}

export const lockerDb: LockerDb = { items: [], catalogue: [] };

export const resetLockerDb = () => {
  lockerDb.items = [];
  lockerDb.catalogue = [];
};
