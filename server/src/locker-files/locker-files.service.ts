import { randomUUID } from 'node:crypto';
import {
  type BeforeApplicationShutdown,
  ConflictException,
  HttpException,
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  type OnApplicationBootstrap,
  PayloadTooLargeException,
} from '@nestjs/common';
import { type LockerFile, type LockerFilePurpose, maxLockerFileBytes, maxLockerFilesPerItem } from '@gramwatt/shared';
import { and, asc, count, eq, inArray } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type LockerItemFileRow, lockerItemFiles, lockerItems, storedObjectDeletions } from '../database/schema';
import { OBJECT_STORE, type ObjectStore, type StoredObject } from '../storage/object-store';
import { checkFileContent, sniffFileType } from './file-content-check';
import { cleanFileName } from './file-name';
import { toLockerFile } from './file-view';
import { listFilesByItem } from './files-by-item';
import { makeThumbnail, maxPhotoPixels, thumbnailContentType } from './thumbnail';
import { errorMessage } from '../common/error-message';

/** An uploaded file as the HTTP layer hands it over: the bytes and the name the browser gave. */
export interface IncomingFile {
  bytes: Buffer;
  originalName: string;
}

/** A file to send back: its row and its bytes. */
export interface FileDownload {
  file: LockerItemFileRow;
  object: StoredObject;
}

export const itemNotFoundMessage = 'No such item in your locker';
export const fileNotFoundMessage = 'No such file on this item';
export const tooLargeMessage = `The file is larger than ${maxLockerFileBytes / (1024 * 1024)} MB; send a smaller photo or spec sheet`;

/** How often queued object deletions are drained, in milliseconds (also once at start and after each delete). */
export const deletionDrainIntervalMs = 60_000;

/** Queued deletions claimed per round trip. */
const deletionBatchSize = 100;

/** Where an item's file lives in the bucket: one folder per owner and item, so keys never collide. */
function objectKeyFor(ownerId: string, itemId: string, fileId: string, variant: 'original' | 'thumb'): string {
  return `owners/${ownerId}/items/${itemId}/${fileId}/${variant}`;
}

/**
 * Photos and spec sheets of locker items: checks the content by its bytes, stores it (and a photo's
 * thumbnail) in the object store, and serves it back only to the item's owner. Everyone else gets 404,
 * as for the item itself. Objects of deleted file rows (however deleted: a database trigger queues them)
 * are removed from the store by {@link LockerFilesService.drainDeletedObjects}.
 */
