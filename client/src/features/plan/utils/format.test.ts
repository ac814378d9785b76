import { describe, expect, it } from 'vitest';
import { dayLabel, formatGrams, formatHours, formatPercent, formatShortDate, formatWh, kindLabel } from './format';

describe('formatWh', () => {
  it('keeps one decimal below 10 Wh and whole Wh above, with a plain 0 for nothing', () => {
    expect(formatWh(4.86)).toBe('4.9 Wh');
    expect(formatWh(9.94)).toBe('9.9 Wh');
    expect(formatWh(10.4)).toBe('10 Wh');
    expect(formatWh(1333.4)).toBe('1,333 Wh');
    expect(formatWh(0.04)).toBe('0 Wh');
    expect(formatWh(-0.02)).toBe('0 Wh');
    expect(formatWh(-3.25)).toBe('-3.3 Wh');
  });
});

describe('the other figures', () => {
  it('carry their units and count days from 1', () => {
    expect(formatGrams(1283.4)).toBe('1,283 g');
    expect(formatPercent(0.8834)).toBe('88 %');
    expect(formatHours(3)).toBe('3 h');
    expect(formatHours(1.5)).toBe('1.5 h');
    expect(dayLabel(0)).toBe('Day 1');
    expect(kindLabel('controller')).toBe('Controller');
    expect(kindLabel('sled')).toBe('Sled');
  });

  it('reads a local date without shifting it by the reader’s time zone', () => {
    expect(formatShortDate('2026-12-23')).toBe('Wed 23 Dec');
    expect(formatShortDate('not a date')).toBe('not a date');
  });
});
