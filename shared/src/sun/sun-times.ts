/**
 * Sunrise, sunset and day length on a local calendar date, from suncalc 2.x (Meeus, Astronomical
 * Algorithms, 2nd ed., ch. 15), with polar day and polar night reported instead of NaN.
 */
import { getTimes } from 'suncalc';
import { localToUtcMs, type CalendarDate } from './zone-clock.js';
import { msPerHour } from './time-constants.js';

/** Sun events of one local date. */
export interface SunTimes {
  /** Sunrise (upper limb on the horizon, standard refraction), UTC ms; null in polar day or night. */
  sunriseUtcMs: number | null;
  /** Sunset, UTC ms; null in polar day or night. */
  sunsetUtcMs: number | null;
  /** Solar noon (the sun's highest point), UTC ms. */
  solarNoonUtcMs: number;
  /** Hours from sunrise to sunset: 24 in polar day, 0 in polar night. */
  dayLengthH: number;
  /** `day` when the sun never sets, `night` when it never rises, else null. */
  polar: 'day' | 'night' | null;
}

/**
 * Sun events of the solar day whose noon is nearest local clock noon on `date` in `timeZone`.
 * @example sunTimesOnLocalDate({ year: 2026, month: 6, day: 21 }, 78, 15, 'Arctic/Longyearbyen').polar // 'day'
 */
export function sunTimesOnLocalDate(
  date: CalendarDate,
  latitudeDeg: number,
  longitudeDeg: number,
  timeZone: string,
): SunTimes {
  return sunTimesNear(localToUtcMs(date, 12 * 60, timeZone), latitudeDeg, longitudeDeg);
}

/** Sun events of the solar day whose noon is nearest the instant `nearUtcMs`. */
export function sunTimesNear(nearUtcMs: number, latitudeDeg: number, longitudeDeg: number): SunTimes {
  const times = getTimes(new Date(nearUtcMs), latitudeDeg, longitudeDeg);
  const solarNoonUtcMs = times.solarNoon.getTime();
  if (times.sunrise && times.sunset) {
    const sunriseUtcMs = times.sunrise.getTime();
    const sunsetUtcMs = times.sunset.getTime();
    return {
      sunriseUtcMs,
      sunsetUtcMs,
      solarNoonUtcMs,
      dayLengthH: Math.max(0, (sunsetUtcMs - sunriseUtcMs) / msPerHour),
      polar: null,
    };
  }
  const polarDay = times.alwaysUp === true;
  return {
    sunriseUtcMs: null,
    sunsetUtcMs: null,
    solarNoonUtcMs,
    dayLengthH: polarDay ? 24 : 0,
    polar: polarDay ? 'day' : 'night',
  };
}
