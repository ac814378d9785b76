import type { DeviceKind, UseProfile } from '../schemas/devices.js';
import { useProfileSchema } from '../schemas/devices.js';
import type { UseProfileBasis, UseProfileField, UseProfileOverride } from '../schemas/trips.js';

/** The fields of each use-profile basis (besides `basis` itself). */
export const useProfileFieldsByBasis = {
  'radio-hours': ['transmitMinutesPerDay', 'receiveHoursPerDay', 'standbyHoursPerDay'],
  'battery-share': ['batterySharePerDay'],
  energy: ['energyWhPerDay'],
} as const satisfies Record<UseProfileBasis, readonly UseProfileField[]>;

/** One reason an override cannot be merged; `path` is relative to the override (`['transmitMinutesPerDay']`). */
export interface UseProfileMergeIssue {
  path: (string | number)[];
  message: string;
}

/** The effective use profile and which fields the trip changed, or why the override does not fit. */
export type UseProfileMergeResult =
  | { ok: true; useProfile: UseProfile; overriddenFields: (UseProfileField | 'basis')[] }
  | { ok: false; issues: UseProfileMergeIssue[] };

export interface MergeUseProfileOptions {
  /** The device's kind: transmit/receive hours are for radios only. Unchecked when absent. */
  deviceKind?: DeviceKind;
}

const allFields = Object.values(useProfileFieldsByBasis).flat() as UseProfileField[];

/**
 * A device's use profile for one trip: the trip's override laid over the locker default field by field
 * (a field the override leaves out keeps the default's value). An override whose `basis` differs from the
 * default's replaces the profile, so it must give every field of its basis. The result is checked
 * against `useProfileSchema` (e.g. a radio's transmit, receive and standby time fit in 24 h).
 *
 * @example
 * mergeUseProfile(
 *   { basis: 'radio-hours', transmitMinutesPerDay: 10, receiveHoursPerDay: 2, standbyHoursPerDay: 10 },
 *   { transmitMinutesPerDay: 25 },
 * );
 * // → { ok: true, useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 25, receiveHoursPerDay: 2, standbyHoursPerDay: 10 },
 * //     overriddenFields: ['transmitMinutesPerDay'] }
 */
export function mergeUseProfile(
  defaultProfile: UseProfile,
  override: UseProfileOverride | null | undefined,
  options: MergeUseProfileOptions = {},
): UseProfileMergeResult {
  if (!override) return { ok: true, useProfile: defaultProfile, overriddenFields: [] };
  const basis = override.basis ?? defaultProfile.basis;
  const basisChanged = basis !== defaultProfile.basis;
  const fields: readonly UseProfileField[] = useProfileFieldsByBasis[basis];
  const issues: UseProfileMergeIssue[] = [];

  for (const field of allFields) {
    if (override[field] !== undefined && !fields.includes(field)) {
      issues.push({ path: [field], message: `Not a field of the ${basis} use profile` });
    }
  }
  if (basisChanged) {
    for (const field of fields) {
      if (override[field] === undefined) {
        issues.push({
          path: [field],
          message: `The locker default is ${defaultProfile.basis}: a ${basis} override must give every one of its fields`,
        });
      }
    }
  }
  if (basis === 'radio-hours' && options.deviceKind !== undefined && options.deviceKind !== 'radio') {
    issues.push({ path: ['basis'], message: 'Transmit/receive hours are for radios' });
  }
  if (issues.length > 0) return { ok: false, issues };

  const merged: Record<string, unknown> = basisChanged ? { basis } : { ...defaultProfile };
  const overriddenFields: (UseProfileField | 'basis')[] = basisChanged ? ['basis'] : [];
  for (const field of fields) {
    const value = override[field];
    if (value !== undefined) {
      merged[field] = value;
      overriddenFields.push(field);
    }
  }
  const parsed = useProfileSchema.safeParse(merged);
  if (!parsed.success) {
    return {
      ok: false,
      issues: parsed.error.issues.map((issue) => ({
        path: issue.path.filter((part): part is string | number => typeof part !== 'symbol'),
        message: issue.message,
      })),
    };
  }
  return { ok: true, useProfile: parsed.data, overriddenFields };
}
