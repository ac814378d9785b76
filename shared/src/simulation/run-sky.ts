import { energyEpsilonWh, keepsUpToleranceShare } from '../constants/electrical.js';
import type { CompiledKit } from './compile-kit.js';
import type { DryReason } from './types.js';
import { keepCompiled } from '../jit/keep-compiled.js';

/** Ledger columns per day, in a flat `Float64Array` (day × column). */
export const ledgerColumns = [
  'availableHarvestWh',
  'harvestWh',
  'spilledWh',
  'frozenSpilledWh',
  'storeChargeLossWh',
  'storeOutputLossWh',
  'converterLossWh',
  'deviceChargeLossWh',
  'toppedUpWh',
  'deliveredWh',
  'unmetWh',
  'storedStartWh',
  'storedEndWh',
  'storesStartWh',
  'storesEndWh',
  'devicesStartWh',
  'devicesEndWh',
  'frozenHours',
] as const;
const C = Object.fromEntries(ledgerColumns.map((k, i) => [k, i])) as Record<(typeof ledgerColumns)[number], number>;
const columnCount = ledgerColumns.length;

/** Buffers a recorded run writes into (allocated once per sky). */
export interface SkyRecord {
  ledger: Float64Array;
  storedWhByStep: Float64Array;
  storesWhByStep: Float64Array;
  unitWhByStep: Float64Array;
  /** Flat session log: per step, per flow. Called only when recording. */
  onFlow?: (kind: 'harvest' | 'top-up' | 'live', stepIndex: number, from: number, to: number, energyWh: number) => void;
}

/** The first dry step of a run, by index. */
export interface SkyDry {
  stepIndex: number;
  dayIndex: number;
  deviceIndex: number;
  reason: DryReason;
  shortWh: number;
}

/** Result of one sky's run. */
export interface SkyRun {
  dry: SkyDry | null;
  worstMarginShare: number;
  /**
   * Stored energy (stores + devices) at the start of each day as the verdict counts it, Wh: a device filled only as far
   * as it will still use (it reaches a shared store) counts as full when it holds all that and the stores feeding it are full
   * (scratch-owned when `stopAtDry`, else a copy).
   */
  storedStartByDayWh: Float64Array;
  /** Energy above the floors (stores above their reserve + devices, counted as above) at the start of each day, Wh. */
  aboveFloorStartByDayWh: Float64Array;
}

/** Scratch state reused between runs of the same compiled kit. */
export interface SkyScratch {
  storeWh: Float64Array;
  deviceWh: Float64Array;
  panelRemWh: Float64Array;
  storedStartByDayWh: Float64Array;
  aboveFloorStartByDayWh: Float64Array;
  storeLimitWh: Float64Array;
  breakpoints: Float64Array;
  /** Per panel × store: the store's harvest tier for that panel's harvest (`harvestTiers`; fixed by the kit). */
  harvestTier: Uint16Array;
  /** One more than the highest harvest tier. */
  harvestTierCount: number;
  /** Per store: 1 when the current panel water-fills it in the current tier. */
  harvestFillSet: Uint8Array;
  /** Per store: the charge rate (W of battery gain) it gives the device being topped up, in this step. */
  topUpRateW: Float64Array;
  /** Per store: what it can give the device being topped up in the current pass (W of battery gain). */
  topUpUnitCapW: Float64Array;
  /** Per device × step: `leastLevelsWh` (fixed by the kit and the devices' use, never by sun). */
  leastLevelWh: Float64Array;
  /** The hour unit that early camp top-ups stop at a multiple of (`topUpUnitH`; fixed by the kit and the devices' use). */
  topUpUnitH: number;
}

/*
 * A camp step's top-ups run in one pass, the devices in the trip's order, each raised once to a level fixed by the
 * clock: `earlyCampUnits` of the kit's hour unit of its use early in the camp window, `leavingUnits` in the hour before
 * the last (`fillBeforeLeavingH`), its target in the last hour. Rounds that raised first whichever device held the
 * fewest hours (up to 2026-12-04) found kits lighter on some bench lockers, but a device's place among the others then
 * moved with its demand, and with it which store its charge power went to: a store could end higher with more demand
 * (README, Dispatch, "One pass"). The levels were chosen on the ten 50-item bench lockers (seeds 50–59, 14 nights;
 * README): 1 unit early left one locker at the search's round cap, 2 units cost 72 g on another; without the hour
 * before the last, two lockers came out 17 and 22 g heavier; anything from 1.75 to 2.5 units there gives the same kits.
 */
