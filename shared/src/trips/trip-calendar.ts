import type { TripPhase } from '../schemas/trips.js';
import { addDaysIso, parseIsoDate } from '../sun/zone-clock.js';

/** The dates a trip covers: N nights make N + 1 days. */
export interface TripDates {
  /** First trip day, `YYYY-MM-DD` (local to the trip). */
  startDate: string;
  /** Nights, ≥ 1. */
  nights: number;
}

/**
 * Date of the last trip day, `YYYY-MM-DD`: start date + nights (a trip of N nights has N + 1 days).
 * @example tripEndDate({ startDate: '2026-12-30', nights: 3 }) // '2027-01-02'
 */
export function tripEndDate(trip: TripDates): string {
  const start = parseIsoDate(trip.startDate);
  if (!start) throw new Error(`Not a date: ${trip.startDate}`);
  return addDaysIso(start, trip.nights);
}

/**
 * Where a trip stands on `today` (the date at the trip's place, `YYYY-MM-DD`; shared has no clock, so the
 * caller passes it): upcoming before its first day, ongoing through its last day, past after it.
 * @example tripPhase({ startDate: '2026-07-01', nights: 4 }, '2026-07-05') // 'ongoing'
 */
export function tripPhase(trip: TripDates, today: string): TripPhase {
  if (today < trip.startDate) return 'upcoming';
  if (today <= tripEndDate(trip)) return 'ongoing';
  return 'past';
}

/** A trip as the list orders it. */
export interface ListedTrip extends TripDates {
  phase: TripPhase;
  name: string;
}

/**
 * Order of the trip list: ongoing and upcoming trips first, soonest start first; then past trips, latest
 * start first; ties by name. Use with `Array.prototype.sort`.
 * @example [past, upcoming].sort(compareTripsForList) // [upcoming, past]
 */
export function compareTripsForList(a: ListedTrip, b: ListedTrip): number {
  const aPast = a.phase === 'past';
  const bPast = b.phase === 'past';
  if (aPast !== bPast) return aPast ? 1 : -1;
  if (a.startDate !== b.startDate) {
    const earlierFirst = a.startDate < b.startDate ? -1 : 1;
    return aPast ? -earlierFirst : earlierFirst;
  }
  return a.name.localeCompare(b.name);
}
