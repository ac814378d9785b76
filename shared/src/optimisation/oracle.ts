import { kitKey, kitNoLarger } from './kit.js';
import type { JudgeVerdict, KitCandidate, KitJudge } from './types.js';

/** Options of the exhaustive search. */
export interface ExhaustiveOptions {
  /**
   * Skip kits no larger in any item than a kit already rejected (sound only if the judge is monotone). Default true;
   * tests turn it off on a share of cases so a monotonicity bug cannot hide.
   */
  skipNoLargerThanRejected?: boolean;
  /** Refuse problems with more kits than this (default 200 000). */
  maxKits?: number;
}

/** The exhaustive search's answer. */
export interface ExhaustiveAnswer {
  /** The lightest kit the judge accepts (ties: the first in a fixed order), or null when none is. */
  best: { counts: Map<string, number>; massG: number; verdict: JudgeVerdict } | null;
  /** Kits judged and kits skipped. */
  judged: number;
  skipped: number;
}

/**
 * The oracle: every combination of counts 0…owned (Π (owned_i + 1) kits) in ascending grams, each judged; the first
 * feasible one is the lightest feasible kit. Slow by design — it is the reference the optimiser is tested against.
 * @example exhaustiveLightestKit(candidates, judge).best?.massG // 300
 */
export function exhaustiveLightestKit(
  candidates: readonly KitCandidate[],
  judge: KitJudge,
  options: ExhaustiveOptions = {},
): ExhaustiveAnswer {
  const skip = options.skipNoLargerThanRejected ?? true;
  const maxKits = options.maxKits ?? 200_000;
  const items = candidates.filter((c) => c.ownedCount > 0);
  const total = items.reduce((n, c) => n * (c.ownedCount + 1), 1);
  if (total > maxKits) throw new Error(`exhaustive search over ${total} kits refused (limit ${maxKits})`);
  const kits: { counts: number[]; massG: number; key: string }[] = [];
  const counts = items.map(() => 0);
  for (let n = 0; n < total; n++) {
    let massG = 0;
    items.forEach((c, i) => (massG += (counts[i] ?? 0) * c.massG));
    kits.push({ counts: [...counts], massG, key: '' });
    for (let i = 0; i < items.length; i++) {
      const c = items[i] as KitCandidate;
      if ((counts[i] ?? 0) < c.ownedCount) {
        counts[i] = (counts[i] ?? 0) + 1;
        break;
      }
      counts[i] = 0;
    }
  }
  const toMap = (v: number[]): Map<string, number> =>
    new Map(items.flatMap((c, i) => ((v[i] ?? 0) > 0 ? [[c.itemId, v[i] as number] as const] : [])));
  for (const k of kits) k.key = kitKey(toMap(k.counts));
  kits.sort((a, b) => a.massG - b.massG || (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
  const rejected: Map<string, number>[] = [];
  let judged = 0;
  let skipped = 0;
  for (const k of kits) {
    const kit = toMap(k.counts);
    if (skip && rejected.some((r) => kitNoLarger(kit, r))) {
      skipped++;
      continue;
    }
    judged++;
    const verdict = judge(kit);
    if (verdict.feasible) return { best: { counts: kit, massG: k.massG, verdict }, judged, skipped };
    rejected.push(kit);
  }
  return { best: null, judged, skipped };
}
