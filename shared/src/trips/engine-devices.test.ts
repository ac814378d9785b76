import { describe, expect, it } from 'vitest';
import { deviceDemandWhPerDay } from '../demand/device-demand.js';
import type { TripDeviceDetail } from '../schemas/trips.js';
import { testRadio } from '../testing/fixtures.js';
import { toEngineTripDevices } from './engine-devices.js';

describe('toEngineTripDevices', () => {
  it('hands the engine the effective use profile in place of the locker default, keyed by item id', () => {
    const spec = testRadio();
    const effective = {
      basis: 'radio-hours' as const,
      transmitMinutesPerDay: 50,
      receiveHoursPerDay: 2,
      standbyHoursPerDay: 8,
    };
    const detail: TripDeviceDetail = {
      id: '6f1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
      itemId: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
      name: 'Test radio',
      notes: '',
      massG: 0,
      ownerAccountId: '1a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
      carrierAccountId: '1a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
      spec,
      defaultUseProfile: spec.useProfile,
      useProfileOverride: { transmitMinutesPerDay: 50 },
      useProfile: effective,
      overriddenFields: ['transmitMinutesPerDay'],
      overrideIssues: [],
      createdAt: '2026-06-01T08:00:00.000Z',
      updatedAt: '2026-06-01T08:00:00.000Z',
    };
    const [engine] = toEngineTripDevices([detail]);
    expect(engine?.deviceId).toBe(detail.itemId);
    expect(engine?.spec.useProfile).toEqual(effective);
    expect(engine?.spec.transmitCurrentA).toBe(spec.transmitCurrentA);
    // The engine's demand now follows the trip's profile, not the locker's.
    expect(deviceDemandWhPerDay(engine!.spec)).toBeCloseTo(deviceDemandWhPerDay(spec, effective), 9);
    expect(deviceDemandWhPerDay(engine!.spec)).toBeGreaterThan(deviceDemandWhPerDay(spec));
  });
});
