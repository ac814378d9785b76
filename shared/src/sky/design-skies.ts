/**
 * The four design skies: the expected sky (every day at the mean of clear and cloudy) and a run of `k`
 * cloudy days placed at the start, in the middle and at the end of the trip, the other days at the mean.
 */
import type { DesignSky, DesignSkyId } from '../sun/trip-solar-types.js';

/** Ids of the design skies in their fixed order (`expected` first). */
export const designSkyIds: readonly DesignSkyId[] = ['expected', 'cloudy-start', 'cloudy-middle', 'cloudy-end'];

/**
 * Which days are in the design cloudy run for a sky. The middle run starts at ⌊(days − k) / 2⌋.
 * @example cloudyDayFlags('cloudy-middle', 5, 2) // [false, true, true, false, false]
 */
export function cloudyDayFlags(id: DesignSkyId, days: number, runDays: number): boolean[] {
  const k = Math.max(0, Math.min(days, Math.floor(runDays)));
  const first = id === 'cloudy-start' ? 0 : id === 'cloudy-middle' ? Math.floor((days - k) / 2) : days - k;
  return Array.from({ length: days }, (_, day) => id !== 'expected' && k > 0 && day >= first && day < first + k);
}

/** Per-step inputs of the design skies. */
export interface DesignSkyInput {
  /** Trip days (nights + 1). */
  days: number;
  /** The design run of cloudy days k. */
  cloudyRunDays: number;
  /** Trip day of each step. */
  stepDayIndex: ArrayLike<number>;
  /** Plane irradiance in each step under a clear sky, W/m² (0 where stowed). */
  clearPlaneWm2: ArrayLike<number>;
  /** Plane irradiance in each step under overcast (all diffuse), W/m² (0 where stowed). */
  overcastPlaneWm2: ArrayLike<number>;
  /** Long-run share of clear days p, 0–1. */
  clearShare: number;
  /** Share of light the canopy blocks, 0–1. */
  canopyShade: number;
}

/**
 * Builds the four design skies from clear and overcast plane irradiance: mean = p × clear + (1 − p) ×
 * overcast, cloudy run days = overcast, and everything × (1 − canopy shade).
 * @example designSkies({ days: 1, cloudyRunDays: 1, stepDayIndex: [0], clearPlaneWm2: [800], overcastPlaneWm2: [100], clearShare: 0.5, canopyShade: 0 })[1].planeIrradianceWm2 // [100]
 */
export function designSkies(input: DesignSkyInput): DesignSky[] {
  const stepCount = input.stepDayIndex.length;
  const open = 1 - input.canopyShade;
  const p = input.clearShare;
  const meanWm2 = new Array<number>(stepCount);
  const cloudyWm2 = new Array<number>(stepCount);
  for (let i = 0; i < stepCount; i++) {
    const clear = input.clearPlaneWm2[i] ?? 0;
    const overcast = input.overcastPlaneWm2[i] ?? 0;
    meanWm2[i] = (p * clear + (1 - p) * overcast) * open;
    cloudyWm2[i] = overcast * open;
  }
  return designSkyIds.map((id) => {
    const cloudyDays = cloudyDayFlags(id, input.days, input.cloudyRunDays);
    const planeIrradianceWm2 = new Array<number>(stepCount);
    for (let i = 0; i < stepCount; i++) {
      const day = input.stepDayIndex[i] ?? 0;
      planeIrradianceWm2[i] = (cloudyDays[day] ? cloudyWm2[i] : meanWm2[i]) ?? 0;
    }
    return { id, cloudyDays, planeIrradianceWm2 };
  });
}