@Injectable()
export class LockerFilesService implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('LockerFiles');
  private drainTimer: NodeJS.Timeout | undefined;
  private draining: Promise<number> | undefined;

  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(OBJECT_STORE) private readonly store: ObjectStore,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /**
   * Stores a file for the owner's item. 404 when the item is not theirs, 413 over the size limit, 415 when
   * the content is not a type the purpose takes (naming `file` or `purpose`), 409 when the item is full.
   */
  async upload(
    ownerId: string,
    itemId: string,
    incoming: IncomingFile,
    purpose: LockerFilePurpose,
  ): Promise<LockerFile> {
    await this.assertOwnsItem(ownerId, itemId);
    if (incoming.bytes.length > maxLockerFileBytes) throw new PayloadTooLargeException(tooLargeMessage);
    const verdict = checkFileContent(await sniffFileType(incoming.bytes), incoming.bytes.length, purpose);
    if (!verdict.ok) {
      throw new HttpException(
        { message: verdict.message, errors: [{ path: verdict.path, message: verdict.message }] },
        verdict.statusCode,
      );
    }
    const [held] = await this.db
      .select({ files: count() })
      .from(lockerItemFiles)
      .where(and(eq(lockerItemFiles.ownerId, ownerId), eq(lockerItemFiles.itemId, itemId)));
    if ((held?.files ?? 0) >= maxLockerFilesPerItem) {
      throw new ConflictException(`An item keeps at most ${maxLockerFilesPerItem} files; delete one first`);
    }

    const thumb = purpose === 'photo' ? await this.thumbnailOf(incoming.bytes) : undefined;
    const fileId = randomUUID();
    const objectKey = objectKeyFor(ownerId, itemId, fileId, 'original');
    const thumbKey = thumb ? objectKeyFor(ownerId, itemId, fileId, 'thumb') : null;
    await this.store.put(objectKey, incoming.bytes, verdict.contentType);
    try {
      if (thumb && thumbKey) await this.store.put(thumbKey, thumb, thumbnailContentType);
      const [row] = await this.db
        .insert(lockerItemFiles)
        .values({
          id: fileId,
          itemId,
          ownerId,
          purpose,
          contentType: verdict.contentType,
          sizeBytes: incoming.bytes.length,
          fileName: cleanFileName(incoming.originalName, verdict.contentType, purpose),
          objectKey,
          thumbKey,
          createdAt: this.clock.now(),
        })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return toLockerFile(row);
    } catch (error) {
      // Nothing may point at half-stored bytes: take them back out, then report the failure.
      await Promise.allSettled([objectKey, ...(thumbKey ? [thumbKey] : [])].map((key) => this.store.delete(key)));
      throw error;
    }
  }

  /** The owner's item's files, oldest first; 404 when the item is not theirs. */
  async listForItem(ownerId: string, itemId: string): Promise<LockerFile[]> {
    await this.assertOwnsItem(ownerId, itemId);
    return (await this.listForItems(ownerId, [itemId])).get(itemId) ?? [];
  }

  /**
   * Files of many of the owner's items at once, by item id, oldest first (for the locker's item answers).
   * Items without files, and ids that are not the owner's, map to nothing.
   */
  async listForItems(ownerId: string, itemIds: readonly string[]): Promise<Map<string, LockerFile[]>> {
    return listFilesByItem(this.db, ownerId, itemIds);
  }

  /** The original bytes of the owner's file; 404 when it is not theirs or not there. */
  async download(ownerId: string, itemId: string, fileId: string): Promise<FileDownload> {
    const file = await this.findOwned(ownerId, itemId, fileId);
    return { file, object: await this.fetch(file.objectKey) };
  }

  /** The thumbnail of the owner's photo; 404 for spec sheets and for files that are not theirs. */
  async thumbnail(ownerId: string, itemId: string, fileId: string): Promise<FileDownload> {
    const file = await this.findOwned(ownerId, itemId, fileId);
    if (!file.thumbKey) throw new NotFoundException('This file has no thumbnail: only photos have one');
    return { file, object: await this.fetch(file.thumbKey) };
  }

  /** Deletes the owner's file and its bytes; 404 when it is not theirs or not there. */
  async remove(ownerId: string, itemId: string, fileId: string): Promise<void> {
    const file = await this.findOwned(ownerId, itemId, fileId);
    await this.db
      .delete(lockerItemFiles)
      .where(and(eq(lockerItemFiles.id, file.id), eq(lockerItemFiles.ownerId, ownerId)));
    await this.drainDeletedObjects();
  }

  /**
   * Removes from the store the objects whose file rows were deleted (queued by the database trigger on
   * `locker_item_files`), batch by batch; a key the store fails to delete goes back in the queue. Concurrent
   * calls share one run. Returns how many objects were removed.
   */
  drainDeletedObjects(): Promise<number> {
    this.draining ??= this.drainQueue().finally(() => {
      this.draining = undefined;
    });
    return this.draining;
  }

  /** Drains once at start (deletions queued while the app was down), then every {@link deletionDrainIntervalMs}. */
  async onApplicationBootstrap(): Promise<void> {
    await this.drainQuietly();
    this.drainTimer = setInterval(() => void this.drainQuietly(), deletionDrainIntervalMs);
    this.drainTimer.unref();
  }

  async beforeApplicationShutdown(): Promise<void> {
    clearInterval(this.drainTimer);
    await this.draining?.catch(() => undefined);
  }

  private async drainQuietly(): Promise<void> {
    try {
      await this.drainDeletedObjects();
    } catch (error) {
      this.logger.warn(`Could not drain deleted objects: ${errorMessage(error)}`);
    }
  }

  private async drainQueue(): Promise<number> {
    let removed = 0;
    for (;;) {
      const batch = this.db
        .select({ id: storedObjectDeletions.id })
        .from(storedObjectDeletions)
        .orderBy(asc(storedObjectDeletions.id))
        .limit(deletionBatchSize)
        .for('update', { skipLocked: true });
      const claimed = await this.db
        .delete(storedObjectDeletions)
        .where(inArray(storedObjectDeletions.id, batch))
        .returning({ objectKey: storedObjectDeletions.objectKey });
      const failed: string[] = [];
      for (const { objectKey } of claimed) {
        try {
          await this.store.delete(objectKey);
          removed += 1;
        } catch (error) {
          failed.push(objectKey);
          this.logger.warn(`Could not delete stored object ${objectKey}: ${errorMessage(error)}`);
        }
      }
      if (failed.length > 0) {
        await this.db.insert(storedObjectDeletions).values(failed.map((objectKey) => ({ objectKey })));
        return removed;
      }
      if (claimed.length < deletionBatchSize) return removed;
    }
  }

  private async thumbnailOf(photo: Buffer): Promise<Buffer> {
    try {
      return await makeThumbnail(photo);
    } catch (error) {
      const message =
        error instanceof Error && /pixel limit/i.test(error.message)
          ? `The photo has more than ${maxPhotoPixels / 1_000_000} megapixels; send a smaller one`
          : 'The photo could not be read: its content starts like an image but does not decode (damaged or cut short?)';
      throw new HttpException({ message, errors: [{ path: 'file', message }] }, 415);
    }
  }

  private async assertOwnsItem(ownerId: string, itemId: string): Promise<void> {
    const [item] = await this.db
      .select({ id: lockerItems.id })
      .from(lockerItems)
      .where(and(eq(lockerItems.id, itemId), eq(lockerItems.ownerId, ownerId)));
    if (!item) throw new NotFoundException(itemNotFoundMessage);
  }

  private async findOwned(ownerId: string, itemId: string, fileId: string): Promise<LockerItemFileRow> {
    const [file] = await this.db
      .select()
      .from(lockerItemFiles)
      .where(
        and(eq(lockerItemFiles.id, fileId), eq(lockerItemFiles.itemId, itemId), eq(lockerItemFiles.ownerId, ownerId)),
      );
    if (!file) throw new NotFoundException(fileNotFoundMessage);
    return file;
  }

  private async fetch(key: string): Promise<StoredObject> {
    const object = await this.store.get(key);
    if (!object) {
      this.logger.error(`Stored object ${key} is missing`);
      throw new NotFoundException('The stored file is missing; upload it again');
    }
    return object;
  }
}
