/** Source of the current time, injected so tests can move it (token expiry, timestamps). */
export interface Clock {
  now(): Date;
}

/** Injection token of the {@link Clock}. */
export const CLOCK = Symbol('CLOCK');

/** The wall clock. */
export const systemClock: Clock = { now: () => new Date() };
