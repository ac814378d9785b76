import { z } from 'zod';
import { maxTripNights } from '../constants/limits.js';
import { defaultGroundAlbedo, defaultLinkeTurbidity } from '../constants/solar.js';
import { isValidCloudChain, minCloudyPersistence } from '../sky/cloud-chain.js';
import { skyPresets } from '../sky/sky-presets.js';
import { isValidTimeZone, parseClockMinutes, parseIsoDate } from '../sun/zone-clock.js';

/** A finite number with a field-level message (zod 4 rejects NaN and ±Infinity for `z.number()`). */
function finiteNumber(label: string, min: number, max: number, unit = '') {
  const range = `${min}${unit} to ${max}${unit}`;
  return z
    .number({ error: `${label} must be a number` })
    .min(min, { error: `${label} must be between ${range}` })
    .max(max, { error: `${label} must be between ${range}` });
}

function share(label: string) {
  return finiteNumber(label, 0, 1);
}

const clockTimeSchema = z
  .string({ error: 'Time must be written HH:mm' })
  .refine((text) => parseClockMinutes(text) !== null, { error: 'Time must be written HH:mm (00:00–23:59)' });

function windowSchema(label: string, start: string, end: string) {
  return z
    .object({ start: clockTimeSchema, end: clockTimeSchema })
    .refine((w) => w.start !== w.end, { error: `${label} must not be zero length`, path: ['end'] })
    .default({ start, end });
}

/** Carry mode while walking: strapped to the pack facing behind, or stowed (no harvest). */
export const walkingCarrySchema = z.enum(['pack', 'stowed'], { error: 'Walking carry must be pack or stowed' });
/** Carry mode at camp: propped and re-aimed, lying flat, or stowed (no harvest). */
export const campCarrySchema = z.enum(['propped', 'flat', 'stowed'], {
  error: 'Camp carry must be propped, flat or stowed',
});

function presetValues(id: string) {
  const preset = skyPresets.find((candidate) => candidate.id === id);
  if (!preset) throw new Error(`Missing sky preset ${id}`);
  return preset.values;
}

const mixedSky = presetValues('mixed');

const isShare = (value: unknown): value is number =>
  typeof value === 'number' && Number.isFinite(value) && value >= 0 && value <= 1;

/** The trip's sky: the two-state cloud chain, what a cloudy day lets through, canopy shade, design likelihood. */
export const tripSkySchema = z
  .object({
    clearShare: share('Clear-day share'),
    cloudyPersistence: share('Cloudy persistence'),
    cloudyTransmission: share('Cloudy-day transmission'),
    canopyShade: share('Canopy shade'),
    designLikelihood: share('Design likelihood'),
  })
  // A share outside 0–1 already has its own error; the chain bound speaks only about valid shares.
  .refine(
    (sky) =>
      !(isShare(sky.clearShare) && isShare(sky.cloudyPersistence)) ||
      isValidCloudChain(sky.clearShare, sky.cloudyPersistence),
    {
      path: ['cloudyPersistence'],
      error: (issue) => {
        const sky = issue.input as { clearShare?: number } | undefined;
        const min = minCloudyPersistence(sky?.clearShare ?? 0);
        return `With this clear-day share, cloudy persistence must be at least ${min.toFixed(3)}`;
      },
    },
  );

const dailyTempSchema = z.union([
  finiteNumber('Temperature', -70, 60, ' °C'),
  z.array(finiteNumber('Temperature', -70, 60, ' °C'), { error: 'Temperatures must be a number or a list of numbers' }),
]);

/**
 * Everything the sun, sky and temperature models need from a trip. Defaults: walking window 08:00–16:00,
 * camp window 16:00–08:00, bearings unknown (null), pack / propped, re-aim every 2 h, the "mixed" sky
 * preset, ground albedo 0.2, hourly steps, sea level, Linke turbidity 3.
 * @example tripSolarInputSchema.parse({ latitudeDeg: 46.5, longitudeDeg: 8, timeZone: 'Europe/Zurich', startDate: '2026-07-01', nights: 4, temperatures: { lowC: 5, highC: 18 } })
 */
