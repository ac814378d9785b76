import { z } from 'zod';
import { type LockerFilePurpose, lockerFilePurposeSchema, lockerFileSchema } from './locker.js';

/**
 * Files attached to a locker item: a photo or a spec sheet (`lockerFileSchema` in `locker.ts` is the
 * answer's shape). The server checks the type from the bytes themselves (magic numbers), never from the
 * file name or the declared type.
 */

/** Content types a photo may have (JPEG, PNG or WebP). */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
/** Content types a spec sheet may have (PDF). */
export const specSheetContentTypes = ['application/pdf'] as const;
/** Every content type an item file may have. */
export type LockerFileContentType = (typeof photoContentTypes)[number] | (typeof specSheetContentTypes)[number];

/**
 * Content types accepted per purpose.
 *
 * @example
 * lockerFileContentTypes['spec-sheet'] // ['application/pdf']
 */
export const lockerFileContentTypes: Record<LockerFilePurpose, readonly LockerFileContentType[]> = {
  photo: photoContentTypes,
  'spec-sheet': specSheetContentTypes,
};

/**
 * Largest accepted item file, in bytes: 5 MiB (5 × 1024 × 1024). Big enough for a phone photo or a
 * datasheet PDF, small enough to keep a locker's files cheap to store and fetch.
 */
export const maxLockerFileBytes = 5 * 1024 * 1024;

/** Most files one item keeps (photos and spec sheets together); one more is a 409. */
export const maxLockerFilesPerItem = 10;

/** Longest stored file name, in characters (longer names are shortened, keeping the extension). */
export const maxLockerFileNameLength = 200;

/**
 * Form fields of `POST /api/locker/items/:id/files` beside the multipart `file`.
 *
 * @example
 * lockerFileUploadSchema.parse({ purpose: 'photo' }) // { purpose: 'photo' }
 */
export const lockerFileUploadSchema = z.object({
  purpose: lockerFilePurposeSchema,
});
export type LockerFileUpload = z.infer<typeof lockerFileUploadSchema>;

/** `{ file }`: the answer of an upload. */
export const lockerFileResponseSchema = z.object({ file: lockerFileSchema });
export type LockerFileResponse = z.infer<typeof lockerFileResponseSchema>;

/** `{ files }`: an item's files, oldest first. */
export const lockerFileListResponseSchema = z.object({ files: z.array(lockerFileSchema) });
export type LockerFileListResponse = z.infer<typeof lockerFileListResponseSchema>;
