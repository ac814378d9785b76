import { keepsUpToleranceShare } from '../constants/electrical.js';
import { maxTripNights } from '../constants/limits.js';
import type { DesignSkyId } from '../sun/trip-solar-types.js';
import type { SkyRun } from './run-sky.js';
import type { DeviceUnit, DryReason, KitVerdict, StoreUnit } from './types.js';
import type { MissingLink } from './connections.js';

const skyNames: Record<DesignSkyId, string> = {
  expected: 'the expected sky',
  'cloudy-start': 'a cloudy run at the start',
  'cloudy-middle': 'a cloudy run in the middle',
  'cloudy-end': 'a cloudy run at the end',
};

const reasonText: Record<DryReason, string> = {
  'no-charging-path': 'nothing in the kit can charge it',
  'stores-empty': 'the stores that charge it are empty',
  'store-at-reserve': 'charging it would take a store below its reserve',
  'charge-window-too-short': 'the camp window is too short to charge it at the power its path allows',
  'empty-between-top-ups': 'its own battery cannot cover the hours between camp top-ups',
};

/**
 * The day whose start "keeps up" compares the last day's start with: day 1 (the first dawn after a night of top-ups)
 * when the trip has at least 2 nights, else day 0. Day 0 starts with every store and device full by definition, so
 * comparing with it would call every kit that tops devices up overnight a drain, even one whose harvest refills it
 * every day; from day 1 on, equal dawns mean the harvest covers the demand.
 * @example keepsUpReferenceDay(15) // 1
 */
export function keepsUpReferenceDay(dayCount: number): number {
  return dayCount >= 3 ? 1 : 0;
}

/**
 * Days past which an extrapolated dry day is not worth naming: twice the longest trip Gramwatt plans. A product
 * choice, not a physical fact — a straight-line drain says little about day 110 of a five-night trip.
 */
const extrapolationHorizonDays = 2 * (maxTripNights + 1);

/**
 * The end of a "lasts the trip" verdict: the day it would run dry, or — past three times the trip's length (at most
 * {@link extrapolationHorizonDays}) — that it would last well past that day.
 * @example wouldRunDryText(8, 6) // 'it would run dry on day 9 if the trip went on'
 * @example wouldRunDryText(109, 6) // 'at this rate it would last well past day 18 if the trip went on'
 */
export function wouldRunDryText(wouldRunDryOnDayIndex: number, dayCount: number): string {
  const horizon = Math.min(extrapolationHorizonDays, 3 * dayCount);
  if (wouldRunDryOnDayIndex + 1 > horizon)
    return `at this rate it would last well past day ${horizon} if the trip went on`;
  return `it would run dry on day ${wouldRunDryOnDayIndex + 1} if the trip went on`;
}

/**
 * The verdict over all design skies. Runs dry on day N if, in some design sky, a device cannot get the energy its use
 * profile needs on day N (the earliest such day over the skies; the first sky in order on a tie). Otherwise, in the
 * expected sky (`runs[0]`): keeps up when stored energy at the start of the last day is at least that at the start
 * of the reference day (`keepsUpReferenceDay`) within 1 %, else lasts the trip, with the day it would run dry if the trip went on by extending
 * the expected sky's average daily drain of energy above the reserve.
 */
export function kitVerdict(
  runs: readonly { skyId: DesignSkyId; run: SkyRun }[],
  devices: readonly DeviceUnit[],
  stores: readonly StoreUnit[],
  dayCount: number,
): KitVerdict {
  let earliest: { skyId: DesignSkyId; run: SkyRun } | null = null;
  for (const r of runs) {
    if (r.run.dry && (!earliest || r.run.dry.dayIndex < (earliest.run.dry?.dayIndex ?? Infinity))) earliest = r;
  }
  if (earliest?.run.dry) {
    const dry = earliest.run.dry;
    const device = devices[dry.deviceIndex];
    const storeIds = stores.filter((_, s) => device?.paths[s]).map((s) => s.storeId);
    const missing: MissingLink[] = device?.missing ?? [];
    const missingText = missing.length ? `; missing: ${missing.map((m) => m.text).join(', ')}` : '';
    return {
      status: 'runs-dry',
      dayIndex: dry.dayIndex,
      skyId: earliest.skyId,
      deviceId: device?.deviceId ?? '',
      reason: dry.reason,
      storeIds,
      missing,
      text: `Runs dry on day ${dry.dayIndex + 1} in ${skyNames[earliest.skyId]}: ${device?.deviceId ?? 'a device'} runs out — ${reasonText[dry.reason]}${missingText}.`,
    };
  }
  const worstMarginShare = Math.min(...runs.map((r) => r.run.worstMarginShare), 1);
  const expected = runs[0]?.run;
  const spare = `${Math.round(worstMarginShare * 100)} % to spare on the worst day`;
  const lastDay = dayCount - 1;
  const refDay = keepsUpReferenceDay(dayCount);
  const storedRef = expected?.storedStartByDayWh[refDay] ?? 0;
  const storedLast = expected?.storedStartByDayWh[lastDay] ?? 0;
  if (!expected || lastDay <= refDay || storedLast >= storedRef * (1 - keepsUpToleranceShare)) {
    return { status: 'keeps-up', worstMarginShare, text: `Keeps up: ${spare}.` };
  }
  const aboveRef = expected.aboveFloorStartByDayWh[refDay] ?? 0;
  const aboveLast = Math.max(0, expected.aboveFloorStartByDayWh[lastDay] ?? 0);
  const drainPerDayWh = (aboveRef - aboveLast) / (lastDay - refDay);
  const daysLeft = drainPerDayWh > 0 ? Math.floor(aboveLast / drainPerDayWh) : Number.MAX_SAFE_INTEGER - lastDay;
  const wouldRunDryOnDayIndex = lastDay + daysLeft;
  return {
    status: 'lasts-trip',
    worstMarginShare,
    wouldRunDryOnDayIndex,
    text: `Lasts the trip: ${spare}; ${wouldRunDryText(wouldRunDryOnDayIndex, dayCount)}.`,
  };
}
