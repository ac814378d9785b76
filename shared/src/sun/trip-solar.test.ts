import { describe, expect, it } from 'vitest';
import { tripSolarInputSchema, type TripSolarInputDraft } from '../schemas/trip-solar.js';
import { dailyExtraterrestrialHorizontalWhm2, dayOfYearUtc } from './extraterrestrial.js';
import { computeTripSolar } from './trip-solar.js';
import type { TripSolarSeries } from './trip-solar-types.js';

const clearSky = {
  clearShare: 1,
  cloudyPersistence: 0.5,
  cloudyTransmission: 0.2,
  canopyShade: 0,
  designLikelihood: 0.9,
};

function series(overrides: Partial<TripSolarInputDraft>): TripSolarSeries {
  return computeTripSolar(
    tripSolarInputSchema.parse({
      latitudeDeg: 46.5,
      longitudeDeg: 8.1,
      timeZone: 'Europe/Zurich',
      startDate: '2026-07-01',
      nights: 3,
      temperatures: { lowC: 4, highC: 17 },
      ...overrides,
    }),
  );
}

/** Plane irradiation of one sky over the steps that match, Wh/m². */
function sumWh(s: TripSolarSeries, skyIndex: number, keep: (i: number) => boolean = () => true): number {
  let total = 0;
  s.steps.forEach((step, i) => {
    if (keep(i)) total += (s.skies[skyIndex]?.planeIrradianceWm2[i] ?? 0) * step.durationH;
  });
  return total;
}

function expectWellFormed(s: TripSolarSeries, nights: number): void {
  expect(s.days).toHaveLength(nights + 1);
  expect(s.skies.map((sky) => sky.id)).toEqual(['expected', 'cloudy-start', 'cloudy-middle', 'cloudy-end']);
  for (const sky of s.skies) {
    expect(sky.planeIrradianceWm2).toHaveLength(s.steps.length);
    expect(sky.cloudyDays).toHaveLength(nights + 1);
    for (const value of sky.planeIrradianceWm2) {
      expect(Number.isFinite(value)).toBe(true);
      expect(value).toBeGreaterThanOrEqual(0);
    }
  }
  let previousEnd = s.days[0]?.startUtcMs ?? 0;
  for (const day of s.days) {
    expect(day.startUtcMs).toBe(previousEnd);
    previousEnd = day.endUtcMs;
    expect(Number.isFinite(day.dayLengthH)).toBe(true);
    const steps = s.steps.filter((step) => step.dayIndex === day.dayIndex);
    const hours = steps.reduce((sum, step) => sum + step.durationH, 0);
    expect(hours).toBeCloseTo((day.endUtcMs - day.startUtcMs) / 3_600_000, 9);
    expect(steps[0]?.startUtcMs).toBe(day.startUtcMs);
  }
  for (let i = 1; i < s.steps.length; i++) {
    const previous = s.steps[i - 1];
    const step = s.steps[i];
    expect(step?.startUtcMs).toBeCloseTo((previous?.startUtcMs ?? 0) + (previous?.durationH ?? 0) * 3_600_000, 3);
  }
  for (const step of s.steps) {
    for (const value of [step.sunAltitudeDeg, step.sunAzimuthDeg, step.airTempC, step.clearSkyGhiWm2]) {
      expect(Number.isFinite(value)).toBe(true);
    }
  }
}

