/** Worked cases checkable by hand (invented items; the arithmetic is in each comment). */
import { describe, expect, it } from 'vitest';
import { createKitSearch } from './kit-search.js';
import {
  growToFeasible,
  lockerCheckAfterMs,
  lockerCheckAfterRejections,
  optimiseKit,
  stuckGrowthAfterMs,
} from './optimise.js';
import {
  randomSyntheticWorld,
  seededRandom,
  syntheticJudge,
  syntheticProblem,
  type SyntheticWorld,
} from './synthetic-problem.js';
import type { KitCounts, KitJudge } from './types.js';

const noSun = (reserveShare: number, alternatives: string[][]): SyntheticWorld => ({
  dayCount: 3,
  skyShare: [[0, 0, 0]],
  frozenUntilHour: [0, 0, 0],
  sunScale: 1,
  demandScale: 1,
  demandHours: [18, 19],
  chargeEfficiency: 0.9,
  reserveShare,
  panels: [],
  banks: [
    { itemId: 'bank-20', massG: 150, ownedCount: 2, usableWh: 20, inputW: 10 },
    { itemId: 'bank-12', massG: 100, ownedCount: 3, usableWh: 12, inputW: 10 },
  ],
  pathItems: [],
  devices: [{ deviceId: 'phone', demandWh: 10, alternatives }],
});

describe('worked cases', () => {
  it('10 Wh a day for 3 days, no sun, no reserve: one 20 Wh bank plus one 12 Wh bank (32 Wh ≥ 30 Wh, 250 g)', () => {
    // 30 Wh is needed. 2 × 12 = 24 Wh (200 g) is short; 20 + 12 = 32 Wh at 250 g is the lightest that covers it.
    const w = noSun(0, [[]]);
    const a = optimiseKit(syntheticProblem(w), syntheticJudge(w));
    expect(a.status).toBe('optimal');
    if (a.status === 'optimal') expect(a.kit.massG).toBe(250);
  });
  it('the same with a 10 % reserve: 300 g (0.9 × 32 = 28.8 Wh < 30; 2 × 20 or 3 × 12 gives ≥ 32.4 Wh)', () => {
    const w = noSun(0.1, [[]]);
    const a = optimiseKit(syntheticProblem(w), syntheticJudge(w));
    expect(a.status).toBe('optimal');
    if (a.status === 'optimal') expect(a.kit.massG).toBe(300);
  });
  it('a device with no path in the locker: nothing feasible, naming the device', () => {
    const w = noSun(0, []);
    const a = optimiseKit(syntheticProblem(w), syntheticJudge(w));
    expect(a.status).toBe('nothing-feasible');
    if (a.status === 'nothing-feasible') expect(a.missingPaths.map((m) => m.needId)).toEqual(['phone']);
  });
});

describe('the whole locker is judged only when nothing else is accepted', () => {
  const isLocker = (kit: KitCounts, w: SyntheticWorld): boolean =>
    [...w.banks, ...w.panels, ...w.pathItems].every((it) => (kit.get(it.itemId) ?? 0) === it.ownedCount);
  it('a kit accepted at once: the locker (2 × 20 Wh + 3 × 12 Wh) is never simulated', () => {
    const w = noSun(0, [[]]);
    const judged: KitCounts[] = [];
    const judge: KitJudge = (kit) => {
      judged.push(new Map(kit));
      return syntheticJudge(w)(kit);
    };
    const a = optimiseKit(syntheticProblem(w), judge);
    expect(a.status).toBe('optimal');
    expect(judged.length).toBeGreaterThan(0);
    expect(judged.some((kit) => isLocker(kit, w))).toBe(false);
  });
  it(`a judge that rejects every kit: after ${lockerCheckAfterRejections} rejections the newest proposal is grown, the whole locker last, and the answer is nothing feasible`, () => {
    // A larger world, so that the search alone would take many rounds to run out of kits.
    const w = randomSyntheticWorld(seededRandom(73_001), { itemTypes: 12, maxOwned: 2, dayCount: 4, skyCount: 2 });
    let calls = 0;
    let lockerAt = 0;
    const dry: KitJudge = (kit) => {
      calls++;
      if (isLocker(kit, w) && lockerAt === 0) lockerAt = calls;
      return { feasible: false, runsDry: { dayIndex: 1, deviceId: 'stub' } };
    };
    const a = optimiseKit(syntheticProblem(w), dry);
    expect(a.status).toBe('nothing-feasible');
    if (a.status === 'nothing-feasible') expect(a.runsDry?.deviceId).toBe('stub');
    // Every call is a rejection: the growth starts at the round after the eighth (a round may add one more, in its
    // lift), galloping and bisecting over at most 12 items before the locker, and the search stops there.
    expect(lockerAt).toBeGreaterThan(lockerCheckAfterRejections + 1);
    expect(lockerAt).toBeLessThanOrEqual(lockerCheckAfterRejections + 2 + 2 * Math.ceil(Math.log2(13)) + 1);
    expect(calls).toBe(lockerAt);
  });
  it('under a time budget the growth comes after a quarter of it, never later than without one', () => {
    expect(stuckGrowthAfterMs(undefined)).toBe(lockerCheckAfterMs);
    expect(stuckGrowthAfterMs(60_000)).toBe(lockerCheckAfterMs);
    expect(stuckGrowthAfterMs(1_000)).toBe(250);
    expect(stuckGrowthAfterMs(2 * lockerCheckAfterMs)).toBe(lockerCheckAfterMs / 2);
  });
  it('a search that runs long with nothing accepted asks once whether the locker runs dry, and a dry locker grows nothing', () => {
    const w = randomSyntheticWorld(seededRandom(73_001), { itemTypes: 12, maxOwned: 2, dayCount: 4, skyCount: 2 });
    const problem = syntheticProblem(w);
    const dry: KitJudge = () => ({ feasible: false });
    // A clock that moves 1 ms each time it is read; the rejection count never triggers.
    let clockMs = 0;
    const search = createKitSearch(problem, dry, { now: () => clockMs++ });
    let asked = 0;
    const step = search.next(Infinity, {
      afterRejections: Infinity,
      afterMs: 3,
      allDry: () => {
        asked++;
        return true;
      },
    });
    expect(step.kind).toBe('exhausted');
    expect(asked).toBe(1);
    const locker = new Map(problem.candidates.map((c) => [c.itemId, c.ownedCount]));
    expect(growToFeasible(search, new Map(), locker, Infinity)).toBeUndefined();
  });
});
