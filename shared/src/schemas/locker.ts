import { z } from 'zod';
import { itemSpecSchema } from './kit.js';

/**
 * The locker's stored records: what a member sends to create or change an item, what the API answers,
 * and the list query. The engine's `itemSpecSchema` is the one definition of an item's physics; these
 * schemas only add the locker's own fields (name, notes, counts, files, times).
 */

/** The item kinds the locker holds today, in power-role order (Collect, Store, Convert, Connect, Use). */
export const lockerItemKinds = ['panel', 'bank', 'battery', 'converter', 'controller', 'lead', 'device'] as const;
export const lockerItemKindSchema = z.enum(lockerItemKinds, {
  error: 'Kind must be panel, bank, battery, converter, controller, lead or device',
});
export type LockerItemKind = z.infer<typeof lockerItemKindSchema>;

/** Longest item name, in characters. */
export const maxLockerItemNameLength = 120;
/** Longest item notes, in characters. */
export const maxLockerItemNotesLength = 2000;
/** Most of one item a member can own (the solver's per-item count bound, as in `kitEntrySchema`). */
export const maxLockerCountOwned = 20;

/**
 * Body of `POST /api/locker/items` and `PUT /api/locker/items/:id`. The kind is `spec.kind`.
 *
 * @example
 * lockerItemInputSchema.parse({ name: 'Ridgeline 10 W fold-out', countOwned: 1, spec: panelSpec });
 * // → { name: 'Ridgeline 10 W fold-out', notes: '', countOwned: 1, spec: { kind: 'panel', ... } }
 */
export const lockerItemInputSchema = z.object({
  name: z
    .string({ error: 'Name is required' })
    .trim()
    .min(1, { error: 'Name is required' })
    .max(maxLockerItemNameLength, { error: `Name may have at most ${maxLockerItemNameLength} characters` }),
  notes: z
    .string({ error: 'Notes must be text' })
    .max(maxLockerItemNotesLength, { error: `Notes may have at most ${maxLockerItemNotesLength} characters` })
    .default(''),
  countOwned: z
    .number({ error: 'Count owned must be a number' })
    .int({ error: 'Count owned is a whole number' })
    .min(1, { error: 'Count owned is at least 1' })
    .max(maxLockerCountOwned, { error: `Count owned may be at most ${maxLockerCountOwned}` }),
  spec: itemSpecSchema,
});
/** What the client sends (defaults not yet applied). */
export type LockerItemInputRaw = z.input<typeof lockerItemInputSchema>;
/** A validated item with every default applied. */
export type LockerItemInput = z.infer<typeof lockerItemInputSchema>;

/** What a file attached to an item is for. */
export const lockerFilePurposes = ['photo', 'spec-sheet'] as const;
export const lockerFilePurposeSchema = z.enum(lockerFilePurposes, { error: 'Purpose must be photo or spec-sheet' });
export type LockerFilePurpose = z.infer<typeof lockerFilePurposeSchema>;

/** A photo or spec sheet attached to a locker item; `url` and `thumbUrl` are owner-checked API paths. */
export const lockerFileSchema = z.object({
  id: z.uuid(),
  purpose: lockerFilePurposeSchema,
  contentType: z.string(),
  sizeBytes: z.number().int().min(0),
  fileName: z.string(),
  createdAt: z.iso.datetime(),
  url: z.string(),
  thumbUrl: z.string().nullable(),
});
export type LockerFile = z.infer<typeof lockerFileSchema>;

/**
 * A locker item as the API answers it. `massG` is grams of one item, rounded (devices without a mass: 0);
 * `kind` equals `spec.kind`.
 */
