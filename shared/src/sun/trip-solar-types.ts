/**
 * The contract between the sun/sky side of the engine and the electrical side (harvest, storage, simulation):
 * one pass over the trip's place, dates, windows, carry modes and sky produces the irradiance on the panel's
 * plane, step by step, in each design sky. It does not depend on any panel, so it is computed once per trip
 * and shared by every panel, every kit the solver tries and every simulation.
 */

/** What the panel is doing in a step: strapped to the pack, out at camp, or neither (stowed, no top-ups). */
export type StepWindow = 'walk' | 'camp' | 'none';

/** The four design skies (see the sky module). `expected` is always first. */
export type DesignSkyId = 'expected' | 'cloudy-start' | 'cloudy-middle' | 'cloudy-end';

/** One simulation step (an hour, or shorter at a day boundary or a DST change). */
export interface SolarStep {
  /** 0-based trip day; day d runs from its walking-window start to the next day's walking-window start. */
  dayIndex: number;
  /** Step start, ms since the Unix epoch (UTC). */
  startUtcMs: number;
  /** Step length in hours (1 for hourly steps; less where a day boundary or DST change cuts a step). */
  durationH: number;
  /** Local clock time at the step start, `HH:mm`, in the trip's IANA time zone. */
  localTime: string;
  /** Which window the step belongs to (walking window, camp window, or neither). */
  window: StepWindow;
  /** Sun altitude at mid-step, degrees above the horizon, refraction-corrected; negative below. */
  sunAltitudeDeg: number;
  /** Sun azimuth at mid-step, degrees clockwise from north. */
  sunAzimuthDeg: number;
  /** Air temperature at mid-step, °C, from the day's low and high. */
  airTempC: number;
  /** Clear-sky global horizontal irradiance at mid-step, W/m². */
  clearSkyGhiWm2: number;
}

/** Per trip day facts for the ledger, the day strip and the sun-path chart. */
export interface SolarDay {
  dayIndex: number;
  /** Local calendar date of the day's start, `YYYY-MM-DD`. */
  dateLocal: string;
  startUtcMs: number;
  endUtcMs: number;
  /** Sunrise and sunset on that local date; null in polar day or polar night. */
  sunriseUtcMs: number | null;
  sunsetUtcMs: number | null;
  /** Hours of sun above the horizon on that local date (0 in polar night, 24 in polar day). */
  dayLengthH: number;
  /** `day` when the sun never sets that date, `night` when it never rises, else null. */
  polar: 'day' | 'night' | null;
  lowC: number;
  highC: number;
}

/** One design sky: which days are cloudy and what reaches the panel's plane in each step. */
export interface DesignSky {
  id: DesignSkyId;
  /** Per trip day: true where the day is in the design run of cloudy days (always false in `expected`). */
  cloudyDays: boolean[];
  /**
   * Irradiance on the panel's plane as it is carried in each step, W/m², after clouds and canopy shade;
   * 0 where the panel is stowed. Same length and order as `TripSolarSeries.steps`.
   */
  planeIrradianceWm2: number[];
}

/** Everything the electrical side needs from the sun and the sky for one trip. */
export interface TripSolarSeries {
  steps: SolarStep[];
  days: SolarDay[];
  /** `expected` first, then `cloudy-start`, `cloudy-middle`, `cloudy-end`. */
  skies: DesignSky[];
  /** `k`: the design run of cloudy days for this trip's length and design likelihood. */
  cloudyRunDays: number;
}