/** The last hours of a camp window, in which devices are raised past the early level: they leave camp topped up. */
const fillBeforeLeavingH = 2;
/** The last hour of a camp window, in which devices are raised to their targets. */
const lastHourH = 1;
/** Hour units a device is raised to early in a camp window, so the banks keep energy for whichever device runs low. */
const earlyCampUnits = 1.5;
/** Hour units a device is raised to in the hour before the last, so the last hour's fill starts from even levels. */
const leavingUnits = 2;
interface HullFlows {
  drawW: number;
  converterLossW: number;
  deviceLossW: number;
}
const flowsAt: HullFlows = { drawW: 0, converterLossW: 0, deviceLossW: 0 };

/** Allocates scratch buffers for a compiled kit. */
export function skyScratch(k: CompiledKit): SkyScratch {
  return {
    storeWh: new Float64Array(k.storeCount),
    deviceWh: new Float64Array(k.deviceCount),
    panelRemWh: new Float64Array(k.panelCount),
    storedStartByDayWh: new Float64Array(k.dayCount),
    aboveFloorStartByDayWh: new Float64Array(k.dayCount),
    storeLimitWh: new Float64Array(k.storeCount),
    breakpoints: new Float64Array(2 * k.storeCount + 1),
    ...harvestTiers(k),
    harvestFillSet: new Uint8Array(k.storeCount),
    topUpRateW: new Float64Array(k.storeCount),
    topUpUnitCapW: new Float64Array(k.storeCount),
    leastLevelWh: leastLevelsWh(k),
    topUpUnitH: topUpUnitH(k),
  };
}

/**
 * The hour unit of the top-ups: the fewest hours any topped-up device's full battery holds at its mean hourly use
 * (Infinity when none uses anything). It scales as 1 / demand when every device's use scales alike, so the early camp
 * target in Wh does not move.
 */
function topUpUnitH(k: CompiledKit): number {
  let unitH = Infinity;
  for (let d = 0; d < k.deviceCount; d++) {
    const useWhPerH = k.deviceDemandWhPerH[d] ?? 0;
    if (k.deviceTopsUp[d] === 1 && useWhPerH > 0) unitH = Math.min(unitH, (k.deviceCapWh[d] ?? 0) / useWhPerH);
  }
  return unitH;
}

/**
 * Per device × step: the least its battery must hold at the end of the step to reach the trip's end without running
 * dry, charged in every later camp step (where top-ups run) at its efficient rate — each store's most efficient path
 * at full rate, summed over the stores it reaches, within the device's charge power — and never faster. Backwards from
 * the trip's end: level before step j = use in j + max(0, level after j − charge in j). Use and rates are fixed by the
 * kit and the devices, so the levels never move with the sun, and rise with demand.
 */
function leastLevelsWh(k: CompiledKit): Float64Array {
  const { storeCount: S, deviceCount: D, stepCount: N } = k;
  const levels = new Float64Array(D * N);
  for (let d = 0; d < D; d++) {
    if (k.deviceTopsUp[d] !== 1) continue;
    let efficientW = 0;
    for (let s = 0; s < S; s++) {
      if ((k.hullCount[s * D + d] ?? 0) > 0) efficientW += k.hullGainW[k.hullOffset[s * D + d] ?? 0] ?? 0;
    }
    efficientW = Math.min(efficientW, k.deviceGainMaxW[d] ?? 0);
    const useW = k.deviceDemandWhPerH[d] ?? 0;
    let after = 0;
    for (let j = N - 1; j >= 0; j--) {
      levels[d * N + j] = after;
      const dt = k.stepDurationH[j] ?? 0;
      const charges = k.stepCamp[j] === 1 && !(k.stepFrozen[j] === 1 && k.freezeBlocksDeviceTopUps);
      after = useW * dt + Math.max(0, after - (charges ? efficientW * dt : 0));
    }
  }
  return levels;
}

/**
 * Per panel × store: the store's harvest tier for that panel — 0 when no store the panel reaches outranks it, else one
 * more than the highest tier of those that do (`storeOutranks` is a strict partial order, so this is its depth among the
 * panel's stores). Each panel's harvest goes tier by tier; a store's tier depends only on the kit, never on what any
 * store holds, so each step's harvest is a fixed sequence of water-fills and stays monotone in the sun and in every
 * store's energy.
 */
