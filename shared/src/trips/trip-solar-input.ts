import type { SkyPresetId } from '../sky/sky-presets.js';
import { type TripSolarInput, tripSolarInputSchema } from '../schemas/trip-solar.js';
import type { TripInput } from '../schemas/trips.js';
import { resolveTripSky } from './trip-sky.js';

/** The keys of the engine's sun/sky input, read from its schema so the two never drift apart. */
const solarInputKeys = Object.keys(tripSolarInputSchema.shape) as (keyof TripSolarInput)[];

/** What a validated trip body becomes once the time zone is known: the engine input and the sky's preset. */
export interface ResolvedTripInput {
  solarInput: TripSolarInput;
  skyPresetId: SkyPresetId | null;
}

/**
 * The exact `TripSolarInput` (for `computeTripSolar`) of a validated trip body, with the time zone the
 * body gave or the caller derived from the start point, and the sky from its preset or custom values.
 * @example
 * buildTripSolarInput(tripInputSchema.parse({ name: 'Tarn loop', latitudeDeg: 46.5, longitudeDeg: 8, startDate: '2026-07-01', nights: 4 }), 'Europe/Zurich')
 * // → { solarInput: { latitudeDeg: 46.5, ..., timeZone: 'Europe/Zurich', sky: { clearShare: 0.5, ... } }, skyPresetId: 'mixed' }
 */
export function buildTripSolarInput(input: TripInput, timeZone: string): ResolvedTripInput {
  const { sky, skyPresetId } = resolveTripSky(input.sky, input.skyPresetId);
  const picked: Record<string, unknown> = {};
  for (const key of solarInputKeys) picked[key] = input[key];
  picked.timeZone = timeZone;
  picked.sky = sky;
  return { solarInput: tripSolarInputSchema.parse(picked), skyPresetId };
}
