import { describe, expect, it } from 'vitest';
import { defaultReserveShare } from '../constants/electrical.js';
import { skyPresets } from '../sky/sky-presets.js';
import { buildTripSolarInput } from '../trips/trip-solar-input.js';
import { skyPresetValues } from '../trips/trip-sky.js';
import { tripSolarInputSchema } from './trip-solar.js';
import { skyPresetIds, tripInputSchema } from './trips.js';

const minimal = { name: 'Tarn loop', latitudeDeg: 46.5, longitudeDeg: 8, startDate: '2026-07-01', nights: 4 };

function paths(body: unknown): string[] {
  const result = tripInputSchema.safeParse(body);
  return result.success ? [] : result.error.issues.map((issue) => issue.path.join('.'));
}

describe('tripInputSchema', () => {
  it('needs only a name, the place and the dates; everything else has a default', () => {
    const trip = tripInputSchema.parse(minimal);
    expect(trip).toMatchObject({
      notes: '',
      reserveShare: defaultReserveShare,
      gramLimitG: null,
      walkWindow: { start: '08:00', end: '16:00' },
      campWindow: { start: '16:00', end: '08:00' },
      carry: { walking: 'pack', camp: 'propped' },
      temperatures: { lowC: 5, highC: 20 },
    });
    expect(trip.timeZone).toBeUndefined();
    expect(trip.sky).toBeUndefined();
  });

  it('gives a field path for each bad field', () => {
    expect(paths({ ...minimal, nights: 0 })).toEqual(['nights']);
    expect(paths({ ...minimal, nights: 61 })).toEqual(['nights']);
    expect(paths({ ...minimal, latitudeDeg: 91 })).toEqual(['latitudeDeg']);
    expect(paths({ ...minimal, timeZone: 'Mars/Olympus_Mons' })).toEqual(['timeZone']);
    expect(paths({ ...minimal, campWindow: { start: '18:00', end: '18:00' } })).toEqual(['campWindow.end']);
    expect(paths({ ...minimal, reserveShare: 1.2 })).toEqual(['reserveShare']);
    expect(paths({ ...minimal, reserveShare: -0.1 })).toEqual(['reserveShare']);
    expect(paths({ ...minimal, name: '  ' })).toEqual(['name']);
    expect(paths({ ...minimal, gramLimitG: 0 })).toEqual(['gramLimitG']);
  });

  it('keeps the sun/sky schema’s own cross-field checks (bearings per day, low ≤ high)', () => {
    expect(paths({ ...minimal, walkingBearingsDeg: [90, 180] })).toEqual(['walkingBearingsDeg']);
    expect(paths({ ...minimal, temperatures: { lowC: 10, highC: 2 } })).toEqual(['temperatures.lowC']);
  });

  it('refuses a cloud chain that cannot exist (q < 1 − p/(1 − p) for p < 0.5)', () => {
    // p = 0.2 needs q ≥ 1 − 0.2/0.8 = 0.75 (the two-state chain's stationary share p = (1 − q)/(2 − q − r)
    // with r ≥ 0; see the cloud-chain module).
    const sky = {
      clearShare: 0.2,
      cloudyPersistence: 0.5,
      cloudyTransmission: 0.2,
      canopyShade: 0,
      designLikelihood: 0.9,
    };
    expect(paths({ ...minimal, sky })).toEqual(['sky.cloudyPersistence']);
    expect(paths({ ...minimal, sky: { ...sky, cloudyPersistence: 0.8 } })).toEqual([]);
  });

  it('refuses a sky that disagrees with the chosen preset, accepts one that matches', () => {
    const openSky = skyPresetValues('open-sky');
    expect(paths({ ...minimal, skyPresetId: 'open-sky', sky: { ...openSky, clearShare: 0.6 } })).toEqual(['sky']);
    expect(paths({ ...minimal, skyPresetId: 'open-sky', sky: openSky })).toEqual([]);
  });

  it('names every preset of the sky module', () => {
    expect([...skyPresetIds].sort()).toEqual(skyPresets.map((preset) => preset.id).sort());
  });
});

describe('buildTripSolarInput', () => {
  it('gives the engine input with the time zone and the default preset’s sky', () => {
    const { solarInput, skyPresetId } = buildTripSolarInput(tripInputSchema.parse(minimal), 'Europe/Zurich');
    expect(skyPresetId).toBe('mixed');
    expect(solarInput.timeZone).toBe('Europe/Zurich');
    expect(solarInput.sky).toEqual(skyPresetValues('mixed'));
    expect(tripSolarInputSchema.parse(solarInput)).toEqual(solarInput);
    expect(Object.keys(solarInput).sort()).toEqual(Object.keys(tripSolarInputSchema.shape).sort());
  });

  it('keeps custom sky values with no preset', () => {
    const sky = {
      clearShare: 0.7,
      cloudyPersistence: 0.4,
      cloudyTransmission: 0.2,
      canopyShade: 0.3,
      designLikelihood: 0.95,
    };
    const { solarInput, skyPresetId } = buildTripSolarInput(tripInputSchema.parse({ ...minimal, sky }), 'UTC');
    expect(skyPresetId).toBeNull();
    expect(solarInput.sky).toEqual(sky);
  });
});