function harvestTiers(k: CompiledKit): { harvestTier: Uint16Array; harvestTierCount: number } {
  const { storeCount: S, panelCount: P } = k;
  const tier = new Uint16Array(P * S);
  let count = S > 0 ? 1 : 0;
  for (let p = 0; p < P; p++) {
    // Relax until stable: at most S passes, as a chain of outranking stores has at most S members.
    for (let pass = 0, changed = true; changed && pass < S; pass++) {
      changed = false;
      for (let s = 0; s < S; s++) {
        if (k.panelReach[p * S + s] !== 1) continue;
        let t0 = 0;
        for (let t = 0; t < S; t++) {
          if (k.storeOutranks[s * S + t] !== 1 || k.panelReach[p * S + t] !== 1) continue;
          t0 = Math.max(t0, (tier[p * S + t] ?? 0) + 1);
        }
        if (t0 !== tier[p * S + s]) {
          tier[p * S + s] = t0;
          changed = true;
        }
        count = Math.max(count, t0 + 1);
      }
    }
  }
  return { harvestTier: tier, harvestTierCount: count };
}

/** Allocates record buffers for a compiled kit. */
export function skyRecord(k: CompiledKit): SkyRecord {
  return {
    ledger: new Float64Array(k.dayCount * columnCount),
    storedWhByStep: new Float64Array(k.stepCount),
    storesWhByStep: new Float64Array(k.stepCount),
    unitWhByStep: new Float64Array(k.stepCount * (k.storeCount + k.deviceCount)),
  };
}

/** Reads one ledger cell. */
export function ledgerCell(record: SkyRecord, dayIndex: number, column: (typeof ledgerColumns)[number]): number {
  return record.ledger[dayIndex * columnCount + C[column]] ?? 0;
}

/**
 * Runs one design sky step by step: each device uses its demand for the step from its own battery; in the camp window
 * the devices that need charging are topped up in one pass, in the trip's order, each to a level fixed by the clock
 * (1.5 hour units of its use early in camp, 2 in the hour before the last, its target in the last hour): from the
 * stores only they reach first, then from shared stores; to full, or — for a device that reaches a shared store — from
 * every store only as far as it will still use (merit order, down to each store's reserve, over the paths' hull, within
 * the device's charge power); then the step's harvest goes into the stores with the most room (levelling room, within
 * input limits, none below 0 °C; tier by tier, a store only after the stores that outrank it), so a bank a device drew
 * in the step takes its sun.
 * `stopAtDry` returns at the first dry step (the fast feasibility path).
 */
