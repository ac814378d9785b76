/**
 * Trying a change on many items with few checks: the items go in batches that double while each batch's change holds
 * and halve when one does not; a batch whose change fails is split in two and each half tried in turn, down to single
 * items, which then try their partial changes. Lifting a rejected kit (raise these items) and shaving a feasible one
 * (take these items out) both use it: when most items take the change, a whole batch costs one check.
 * Source: adaptive group testing (D.-Z. Du and F. K. Hwang, Combinatorial Group Testing and Its Applications, 2nd ed.,
 * World Scientific 2000, ch. 2).
 */

/** What is tried on the items. */
export interface BatchTrial<T> {
  /** Tries the change on every item of the batch at once; true (and kept) when it holds. */
  whole(batch: readonly T[]): boolean;
  /** A single item whose whole change failed: tries its partial changes. */
  part(item: T): void;
  /** True when the time is up: no further check is made. */
  stop(): boolean;
}

/** Batch sizes: the first, and the most one batch may hold (1 and 1: one item at a time). */
export interface BatchSizes {
  first: number;
  largest: number;
}

/** Batches of 4 at first, at most 64 (tuned on the bench lockers for shaving, where most large batches fail). */
export const adaptiveBatches: BatchSizes = { first: 4, largest: 64 };
/**
 * Up to 64 at once from the first: lifting a rejected kit, whose spare leads, converters and controllers nearly always
 * leave it rejected all together (one check). On the 50-item bench lockers the same rounds took half the simulations
 * (seed 50's optimum: 106 → 58; seed 54's optimum and four gram prices: 14,700 → 7,400) against `adaptiveBatches`.
 */
export const liftBatches: BatchSizes = { first: 64, largest: 64 };
/** One item at a time. */
export const oneAtATime: BatchSizes = { first: 1, largest: 1 };

/**
 * Tries the change on `items`, in order, in adaptive batches.
 * @example tryInBatches(spares, { whole, part, stop }, { first: 4, largest: 64 })
 */
export function tryInBatches<T>(items: readonly T[], trial: BatchTrial<T>, sizes: BatchSizes): void {
  /** False when the batch did not take the change whole (its halves were then tried in turn). */
  const run = (batch: readonly T[]): boolean => {
    if (batch.length === 0 || trial.stop()) return true;
    if (trial.whole(batch)) return true;
    if (batch.length === 1) {
      trial.part(batch[0] as T);
      return false;
    }
    const half = batch.length >> 1;
    run(batch.slice(0, half));
    run(batch.slice(half));
    return false;
  };
  let size = sizes.first;
  for (let i = 0; i < items.length && !trial.stop();) {
    const batch = items.slice(i, i + size);
    i += batch.length;
    size = run(batch) ? Math.min(sizes.largest, size * 2) : Math.max(1, size >> 1);
  }
}
