import { z } from 'zod';
import { itemSpecSchema } from './kit.js';
import { lockerItemKindSchema } from './locker.js';

/**
 * The reference catalogue: generic example items (invented, no brands) that admins keep and members copy
 * into their lockers. An entry carries the same spec as a locker item, without counts.
 */

/** Item kinds a catalogue entry may have: the locker's kinds. */
export const catalogueKindSchema = lockerItemKindSchema;
export type CatalogueKind = z.infer<typeof catalogueKindSchema>;

/** Longest entry name, in characters. */
export const maxCatalogueNameLength = 120;
/** Longest entry notes, in characters. */
export const maxCatalogueNotesLength = 2000;

/**
 * Body of `POST /api/catalogue` and `PUT /api/catalogue/:id` (admins only). The entry's kind is `spec.kind`.
 *
 * @example
 * catalogueEntryInputSchema.parse({
 *   name: 'Generic 1 m USB-C lead',
 *   spec: { kind: 'lead', fromConnector: 'usb-c', toConnector: 'usb-c', lengthM: 1, massG: 28 },
 * }).notes // ''
 */
export const catalogueEntryInputSchema = z.object({
  name: z
    .string({ error: 'Name is required' })
    .trim()
    .min(1, { error: 'Name is required' })
    .max(maxCatalogueNameLength, { error: `Name may have at most ${maxCatalogueNameLength} characters` }),
  notes: z
    .string({ error: 'Notes must be text' })
    .trim()
    .max(maxCatalogueNotesLength, { error: `Notes may have at most ${maxCatalogueNotesLength} characters` })
    .default(''),
  spec: itemSpecSchema,
});
export type CatalogueEntryInput = z.input<typeof catalogueEntryInputSchema>;
export type CatalogueEntryValues = z.output<typeof catalogueEntryInputSchema>;

/** Query of `GET /api/catalogue`: an optional kind filter. */
export const catalogueListQuerySchema = z.object({
  kind: z.preprocess((v) => (typeof v === 'string' && v.trim() === '' ? undefined : v), catalogueKindSchema.optional()),
});
export type CatalogueListQuery = z.output<typeof catalogueListQuerySchema>;

/**
 * A catalogue entry as the API shows it. `massG` is the spec's mass in whole grams (0 for a device
 * given without one), kept beside the spec for sorting.
 */
export const catalogueEntrySchema = z.object({
  id: z.uuid(),
  kind: catalogueKindSchema,
  name: z.string(),
  notes: z.string(),
  massG: z.number().int().min(0),
  spec: itemSpecSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
/** A catalogue entry (see {@link catalogueEntrySchema}). */
export type CatalogueEntry = z.infer<typeof catalogueEntrySchema>;

/** `{ entries }`: the catalogue, by kind then name. */
export const catalogueListResponseSchema = z.object({ entries: z.array(catalogueEntrySchema) });
export type CatalogueListResponse = z.infer<typeof catalogueListResponseSchema>;

/** `{ entry }`: one catalogue entry. */
export const catalogueEntryResponseSchema = z.object({ entry: catalogueEntrySchema });
export type CatalogueEntryResponse = z.infer<typeof catalogueEntryResponseSchema>;
