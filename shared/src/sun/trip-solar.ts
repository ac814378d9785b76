/**
 * The one entry point of the sun/sky side: a trip's place, dates, windows, carry modes, sky and
 * temperatures → per-step sun, air temperature and plane irradiance in each design sky.
 */
import { dailyHighLocalHour, polarDailyLowLocalHour } from '../constants/solar.js';
import type { TripSolarInput } from '../schemas/trip-solar.js';
import { cloudyRunDays } from '../sky/cloud-chain.js';
import { designSkies } from '../sky/design-skies.js';
import { airTemperatureAt, dailyTemperatureAnchors, type DailyExtremes } from '../temperature/daily-air-temperature.js';
import {
  clearPlaneWm2,
  flatPlane,
  packPlane,
  packPlaneAllHeadingsWm2,
  proppedPlane,
  type SkyAtStep,
} from './carry-modes.js';
import { clearSkyIrradiance } from './clear-sky.js';
import { dayOfYearUtc } from './extraterrestrial.js';
import { sunPosition } from './solar-position.js';
import { sunTimesNear, type SunTimes } from './sun-times.js';
import { msPerHour } from './time-constants.js';
import { overcastPlaneIrradianceWm2, type PlaneOrientation } from './transposition.js';
import { buildTripTimeline, type TimelineStep } from './trip-timeline.js';
import type { SolarDay, SolarStep, TripSolarSeries } from './trip-solar-types.js';

/** Per-day value from a scalar or a per-day array (already validated to the right length). */
function dailyValue(value: number | number[], day: number): number {
  if (!Array.isArray(value)) return value;
  const clamped = Math.max(0, Math.min(value.length - 1, day));
  return value[clamped] ?? 0;
}

/** Options beyond the trip's own input. */
export interface TripSolarOptions {
  /** Cloudy days added to the design run (the gram price of "one more cloudy day"); default 0. */
  extraCloudyRunDays?: number;
}

/** Plane orientation of one step, or null when nothing faces the sky (stowed, outside both windows). */
type StepPlane = PlaneOrientation | 'all-headings' | null;

/**
 * Computes the trip's solar series: for every step of every trip day, the sun at mid-step, the air
 * temperature, clear-sky GHI and, for each of the four design skies, the irradiance on the panel's plane
 * as it is carried. Pure and deterministic; about a millisecond for a 60-night hourly trip (see the
 * report of the benchmark).
 * @param input a value returned by `tripSolarInputSchema.parse` (ranges and the cloud chain are checked there)
 * @example computeTripSolar(tripSolarInputSchema.parse({ latitudeDeg: 46.5, longitudeDeg: 8, timeZone: 'Europe/Zurich', startDate: '2026-07-01', nights: 4, temperatures: { lowC: 5, highC: 18 } })).days.length // 5
 */
