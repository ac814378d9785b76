/**
 * Hourly air temperature from a day's low and high: a two-part cosine through the low at sunrise and the
 * high at 15:00 local, falling to the next day's low at the next sunrise. Cosine interpolation between
 * daily extremes is common practice in crop and building simulation (e.g. the scheme in Goudriaan &
 * van Laar, Modelling Potential Crop Growth Processes, 1994, which puts the high at 14:00 — `from memory`);
 * `common practice` for the 15:00 high.
 */

/** A daily extreme at an instant: the curve passes through these points. */
export interface TemperatureAnchor {
  /** Instant, UTC ms. */
  utcMs: number;
  /** Air temperature, °C. */
  tempC: number;
}

/**
 * Air temperature at an instant by cosine interpolation between the anchors that bracket it; before the
 * first and after the last anchor the nearest anchor's value holds. Anchors must be sorted by time.
 * @example airTemperatureAt([{ utcMs: 0, tempC: 0 }, { utcMs: 10, tempC: 10 }], 5) // 5
 */
export function airTemperatureAt(anchors: readonly TemperatureAnchor[], utcMs: number): number {
  const first = anchors[0];
  if (!first) throw new RangeError('airTemperatureAt needs at least one anchor');
  if (utcMs <= first.utcMs) return first.tempC;
  let lo = 0;
  let hi = anchors.length - 1;
  const last = anchors[hi] as TemperatureAnchor;
  if (utcMs >= last.utcMs) return last.tempC;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((anchors[mid] as TemperatureAnchor).utcMs <= utcMs) lo = mid;
    else hi = mid;
  }
  return cosineBetween(anchors[lo] as TemperatureAnchor, anchors[hi] as TemperatureAnchor, utcMs);
}

/** Half-cosine from a to b: flat at both ends, like a daily temperature near its extremes. */
export function cosineBetween(a: TemperatureAnchor, b: TemperatureAnchor, utcMs: number): number {
  const span = b.utcMs - a.utcMs;
  if (span <= 0) return b.tempC;
  const f = (utcMs - a.utcMs) / span;
  return a.tempC + ((b.tempC - a.tempC) * (1 - Math.cos(Math.PI * f))) / 2;
}

/** One local date's extremes and when they happen. */
export interface DailyExtremes {
  /** Instant of the day's low (sunrise, or a fixed morning hour in polar day or night), UTC ms. */
  lowUtcMs: number;
  /** Instant of the day's high (mid-afternoon), UTC ms. */
  highUtcMs: number;
  lowC: number;
  highC: number;
}

/**
 * Anchors of the daily curve from consecutive dates' extremes, dropping any that would run backwards.
 * @example dailyTemperatureAnchors([{ lowUtcMs: 0, highUtcMs: 9, lowC: 2, highC: 12 }]).length // 2
 */
export function dailyTemperatureAnchors(days: readonly DailyExtremes[]): TemperatureAnchor[] {
  const anchors: TemperatureAnchor[] = [];
  for (const day of days) {
    const points: TemperatureAnchor[] = [
      { utcMs: day.lowUtcMs, tempC: day.lowC },
      { utcMs: day.highUtcMs, tempC: day.highC },
    ];
    for (const point of points) {
      const previous = anchors[anchors.length - 1];
      if (!previous || point.utcMs > previous.utcMs) anchors.push(point);
    }
  }
  return anchors;
}
