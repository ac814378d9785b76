import type { KitCandidate, KitCounts, KitLine } from './types.js';

/**
 * Kit lines (non-zero counts, sorted by item id) from counts.
 * @example kitLines(new Map([['b', 1], ['a', 0]])) // [{ itemId: 'b', count: 1 }]
 */
export function kitLines(counts: KitCounts): KitLine[] {
  return [...counts.entries()]
    .filter(([, count]) => count > 0)
    .map(([itemId, count]) => ({ itemId, count }))
    .sort((a, b) => (a.itemId < b.itemId ? -1 : a.itemId > b.itemId ? 1 : 0));
}

/**
 * Counts from kit lines.
 * @example kitCounts([{ itemId: 'a', count: 2 }]).get('a') // 2
 */
export function kitCounts(lines: readonly KitLine[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const line of lines) if (line.count > 0) counts.set(line.itemId, (counts.get(line.itemId) ?? 0) + line.count);
  return counts;
}

/**
 * A stable text key of a kit (for caches and sets).
 * @example kitKey(new Map([['b', 1], ['a', 2]])) // 'a*2|b*1'
 */
export function kitKey(counts: KitCounts): string {
  return kitLines(counts)
    .map((l) => `${l.itemId}*${l.count}`)
    .join('|');
}

/**
 * Grams of a kit: Σ count × unit grams. Items not among the candidates weigh nothing here (the caller validates ids).
 * @example kitMassG(new Map([['a', 2]]), [{ itemId: 'a', kind: 'bank', massG: 150, ownedCount: 2 }]) // 300
 */
export function kitMassG(counts: KitCounts, candidates: readonly KitCandidate[]): number {
  let massG = 0;
  for (const c of candidates) massG += (counts.get(c.itemId) ?? 0) * c.massG;
  return massG;
}

/**
 * The kit with one unit of `fromId` taken out (its line gone at zero) and, when given, one unit of `toId` put in.
 * @example withOneSwapped(new Map([['a', 1]]), 'a', 'b') // Map { 'b' => 1 }
 */
export function withOneSwapped(kit: KitCounts, fromId: string, toId?: string): Map<string, number> {
  const next = new Map(kit);
  const left = (next.get(fromId) ?? 0) - 1;
  if (left > 0) next.set(fromId, left);
  else next.delete(fromId);
  if (toId !== undefined) next.set(toId, (next.get(toId) ?? 0) + 1);
  return next;
}

/**
 * Whether kit `a` holds no more of any item than kit `b` (a ≤ b item by item).
 * @example kitNoLarger(new Map([['a', 1]]), new Map([['a', 2]])) // true
 */
export function kitNoLarger(a: KitCounts, b: KitCounts): boolean {
  for (const [itemId, count] of a) if (count > (b.get(itemId) ?? 0)) return false;
  return true;
}

/**
 * A kit as counts by candidate index (bytes, at most 255) with the indices it packs: a search compares each kit it meets
 * with hundreds of rejected kits, and `vectorNoLarger` looks only at the few items the smaller kit packs.
 */
export interface KitVector {
  counts: Uint8Array;
  packed: Int32Array;
}

/**
 * The kit's vector over `index` (candidate id → position; ids not in it are left out, so index every candidate).
 * @example kitVector(new Map([['a', 2]]), new Map([['a', 0]])).packed // Int32Array [0]
 */
export function kitVector(counts: KitCounts, index: ReadonlyMap<string, number>): KitVector {
  const vector = new Uint8Array(index.size);
  const packed: number[] = [];
  for (const [itemId, count] of counts) {
    const i = index.get(itemId);
    if (i === undefined || !(count > 0)) continue;
    vector[i] = Math.min(255, count);
    packed.push(i);
  }
  return { counts: vector, packed: Int32Array.from(packed) };
}

/**
 * `kitNoLarger` on vectors: whether `a` holds no more of any item than `b`.
 * @example vectorNoLarger(kitVector(small, index), kitVector(big, index)) // true
 */
export function vectorNoLarger(a: KitVector, b: KitVector): boolean {
  const { counts, packed } = a;
  const other = b.counts;
  for (let j = 0; j < packed.length; j++) {
    const i = packed[j] as number;
    if ((counts[i] as number) > (other[i] as number)) return false;
  }
  return true;
}