describe('computeTripSolar: the trip clock', () => {
  it('has N + 1 days from walking start to walking start, hourly steps, no NaN', () => {
    const s = series({});
    expectWellFormed(s, 3);
    expect(s.steps).toHaveLength(4 * 24);
    expect(s.steps[0]).toMatchObject({ localTime: '08:00', window: 'walk', durationH: 1 });
    expect(s.steps[8]).toMatchObject({ localTime: '16:00', window: 'camp' });
    expect(s.days[0]?.dateLocal).toBe('2026-07-01');
    expect(s.days[3]?.dateLocal).toBe('2026-07-04');
    expect(s.days[0]?.startUtcMs).toBe(Date.UTC(2026, 6, 1, 6));
  });

  it('makes the day that holds the March DST change 23 h long and the October one 25 h long', () => {
    // EU rule in the IANA tz database: clocks go forward on 29 March 2026 and back on 25 October 2026.
    const spring = series({ timeZone: 'Europe/Berlin', startDate: '2026-03-27', nights: 3 });
    expectWellFormed(spring, 3);
    expect(spring.days.map((d) => (d.endUtcMs - d.startUtcMs) / 3_600_000)).toEqual([24, 23, 24, 24]);
    const localTimes = spring.steps.filter((step) => step.dayIndex === 1).map((step) => step.localTime);
    expect(localTimes).not.toContain('02:00');
    const autumn = series({ timeZone: 'Europe/Berlin', startDate: '2026-10-24', nights: 2 });
    expect(autumn.days.map((d) => (d.endUtcMs - d.startUtcMs) / 3_600_000)).toEqual([25, 24, 24]);
  });

  it('cuts steps at window boundaries and marks hours outside both windows as none, with zero irradiance', () => {
    const s = series({ walkWindow: { start: '07:30', end: '13:45' }, campWindow: { start: '18:00', end: '06:00' } });
    expectWellFormed(s, 3);
    // Steps run from 07:30 on the half hour: 13:30–13:45 is cut by the walking window's end.
    expect(s.steps.find((step) => step.localTime === '13:30')).toMatchObject({ window: 'walk', durationH: 0.25 });
    expect(s.steps.find((step) => step.localTime === '13:45')).toMatchObject({ window: 'none', durationH: 0.75 });
    const none = s.steps.map((step, i) => [step, i] as const).filter(([step]) => step.window === 'none');
    expect(none.length).toBeGreaterThan(0);
    expect(none.some(([step]) => step.clearSkyGhiWm2 > 100)).toBe(true);
    for (const [, i] of none) for (const sky of s.skies) expect(sky.planeIrradianceWm2[i]).toBe(0);
  });

  it('splits steps at 15 minutes with the same daily energy as hourly steps to within 2 %', () => {
    const hourly = sumWh(series({ sky: clearSky }), 0);
    const quarter = series({ sky: clearSky, stepMinutes: 15 });
    expect(quarter.steps).toHaveLength(4 * 96);
    expect(Math.abs(sumWh(quarter, 0) - hourly) / hourly).toBeLessThan(0.02);
  });

  it('runs a 60-night trip', () => {
    const s = series({ nights: 60, startDate: '2026-05-01' });
    expectWellFormed(s, 60);
    expect(s.cloudyRunDays).toBeGreaterThan(0);
    expect(s.cloudyRunDays).toBeLessThanOrEqual(61);
  });
});

