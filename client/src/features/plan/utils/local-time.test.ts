import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clockTime, localEnd, minutesOfDay } from './local-time';

describe('local clock times', () => {
  it('ends a camp top-up the next morning', () => {
    expect(localEnd('16:00', '2026-12-23T14:00:00.000Z', '2026-12-24T06:30:00.000Z')).toEqual({
      time: '08:30',
      daysLater: 1,
    });
    expect(localEnd('08:30', '2026-12-24T06:30:00.000Z', '2026-12-24T12:30:00.000Z')).toEqual({
      time: '14:30',
      daysLater: 0,
    });
  });

  it('round-trips every minute of the day', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 24 * 60 - 1 }), (minutes) => {
        expect(minutesOfDay(clockTime(minutes))).toBe(minutes);
      }),
    );
  });

  it('wraps past midnight', () => {
    expect(clockTime(24 * 60 + 30)).toBe('00:30');
    expect(clockTime(-30)).toBe('23:30');
  });
});
