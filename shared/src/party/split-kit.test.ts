/**
 * The split against brute force: every assignment of every unit to every carrier. Invented masses and limits — the
 * check is agreement with the rule as stated in types.ts, not a value from the outside world.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bruteForceSplitCost, keepsWalkingRule } from './party-oracle.test-support.js';
import { splitKit } from './split-kit.js';
import type { KitSplit, SplitRules } from './types.js';

const propertySeed = 9;

interface Case {
  kit: Map<string, number>;
  rules: SplitRules;
  massGById: Map<string, number>;
}

/** 2–3 carriers, 1–4 item types of 1–2 units (at most 6 units), some panels with walking feeds among the rest. */
const caseArb: fc.Arbitrary<Case> = fc
  .record({
    limits: fc.array(fc.option(fc.integer({ min: 50, max: 900 }), { nil: null, freq: 4 }), {
      minLength: 2,
      maxLength: 3,
    }),
    items: fc.array(
      fc.record({
        massG: fc.integer({ min: 5, max: 600 }),
        count: fc.integer({ min: 1, max: 2 }),
        panel: fc.boolean(),
        owner: fc.integer({ min: -1, max: 2 }),
        feeds: fc.array(fc.array(fc.nat(3), { minLength: 1, maxLength: 2 }), { maxLength: 2 }),
      }),
      { minLength: 1, maxLength: 4 },
    ),
  })
  .filter((c) => c.items.reduce((n, i) => n + i.count, 0) <= 6)
  .map(({ limits, items }) => {
    const carriers = limits.map((gramLimitG, i) => ({ memberId: `hiker-${i}`, gramLimitG }));
    const ids = items.map((_, i) => `item-${i}`);
    const stores = ids.filter((_, i) => !items[i]?.panel);
    const kit = new Map(items.map((it, i) => [ids[i] as string, it.count]));
    const massGById = new Map(items.map((it, i) => [ids[i] as string, it.massG]));
    const ownerByItemId = new Map(
      items.flatMap((it, i) =>
        it.owner >= 0 && it.owner < carriers.length ? [[ids[i] as string, `hiker-${it.owner}`] as const] : [],
      ),
    );
    const walkingFeeds = items.flatMap((it, i) =>
      it.panel
        ? [
            {
              panelItemId: ids[i] as string,
              alternatives:
                stores.length === 0
                  ? []
                  : it.feeds.map((alt) => ({ itemIds: alt.map((k) => stores[k % stores.length] as string) })),
            },
          ]
        : [],
    );
    return { kit, massGById, rules: { carriers, ownerByItemId, walkingFeeds } };
  });

/** Unit list and carrier index per unit, as the split reports it. */
function assignment(split: KitSplit): { units: string[]; carrierOf: number[] } {
  const units: string[] = [];
  const carrierOf: number[] = [];
  split.carriers.forEach((c, m) => {
    for (const line of c.lines)
      for (let k = 0; k < line.count; k++) {
        units.push(line.itemId);
        carrierOf.push(m);
      }
  });
  return { units, carrierOf };
}

