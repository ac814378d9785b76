import { itemSpecSchema, type ItemKind, type ItemSpec } from '@gramwatt/shared';
import { z } from 'zod';

/** What an uploaded file is for: a photo of the item, or the maker's spec sheet (PDF). */
export type LockerFilePurpose = 'photo' | 'spec-sheet';

/** A file attached to a locker item, as the API describes it; `url` and `thumbUrl` are owner-checked API paths. */
export interface LockerFile {
  id: string;
  purpose: LockerFilePurpose;
  contentType: string;
  sizeBytes: number;
  fileName: string;
  createdAt: string;
  url: string;
  thumbUrl: string | null;
}

/** One item of the signed-in member's locker. `massG` is per item; devices may have 0. */
export interface LockerItem {
  id: string;
  kind: ItemKind;
  name: string;
  notes: string;
  countOwned: number;
  massG: number;
  spec: ItemSpec;
  files: LockerFile[];
  createdAt: string;
  updatedAt: string;
}

/** `GET /api/locker/items`: the items and Σ massG × countOwned over the power gear (devices are not counted). */
export interface LockerItemsResponse {
  items: LockerItem[];
  totalMassG: number;
}

/**
 * The body of `POST /api/locker/items` and `PUT /api/locker/items/:id`, checked in the form before it is sent.
 * The server checks the same body again and answers 400 with field paths such as `spec.ratedW`.
 */
export const lockerItemBodySchema = z.object({
  name: z
    .string({ error: 'Give the item a name' })
    .trim()
    .min(1, { error: 'Give the item a name' })
    .max(120, { error: 'A name is at most 120 characters' }),
  notes: z.string().max(2000, { error: 'Notes are at most 2,000 characters' }).default(''),
  countOwned: z
    .number({ error: 'Count owned must be a number' })
    .int({ error: 'Count owned is a whole number' })
    .min(1, { error: 'Count owned is at least 1' })
    .max(99, { error: 'Count owned may be at most 99' }),
  spec: itemSpecSchema,
});
export type LockerItemBody = z.infer<typeof lockerItemBodySchema>;