export function runSky(
  k: CompiledKit,
  skyIndex: number,
  scratch: SkyScratch,
  record: SkyRecord | null,
  stopAtDry: boolean,
): SkyRun {
  const { storeCount: S, deviceCount: D, panelCount: P } = k;
  const E = scratch.storeWh;
  const devE = scratch.deviceWh;
  const rem = scratch.panelRemWh;
  E.set(k.storeCapWh);
  devE.set(k.deviceCapWh);
  const series = k.panelSeries[skyIndex] ?? [];
  const ledger = record?.ledger;
  if (ledger) ledger.fill(0);
  const eps = energyEpsilonWh;
  // Loop guards far below the 1e-9 Wh the checks resolve, so they add no visible steps to the state.
  const tiny = 1e-13;
  keepCompiled('sky run', topUp);

  let capAboveFloor = 0;
  for (let s = 0; s < S; s++) capAboveFloor += (k.storeCapWh[s] ?? 0) - (k.storeFloorWh[s] ?? 0);
  for (let d = 0; d < D; d++) capAboveFloor += k.deviceCapWh[d] ?? 0;

  let dry: SkyDry | null = null;
  let worstMargin = 1;
  let currentDay = -1;
  const storedStartByDayWh = scratch.storedStartByDayWh;
  const aboveFloorStartByDayWh = scratch.aboveFloorStartByDayWh;
  storedStartByDayWh.fill(0);
  aboveFloorStartByDayWh.fill(0);

  const totals = () => {
    let stores = 0;
    let above = 0;
    for (let s = 0; s < S; s++) {
      const e = E[s] ?? 0;
      stores += e;
      above += e - (k.storeFloorWh[s] ?? 0);
    }
    let devices = 0;
    for (let d = 0; d < D; d++) devices += devE[d] ?? 0;
    return { stores, devices, above: above + devices };
  };

  let stepIndex = 0;
  let dayIndexNow = 0;
  let dt = 0;

  for (let i = 0; i < k.stepCount; i++) {
    dt = k.stepDurationH[i] ?? 0;
    stepIndex = i;
    const day = k.stepDay[i] ?? 0;
    dayIndexNow = day;
    const row = day * columnCount;
    if (day !== currentDay) {
      const t = totals();
      // A device that reaches a shared store is filled only as far as it will still use. For the verdict it counts as
      // full when it holds all it will use for the rest of the trip and every store that feeds it is full (within the
      // keeps-up tolerance): filling it then would only have taken harvest that the full stores spill.
      let liftWh = 0;
      if (k.anyShared) {
        for (let d = 0; d < D; d++) {
          if (k.deviceSharesStores[d] !== 1) continue;
          const e = devE[d] ?? 0;
          if (e < (k.deviceDemandWhPerH[d] ?? 0) * ((k.stepHoursAfter[i] ?? 0) + dt) - eps) continue;
          let feedersFull = true;
          for (let s = 0; s < S && feedersFull; s++) {
            if ((k.hullCount[s * D + d] ?? 0) === 0) continue;
            const capWh = k.storeCapWh[s] ?? 0;
            if ((E[s] ?? 0) < capWh * (1 - keepsUpToleranceShare)) feedersFull = false;
          }
          if (feedersFull) liftWh += Math.max(0, (k.deviceCapWh[d] ?? 0) - e);
        }
      }
      storedStartByDayWh[day] = t.stores + t.devices + liftWh;
      aboveFloorStartByDayWh[day] = t.above + liftWh;
      if (ledger) {
        ledger[row + C.storedStartWh] = t.stores + t.devices;
        ledger[row + C.storesStartWh] = t.stores;
        ledger[row + C.devicesStartWh] = t.devices;
      }
      currentDay = day;
    }
    const frozen = k.stepFrozen[i] === 1;

    // 1. Devices use their step's share of the day's demand from their own batteries; a device that can run live from a
    //    12 V pack takes what its battery lacks straight from its packs (merit order, down to each reserve).
    for (let d = 0; d < D; d++) {
      const need = (k.deviceDemandWhPerH[d] ?? 0) * dt;
      const have = devE[d] ?? 0;
      let used = Math.min(have, need);
      devE[d] = have - used;
      if (need - used > tiny) used += runLive(d, need - used);
      if (ledger) {
        ledger[row + C.deliveredWh] = (ledger[row + C.deliveredWh] ?? 0) + used;
        if (need > used) ledger[row + C.unmetWh] = (ledger[row + C.unmetWh] ?? 0) + (need - used);
      }
      if (need - used > eps && !dry) {
        dry = { stepIndex: i, dayIndex: day, deviceIndex: d, reason: dryReason(k, d, i), shortWh: need - used };
        if (stopAtDry) return finish();
      }
    }

    // 2. Camp top-ups of the devices that need charging, each store down to its reserve: first from the stores no other
    //    device reaches (merit order), then from the shared stores (merit order). A device that reaches no shared store
    //    is filled to full; one that does, only as far as it will still use for the rest of the trip, from every store —
    //    so it never takes from another's bank what it does not need, and its target moves with its demand the same way
    //    for all its stores (filled to full from its own bank but to its use left from a shared one, more demand let it
    //    fill from the shared bank and then leave harvest in its own bank). The device's own charge power is shared between
    //    stores (it may be moved from store to store within a step); within a store it may be switched between paths (the
    //    hull). Two passes over the stores in that order: first each store gives at most its most efficient path's full
    //    rate; then, only while the device holds less than the least level from which it reaches the trip's end charging
    //    at those rates (`leastLevelsWh`), the stores speed up, in the same order, within the charge power left, each
    //    store's extra draw taken from the hull above the rate it already gives. A faster, lossier path thus costs
    //    energy only when the device would otherwise run dry, and more demand only raises every store's rate in the step.
    //    One pass per step, the devices in the trip's order, each raised once: early in the camp window only up to
    //    `earlyCampUnits` of the kit's hour unit of its use (`topUpUnitH`), in the hour before the last to
    //    `leavingUnits`, in the last hour to its target. The order and the level are fixed by the kit and the clock,
    //    never by what a device holds, so each step is a fixed sequence of greedy draws, monotone in every store's energy
    //    and in the demand (README, Dispatch).
    if (k.stepCamp[i] === 1 && !(frozen && k.freezeBlocksDeviceTopUps)) {
      const rateW = scratch.topUpRateW;
      const leftH = k.stepCampLeftH[i] ?? 0;
      const units = leftH > fillBeforeLeavingH ? earlyCampUnits : leftH > lastHourH ? leavingUnits : Infinity;
      const levelH = units === Infinity ? Infinity : units * scratch.topUpUnitH;
      for (let d = 0; d < D; d++) {
        if (k.deviceTopsUp[d] !== 1) continue;
        const cap = k.deviceCapWh[d] ?? 0;
        const heldWh = devE[d] ?? 0;
        if (cap - heldWh <= tiny) continue;
        // A device that reaches a shared store is filled, from every store, only up to what it will still use for the
        // rest of the trip; any other device to full.
        const demandWhPerH = k.deviceDemandWhPerH[d] ?? 0;
        const fullWh = k.deviceSharesStores[d] === 1 ? Math.min(cap, demandWhPerH * (k.stepHoursAfter[i] ?? 0)) : cap;
        const targetWh = levelH === Infinity ? fullWh : Math.min(fullWh, levelH * demandWhPerH);
        const wantWh = targetWh - heldWh;
        const powerWh = (k.deviceGainMaxW[d] ?? 0) * dt;
        if (wantWh <= tiny || powerWh <= tiny) continue;
        rateW.fill(0);
        // Efficient paths up to the level; then, below the least level, the sped-up ones within the power left.
        const efficientWh = passOverStores(d, true, wantWh, powerWh);
        const shortWh = Math.min(targetWh, scratch.leastLevelWh[d * k.stepCount + i] ?? 0) - (heldWh + efficientWh);
        if (shortWh > tiny) passOverStores(d, false, shortWh, powerWh - efficientWh);
        for (let s = 0; s < S; s++) topUp(d, s, rateW[s] ?? 0);
      }
    }

    // 3. Harvest, after the top-ups (see the README, Dispatch: a bank a device drew in this step takes the step's sun).
    let availWh = 0;
    for (let p = 0; p < P; p++) {
      const w = (series[p]?.[i] ?? 0) * dt;
      rem[p] = w;
      availWh += w;
    }
    if (availWh > 0 && !frozen) {
      // Harvest goes to the stores with the most room (usable Wh), levelling their room, within input limits — but never
      // to a store ahead of a store that outranks it (`storeOutranks`: keeps more per input Wh, charges the same devices
      // as fast and as efficiently). Tier by tier (`harvestTiers`, fixed by the kit), each panel in turn (item id order)
      // water-fills the stores of the tier its port reaches; what a tier cannot take passes to the next. Every step is a
      // water-fill over a fixed set, so a fuller store or more harvest never leaves any store lower after the step;
      // admitting a store once its outrankers were full or at their limit was not (the README's known gap (5)).
      const limitLeft = scratch.storeLimitWh;
      for (let s = 0; s < S; s++) limitLeft[s] = (k.storeInputMaxW[s] ?? 0) * dt;
      const tierOf = scratch.harvestTier;
      const fillSet = scratch.harvestFillSet;
      for (let tier = 0; tier < scratch.harvestTierCount; tier++) {
        for (let p = 0; p < P; p++) {
          const h = rem[p] ?? 0;
          if (h <= tiny) continue;
          let total0 = 0;
          for (let s = 0; s < S; s++) {
            fillSet[s] = 0;
            if (k.panelReach[p * S + s] !== 1 || tierOf[p * S + s] !== tier) continue;
            const room = (k.storeCapWh[s] ?? 0) - (E[s] ?? 0);
            if (room <= tiny) continue;
            fillSet[s] = 1;
            total0 += Math.min(limitLeft[s] ?? 0, room / storeEta(k, s));
          }
          if (total0 <= 0) continue;
          const level = total0 > h ? waterLevel(k, E, limitLeft, fillSet, h, scratch.breakpoints) : 0;
          for (let s = 0; s < S; s++) {
            if (fillSet[s] !== 1) continue;
            const room = (k.storeCapWh[s] ?? 0) - (E[s] ?? 0);
            const etaC = k.storeChargeEff[s] ?? 1;
            const etaO = k.storeOutputEff[s] ?? 1;
            const take = Math.min(limitLeft[s] ?? 0, Math.max(0, room - level) / (etaC * etaO), rem[p] ?? 0);
            if (!(take > 0)) continue;
            rem[p] = (rem[p] ?? 0) - take;
            limitLeft[s] = (limitLeft[s] ?? 0) - take;
            E[s] = Math.min(k.storeCapWh[s] ?? 0, (E[s] ?? 0) + take * etaC * etaO);
            if (record?.onFlow) record.onFlow('harvest', i, p, s, take);
            if (ledger) {
              ledger[row + C.harvestWh] = (ledger[row + C.harvestWh] ?? 0) + take;
              ledger[row + C.storeChargeLossWh] = (ledger[row + C.storeChargeLossWh] ?? 0) + take * (1 - etaC);
              ledger[row + C.storeOutputLossWh] = (ledger[row + C.storeOutputLossWh] ?? 0) + take * etaC * (1 - etaO);
            }
          }
        }
      }
    }
    if (ledger) {
      let left = 0;
      for (let p = 0; p < P; p++) left += rem[p] ?? 0;
      ledger[row + C.availableHarvestWh] = (ledger[row + C.availableHarvestWh] ?? 0) + availWh;
      ledger[row + C.spilledWh] = (ledger[row + C.spilledWh] ?? 0) + left;
      if (frozen) ledger[row + C.frozenSpilledWh] = (ledger[row + C.frozenSpilledWh] ?? 0) + availWh;
      if (frozen) ledger[row + C.frozenHours] = (ledger[row + C.frozenHours] ?? 0) + dt;
    }

    const t = totals();
    const margin = capAboveFloor > 0 ? t.above / capAboveFloor : 1;
    if (margin < worstMargin) worstMargin = margin;
    if (record) {
      record.storedWhByStep[i] = t.stores + t.devices;
      record.storesWhByStep[i] = t.stores;
      const base = i * (S + D);
      for (let s = 0; s < S; s++) record.unitWhByStep[base + s] = E[s] ?? 0;
      for (let d = 0; d < D; d++) record.unitWhByStep[base + S + d] = devE[d] ?? 0;
      if (ledger) {
        ledger[row + C.storedEndWh] = t.stores + t.devices;
        ledger[row + C.storesEndWh] = t.stores;
        ledger[row + C.devicesEndWh] = t.devices;
      }
    }
  }
  return finish();

  /**
   * One pass of device d's top-up over its stores — first those only it reaches, then the shared ones, each group in
   * merit order — along the most efficient paths (`efficient`) or sped up along the hulls: at most `limitWh` of battery
   * gain within `powerWh`, added to `topUpRateW`. Returns the Wh given.
   */
  function passOverStores(d: number, efficient: boolean, limitWh: number, powerWh: number): number {
    const allWh = Math.min(limitWh, powerWh);
    let leftWh = allWh;
    for (let group = 0; group < 2; group++) {
      for (let s = 0, m = 1; s < S && leftWh > tiny; s += m) {
        m = Math.max(1, k.storeGroupSize[s] ?? 1);
        if ((k.storeShared[s] ?? 0) !== group) continue;
        leftWh -= giveFromUnits(d, s, m, efficient, leftWh / dt) * dt;
      }
    }
    return allWh - leftWh;
  }

  /**
   * Gives device d at most `limitW` more (W of battery gain) in this step from the units s … s + m − 1 of one item,
   * taken as one: what they can give together in the pass — along their most efficient paths (`efficient`), else sped
   * up along their hulls above the rates they give already — split in proportion to what each can give, and added to
   * `topUpRateW`. Returns the rate given.
   */
  function giveFromUnits(d: number, s: number, m: number, efficient: boolean, limitW: number): number {
    const rateW = scratch.topUpRateW;
    const unitCapW = scratch.topUpUnitCapW;
    let capW = 0;
    for (let u = s; u < s + m; u++) {
      const fromW = rateW[u] ?? 0;
      const c = efficient ? efficientCapW(d, u) : Math.max(0, fastestRateW(d, u, fromW) - fromW);
      unitCapW[u] = c;
      capW += c;
    }
    const x = Math.min(capW, limitW);
    if (!(x > 0)) return 0;
    for (let u = s; u < s + m; u++) rateW[u] = (rateW[u] ?? 0) + (x * (unitCapW[u] ?? 0)) / capW;
    return x;
  }

  /**
   * First pass of a top-up: the rate (W of battery gain) store s can give device d along its most efficient path (the
   * hull's first point), within what it holds above its reserve.
   */
  function efficientCapW(d: number, s: number): number {
    const idx = s * D + d;
    if ((k.hullCount[idx] ?? 0) === 0) return 0;
    const avail = (E[s] ?? 0) - (k.storeFloorWh[s] ?? 0);
    if (avail <= tiny) return 0;
    const off = k.hullOffset[idx] ?? 0;
    const g0 = k.hullGainW[off] ?? 0;
    const c0 = k.hullDrawW[off] ?? 0;
    const x = Math.min(g0, c0 > 0 ? ((avail / dt) * g0) / c0 : g0);
    return x > 0 ? x : 0;
  }

  /**
   * Second pass: the fastest rate store s can give device d once sped up from `fromW`, along its hull and within what
   * it holds above its reserve (the step's whole draw at the new rate, never more).
   */
  function fastestRateW(d: number, s: number, fromW: number): number {
    const idx = s * D + d;
    const n = k.hullCount[idx] ?? 0;
    if (n < 2) return fromW;
    const avail = (E[s] ?? 0) - (k.storeFloorWh[s] ?? 0);
    if (avail <= tiny) return fromW;
    const off = k.hullOffset[idx] ?? 0;
    let x = k.hullGainW[off + n - 1] ?? 0;
    if (hullDrawAt(k, off, n, x) * dt > avail) x = hullGainAtDraw(k, off, n, avail / dt);
    return Math.max(fromW, x);
  }

  /**
   * Tops device d up from store s in the current step at rate `toW` (W at the battery, on the hull, already within the
   * store's energy above its reserve and the device's charge power): the draw and losses are the hull's at `toW`.
   */
  function topUp(d: number, s: number, toW: number): void {
    const idx = s * D + d;
    const n = k.hullCount[idx] ?? 0;
    if (n === 0 || !(toW > 0)) return;
    const off = k.hullOffset[idx] ?? 0;
    hullFlowsAt(off, n, k.deviceChargeEff[d] ?? 1, toW, flowsAt);
    const gain = toW * dt;
    const draw = flowsAt.drawW * dt;
    E[s] = Math.max(k.storeFloorWh[s] ?? 0, (E[s] ?? 0) - draw);
    devE[d] = (devE[d] ?? 0) + gain;
    if (ledger) {
      const row = dayIndexNow * columnCount;
      ledger[row + C.converterLossWh] = (ledger[row + C.converterLossWh] ?? 0) + flowsAt.converterLossW * dt;
      ledger[row + C.deviceChargeLossWh] = (ledger[row + C.deviceChargeLossWh] ?? 0) + flowsAt.deviceLossW * dt;
      ledger[row + C.toppedUpWh] = (ledger[row + C.toppedUpWh] ?? 0) + gain;
    }
    if (record?.onFlow) record.onFlow('top-up', stepIndex, s, d, gain);
  }

  /**
   * The flows of a store–device hull at gain rate x (W at the battery): the rate split between the two hull points
   * around x, each with its own efficiencies — the draw, the converter's loss and the device's charging loss (W).
   */
  function hullFlowsAt(off: number, n: number, etaDev: number, x: number, out: HullFlows): void {
    out.drawW = 0;
    out.converterLossW = 0;
    out.deviceLossW = 0;
    if (!(x > 0)) return;
    let seg = 0;
    while (seg < n - 1 && (k.hullGainW[off + seg] ?? 0) < x) seg++;
    const g1 = k.hullGainW[off + seg] ?? 0;
    const e1 = k.hullPathEff[off + seg] ?? 1;
    const g0 = seg > 0 ? (k.hullGainW[off + seg - 1] ?? 0) : 0;
    const e0 = seg > 0 ? (k.hullPathEff[off + seg - 1] ?? 1) : 1;
    const f1 = seg > 0 ? (x - g0) / (g1 - g0) : x / g1;
    const gain1W = f1 * g1;
    const gain0W = seg > 0 ? (1 - f1) * g0 : 0;
    const draw0 = gain0W / (e0 * etaDev);
    const draw1 = gain1W / (e1 * etaDev);
    out.drawW = draw0 + draw1;
    out.converterLossW = draw0 * (1 - e0) + draw1 * (1 - e1);
    out.deviceLossW = draw0 * e0 * (1 - etaDev) + draw1 * e1 * (1 - etaDev);
  }

  /** Device d runs live from its packs for `lackWh` of use in step i; returns the Wh delivered. */
  function runLive(d: number, lackWh: number): number {
    let got = 0;
    // The units of one item together, each in proportion to what it holds above its reserve.
    for (let s = 0, m = 1; s < S && lackWh - got > tiny; s += m) {
      m = Math.max(1, k.storeGroupSize[s] ?? 1);
      const eff = k.liveEff[s * D + d] ?? 0;
      if (!(eff > 0)) continue;
      let availWh = 0;
      for (let u = s; u < s + m; u++) availWh += Math.max(0, (E[u] ?? 0) - (k.storeFloorWh[u] ?? 0));
      if (availWh <= tiny) continue;
      const drawWh = Math.min(availWh, (lackWh - got) / eff);
      for (let u = s; u < s + m; u++) {
        const draw = (drawWh * Math.max(0, (E[u] ?? 0) - (k.storeFloorWh[u] ?? 0))) / availWh;
        if (!(draw > 0)) continue;
        E[u] = (E[u] ?? 0) - draw;
        if (ledger) {
          const row = dayIndexNow * columnCount;
          ledger[row + C.converterLossWh] = (ledger[row + C.converterLossWh] ?? 0) + draw * (1 - eff);
        }
        if (record?.onFlow) record.onFlow('live', stepIndex, u, d, draw * eff);
      }
      got += drawWh * eff;
    }
    return got;
  }

  function finish(): SkyRun {
    return {
      dry,
      worstMarginShare: Math.max(0, worstMargin),
      storedStartByDayWh: stopAtDry ? storedStartByDayWh : storedStartByDayWh.slice(),
      aboveFloorStartByDayWh: stopAtDry ? aboveFloorStartByDayWh : aboveFloorStartByDayWh.slice(),
    };
  }

  function dryReason(kit: CompiledKit, d: number, step: number): DryReason {
    let reachable = false;
    let aboveFloor = false;
    let belowFloor = false;
    for (let s = 0; s < S; s++) {
      if ((kit.pathEff[s * D + d] ?? 0) === 0) continue;
      reachable = true;
      const e = E[s] ?? 0;
      const floor = kit.storeFloorWh[s] ?? 0;
      if (e - floor > eps) aboveFloor = true;
      else if (e > eps) belowFloor = true;
    }
    if (!reachable) return 'no-charging-path';
    if (aboveFloor) return kit.stepCamp[step] === 1 ? 'charge-window-too-short' : 'empty-between-top-ups';
    if (belowFloor) return 'store-at-reserve';
    return 'stores-empty';
  }
}

