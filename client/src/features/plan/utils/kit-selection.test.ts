import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sameSelection } from './kit-selection';

const lines = fc.uniqueArray(
  fc.record({ itemId: fc.constantFrom('a', 'b', 'c', 'd', 'e'), count: fc.integer({ min: 1, max: 4 }) }),
  { selector: (l) => l.itemId },
);

describe('sameSelection', () => {
  it('ignores the order of the lines', () => {
    fc.assert(fc.property(lines, (kit) => sameSelection(kit, [...kit].reverse())));
  });

  it('tells kits apart by any count', () => {
    fc.assert(
      fc.property(
        lines.filter((kit) => kit.length > 0),
        fc.nat(),
        (kit, pick) => {
          const i = pick % kit.length;
          const changed = kit.map((l, j) => (j === i ? { ...l, count: l.count + 1 } : l));
          expect(sameSelection(kit, changed)).toBe(false);
        },
      ),
    );
  });

  it('treats a line of none as no line', () => {
    expect(
      sameSelection(
        [{ itemId: 'a', count: 1 }],
        [
          { itemId: 'a', count: 1 },
          { itemId: 'b', count: 0 },
        ],
      ),
    ).toBe(true);
    expect(sameSelection([{ itemId: 'a', count: 1 }], [{ itemId: 'b', count: 1 }])).toBe(false);
  });
});