export const lockerItemSchema = z.object({
  id: z.uuid(),
  kind: lockerItemKindSchema,
  name: z.string(),
  notes: z.string(),
  countOwned: z.number().int(),
  massG: z.number().int(),
  spec: itemSpecSchema,
  files: z.array(lockerFileSchema),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type LockerItem = z.infer<typeof lockerItemSchema>;

/** `{ item }`: the answer of get, create, update and a catalogue copy. */
export const lockerItemResponseSchema = z.object({ item: lockerItemSchema });
export type LockerItemResponse = z.infer<typeof lockerItemResponseSchema>;

/** `{ items, totalMassG }`: the list. `totalMassG` = Σ massG × countOwned over the power gear (devices excluded). */
export const lockerItemListResponseSchema = z.object({
  items: z.array(lockerItemSchema),
  totalMassG: z.number().int(),
});
export type LockerItemListResponse = z.infer<typeof lockerItemListResponseSchema>;

/** Columns the list can be sorted by. */
export const lockerSortKeys = ['name', 'kind', 'massG', 'countOwned', 'updatedAt'] as const;
export type LockerSortKey = (typeof lockerSortKeys)[number];

/** An empty query-string value (`?kind=`) means "not given". */
const blankToUndefined = (value: unknown) => (typeof value === 'string' && value.trim() === '' ? undefined : value);

/**
 * Query of `GET /api/locker/items`: filter by kind, search the name (case-insensitive substring), sort.
 *
 * @example
 * lockerListQuerySchema.parse({ kind: 'bank', sort: 'massG', order: 'desc' });
 * // → { kind: 'bank', sort: 'massG', order: 'desc' }
 */
export const lockerListQuerySchema = z.object({
  kind: z.preprocess(blankToUndefined, lockerItemKindSchema.optional()),
  q: z.preprocess(
    blankToUndefined,
    z
      .string()
      .trim()
      .max(maxLockerItemNameLength, { error: `Search may have at most ${maxLockerItemNameLength} characters` })
      .optional(),
  ),
  sort: z.preprocess(
    blankToUndefined,
    z.enum(lockerSortKeys, { error: 'Sort by name, kind, massG, countOwned or updatedAt' }).default('name'),
  ),
  order: z.preprocess(blankToUndefined, z.enum(['asc', 'desc'], { error: 'Order is asc or desc' }).default('asc')),
});
export type LockerListQuery = z.infer<typeof lockerListQuerySchema>;

/** How an import treats the existing locker: add the rows to it, or replace it with them. */
export const lockerImportModes = ['add', 'replace'] as const;
export type LockerImportMode = (typeof lockerImportModes)[number];

/**
 * Query of `POST /api/locker/import`: `mode` (default add) and `commit` (default false: a preview that
 * writes nothing).
 */
export const lockerImportQuerySchema = z.object({
  mode: z.preprocess(blankToUndefined, z.enum(lockerImportModes, { error: 'Mode is add or replace' }).default('add')),
  commit: z.preprocess(
    blankToUndefined,
    z
      .enum(['true', 'false'], { error: 'Commit is true or false' })
      .default('false')
      .transform((v) => v === 'true'),
  ),
});
export type LockerImportQuery = z.infer<typeof lockerImportQuerySchema>;

/** One problem in an imported file. `row` is the spreadsheet row (the header is row 1); `column` is '' for the whole row or file. */
export const lockerImportIssueSchema = z.object({ row: z.number().int(), column: z.string(), message: z.string() });
export type LockerImportIssue = z.infer<typeof lockerImportIssueSchema>;

/** One readable row of an import, as the preview lists it. */
export const lockerImportPreviewRowSchema = z.object({
  row: z.number().int(),
  kind: lockerItemKindSchema,
  name: z.string(),
  countOwned: z.number().int(),
  massG: z.number().int(),
});
export type LockerImportPreviewRow = z.infer<typeof lockerImportPreviewRowSchema>;

/**
 * The answer of `POST /api/locker/import`: `ok` when every row is good (and, with commit, written);
 * `rowCount` data rows read; the row-by-row report; the preview of the good rows.
 */
export const lockerImportResultSchema = z.object({
  ok: z.boolean(),
  mode: z.enum(lockerImportModes),
  committed: z.boolean(),
  rowCount: z.number().int(),
  report: z.array(lockerImportIssueSchema),
  preview: z.array(lockerImportPreviewRowSchema),
});
export type LockerImportResult = z.infer<typeof lockerImportResultSchema>;

/**
 * Grams of one item as the locker stores it: `spec.massG` rounded to a whole gram, 0 for a device without one.
 *
 * @example
 * lockerItemMassG({ kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 14.6 }); // → 15
 */
export function lockerItemMassG(spec: { massG?: number | undefined }): number {
  return spec.massG === undefined ? 0 : Math.round(spec.massG);
}
