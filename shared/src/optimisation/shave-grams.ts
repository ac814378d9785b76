import { kitLines, kitMassG, withOneSwapped } from './kit.js';
import type { KitCandidate, KitCounts, KitJudge, KitShave } from './types.js';

/**
 * The changes to a kit picked by hand that the judge still accepts and that weigh less: removing one unit of an item,
 * or replacing one unit with one unit of a lighter item of the same kind that is not all packed already. Lightest
 * resulting kit first (ties by item id). One judge call per change tried.
 * @example shaveGrams(candidates, judge, new Map([['bank-big', 1], ['bank-small', 1]]))[0].change.kind // 'remove'
 */
export function shaveGrams(candidates: readonly KitCandidate[], judge: KitJudge, kit: KitCounts): KitShave[] {
  const byId = new Map(candidates.map((c) => [c.itemId, c]));
  const baseG = kitMassG(kit, candidates);
  const shaves: KitShave[] = [];
  const tryKit = (change: KitShave['change'], counts: Map<string, number>): void => {
    const massG = kitMassG(counts, candidates);
    if (massG >= baseG) return;
    const verdict = judge(counts);
    // A kit that works only with an item left home is offered as that lighter kit's own change, never as this one.
    if (verdict.feasible && !verdict.works)
      shaves.push({ change, kit: { lines: kitLines(counts), massG, verdict }, savedG: baseG - massG });
  };
  const lines = kitLines(kit);
  for (const line of lines) {
    const item = byId.get(line.itemId);
    if (!item) continue;
    tryKit({ kind: 'remove', itemId: line.itemId }, withOneSwapped(kit, line.itemId));
    for (const other of candidates) {
      if (other.itemId === item.itemId || other.kind !== item.kind || other.massG >= item.massG) continue;
      if ((kit.get(other.itemId) ?? 0) >= other.ownedCount) continue;
      tryKit(
        { kind: 'replace', itemId: item.itemId, withItemId: other.itemId },
        withOneSwapped(kit, item.itemId, other.itemId),
      );
    }
  }
  return shaves.sort((a, b) => a.kit.massG - b.kit.massG || describe(a).localeCompare(describe(b)));
}

function describe(s: KitShave): string {
  return s.change.kind === 'remove' ? `0${s.change.itemId}` : `1${s.change.itemId}>${s.change.withItemId}`;
}
