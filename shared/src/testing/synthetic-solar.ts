import type {
  DesignSky,
  DesignSkyId,
  SolarDay,
  SolarStep,
  StepWindow,
  TripSolarSeries,
} from '../sun/trip-solar-types.js';

/** Options of `syntheticTripSolar`, all with defaults. Times are hours on a UTC clock (the synthetic place is at 0°). */
export interface SyntheticSolarOptions {
  nights: number;
  /** Plane irradiance at solar noon on a clear day, W/m² (default 1000: a panel aimed at a high sun). */
  peakWm2?: number;
  sunriseHour?: number;
  sunsetHour?: number;
  /** Walking window, local hours [start, end); camp runs from walk end to next walk start. */
  walkStartHour?: number;
  walkEndHour?: number;
  lowC?: number;
  highC?: number;
  /** Multiplier on every sky's irradiance in the expected sky (default 1) and on cloudy days (default 0.2). */
  expectedShare?: number;
  cloudyShare?: number;
  /** Design run of cloudy days (default 2). */
  cloudyRunDays?: number;
  /** Step length, h (default 1). */
  stepH?: number;
}

/**
 * A synthetic trip solar series for tests: a clear-day bell (half sine from sunrise to sunset), a daily air
 * temperature cosine (low at sunrise, high at 15:00), hourly steps, and four design skies with a run of cloudy days at
 * the start, middle and end. Not a physical sun model — the sun module provides that.
 */
export function syntheticTripSolar(options: SyntheticSolarOptions): TripSolarSeries {
  const o = {
    peakWm2: 1000,
    sunriseHour: 6,
    sunsetHour: 18,
    walkStartHour: 8,
    walkEndHour: 16,
    lowC: 5,
    highC: 20,
    expectedShare: 1,
    cloudyShare: 0.2,
    cloudyRunDays: 2,
    stepH: 1,
    ...options,
  };
  const dayCount = o.nights + 1;
  const steps: SolarStep[] = [];
  const clear: number[] = [];
  const days: SolarDay[] = [];
  const hourMs = 3_600_000;
  for (let d = 0; d < dayCount; d++) {
    const dayStartMs = (d * 24 + o.walkStartHour) * hourMs;
    const lengthH = d === dayCount - 1 ? o.walkEndHour - o.walkStartHour : 24;
    days.push({
      dayIndex: d,
      dateLocal: `2030-06-${String(1 + d).padStart(2, '0')}`,
      startUtcMs: dayStartMs,
      endUtcMs: dayStartMs + lengthH * hourMs,
      sunriseUtcMs: (d * 24 + o.sunriseHour) * hourMs,
      sunsetUtcMs: (d * 24 + o.sunsetHour) * hourMs,
      dayLengthH: o.sunsetHour - o.sunriseHour,
      polar: null,
      lowC: o.lowC,
      highC: o.highC,
    });
    for (let t = 0; t < lengthH; t += o.stepH) {
      const hour = (o.walkStartHour + t) % 24;
      const mid = hour + o.stepH / 2;
      const window: StepWindow = hour >= o.walkStartHour && hour < o.walkEndHour ? 'walk' : 'camp';
      const daylight = mid > o.sunriseHour && mid < o.sunsetHour;
      const g = daylight ? o.peakWm2 * Math.sin((Math.PI * (mid - o.sunriseHour)) / (o.sunsetHour - o.sunriseHour)) : 0;
      const phase = (2 * Math.PI * (mid - 15)) / 24;
      const airTempC = o.lowC + ((o.highC - o.lowC) * (1 + Math.cos(phase))) / 2;
      steps.push({
        dayIndex: d,
        startUtcMs: dayStartMs + t * hourMs,
        durationH: o.stepH,
        localTime: `${String(Math.floor(hour)).padStart(2, '0')}:${String(Math.round((hour % 1) * 60)).padStart(2, '0')}`,
        window,
        sunAltitudeDeg: daylight ? 45 : -10,
        sunAzimuthDeg: 180,
        airTempC,
        clearSkyGhiWm2: g,
      });
      clear.push(g);
    }
  }
  const runStarts: Record<DesignSkyId, number> = {
    expected: -1,
    'cloudy-start': 0,
    'cloudy-middle': Math.max(0, Math.floor((dayCount - o.cloudyRunDays) / 2)),
    'cloudy-end': Math.max(0, dayCount - o.cloudyRunDays),
  };
  const skies: DesignSky[] = (Object.keys(runStarts) as DesignSkyId[]).map((id) => {
    const start = runStarts[id];
    const cloudyDays = Array.from(
      { length: dayCount },
      (_, d) => start >= 0 && d >= start && d < start + o.cloudyRunDays,
    );
    return {
      id,
      cloudyDays,
      planeIrradianceWm2: steps.map(
        (s, i) => (clear[i] ?? 0) * (cloudyDays[s.dayIndex] ? o.cloudyShare : o.expectedShare),
      ),
    };
  });
  return { steps, days, skies, cloudyRunDays: o.cloudyRunDays };
}

/** A copy of a series with every sky's irradiance multiplied (more sun / less sun). */
export function scaleSolar(solar: TripSolarSeries, factor: number): TripSolarSeries {
  return {
    ...solar,
    skies: solar.skies.map((s) => ({ ...s, planeIrradianceWm2: s.planeIrradianceWm2.map((g) => g * factor) })),
  };
}
