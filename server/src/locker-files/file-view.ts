import type { LockerFile } from '@gramwatt/shared';
import type { LockerItemFileRow } from '../database/schema';

/** The owner-checked download path of a file (under the API prefix). */
export function lockerFileUrl(itemId: string, fileId: string): string {
  return `/api/locker/items/${itemId}/files/${fileId}`;
}

/** A stored file as the API shows it: never the object keys. */
export function toLockerFile(row: LockerItemFileRow): LockerFile {
  const url = lockerFileUrl(row.itemId, row.id);
  return {
    id: row.id,
    purpose: row.purpose,
    contentType: row.contentType,
    sizeBytes: row.sizeBytes,
    fileName: row.fileName,
    createdAt: row.createdAt.toISOString(),
    url,
    thumbUrl: row.thumbKey ? `${url}/thumb` : null,
  };
}
