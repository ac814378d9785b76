import { z } from 'zod';
import { defaultReserveShare } from '../constants/electrical.js';
import type { SkyPresetId } from '../sky/sky-presets.js';
import { skyMatchesPreset, skyPresetValues } from '../trips/trip-sky.js';
import {
  defaultDailyHighC,
  defaultDailyLowC,
  maxTripGramLimitG,
  maxTripNameLength,
  maxTripNotesLength,
} from '../trips/trip-defaults.js';
import { apiFieldErrorSchema } from './api-error.js';
import {
  batteryShareUseProfileSchema,
  deviceSpecSchema,
  energyUseProfileSchema,
  radioUseProfileSchema,
  useProfileSchema,
} from './devices.js';
import { tripSkySchema, tripSolarInputSchema } from './trip-solar.js';

/**
 * The trip as members create, read and change it: the engine's sun/sky input (`tripSolarInputSchema`,
 * reused field for field) plus the trip's own fields (name, notes, sky preset, reserve, gram limit), its
 * members with their roles and gram limits, and its devices with their use profiles for this trip.
 */

/** Trip roles, from most to least rights: the leader edits and deletes, a partner adds own gear, a viewer reads. */
export const tripRoles = ['leader', 'partner', 'viewer'] as const;
export const tripRoleSchema = z.enum(tripRoles, { error: 'Role must be leader, partner or viewer' });
export type TripRole = z.infer<typeof tripRoleSchema>;

/** Ids of the sky presets (`skyPresets` in sky/sky-presets.ts holds their values and labels). */
export const skyPresetIds = ['open-sky', 'mixed', 'socked-in'] as const satisfies readonly SkyPresetId[];
export const skyPresetIdSchema = z.enum(skyPresetIds, { error: 'Sky preset must be open-sky, mixed or socked-in' });

/** A gram limit for carried power gear, whole grams, or null for no limit. */
export const gramLimitGSchema = z
  .number({ error: 'Gram limit must be a number of grams' })
  .int({ error: 'Gram limit is a whole number of grams' })
  .min(1, { error: `Gram limit must be between 1 and ${maxTripGramLimitG} g` })
  .max(maxTripGramLimitG, { error: `Gram limit must be between 1 and ${maxTripGramLimitG} g` })
  .nullable();

const solarShape = tripSolarInputSchema.shape;

function isPathKey(part: PropertyKey): part is string | number {
  return typeof part !== 'symbol';
}

function pathKey(path: readonly PropertyKey[]): string {
  return path.filter(isPathKey).join('.');
}

/**
 * Body of `POST /api/trips` and `PUT /api/trips/:id` (PUT replaces the trip: an omitted field takes its
 * default). Every field of `tripSolarInputSchema` with its validation, except that:
 * - `timeZone` may be left out: the server derives it from the start point;
 * - `sky` may be left out: it then comes from `skyPresetId` (default `mixed`); when both are given they
 *   must agree (pick a preset, or clear it to use your own values);
 * - `temperatures` default to a mild day (5 °C low, 20 °C high).
 * Trip fields: `name` (required), `notes`, `reserveShare` (0 to below 1, default `defaultReserveShare`), `gramLimitG` (null = none).
 *
 * @example
 * tripInputSchema.parse({ name: 'Tarn loop', latitudeDeg: 46.5, longitudeDeg: 8, startDate: '2026-07-01', nights: 4 });
 * // → { name: 'Tarn loop', notes: '', reserveShare: 0.2, gramLimitG: null, walkWindow: { start: '08:00', end: '16:00' }, ... }
 */
