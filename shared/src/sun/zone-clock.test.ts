import { describe, expect, it } from 'vitest';
import {
  SpanOffsets,
  addDaysIso,
  isValidTimeZone,
  localToUtcMs,
  parseClockMinutes,
  parseIsoDate,
  utcToLocalClock,
  zoneOffsetMinutes,
} from './zone-clock.js';

// Offsets and change dates are those of the IANA tz database (EU rule: last Sunday of March and October at
// 01:00 UTC; New Zealand: last Sunday of September, first Sunday of April at 02:00/03:00 local).

describe('zone offsets', () => {
  it('reads standard and summer offsets', () => {
    expect(zoneOffsetMinutes(Date.UTC(2026, 0, 15), 'Europe/Berlin')).toBe(60);
    expect(zoneOffsetMinutes(Date.UTC(2026, 6, 15), 'Europe/Berlin')).toBe(120);
    expect(zoneOffsetMinutes(Date.UTC(2026, 6, 15), 'America/Denver')).toBe(-360);
    expect(zoneOffsetMinutes(Date.UTC(2026, 0, 15), 'Pacific/Auckland')).toBe(780);
    expect(zoneOffsetMinutes(Date.UTC(2026, 0, 15), 'Asia/Kathmandu')).toBe(345);
  });

  it('rejects unknown zones', () => {
    expect(isValidTimeZone('Europe/Berlin')).toBe(true);
    expect(isValidTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isValidTimeZone('')).toBe(false);
  });
});

describe('localToUtcMs', () => {
  it('converts ordinary local times', () => {
    expect(localToUtcMs({ year: 2026, month: 1, day: 15 }, 8 * 60, 'Europe/Berlin')).toBe(Date.UTC(2026, 0, 15, 7));
    expect(localToUtcMs({ year: 2026, month: 7, day: 1 }, 8 * 60, 'America/Denver')).toBe(Date.UTC(2026, 6, 1, 14));
  });

  it('resolves a time inside the spring-forward gap past the gap (29 March 2026, 02:30 in Berlin)', () => {
    expect(localToUtcMs({ year: 2026, month: 3, day: 29 }, 150, 'Europe/Berlin')).toBe(Date.UTC(2026, 2, 29, 1, 30));
  });

  it('resolves a repeated fall-back time to its first occurrence (25 October 2026, 02:30 in Berlin)', () => {
    expect(localToUtcMs({ year: 2026, month: 10, day: 25 }, 150, 'Europe/Berlin')).toBe(Date.UTC(2026, 9, 25, 0, 30));
  });

  it('round-trips through utcToLocalClock', () => {
    for (const zone of ['Europe/Berlin', 'America/Santiago', 'Pacific/Auckland', 'Pacific/Kiritimati']) {
      for (let day = 1; day < 28; day += 3) {
        const utc = localToUtcMs({ year: 2026, month: 4, day }, 9 * 60 + 15, zone);
        expect(utcToLocalClock(utc, zone)).toMatchObject({
          time: '09:15',
          date: `2026-04-${String(day).padStart(2, '0')}`,
        });
      }
    }
  });
});

describe('SpanOffsets', () => {
  it('finds the DST change inside a day to the minute', () => {
    const start = Date.UTC(2026, 2, 28, 7);
    const end = Date.UTC(2026, 2, 29, 6);
    const span = new SpanOffsets(start, end, 'Europe/Berlin');
    expect(span.changeUtcMs).toBe(Date.UTC(2026, 2, 29, 1));
    expect(span.offsetAt(Date.UTC(2026, 2, 29, 0, 59))).toBe(60);
    expect(span.offsetAt(Date.UTC(2026, 2, 29, 1))).toBe(120);
  });
});

describe('date and clock parsing', () => {
  it('accepts real dates and clock times only', () => {
    expect(parseIsoDate('2028-02-29')).toEqual({ year: 2028, month: 2, day: 29 });
    expect(parseIsoDate('2026-02-29')).toBeNull();
    expect(parseIsoDate('26-2-1')).toBeNull();
    expect(parseClockMinutes('23:59')).toBe(1439);
    expect(parseClockMinutes('24:00')).toBeNull();
    expect(parseClockMinutes('7:00')).toBeNull();
    expect(addDaysIso({ year: 2026, month: 12, day: 31 }, 1)).toBe('2027-01-01');
  });
});
