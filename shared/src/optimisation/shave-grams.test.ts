import { describe, expect, it } from 'vitest';
import { shaveGrams } from './shave-grams.js';
import { seededRandom, randomSyntheticWorld, syntheticJudge, syntheticProblem } from './synthetic-problem.js';

describe('shaveGrams within a deadline', () => {
  const world = randomSyntheticWorld(seededRandom(8), {
    itemTypes: 12,
    maxOwned: 2,
    dayCount: 5,
    skyCount: 2,
    deviceCount: 2,
  });
  const problem = syntheticProblem(world);
  const judge = syntheticJudge(world);
  // One unit of each item, so that removals and swaps for a spare unit of a lighter item are both offered.
  const kit = new Map(problem.candidates.map((c) => [c.itemId, 1]));
  const all = shaveGrams(problem.candidates, judge, kit);

  /** A clock that moves 1 ms each time it is read: the search reads it once before each change it judges. */
  const ticking = (): (() => number) => {
    let t = 0;
    return () => t++;
  };

  it('without a deadline every change is tried', () => {
    expect(all.untriedChanges).toBe(0);
    expect(all.shaves.length).toBeGreaterThan(2);
    expect(all.shaves.some((s) => s.change.kind === 'replace')).toBe(true);
  });

  it('a deadline already past tries nothing and counts every change as untried', () => {
    const none = shaveGrams(problem.candidates, judge, kit, { deadlineMs: 0, now: () => 0 });
    expect(none.shaves).toEqual([]);
    const total = none.untriedChanges;
    // Every change that worked in the full search is among those counted.
    expect(total).toBeGreaterThanOrEqual(all.shaves.length);
  });

  it('a stopped search has judged the biggest savings first: its shaves open the full list', () => {
    const total = shaveGrams(problem.candidates, judge, kit, { deadlineMs: 0, now: () => 0 }).untriedChanges;
    for (const k of [1, 3, Math.floor(total / 2), total - 1]) {
      const some = shaveGrams(problem.candidates, judge, kit, { deadlineMs: k, now: ticking() });
      expect(some.untriedChanges).toBe(total - k);
      expect(some.shaves).toEqual(all.shaves.slice(0, some.shaves.length));
      // Nothing the full search found lighter than the stopped one's last shave is missing from it.
      const lastG = some.shaves.at(-1)?.kit.massG ?? -Infinity;
      expect(all.shaves.filter((s) => s.kit.massG < lastG)).toEqual(some.shaves.filter((s) => s.kit.massG < lastG));
    }
  });
});
