import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatDate, formatPlace } from './format';

describe('formatDate', () => {
  it('writes a calendar date with day, short month and year', () => {
    expect(formatDate('2027-03-10')).toBe('10 Mar 2027');
  });

  it('keeps the calendar day whatever the reader’s time zone (no shift at the year’s edges)', () => {
    expect(formatDate('2026-12-31')).toBe('31 Dec 2026');
    expect(formatDate('2027-01-01')).toBe('1 Jan 2027');
  });

  it('hands back text that is not a date unchanged', () => {
    expect(formatDate('soon')).toBe('soon');
  });

  it('shows the day, month and year it was given, for any date', () => {
    const shortMonths = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sept', 'Oct', 'Nov', 'Dec'];
    fc.assert(
      fc.property(
        fc.date({ min: new Date('1970-01-01'), max: new Date('2099-12-31'), noInvalidDate: true }),
        (date) => {
          const isoDate = date.toISOString().slice(0, 10);
          expect(formatDate(isoDate)).toBe(
            `${date.getUTCDate()} ${shortMonths[date.getUTCMonth()]} ${date.getUTCFullYear()}`,
          );
        },
      ),
    );
  });
});

describe('formatPlace', () => {
  it('names the hemispheres from the signs', () => {
    expect(formatPlace(61.2034, 9.8012)).toBe('61.2034° N, 9.8012° E');
    expect(formatPlace(-33.5, -70.25)).toBe('33.5000° S, 70.2500° W');
  });
});
