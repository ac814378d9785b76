import type { DesignSkyId } from '../api/types';

const wholeNumber = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/** Below this a figure in Wh keeps one decimal (a headlamp's day); above it, whole Wh (a bank) — common practice. */
const wholeWhFromWh = 10;

/** @example formatGrams(1283) // '1,283 g' */
export const formatGrams = (massG: number): string => `${wholeNumber.format(Math.round(massG))} g`;

/**
 * Energy with the rounding a hiker needs: one decimal under 10 Wh, whole Wh above, and a plain 0 for nothing.
 * @example formatWh(4.86) // '4.9 Wh'
 * @example formatWh(133.4) // '133 Wh'
 */
export const formatWh = (energyWh: number): string => {
  if (Math.abs(energyWh) < 0.05) return '0 Wh';
  return Math.abs(energyWh) < wholeWhFromWh
    ? `${oneDecimal.format(energyWh)} Wh`
    : `${wholeNumber.format(Math.round(energyWh))} Wh`;
};

/** A share 0–1 as whole percent. @example formatPercent(0.883) // '88 %' */
export const formatPercent = (share: number): string => `${Math.round(share * 100)} %`;

/** Hours, whole when whole. @example formatHours(1.5) // '1.5 h' */
export const formatHours = (durationH: number): string =>
  `${Number.isInteger(durationH) ? durationH : oneDecimal.format(durationH)} h`;

/** Trip days are 0-based in the API and counted from 1 on screen. @example dayLabel(0) // 'Day 1' */
export const dayLabel = (dayIndex: number): string => `Day ${dayIndex + 1}`;

/** A local calendar date as a short label, read without any time-zone shift. @example formatShortDate('2026-12-23') // 'Wed 23 Dec' */
export const formatShortDate = (isoDate: string): string => {
  const [y, m, d] = isoDate.split('-').map(Number);
  if (!y || !m || !d) return isoDate;
  return new Date(Date.UTC(y, m - 1, d)).toLocaleDateString('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    timeZone: 'UTC',
  });
};

/** When a plan was made, in the reader's own clock. @example formatMoment('2026-12-02T14:10:00Z') // '2 Dec, 14:10' */
export const formatMoment = (iso: string): string =>
  new Date(iso).toLocaleString('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** Seconds for "solved in …". @example formatSeconds(4648) // '4.6 s' */
export const formatSeconds = (durationMs: number): string =>
  durationMs < 10_000 ? `${oneDecimal.format(durationMs / 1000)} s` : `${wholeNumber.format(durationMs / 1000)} s`;

/** The four design skies in our words. */
export const skyLabels: Record<DesignSkyId, string> = {
  expected: 'Expected sky',
  'cloudy-start': 'Cloudy run at the start',
  'cloudy-middle': 'Cloudy run mid-trip',
  'cloudy-end': 'Cloudy run at the end',
};

const kindNames: Record<string, string> = {
  panel: 'Panel',
  bank: 'Bank',
  battery: 'Battery',
  converter: 'Converter',
  controller: 'Controller',
  lead: 'Lead',
  device: 'Device',
};

/** The kind of a kit line in words. @example kindLabel('bank') // 'Bank' */
export const kindLabel = (kind: string): string => kindNames[kind] ?? kind.charAt(0).toUpperCase() + kind.slice(1);

/** "1 night" / "2 units": a count with its noun. */
export const plural = (count: number, one: string, many = `${one}s`): string => `${count} ${count === 1 ? one : many}`;
