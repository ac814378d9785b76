/**
 * The party plan's own pieces by hand: which banks a panel can fill while walking, and a party plan's carriers. The
 * gear is invented (testing/fixtures.ts); the checks follow the hop rule and the carrier rule as stated, nothing more.
 */
import { describe, expect, it } from 'vitest';
import { testBank, testLead, testUsbPanel } from '../testing/fixtures.js';
import { randomPlanningInput } from './invented-trips.js';
import { seededRandom } from '../optimisation/synthetic-problem.js';
import type { PlanningGear } from './planning-input.js';
import { planParty, walkingFeedsOf } from './plan-party.js';

const gear = (itemId: string, spec: PlanningGear['spec'], countOwned = 1): PlanningGear => ({
  itemId,
  name: itemId,
  countOwned,
  massG: spec.massG,
  spec,
});

describe('walkingFeedsOf', () => {
  it('a panel fills a bank its captive plug fits directly, and another only through a lead with the right ends', () => {
    const panel = testUsbPanel({ outputPort: { connector: 'usb-c', captiveCable: true } });
    const socketC = testBank({ inputPort: { connector: 'usb-c', captiveCable: false } });
    const socketMicro = testBank({ inputPort: { connector: 'micro-usb', captiveCable: false } });
    const feeds = walkingFeedsOf([
      gear('panel', panel),
      gear('bank-c', socketC),
      gear('bank-micro', socketMicro),
      gear('lead-c-micro', testLead('usb-c', 'micro-usb')),
      gear('lead-a-c', testLead('usb-a', 'usb-c')),
    ]);
    expect(feeds).toEqual([
      {
        panelItemId: 'panel',
        alternatives: [{ itemIds: ['bank-c'] }, { itemIds: ['bank-micro', 'lead-c-micro'] }],
      },
    ]);
  });

  it('a panel with no bank it can reach has no alternatives; gear not owned is left out', () => {
    const panel = testUsbPanel({ outputPort: { connector: 'usb-a', captiveCable: false } });
    const feeds = walkingFeedsOf([gear('panel', panel), gear('bank', testBank(), 0)]);
    expect(feeds).toEqual([{ panelItemId: 'panel', alternatives: [] }]);
  });
});

describe('planParty', () => {
  it('carries every unit of the kit and of each swap exactly once, one line set per carrier, in member order', () => {
    // Seed 3 of the generator: a pool that keeps its devices charged, with swaps to carry too.
    const input = randomPlanningInput(seededRandom(3), { itemTypes: 5 });
    const party = {
      members: [
        { memberId: 'wren', name: 'Wren', gramLimitG: null },
        { memberId: 'tamsin', name: 'Tamsin', gramLimitG: 400 },
      ],
      ownerByItemId: Object.fromEntries(input.gear.map((g, i) => [g.itemId, i % 2 === 0 ? 'wren' : 'tamsin'])),
    };
    const plan = planParty(input, party);
    expect(plan.swaps.length).toBeGreaterThan(0);
    for (const kit of [plan.kit, ...plan.swaps.map((s) => s.kit)]) {
      expect(kit?.carriers?.map((c) => c.name)).toEqual(['Wren', 'Tamsin']);
      const carried = new Map<string, number>();
      for (const c of kit?.carriers ?? [])
        for (const l of c.lines) carried.set(l.itemId, (carried.get(l.itemId) ?? 0) + l.count);
      expect(Object.fromEntries(carried)).toEqual(
        Object.fromEntries((kit?.lines ?? []).map((l) => [l.itemId, l.count])),
      );
      expect((kit?.carriers ?? []).reduce((g, c) => g + c.massG, 0)).toBe(kit?.massG);
    }
    // Wren has no limit, so the party's kit always fits: it is the optimum, and Tamsin stays within 400 g.
    expect(plan.status).toBe('optimal');
    expect(plan.kit?.carriers?.[1]?.massG).toBeLessThanOrEqual(400);
    expect(plan.headline).toMatch(/share within everyone’s limits/);
  });

  it('refuses a party with nobody to carry', () => {
    const input = randomPlanningInput(seededRandom(5));
    expect(() => planParty(input, { members: [], ownerByItemId: {} })).toThrow();
  });
});