/** Draw rate (W) on a store–device hull at gain rate x (W), linear between points, through the origin. */
function hullDrawAt(k: CompiledKit, off: number, n: number, x: number): number {
  let g0 = 0;
  let c0 = 0;
  for (let j = 0; j < n; j++) {
    const g1 = k.hullGainW[off + j] ?? 0;
    const c1 = k.hullDrawW[off + j] ?? 0;
    if (x <= g1) return c0 + ((c1 - c0) * (x - g0)) / (g1 - g0);
    g0 = g1;
    c0 = c1;
  }
  return c0;
}

/** Gain rate (W) on a store–device hull at draw rate c (W): the inverse of `hullDrawAt`. */
function hullGainAtDraw(k: CompiledKit, off: number, n: number, c: number): number {
  let g0 = 0;
  let c0 = 0;
  for (let j = 0; j < n; j++) {
    const g1 = k.hullGainW[off + j] ?? 0;
    const c1 = k.hullDrawW[off + j] ?? 0;
    if (c <= c1) return g0 + ((g1 - g0) * (c - c0)) / (c1 - c0);
    g0 = g1;
    c0 = c1;
  }
  return g0;
}

/** Usable Wh a store gains per input Wh (charge × output efficiency). */
function storeEta(k: CompiledKit, s: number): number {
  return (k.storeChargeEff[s] ?? 1) * (k.storeOutputEff[s] ?? 1);
}

