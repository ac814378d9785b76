import { z } from 'zod';
import { kitItemSpecSchema } from './kit.js';
import { maxLockerCountOwned } from './locker.js';

/**
 * The party pool: power gear (panels, banks, batteries, converters, controllers, leads) that members share into a trip's plan, each entry one
 * member's locker item with how many of it they bring. Devices are not pooled: they go on the trip's device list.
 *
 * The leader's locker rule: until the leader pools an item themselves, the leader's WHOLE locker counts as pooled
 * (at every count owned) — so a trip with no pool entries plans exactly as a solo trip does. Once the leader has a
 * pool entry of their own, only the leader's entries count. Partners' gear counts only through their entries.
 */

const countSchema = z
  .number({ error: 'Count must be a number' })
  .int({ error: 'Count is a whole number' })
  .min(1, { error: 'Count is at least 1' })
  .max(maxLockerCountOwned, { error: `Count may be at most ${maxLockerCountOwned}` });

/** Body of `POST /api/trips/:id/pool`: one of the caller's locker items and how many of it (at most the count owned). */
export const poolItemAddSchema = z.object({
  itemId: z.uuid({ error: 'Not a locker item id' }),
  count: countSchema.default(1),
});
export type PoolItemAdd = z.infer<typeof poolItemAddSchema>;
export type PoolItemAddInput = z.input<typeof poolItemAddSchema>;

/** Body of `PATCH /api/trips/:id/pool/:poolItemId`: a new count (at most the count owned). */
export const poolItemUpdateSchema = z.object({ count: countSchema });
export type PoolItemUpdate = z.infer<typeof poolItemUpdateSchema>;

/**
 * One pooled item. `count` is what the member pooled; `countOwned` is what their locker holds now; the plan uses the
 * smaller of the two (a locker count lowered after pooling is respected).
 */
export const poolItemSchema = z.object({
  id: z.uuid(),
  itemId: z.uuid(),
  name: z.string(),
  kind: z.enum(['panel', 'bank', 'battery', 'converter', 'controller', 'lead']),
  /** Grams of one unit. */
  massG: z.number().int(),
  count: z.number().int(),
  countOwned: z.number().int(),
  ownerAccountId: z.uuid(),
  ownerName: z.string(),
  spec: kitItemSpecSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type PoolItem = z.infer<typeof poolItemSchema>;

/** `GET /api/trips/:id/pool`: the entries, and whether the leader's whole locker counts (no leader entries yet). */
export const poolListResponseSchema = z.object({
  items: z.array(poolItemSchema),
  /** True while the leader has pooled nothing themselves: the plan then draws on the leader's whole locker. */
  leaderWholeLocker: z.boolean(),
});
export type PoolListResponse = z.infer<typeof poolListResponseSchema>;

export const poolItemResponseSchema = z.object({ item: poolItemSchema });
export type PoolItemResponse = z.infer<typeof poolItemResponseSchema>;