export const tripInputSchema = z
  .object({
    ...solarShape,
    name: z
      .string({ error: 'Name is required' })
      .trim()
      .min(1, { error: 'Name is required' })
      .max(maxTripNameLength, { error: `Name may have at most ${maxTripNameLength} characters` }),
    notes: z
      .string({ error: 'Notes must be text' })
      .max(maxTripNotesLength, { error: `Notes may have at most ${maxTripNotesLength} characters` })
      .default(''),
    timeZone: solarShape.timeZone.optional(),
    sky: tripSkySchema.optional(),
    skyPresetId: skyPresetIdSchema.nullable().optional(),
    temperatures: solarShape.temperatures.default({ lowC: defaultDailyLowC, highC: defaultDailyHighC }),
    reserveShare: z
      .number({ error: 'Reserve share must be a number' })
      .min(0, { error: 'Reserve share must be at least 0 and below 1' })
      .lt(1, { error: 'Reserve share must be at least 0 and below 1' })
      .default(defaultReserveShare),
    gramLimitG: gramLimitGSchema.default(null),
  })
  .superRefine((trip, ctx) => {
    if (trip.sky && trip.skyPresetId && !skyMatchesPreset(trip.sky, trip.skyPresetId)) {
      ctx.addIssue({
        code: 'custom',
        path: ['sky'],
        message: 'These sky values are not the chosen preset: clear the preset to use your own values',
      });
    }
    // The sun/sky schema's own cross-field checks (a bearing per day, low ≤ high) run by parsing with it;
    // a missing zone or sky is stood in for here (the server fills them), and a field that already has an
    // issue from the shape above is not reported twice.
    const seen = new Set(ctx.issues.map((issue) => pathKey(issue.path ?? [])));
    const solar = tripSolarInputSchema.safeParse({
      ...trip,
      timeZone: trip.timeZone ?? 'UTC',
      sky: trip.sky ?? (trip.skyPresetId ? skyPresetValues(trip.skyPresetId) : undefined),
    });
    for (const issue of solar.error?.issues ?? []) {
      if (!seen.has(pathKey(issue.path))) {
        ctx.addIssue({ code: 'custom', path: issue.path.filter(isPathKey), message: issue.message });
      }
    }
  });
/** What a client sends (defaults optional). */
export type TripInputDraft = z.input<typeof tripInputSchema>;
/** A validated trip body with defaults applied (`timeZone` and `sky` may still be absent). */
export type TripInput = z.output<typeof tripInputSchema>;

/** Use-profile bases, as in `useProfileSchema`. */
export const useProfileBases = ['radio-hours', 'battery-share', 'energy'] as const;
export type UseProfileBasis = (typeof useProfileBases)[number];

/**
 * A trip's change to a device's locker use profile. Every field is optional and falls back, field by
 * field, to the locker default; a `basis` other than the default's must come with every field of that
 * basis (see `mergeUseProfile`). Unknown fields are refused.
 * @example useProfileOverrideSchema.parse({ transmitMinutesPerDay: 30 }) // { transmitMinutesPerDay: 30 }
 */
export const useProfileOverrideSchema = z.strictObject(
  {
    basis: z
      .enum(useProfileBases, { error: 'Use profile basis must be radio-hours, battery-share or energy' })
      .optional(),
    transmitMinutesPerDay: radioUseProfileSchema.shape.transmitMinutesPerDay.optional(),
    receiveHoursPerDay: radioUseProfileSchema.shape.receiveHoursPerDay.optional(),
    standbyHoursPerDay: radioUseProfileSchema.shape.standbyHoursPerDay.optional(),
    batterySharePerDay: batteryShareUseProfileSchema.shape.batterySharePerDay.optional(),
    energyWhPerDay: energyUseProfileSchema.shape.energyWhPerDay.optional(),
  },
  { error: 'Not a use-profile field' },
);
export type UseProfileOverride = z.infer<typeof useProfileOverrideSchema>;
/** A use-profile field a trip can override. */
export type UseProfileField = Exclude<keyof UseProfileOverride, 'basis'>;

const accountIdSchema = z.uuid({ error: 'Not an account id' });

/** Body of `POST /api/trips/:id/devices`: one of the caller's locker devices, its override and its carrier (default: its owner). */
export const tripDeviceAddSchema = z.object({
  itemId: z.uuid({ error: 'Not a locker item id' }),
  useProfileOverride: useProfileOverrideSchema.nullable().default(null),
  carrierAccountId: accountIdSchema.optional(),
});
export type TripDeviceAdd = z.infer<typeof tripDeviceAddSchema>;

/**
 * Body of `PATCH /api/trips/:id/devices/:deviceId`. An absent field is left as it is;
 * `useProfileOverride: null` clears the override (the locker default applies again in full). A given
 * override replaces the stored one whole.
 */