describe('computeTripSolar: sun and temperature', () => {
  it('keeps a clear flat day below the extraterrestrial day (Duffie & Beckman eq. 1.10.3) at a clear-sky index of 0.65–0.85', () => {
    // Clear days have a daily clearness index K_T of about 0.7–0.8 (Duffie & Beckman, 3rd ed., §2.9–2.11:
    // `common practice`). Here the whole day is at camp, lying flat.
    const s = series({
      walkWindow: { start: '00:00', end: '00:01' },
      campWindow: { start: '00:01', end: '00:00' },
      carry: { walking: 'stowed', camp: 'flat' },
      sky: clearSky,
      nights: 1,
    });
    const day0 = s.days[0];
    const ghiWh = s.steps
      .filter((step) => step.dayIndex === 0)
      .reduce((sum, step) => sum + step.clearSkyGhiWm2 * step.durationH, 0);
    const h0 = dailyExtraterrestrialHorizontalWhm2(46.5, dayOfYearUtc((day0?.startUtcMs ?? 0) + 12 * 3_600_000));
    expect(ghiWh / h0).toBeGreaterThan(0.65);
    expect(ghiWh / h0).toBeLessThan(0.85);
    expect(sumWh(s, 0, (i) => s.steps[i]?.dayIndex === 0)).toBeCloseTo(ghiWh, 6);
  });

  it('places the air temperature low near sunrise and the high in mid-afternoon', () => {
    const s = series({ temperatures: { lowC: [2, 3, 4, 5], highC: [12, 13, 14, 15] } });
    const day1 = s.steps.filter((step) => step.dayIndex === 1);
    const at15 = day1.find((step) => step.localTime === '15:00');
    expect(at15?.airTempC).toBeGreaterThan(12.5);
    expect(at15?.airTempC).toBeLessThanOrEqual(13);
    const coldest = day1.reduce((a, b) => (b.airTempC < a.airTempC ? b : a));
    expect(['04:00', '05:00', '06:00']).toContain(coldest.localTime);
    for (const step of s.steps) {
      expect(step.airTempC).toBeGreaterThanOrEqual(2 - 1e-9);
      expect(step.airTempC).toBeLessThanOrEqual(15 + 1e-9);
    }
  });

  it('handles polar night at 78° N in January: no sun, no NaN', () => {
    const s = series({
      latitudeDeg: 78.2,
      longitudeDeg: 15.6,
      timeZone: 'Arctic/Longyearbyen',
      startDate: '2026-01-10',
    });
    expectWellFormed(s, 3);
    for (const day of s.days) expect(day).toMatchObject({ polar: 'night', dayLengthH: 0, sunriseUtcMs: null });
    for (const sky of s.skies) expect(Math.max(...sky.planeIrradianceWm2)).toBe(0);
  });

  it('handles polar day at 78° N in June: sun at midnight, harvest at camp through the night', () => {
    const s = series({
      latitudeDeg: 78.2,
      longitudeDeg: 15.6,
      timeZone: 'Arctic/Longyearbyen',
      startDate: '2026-06-18',
      sky: clearSky,
    });
    expectWellFormed(s, 3);
    for (const day of s.days) expect(day).toMatchObject({ polar: 'day', dayLengthH: 24, sunsetUtcMs: null });
    const midnight = s.steps.findIndex((step) => step.localTime === '00:00');
    expect(s.steps[midnight]?.sunAltitudeDeg).toBeGreaterThan(5);
    expect(s.skies[0]?.planeIrradianceWm2[midnight]).toBeGreaterThan(50);
  });

  it('puts the noon sun in the north in the southern hemisphere, so walking south is best there', () => {
    const base = {
      latitudeDeg: -44.7,
      longitudeDeg: 169.1,
      timeZone: 'Pacific/Auckland',
      startDate: '2026-01-12',
      sky: clearSky,
    };
    const south = series({ ...base, walkingBearingsDeg: [180] });
    const noon = south.steps.reduce((a, b) => (b.sunAltitudeDeg > a.sunAltitudeDeg ? b : a));
    expect(Math.min(noon.sunAzimuthDeg, 360 - noon.sunAzimuthDeg)).toBeLessThan(20);
    const north = series({ ...base, walkingBearingsDeg: [0] });
    const walk = (i: number) => south.steps[i]?.window === 'walk';
    expect(sumWh(south, 0, walk)).toBeGreaterThan(sumWh(north, 0, walk) * 1.3);
    const unknown = series({ ...base, walkingBearingsDeg: null });
    expect(sumWh(unknown, 0, walk)).toBeGreaterThan(sumWh(north, 0, walk));
    expect(sumWh(unknown, 0, walk)).toBeLessThan(sumWh(south, 0, walk));
  });

  it('works next to the antimeridian on both sides', () => {
    for (const place of [
      { latitudeDeg: -17.8, longitudeDeg: 179.9, timeZone: 'Pacific/Fiji' },
      { latitudeDeg: 51.9, longitudeDeg: -179.9, timeZone: 'Etc/GMT+12' },
    ]) {
      const s = series({ ...place, startDate: '2026-09-03' });
      expectWellFormed(s, 3);
      const noon = s.steps.find((step) => step.dayIndex === 1 && step.localTime === '12:00');
      expect(noon?.sunAltitudeDeg).toBeGreaterThan(20);
      for (const day of s.days) {
        expect(day.sunriseUtcMs).not.toBeNull();
        expect(day.sunriseUtcMs ?? 0).toBeGreaterThan(day.startUtcMs - 24 * 3_600_000);
        expect(day.sunriseUtcMs ?? 0).toBeLessThan(day.endUtcMs);
      }
    }
  });
});

