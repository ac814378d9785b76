import { describe, expect, it } from 'vitest';
import { compareTripsForList, type ListedTrip, tripEndDate, tripPhase } from './trip-calendar.js';

describe('tripEndDate', () => {
  // Calendar rules of the proleptic Gregorian calendar (ISO 8601:2019, clause 4.3.2.1: leap years are
  // divisible by 4, except centuries not divisible by 400).
  it('adds nights across a month, a year end and a leap day', () => {
    expect(tripEndDate({ startDate: '2026-07-01', nights: 4 })).toBe('2026-07-05');
    expect(tripEndDate({ startDate: '2026-12-30', nights: 3 })).toBe('2027-01-02');
    expect(tripEndDate({ startDate: '2028-02-27', nights: 2 })).toBe('2028-02-29');
    expect(tripEndDate({ startDate: '2100-02-28', nights: 1 })).toBe('2100-03-01');
  });
});

describe('tripPhase', () => {
  const trip = { startDate: '2026-07-01', nights: 4 };
  it('is upcoming before the first day, ongoing through the last day (N nights = N + 1 days), then past', () => {
    expect(tripPhase(trip, '2026-06-30')).toBe('upcoming');
    expect(tripPhase(trip, '2026-07-01')).toBe('ongoing');
    expect(tripPhase(trip, '2026-07-05')).toBe('ongoing');
    expect(tripPhase(trip, '2026-07-06')).toBe('past');
  });
});

describe('compareTripsForList', () => {
  const listed = (name: string, startDate: string, phase: ListedTrip['phase']): ListedTrip => ({
    name,
    startDate,
    nights: 2,
    phase,
  });
  it('puts ongoing and upcoming trips first, soonest first, then past trips, latest first', () => {
    const trips = [
      listed('old', '2025-01-01', 'past'),
      listed('later', '2026-09-01', 'upcoming'),
      listed('recent', '2026-05-01', 'past'),
      listed('now', '2026-05-30', 'ongoing'),
      listed('soon', '2026-06-10', 'upcoming'),
    ];
    expect(trips.sort(compareTripsForList).map((trip) => trip.name)).toEqual(['now', 'soon', 'later', 'recent', 'old']);
  });
});