/** Input Wh that brings the room of every store being water-filled (`active`) down to `level` (usable Wh). */
function fillAtLevel(
  k: CompiledKit,
  E: Float64Array,
  limitLeft: Float64Array,
  active: Uint8Array,
  level: number,
): number {
  const S = k.storeCount;
  let total = 0;
  for (let s = 0; s < S; s++) {
    if (active[s] !== 1) continue;
    const room = (k.storeCapWh[s] ?? 0) - (E[s] ?? 0);
    if (room <= level) continue;
    total += Math.min(limitLeft[s] ?? 0, (room - level) / storeEta(k, s));
  }
  return total;
}

/**
 * The room level (usable Wh) to which `inputWh` brings the stores being water-filled (`active`): `fillAtLevel` is piecewise
 * linear and falling in the level, with breaks where a store starts taking harvest (level = its room) and where its
 * input limit binds; find the two breaks around `inputWh` and interpolate. No allocation: `breaks` is scratch.
 */
function waterLevel(
  k: CompiledKit,
  E: Float64Array,
  limitLeft: Float64Array,
  active: Uint8Array,
  inputWh: number,
  breaks: Float64Array,
): number {
  const S = k.storeCount;
  let n = 0;
  breaks[n++] = 0;
  for (let s = 0; s < S; s++) {
    if (active[s] !== 1) continue;
    const room = (k.storeCapWh[s] ?? 0) - (E[s] ?? 0);
    if (room <= 0) continue;
    breaks[n++] = room;
    const saturated = room - (limitLeft[s] ?? 0) * storeEta(k, s);
    if (saturated > 0) breaks[n++] = saturated;
  }
  // Insertion sort, descending (n ≤ 2S + 1, small).
  for (let a = 1; a < n; a++) {
    const v = breaks[a] ?? 0;
    let b = a - 1;
    while (b >= 0 && (breaks[b] ?? 0) < v) {
      breaks[b + 1] = breaks[b] ?? 0;
      b--;
    }
    breaks[b + 1] = v;
  }
  let hiLevel = breaks[0] ?? 0;
  let hiFill = fillAtLevel(k, E, limitLeft, active, hiLevel);
  for (let j = 1; j < n; j++) {
    const loLevel = breaks[j] ?? 0;
    const loFill = fillAtLevel(k, E, limitLeft, active, loLevel);
    if (loFill >= inputWh) {
      return loFill === hiFill ? loLevel : loLevel + ((hiLevel - loLevel) * (loFill - inputWh)) / (loFill - hiFill);
    }
    hiLevel = loLevel;
    hiFill = loFill;
  }
  return 0;
}
