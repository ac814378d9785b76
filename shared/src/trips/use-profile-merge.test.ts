import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type UseProfile, useProfileSchema } from '../schemas/devices.js';
import { useProfileBases, useProfileOverrideSchema } from '../schemas/trips.js';
import { mergeUseProfile, useProfileFieldsByBasis } from './use-profile-merge.js';

const radioDefault: UseProfile = {
  basis: 'radio-hours',
  transmitMinutesPerDay: 10,
  receiveHoursPerDay: 2,
  standbyHoursPerDay: 10,
};
const phoneDefault: UseProfile = { basis: 'battery-share', batterySharePerDay: 0.6 };

describe('mergeUseProfile: normal cases', () => {
  it('without an override the locker default applies unchanged', () => {
    expect(mergeUseProfile(radioDefault, null)).toEqual({ ok: true, useProfile: radioDefault, overriddenFields: [] });
    expect(mergeUseProfile(radioDefault, {})).toEqual({ ok: true, useProfile: radioDefault, overriddenFields: [] });
  });

  it('an override of one field keeps every other field of the default', () => {
    const result = mergeUseProfile(radioDefault, { transmitMinutesPerDay: 25 });
    expect(result).toEqual({
      ok: true,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 25, receiveHoursPerDay: 2, standbyHoursPerDay: 10 },
      overriddenFields: ['transmitMinutesPerDay'],
    });
  });

  it('naming the default basis again is not a change of basis', () => {
    const result = mergeUseProfile(phoneDefault, { basis: 'battery-share' });
    expect(result).toEqual({ ok: true, useProfile: phoneDefault, overriddenFields: [] });
  });

  it('a complete override of another basis replaces the default', () => {
    const result = mergeUseProfile(phoneDefault, { basis: 'energy', energyWhPerDay: 4.5 });
    expect(result).toEqual({
      ok: true,
      useProfile: { basis: 'energy', energyWhPerDay: 4.5 },
      overriddenFields: ['basis', 'energyWhPerDay'],
    });
  });
});

describe('mergeUseProfile: overrides that do not fit', () => {
  it('another basis must be complete: missing fields are named', () => {
    const result = mergeUseProfile(
      phoneDefault,
      { basis: 'radio-hours', transmitMinutesPerDay: 5 },
      { deviceKind: 'radio' },
    );
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues.map((issue) => issue.path.join('.')).sort()).toEqual([
      'receiveHoursPerDay',
      'standbyHoursPerDay',
    ]);
  });

  it('a field of another basis is refused', () => {
    const result = mergeUseProfile(radioDefault, { batterySharePerDay: 0.3 });
    expect(result).toEqual({
      ok: false,
      issues: [{ path: ['batterySharePerDay'], message: 'Not a field of the radio-hours use profile' }],
    });
  });

  it('the merged radio day must fit in 24 h, even when each field alone is in range', () => {
    const result = mergeUseProfile(radioDefault, { standbyHoursPerDay: 23 });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues[0]?.path).toEqual(['standbyHoursPerDay']);
  });

  it('transmit hours are refused for a device that is not a radio', () => {
    const override = {
      basis: 'radio-hours' as const,
      transmitMinutesPerDay: 5,
      receiveHoursPerDay: 1,
      standbyHoursPerDay: 1,
    };
    const result = mergeUseProfile(phoneDefault, override, { deviceKind: 'phone' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues.map((issue) => issue.path.join('.'))).toEqual(['basis']);
  });
});

describe('mergeUseProfile: properties', () => {
  const radioProfileArb = fc
    .record({
      transmitMinutesPerDay: fc.double({ min: 0, max: 120, noNaN: true }),
      receiveHoursPerDay: fc.double({ min: 0, max: 8, noNaN: true }),
      standbyHoursPerDay: fc.double({ min: 0, max: 12, noNaN: true }),
    })
    .map((fields): UseProfile => ({ basis: 'radio-hours', ...fields }));
  const radioOverrideArb = fc.record(
    {
      transmitMinutesPerDay: fc.double({ min: 0, max: 120, noNaN: true }),
      receiveHoursPerDay: fc.double({ min: 0, max: 8, noNaN: true }),
      standbyHoursPerDay: fc.double({ min: 0, max: 12, noNaN: true }),
    },
    { requiredKeys: [] },
  );

  it('every field is the override’s when set and the default’s otherwise; the result is a valid profile', () => {
    fc.assert(
      fc.property(radioProfileArb, radioOverrideArb, (defaultProfile, override) => {
        const result = mergeUseProfile(defaultProfile, override);
        expect(result.ok).toBe(true);
        if (!result.ok || result.useProfile.basis !== 'radio-hours' || defaultProfile.basis !== 'radio-hours') return;
        for (const field of useProfileFieldsByBasis['radio-hours']) {
          expect(result.useProfile[field]).toBe(override[field] ?? defaultProfile[field]);
        }
        expect(new Set(result.overriddenFields)).toEqual(new Set(Object.keys(override)));
        expect(useProfileSchema.safeParse(result.useProfile).success).toBe(true);
      }),
    );
  });

  it('merging is idempotent: laying the same override over the result changes nothing', () => {
    fc.assert(
      fc.property(radioProfileArb, radioOverrideArb, (defaultProfile, override) => {
        const once = mergeUseProfile(defaultProfile, override);
        if (!once.ok) return;
        const twice = mergeUseProfile(once.useProfile, override);
        expect(twice.ok && twice.useProfile).toEqual(once.useProfile);
      }),
    );
  });
});

describe('override schema', () => {
  it('lists the same bases as the use-profile schema', () => {
    const schemaBases = useProfileSchema.options.map((option) => option.shape.basis.value);
    expect([...useProfileBases].sort()).toEqual([...schemaBases].sort());
    expect(Object.keys(useProfileFieldsByBasis).sort()).toEqual([...schemaBases].sort());
  });

  it('refuses unknown fields and out-of-range values with the field path', () => {
    const unknown = useProfileOverrideSchema.safeParse({ transmitMinutes: 5 });
    expect(unknown.success).toBe(false);
    const negative = useProfileOverrideSchema.safeParse({ receiveHoursPerDay: -1 });
    expect(negative.error?.issues[0]?.path).toEqual(['receiveHoursPerDay']);
  });
});