describe('computeTripSolar: carry modes and skies', () => {
  it('gives zero when stowed and more when propped and re-aimed than flat', () => {
    const stowed = series({ carry: { walking: 'stowed', camp: 'stowed' } });
    for (const sky of stowed.skies) expect(Math.max(...sky.planeIrradianceWm2)).toBe(0);
    const camp = (s: TripSolarSeries) => (i: number) => s.steps[i]?.window === 'camp';
    const propped = series({ sky: clearSky, carry: { walking: 'pack', camp: 'propped' } });
    const flat = series({ sky: clearSky, carry: { walking: 'pack', camp: 'flat' } });
    expect(sumWh(propped, 0, camp(propped))).toBeGreaterThan(sumWh(flat, 0, camp(flat)) * 1.2);
    const often = series({ sky: clearSky, reaimEveryH: 0.5 });
    const seldom = series({ sky: clearSky, reaimEveryH: 8 });
    expect(sumWh(often, 0, camp(often))).toBeGreaterThan(sumWh(seldom, 0, camp(seldom)));
  });

  it('makes cloudy run days overcast (c × clear GHI, all diffuse) and other days the mean, × (1 − shade)', () => {
    const sky = {
      clearShare: 0.5,
      cloudyPersistence: 0.6,
      cloudyTransmission: 0.2,
      canopyShade: 0.25,
      designLikelihood: 0.9,
    };
    const s = series({ sky, carry: { walking: 'stowed', camp: 'flat' }, nights: 5 });
    expect(s.cloudyRunDays).toBeGreaterThan(0);
    const start = s.skies[1];
    s.steps.forEach((step, i) => {
      if (step.window !== 'camp') return;
      const overcast = 0.2 * step.clearSkyGhiWm2 * 0.75;
      const mean = (0.5 * step.clearSkyGhiWm2 + 0.5 * 0.2 * step.clearSkyGhiWm2) * 0.75;
      expect(s.skies[0]?.planeIrradianceWm2[i]).toBeCloseTo(mean, 9);
      expect(start?.planeIrradianceWm2[i]).toBeCloseTo(start?.cloudyDays[step.dayIndex] ? overcast : mean, 9);
    });
    expect(start?.cloudyDays.slice(0, s.cloudyRunDays).every(Boolean)).toBe(true);
  });

  it('uses one bearing per day when given one per day', () => {
    const perDay = series({ sky: clearSky, walkingBearingsDeg: [0, 180, 0, 180] });
    const allNorth = series({ sky: clearSky, walkingBearingsDeg: [0] });
    const walkOn = (s: TripSolarSeries, day: number) => (i: number) =>
      s.steps[i]?.window === 'walk' && s.steps[i]?.dayIndex === day;
    expect(sumWh(perDay, 0, walkOn(perDay, 0))).toBeCloseTo(sumWh(allNorth, 0, walkOn(allNorth, 0)), 9);
    expect(sumWh(perDay, 0, walkOn(perDay, 1))).toBeLessThan(sumWh(allNorth, 0, walkOn(allNorth, 1)) * 0.8);
  });

  it('gives a steep pack panel no tilt gain under overcast', () => {
    const overcast = {
      clearShare: 0,
      cloudyPersistence: 1,
      cloudyTransmission: 0.3,
      canopyShade: 0,
      designLikelihood: 0.9,
    };
    const s = series({ sky: overcast, walkingBearingsDeg: [0] });
    s.steps.forEach((step, i) => {
      expect(s.skies[0]?.planeIrradianceWm2[i] ?? 0).toBeLessThanOrEqual(0.3 * step.clearSkyGhiWm2 + 1e-9);
    });
  });
});