export const tripDeviceUpdateSchema = z.object({
  useProfileOverride: useProfileOverrideSchema.nullable().optional(),
  carrierAccountId: accountIdSchema.optional(),
});
export type TripDeviceUpdate = z.infer<typeof tripDeviceUpdateSchema>;

/** A person on a trip: their role and their own gram limit for carried power gear. */
export const tripMemberSchema = z.object({
  accountId: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: tripRoleSchema,
  gramLimitG: gramLimitGSchema,
  joinedAt: z.iso.datetime(),
});
export type TripMember = z.infer<typeof tripMemberSchema>;

/**
 * A device on a trip. `spec` is the locker item's spec (its `useProfile` is the locker default, also in
 * `defaultUseProfile`); `useProfile` is the effective one for this trip (the override merged over the
 * default, field by field); `overriddenFields` names the fields the trip changes. When the override no
 * longer fits a changed locker default, `overrideIssues` says why and the default applies.
 */
export const tripDeviceDetailSchema = z.object({
  id: z.uuid(),
  itemId: z.uuid(),
  name: z.string(),
  notes: z.string(),
  /** Grams of the device (carried anyway; not part of a kit's grams). */
  massG: z.number().int(),
  ownerAccountId: z.uuid(),
  carrierAccountId: z.uuid(),
  spec: deviceSpecSchema,
  defaultUseProfile: useProfileSchema,
  useProfileOverride: useProfileOverrideSchema.nullable(),
  useProfile: useProfileSchema,
  overriddenFields: z.array(z.string()),
  overrideIssues: z.array(apiFieldErrorSchema),
  createdAt: z.iso.datetime(),
  /** When the device's part of the trip last changed: its override or carrier, or its locker item's spec (not its name or notes). */
  updatedAt: z.iso.datetime(),
});
export type TripDeviceDetail = z.infer<typeof tripDeviceDetailSchema>;

/** Where a trip stands against today's date at its place: before it, during it, or after its last day. */
export const tripPhases = ['upcoming', 'ongoing', 'past'] as const;
export const tripPhaseSchema = z.enum(tripPhases);
export type TripPhase = z.infer<typeof tripPhaseSchema>;

const tripOwnFields = {
  id: z.uuid(),
  name: z.string(),
  notes: z.string(),
  skyPresetId: skyPresetIdSchema.nullable(),
  reserveShare: z.number(),
  gramLimitG: gramLimitGSchema,
  /** Whether the server derived `timeZone` from the start point (none was given). */
  timeZoneDerived: z.boolean(),
  /** Date of the last trip day (start date + nights), `YYYY-MM-DD`. */
  endDate: z.string(),
  phase: tripPhaseSchema,
  /** The caller's role on this trip. */
  myRole: tripRoleSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
};

/**
 * A trip as `GET /api/trips/:id` answers it: every input field with its stored value (so a form can PUT
 * it back), the members, the devices with effective use profiles, and `solarInput`, the exact
 * `TripSolarInput` that `computeTripSolar` takes.
 */
export const tripSchema = tripSolarInputSchema.extend({
  ...tripOwnFields,
  members: z.array(tripMemberSchema),
  devices: z.array(tripDeviceDetailSchema),
  solarInput: tripSolarInputSchema,
});
export type Trip = z.infer<typeof tripSchema>;

/** A line of the trip list. */
export const tripSummarySchema = z.object({
  ...tripOwnFields,
  startDate: z.string(),
  nights: z.number().int(),
  latitudeDeg: z.number(),
  longitudeDeg: z.number(),
  timeZone: z.string(),
  memberCount: z.number().int(),
  deviceCount: z.number().int(),
});
export type TripSummary = z.infer<typeof tripSummarySchema>;

/** `{ trip }`. */
export const tripResponseSchema = z.object({ trip: tripSchema });
/** `{ trips }`: upcoming and ongoing trips first (soonest first), then past trips (latest first). */
export const tripListResponseSchema = z.object({ trips: z.array(tripSummarySchema) });
/** `{ members }`. */
export const tripMemberListResponseSchema = z.object({ members: z.array(tripMemberSchema) });
/** `{ device }`. */
export const tripDeviceResponseSchema = z.object({ device: tripDeviceDetailSchema });
/** `{ devices }`. */
export const tripDeviceListResponseSchema = z.object({ devices: z.array(tripDeviceDetailSchema) });