export function computeTripSolar(input: TripSolarInput, options: TripSolarOptions = {}): TripSolarSeries {
  const timeline = buildTripTimeline(input);
  const dayCount = timeline.days.length;
  const { latitudeDeg, longitudeDeg } = input;
  const clearSkyOptions = { linkeTurbidity: input.linkeTurbidity, elevationM: input.elevationM };

  // Sun events per local date, from the day before the trip to the day after (for the temperature curve).
  const sunTimesByDate: SunTimes[] = [];
  for (let dateIndex = -1; dateIndex <= dayCount; dateIndex++) {
    sunTimesByDate.push(sunTimesNear(timeline.localUtc(dateIndex, 12 * 60), latitudeDeg, longitudeDeg));
  }
  const sunTimesOf = (dateIndex: number): SunTimes => sunTimesByDate[dateIndex + 1] as SunTimes;

  const extremes: DailyExtremes[] = [];
  for (let dateIndex = -1; dateIndex <= dayCount; dateIndex++) {
    const times = sunTimesOf(dateIndex);
    const highUtcMs = timeline.localUtc(dateIndex, dailyHighLocalHour * 60);
    const lowUtcMs = Math.min(
      times.sunriseUtcMs ?? timeline.localUtc(dateIndex, polarDailyLowLocalHour * 60),
      highUtcMs - msPerHour,
    );
    const day = Math.max(0, Math.min(dayCount - 1, dateIndex));
    extremes.push({
      lowUtcMs,
      highUtcMs,
      lowC: dailyValue(input.temperatures.lowC, day),
      highC: dailyValue(input.temperatures.highC, day),
    });
  }
  const anchors = dailyTemperatureAnchors(extremes);

  const days: SolarDay[] = timeline.days.map((day) => {
    const times = sunTimesOf(day.dayIndex);
    return {
      dayIndex: day.dayIndex,
      dateLocal: day.dateLocal,
      startUtcMs: day.startUtcMs,
      endUtcMs: day.endUtcMs,
      sunriseUtcMs: times.sunriseUtcMs,
      sunsetUtcMs: times.sunsetUtcMs,
      dayLengthH: times.dayLengthH,
      polar: times.polar,
      lowC: dailyValue(input.temperatures.lowC, day.dayIndex),
      highC: dailyValue(input.temperatures.highC, day.dayIndex),
    };
  });

  const stepCount = timeline.steps.length;
  const skyAt: SkyAtStep[] = new Array<SkyAtStep>(stepCount);
  for (let i = 0; i < stepCount; i++) {
    const step = timeline.steps[i] as TimelineStep;
    const sun = sunPosition(step.midUtcMs, latitudeDeg, longitudeDeg);
    skyAt[i] = {
      sunAltitudeDeg: sun.altitudeDeg,
      sunAzimuthDeg: sun.azimuthDeg,
      clear: clearSkyIrradiance(sun.altitudeDeg, dayOfYearUtc(step.midUtcMs), clearSkyOptions),
      albedo: input.groundAlbedo,
    };
  }

  const planes = stepPlanes(input, timeline.steps, skyAt);
  const c = input.sky.cloudyTransmission;
  const clearPlane = new Float64Array(stepCount);
  const overcastPlane = new Float64Array(stepCount);
  const stepDayIndex = new Int32Array(stepCount);
  const steps: SolarStep[] = new Array<SolarStep>(stepCount);
  for (let i = 0; i < stepCount; i++) {
    const step = timeline.steps[i] as TimelineStep;
    const sky = skyAt[i] as SkyAtStep;
    const plane = planes[i] ?? null;
    stepDayIndex[i] = step.dayIndex;
    if (plane !== null && sky.clear.ghiWm2 > 0) {
      const overcastGhiWm2 = c * sky.clear.ghiWm2;
      if (plane === 'all-headings') {
        clearPlane[i] = packPlaneAllHeadingsWm2(sky);
        overcastPlane[i] = overcastPlaneIrradianceWm2(packPlane(0).tiltDeg, overcastGhiWm2, sky.albedo);
      } else {
        clearPlane[i] = clearPlaneWm2(plane, sky);
        overcastPlane[i] = overcastPlaneIrradianceWm2(plane.tiltDeg, overcastGhiWm2, sky.albedo);
      }
    }
    steps[i] = {
      dayIndex: step.dayIndex,
      startUtcMs: step.startUtcMs,
      durationH: step.durationH,
      localTime: step.localTime,
      window: step.window,
      sunAltitudeDeg: sky.sunAltitudeDeg,
      sunAzimuthDeg: sky.sunAzimuthDeg,
      airTempC: airTemperatureAt(anchors, step.midUtcMs),
      clearSkyGhiWm2: sky.clear.ghiWm2,
    };
  }

  const k = Math.min(
    dayCount,
    cloudyRunDays(input.sky.clearShare, input.sky.cloudyPersistence, dayCount, input.sky.designLikelihood) +
      Math.max(0, options.extraCloudyRunDays ?? 0),
  );
  const skies = designSkies({
    days: dayCount,
    cloudyRunDays: k,
    stepDayIndex,
    clearPlaneWm2: clearPlane,
    overcastPlaneWm2: overcastPlane,
    clearShare: input.sky.clearShare,
    canopyShade: input.sky.canopyShade,
  });
  return { steps, days, skies, cloudyRunDays: k };
}

/** The panel's plane in each step from the carry modes; propped panels are aimed per re-aim interval. */
function stepPlanes(input: TripSolarInput, steps: readonly TimelineStep[], skyAt: readonly SkyAtStep[]): StepPlane[] {
  const planes: StepPlane[] = new Array<StepPlane>(steps.length).fill(null);
  const reaimMs = input.reaimEveryH * msPerHour;
  const bearings = input.walkingBearingsDeg;
  // Camp steps of one re-aim interval share one aim: the sun at the middle of the interval's sunlit part.
  let groupKey = '';
  let group: number[] = [];
  const flushGroup = () => {
    const lit = group.filter((i) => (skyAt[i] as SkyAtStep).sunAltitudeDeg > 0);
    const first = lit[0];
    const last = lit[lit.length - 1];
    if (first !== undefined && last !== undefined) {
      const firstStep = steps[first] as TimelineStep;
      const lastStep = steps[last] as TimelineStep;
      const aimUtcMs = (firstStep.startUtcMs + lastStep.endUtcMs) / 2;
      let aim = sunPosition(aimUtcMs, input.latitudeDeg, input.longitudeDeg);
      if (!(aim.altitudeDeg > 0)) {
        const highest = lit.reduce((a, b) =>
          (skyAt[b] as SkyAtStep).sunAltitudeDeg > (skyAt[a] as SkyAtStep).sunAltitudeDeg ? b : a,
        );
        const sky = skyAt[highest] as SkyAtStep;
        aim = { altitudeDeg: sky.sunAltitudeDeg, azimuthDeg: sky.sunAzimuthDeg };
      }
      const plane = proppedPlane(aim.altitudeDeg, aim.azimuthDeg);
      for (const i of group) planes[i] = plane;
    }
    group = [];
  };

  for (let i = 0; i < steps.length; i++) {
    const step = steps[i] as TimelineStep;
    if (step.window === 'walk' && input.carry.walking === 'pack') {
      if (bearings === null || bearings.length === 0) planes[i] = 'all-headings';
      else planes[i] = packPlane(bearings.length === 1 ? (bearings[0] ?? 0) : (bearings[step.dayIndex] ?? 0));
    } else if (step.window === 'camp' && input.carry.camp === 'flat') {
      planes[i] = flatPlane;
    } else if (step.window === 'camp' && input.carry.camp === 'propped') {
      const interval = Math.floor((step.midUtcMs - step.windowStartUtcMs) / reaimMs);
      const key = `${step.windowStartUtcMs}:${interval}`;
      if (key !== groupKey) {
        flushGroup();
        groupKey = key;
      }
      group.push(i);
    }
  }
  flushGroup();
  return planes;
}