export const tripSolarInputSchema = z
  .object({
    latitudeDeg: finiteNumber('Latitude', -90, 90, '°'),
    longitudeDeg: finiteNumber('Longitude', -180, 180, '°'),
    timeZone: z
      .string({ error: 'Time zone is required' })
      .refine(isValidTimeZone, { error: 'Unknown time zone: use an IANA name such as Europe/Oslo' }),
    startDate: z
      .string({ error: 'Start date is required' })
      .refine((text) => parseIsoDate(text) !== null, { error: 'Start date must be a real date written YYYY-MM-DD' }),
    nights: z
      .number({ error: 'Nights must be a number' })
      .int({ error: 'Nights must be a whole number' })
      .min(1, { error: `Nights must be between 1 and ${maxTripNights}` })
      .max(maxTripNights, { error: `Nights must be between 1 and ${maxTripNights}` }),
    walkWindow: windowSchema('Walking window', '08:00', '16:00'),
    campWindow: windowSchema('Camp window', '16:00', '08:00'),
    walkingBearingsDeg: z
      .array(finiteNumber('Bearing', -360, 360, '°'), { error: 'Bearings must be a list of degrees or null' })
      .nullable()
      .default(null),
    carry: z
      .object({ walking: walkingCarrySchema.default('pack'), camp: campCarrySchema.default('propped') })
      .default({ walking: 'pack', camp: 'propped' }),
    reaimEveryH: finiteNumber('Re-aim interval', 0.25, 24, ' h').default(2),
    sky: tripSkySchema.default({ ...mixedSky }),
    temperatures: z.object({ lowC: dailyTempSchema, highC: dailyTempSchema }, { error: 'Temperatures are required' }),
    groundAlbedo: share('Ground albedo').default(defaultGroundAlbedo),
    stepMinutes: z
      .union([z.literal(15), z.literal(30), z.literal(60)], { error: 'Step must be 15, 30 or 60 minutes' })
      .default(60),
    elevationM: finiteNumber('Elevation', -500, 9000, ' m').default(0),
    linkeTurbidity: finiteNumber('Linke turbidity', 1, 10).default(defaultLinkeTurbidity),
  })
  .superRefine((trip, ctx) => {
    const days = trip.nights + 1;
    const bearings = trip.walkingBearingsDeg;
    if (bearings !== null && bearings.length !== 1 && bearings.length !== days) {
      ctx.addIssue({
        code: 'custom',
        path: ['walkingBearingsDeg'],
        message: `Give one bearing for the whole trip or one per day (${days})`,
      });
    }
    const { lowC, highC } = trip.temperatures;
    for (const [key, value] of [
      ['lowC', lowC],
      ['highC', highC],
    ] as const) {
      if (Array.isArray(value) && value.length !== days) {
        ctx.addIssue({
          code: 'custom',
          path: ['temperatures', key],
          message: `Give one temperature for the whole trip or one per day (${days})`,
        });
        return;
      }
    }
    for (let day = 0; day < days; day++) {
      const low = Array.isArray(lowC) ? lowC[day] : lowC;
      const high = Array.isArray(highC) ? highC[day] : highC;
      if (low !== undefined && high !== undefined && low > high) {
        ctx.addIssue({
          code: 'custom',
          path: Array.isArray(lowC) ? ['temperatures', 'lowC', day] : ['temperatures', 'lowC'],
          message: 'Daily low must not be above the daily high',
        });
        return;
      }
    }
  });

/** A trip's sun, sky and temperature input after defaults are filled in. */
export type TripSolarInput = z.output<typeof tripSolarInputSchema>;
/** A trip's sun, sky and temperature input as a client sends it (defaults optional). */
export type TripSolarInputDraft = z.input<typeof tripSolarInputSchema>;
/** The sky fields of a trip. */
export type TripSky = z.output<typeof tripSkySchema>;
