import type { KitSelection, PlanKit } from '../api/types';

/** A kit as the API takes it back: item ids and counts. */
export const selectionOf = (kit: Pick<PlanKit, 'lines'>): KitSelection =>
  kit.lines.map(({ itemId, count }) => ({ itemId, count }));

/** Whether two kits hold the same items in the same counts, in any order. */
export const sameSelection = (a: KitSelection, b: KitSelection): boolean => {
  const counts = new Map(a.filter((l) => l.count > 0).map((l) => [l.itemId, l.count]));
  const others = b.filter((l) => l.count > 0);
  return counts.size === others.length && others.every((l) => counts.get(l.itemId) === l.count);
};
