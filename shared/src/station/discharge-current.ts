import type { StationBattery, StationWarning } from './types.js';

/** The outcome of checking a draw against a pack's continuous discharge rating. */
export interface DischargeCheck {
  /** The draw as a C-rate, C (current / rated Ah). */
  drawCRate: number;
  /** The maker's largest continuous current, A, when the maker gives a rating. */
  maxDischargeA?: number;
  warning?: StationWarning;
}

/**
 * Checks a steady draw (e.g. a radio's transmit current) against the maker's continuous discharge rating, A =
 * discharge C-rate × Ah. A warning when the draw exceeds it, and also a warning when the maker gives no rating (the
 * pack's protection circuit may cut out under a transmit peak).
 * @example checkDischargeCurrent({ chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 3, dischargeCRate: 1 }, 4).warning?.id // 'discharge-over-rating'
 */
export function checkDischargeCurrent(
  battery: Pick<StationBattery, 'capacityAh' | 'dischargeCRate'>,
  currentA: number,
): DischargeCheck {
  const drawCRate = currentA / battery.capacityAh;
  if (battery.dischargeCRate === undefined) {
    return {
      drawCRate,
      warning: {
        id: 'discharge-rating-missing',
        severity: 'warning',
        text: `The pack has no continuous discharge rating from its maker, so a draw of ${round1(currentA)} A (${round2(drawCRate)}C) cannot be checked. Look it up before running a radio from it.`,
      },
    };
  }
  const maxDischargeA = battery.dischargeCRate * battery.capacityAh;
  if (currentA > maxDischargeA) {
    return {
      drawCRate,
      maxDischargeA,
      warning: {
        id: 'discharge-over-rating',
        severity: 'warning',
        text: `A draw of ${round1(currentA)} A is more than the ${round1(maxDischargeA)} A this pack is rated to give continuously (${battery.dischargeCRate}C). Its protection may cut out while transmitting; use a larger pack or a lower power.`,
      },
    };
  }
  return { drawCRate, maxDischargeA };
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}
