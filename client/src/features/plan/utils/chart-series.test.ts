import { describe, expect, it } from 'vitest';
import { buildEvaluation } from '@/testing/plan-data';
import { dayStartMinutes, elapsedLabel, niceTicks, storedRows, sunPeak, sunRows } from './chart-series';

describe('storedRows', () => {
  const evaluation = buildEvaluation();

  it('starts each sky at the ledger’s stored energy at the start of day 1, then follows its hourly series', () => {
    const rows = storedRows(evaluation);
    expect(rows[0]).toEqual({ elapsedH: 0, 'cloudy-end': 150, expected: 150 });
    expect(rows).toHaveLength(6 * 24 + 1);
    const last = rows.at(-1);
    expect(last?.elapsedH).toBe(144);
    expect(last?.['cloudy-end']).toBeCloseTo(33, 0);
  });

  it('has the hours in order and every sky on every row', () => {
    const rows = storedRows(evaluation);
    rows.slice(1).forEach((row, i) => {
      expect(row.elapsedH).toBeGreaterThan(rows[i]?.elapsedH ?? -1);
      expect(row.expected).toBeTypeOf('number');
    });
  });

  it('labels a point with its trip day and local clock', () => {
    const start = dayStartMinutes(evaluation);
    expect(start).toBe(8 * 60 + 30);
    expect(elapsedLabel(0, start)).toBe('Day 1, 08:30');
    expect(elapsedLabel(30, start)).toBe('Day 2, 14:30');
    expect(elapsedLabel(30, null)).toBe('Day 2');
  });
});

describe('sun paths', () => {
  it('orders a trip day’s points by the local clock and finds the highest', () => {
    const [first] = buildEvaluation().sunPaths;
    if (!first) throw new Error('the fixture has a first day');
    const rows = sunRows(first);
    expect(rows[0]?.minutes).toBe(30);
    expect(rows.every((r, i) => i === 0 || r.minutes > (rows[i - 1]?.minutes ?? 0))).toBe(true);
    expect(sunPeak(first)?.altitudeDeg).toBeGreaterThan(70);
  });
});

describe('niceTicks', () => {
  it('steps by 1, 2, 2.5 or 5 times a power of ten from 0 past the largest value', () => {
    expect(niceTicks(204)).toEqual([0, 50, 100, 150, 200, 250]);
    expect(niceTicks(33)).toEqual([0, 10, 20, 30, 40]);
    expect(niceTicks(4.2)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(niceTicks(0)).toEqual([0, 1]);
  });
});