describe('splitKit against every assignment', () => {
  it('finds the least overage (then worst overage, then lent units) and a split that keeps the walking rule', () => {
    let withinLimits = 0;
    let overLimits = 0;
    let noSplit = 0;
    fc.assert(
      fc.property(caseArb, ({ kit, rules, massGById }) => {
        const split = splitKit(kit, rules, { massGById });
        const reference = bruteForceSplitCost(kit, rules, massGById);
        if (reference === null) {
          expect(split).toBeNull();
          noSplit++;
          return;
        }
        expect(split).not.toBeNull();
        if (!split) return;
        expect(split.proven).toBe(true);
        expect([split.overG, Math.max(0, ...split.carriers.map((c) => c.overG)), split.lentUnits]).toEqual(reference);
        // The split is what it says: every unit once, grams and overage per carrier, the walking rule kept.
        const { units, carrierOf } = assignment(split);
        expect(units.length).toBe([...kit.values()].reduce((a, b) => a + b, 0));
        for (const [id, n] of kit) expect(units.filter((u) => u === id).length).toBe(n);
        expect(keepsWalkingRule(units, carrierOf, rules)).toBe(true);
        split.carriers.forEach((c, m) => {
          const massG = c.lines.reduce((g, l) => g + l.count * (massGById.get(l.itemId) ?? 0), 0);
          expect(c.massG).toBe(massG);
          expect(c.gramLimitG).toBe(rules.carriers[m]?.gramLimitG);
          expect(c.overG).toBe(c.gramLimitG === null ? 0 : Math.max(0, massG - c.gramLimitG));
        });
        expect(split.overG).toBe(split.carriers.reduce((g, c) => g + c.overG, 0));
        expect(split.withinLimits).toBe(split.overG === 0);
        if (split.withinLimits) withinLimits++;
        else overLimits++;
      }),
      { seed: propertySeed, numRuns: 400 },
    );
    // The cases are a mix, so none of the three outcomes goes untested.
    expect(withinLimits).toBeGreaterThan(40);
    expect(overLimits).toBeGreaterThan(40);
    expect(noSplit).toBeGreaterThan(5);
  });

  it('without the walking rule it is plain bin packing by grams', () => {
    fc.assert(
      fc.property(caseArb, ({ kit, rules, massGById }) => {
        const split = splitKit(kit, rules, { massGById, walkingRule: false });
        const reference = bruteForceSplitCost(kit, rules, massGById, false);
        expect(split?.overG).toBe(reference?.[0]);
      }),
      { seed: propertySeed + 1, numRuns: 200 },
    );
  });
});

describe('splitKit: named cases', () => {
  const massGById = new Map([
    ['panel', 400],
    ['bank', 200],
    ['bank-b', 200],
    ['lead', 20],
  ]);
  const carriers = [
    { memberId: 'ash', gramLimitG: 500 },
    { memberId: 'birch', gramLimitG: 300 },
  ];

  it('a panel rides with a bank it can fill: the 400 g panel and a 200 g bank put Ash 100 g over, though 820 g fits 800 g of limits by grams alone', () => {
    const rules: SplitRules = {
      carriers,
      ownerByItemId: new Map(),
      walkingFeeds: [{ panelItemId: 'panel', alternatives: [{ itemIds: ['bank'] }, { itemIds: ['bank-b'] }] }],
    };
    const kit = new Map([
      ['panel', 1],
      ['bank', 1],
      ['lead', 1],
    ]);
    const split = splitKit(kit, rules, { massGById });
    expect(split?.carriers.map((c) => [c.memberId, c.massG, c.overG])).toEqual([
      ['ash', 600, 100],
      ['birch', 20, 0],
    ]);
    const byGrams = splitKit(kit, rules, { massGById, walkingRule: false });
    expect(byGrams?.overG).toBe(0);
  });

  it('owners carry their own items when the limits allow either way', () => {
    const rules: SplitRules = {
      carriers: [
        { memberId: 'ash', gramLimitG: null },
        { memberId: 'birch', gramLimitG: null },
      ],
      ownerByItemId: new Map([
        ['bank', 'ash'],
        ['bank-b', 'birch'],
      ]),
      walkingFeeds: [],
    };
    const split = splitKit(
      new Map([
        ['bank', 1],
        ['bank-b', 1],
      ]),
      rules,
      { massGById },
    );
    expect(split?.carriers.map((c) => c.lines.map((l) => l.itemId))).toEqual([['bank'], ['bank-b']]);
    expect(split?.lentUnits).toBe(0);
  });

  it('an empty kit splits into empty packs; no carriers is refused', () => {
    const split = splitKit(new Map(), { carriers, ownerByItemId: new Map(), walkingFeeds: [] }, { massGById });
    expect(split?.carriers.map((c) => c.massG)).toEqual([0, 0]);
    expect(split?.withinLimits).toBe(true);
    expect(() =>
      splitKit(new Map(), { carriers: [], ownerByItemId: new Map(), walkingFeeds: [] }, { massGById }),
    ).toThrow();
  });
});
