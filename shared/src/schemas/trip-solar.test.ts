import { describe, expect, it } from 'vitest';
import { maxTripNights } from '../constants/limits.js';
import { skyPresets } from '../sky/sky-presets.js';
import { isValidCloudChain } from '../sky/cloud-chain.js';
import { tripSolarInputSchema } from './trip-solar.js';

const valid = {
  latitudeDeg: 46.5,
  longitudeDeg: 8.1,
  timeZone: 'Europe/Zurich',
  startDate: '2026-07-01',
  nights: 4,
  temperatures: { lowC: 4, highC: 17 },
};

function issuePaths(input: unknown): string[] {
  const result = tripSolarInputSchema.safeParse(input);
  if (result.success) return [];
  return result.error.issues.map((issue) => issue.path.join('.'));
}

function messageAt(input: unknown, path: string): string | undefined {
  const result = tripSolarInputSchema.safeParse(input);
  if (result.success) return undefined;
  return result.error.issues.find((issue) => issue.path.join('.') === path)?.message;
}

describe('tripSolarInputSchema', () => {
  it('fills in the documented defaults', () => {
    const parsed = tripSolarInputSchema.parse(valid);
    expect(parsed.walkWindow).toEqual({ start: '08:00', end: '16:00' });
    expect(parsed.campWindow).toEqual({ start: '16:00', end: '08:00' });
    expect(parsed.walkingBearingsDeg).toBeNull();
    expect(parsed.carry).toEqual({ walking: 'pack', camp: 'propped' });
    expect(parsed.reaimEveryH).toBe(2);
    expect(parsed.groundAlbedo).toBeCloseTo(0.2, 12);
    expect(parsed.stepMinutes).toBe(60);
    expect(isValidCloudChain(parsed.sky.clearShare, parsed.sky.cloudyPersistence)).toBe(true);
  });

  it('rejects out-of-range, non-finite and unknown values with field paths', () => {
    expect(issuePaths({ ...valid, latitudeDeg: 91 })).toEqual(['latitudeDeg']);
    expect(issuePaths({ ...valid, longitudeDeg: Number.NaN })).toEqual(['longitudeDeg']);
    expect(issuePaths({ ...valid, latitudeDeg: Number.POSITIVE_INFINITY })).toEqual(['latitudeDeg']);
    expect(issuePaths({ ...valid, timeZone: 'Europe/Atlantis' })).toEqual(['timeZone']);
    expect(messageAt({ ...valid, timeZone: 'Europe/Atlantis' }, 'timeZone')).toMatch(/Unknown time zone/);
    expect(issuePaths({ ...valid, nights: maxTripNights + 1 })).toEqual(['nights']);
    expect(issuePaths({ ...valid, nights: 0 })).toEqual(['nights']);
    expect(issuePaths({ ...valid, nights: 2.5 })).toEqual(['nights']);
    expect(issuePaths({ ...valid, startDate: '2026-02-30' })).toEqual(['startDate']);
    expect(issuePaths({ ...valid, stepMinutes: 20 })).toEqual(['stepMinutes']);
    expect(issuePaths({ ...valid, groundAlbedo: 1.5 })).toEqual(['groundAlbedo']);
  });

  it('rejects a zero-length camp window and malformed clock times', () => {
    expect(issuePaths({ ...valid, campWindow: { start: '18:00', end: '18:00' } })).toEqual(['campWindow.end']);
    expect(issuePaths({ ...valid, walkWindow: { start: '8:00', end: '16:00' } })).toEqual(['walkWindow.start']);
  });

  it('rejects a p/q pair the cloud chain cannot have, on sky.cloudyPersistence', () => {
    const sky = {
      clearShare: 0.2,
      cloudyPersistence: 0.5,
      cloudyTransmission: 0.2,
      canopyShade: 0,
      designLikelihood: 0.9,
    };
    expect(issuePaths({ ...valid, sky })).toEqual(['sky.cloudyPersistence']);
    expect(messageAt({ ...valid, sky }, 'sky.cloudyPersistence')).toMatch(/at least 0\.750/);
    expect(issuePaths({ ...valid, sky: { ...sky, cloudyPersistence: 0.8 } })).toEqual([]);
    expect(issuePaths({ ...valid, sky: { ...sky, cloudyPersistence: 0.8, canopyShade: -0.1 } })).toEqual([
      'sky.canopyShade',
    ]);
  });

  it('checks bearings and per-day temperatures against the trip length, and low ≤ high', () => {
    expect(issuePaths({ ...valid, walkingBearingsDeg: [10] })).toEqual([]);
    expect(issuePaths({ ...valid, walkingBearingsDeg: [10, 20, 30, 40, 50] })).toEqual([]);
    expect(issuePaths({ ...valid, walkingBearingsDeg: [10, 20] })).toEqual(['walkingBearingsDeg']);
    expect(issuePaths({ ...valid, temperatures: { lowC: [1, 2, 3, 4, 5], highC: 12 } })).toEqual([]);
    expect(issuePaths({ ...valid, temperatures: { lowC: [1, 2, 3], highC: 12 } })).toEqual(['temperatures.lowC']);
    expect(issuePaths({ ...valid, temperatures: { lowC: 20, highC: 12 } })).toEqual(['temperatures.lowC']);
    expect(issuePaths({ ...valid, temperatures: { lowC: [1, 2, 30, 4, 5], highC: 12 } })).toEqual([
      'temperatures.lowC.2',
    ]);
  });

  it('accepts every sky preset', () => {
    for (const preset of skyPresets) {
      expect(issuePaths({ ...valid, sky: preset.values })).toEqual([]);
    }
  });
});
