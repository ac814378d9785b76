import { compileKit, type CompiledKit } from './compile-kit.js';
import { ledgerCell, ledgerColumns, runSky, skyRecord, skyScratch, type SkyRecord, type SkyRun } from './run-sky.js';
import type { ChargeSession, KitSimulation, KitSimulationInput, LedgerDay, SkySimulation } from './types.js';
import { kitVerdict } from './verdict.js';

/**
 * Simulates a kit step by step over every trip day in every design sky: harvest, dispatch, the state of every store
 * and device, the ledger per day, the verdict and the expected sky's charging schedule.
 *
 * Dispatch (one rule everywhere, chosen so that adding an item never makes a kit worse — see README): harvest goes to
 * the stores with the most room, levelling their room, within each store's input limit — a store only once the stores
 * that outrank it (more usable Wh per input Wh, charging the same devices as fast and as efficiently) are full or at
 * their limit; never into lithium below 0 °C; each device uses its demand spread evenly over the day's hours from its
 * own battery; in the camp window the devices that need a charging path are topped up, first from the stores no other
 * device reaches, then from shared stores — to full, or, for a device that reaches a shared store, only as far as it
 * will still use for the rest of the trip; stores in a fixed merit order (most usable
 * Wh per input Wh first), each down to its reserve, over the lower hull of its paths, within the device's charge power.
 * A boost converter only charges a 12 V device's battery: the device's use in a step comes from its battery before
 * that step's top-up, so it is never run live through the converter.
 * @example simulateKit({ solar, kit: [{ itemId: 'bank', count: 1, spec: bank }], devices: [{ deviceId: 'phone', spec: phone }], reserveShare: 0.1 }).verdict.status // 'lasts-trip'
 */
export function simulateKit(input: KitSimulationInput): KitSimulation {
  const k = compileKit(input);
  const scratch = skyScratch(k);
  const runs: { skyId: SkySimulation['skyId']; run: SkyRun }[] = [];
  const skies: SkySimulation[] = [];
  const schedule: ChargeSession[] = [];
  input.solar.skies.forEach((sky, skyIndex) => {
    const record = skyRecord(k);
    if (skyIndex === 0) record.onFlow = sessionLogger(k, input, schedule);
    const run = runSky(k, skyIndex, scratch, record, false);
    runs.push({ skyId: sky.id, run });
    skies.push({
      skyId: sky.id,
      ledger: ledgerDays(k, record),
      dry: run.dry
        ? {
            skyId: sky.id,
            dayIndex: run.dry.dayIndex,
            stepIndex: run.dry.stepIndex,
            startUtcMs: input.solar.steps[run.dry.stepIndex]?.startUtcMs ?? 0,
            localTime: input.solar.steps[run.dry.stepIndex]?.localTime ?? '',
            deviceId: k.devices[run.dry.deviceIndex]?.deviceId ?? '',
            reason: run.dry.reason,
            storeIds: k.stores.filter((_, s) => k.devices[run.dry?.deviceIndex ?? 0]?.paths[s]).map((s) => s.storeId),
            shortWh: run.dry.shortWh,
            missing: k.devices[run.dry.deviceIndex]?.missing ?? [],
          }
        : null,
      storedWhByStep: record.storedWhByStep,
      storesWhByStep: record.storesWhByStep,
      unitWhByStep: record.unitWhByStep,
      worstMarginShare: run.worstMarginShare,
    });
  });
  const unusedItemIds = input.kit.map((e) => e.itemId).filter((id) => !k.usedItemIds.has(id));
  return {
    verdict: kitVerdict(runs, k.devices, k.stores, k.dayCount),
    skies,
    stores: k.stores,
    devices: k.devices,
    schedule,
    unusedItemIds,
  };
}

/**
 * The fast path for the solver: whether the kit is feasible (no device runs dry in any design sky), stopping at the
 * first dry step and recording nothing. Same rule as `simulateKit`.
 * @example isKitFeasible(input) // true
 */
export function isKitFeasible(input: KitSimulationInput): boolean {
  return kitFeasibility(input).feasible;
}

/** The fast path's answer: feasible or not, the worst-day margin of a feasible kit, the sky a rejected kit ran dry in. */
export interface KitFeasibility {
  feasible: boolean;
  /** As `simulateKit`'s verdict (the least over the skies, at most 1); 0 for a kit that runs dry. */
  worstMarginShare: number;
  /** The design sky (index) a rejected kit ran dry in. */
  drySkyIndex?: number;
}

/**
 * The fast path with what the solver needs beyond yes or no: a feasible kit's worst-day margin (the same as
 * `simulateKit`'s verdict, so an accepted kit needs no second run) and the sky a rejected kit ran dry in. The skies
 * are run from `firstSkyIndex` on, wrapping round: a search whose kits run dry in one sky (a cloudy start) tries that
 * sky first and rejects most kits in a few days of one sky instead of after a whole sunny one.
 * @example kitFeasibility(input, 1).drySkyIndex // 1 when the kit runs dry in a cloudy start
 */
export function kitFeasibility(input: KitSimulationInput, firstSkyIndex = 0): KitFeasibility {
  const k = compileKit(input);
  const scratch = skyScratch(k);
  const skyCount = input.solar.skies.length;
  let worstMarginShare = 1;
  for (let j = 0; j < skyCount; j++) {
    const skyIndex = (firstSkyIndex + j) % skyCount;
    const run = runSky(k, skyIndex, scratch, null, true);
    if (run.dry) return { feasible: false, worstMarginShare: 0, drySkyIndex: skyIndex };
    worstMarginShare = Math.min(worstMarginShare, run.worstMarginShare);
  }
  return { feasible: true, worstMarginShare };
}

function ledgerDays(k: CompiledKit, record: SkyRecord): LedgerDay[] {
  const days: LedgerDay[] = [];
  for (let d = 0; d < k.dayCount; d++) {
    const row = { dayIndex: d } as LedgerDay;
    for (const column of ledgerColumns) row[column] = ledgerCell(record, d, column);
    days.push(row);
  }
  return days;
}

function sessionLogger(k: CompiledKit, input: KitSimulationInput, schedule: ChargeSession[]) {
  const open = new Map<string, ChargeSession>();
  return (kind: ChargeSession['kind'], stepIndex: number, from: number, to: number, energyWh: number) => {
    if (energyWh <= 0) return;
    const step = input.solar.steps[stepIndex];
    if (!step) return;
    const fromId = kind === 'harvest' ? (k.panelItemIds[from] ?? '') : (k.stores[from]?.storeId ?? '');
    const toId = kind === 'harvest' ? (k.stores[to]?.storeId ?? '') : (k.devices[to]?.deviceId ?? '');
    const key = `${kind}|${fromId}|${toId}`;
    const endUtcMs = step.startUtcMs + step.durationH * 3_600_000;
    const current = open.get(key);
    // The step right after the session's, or the same step again (a later round of its top-ups).
    if (
      current &&
      (current.endUtcMs === step.startUtcMs || current.endUtcMs === endUtcMs) &&
      current.dayIndex === step.dayIndex
    ) {
      current.endUtcMs = endUtcMs;
      current.energyWh += energyWh;
      return;
    }
    const path = kind === 'harvest' ? null : k.devices[to]?.paths[from];
    const reach = from * k.storeCount + to;
    const session: ChargeSession = {
      kind,
      dayIndex: step.dayIndex,
      fromId,
      toId,
      converterItemId:
        kind === 'harvest'
          ? (k.panelReachController[reach] ?? null)
          : kind === 'live'
            ? null
            : (path?.converterItemId ?? null),
      leadItemIds: kind === 'harvest' ? (k.panelReachLeads[reach] ?? []) : (path?.leadItemIds ?? []),
      startUtcMs: step.startUtcMs,
      endUtcMs,
      startLocalTime: step.localTime,
      energyWh,
    };
    open.set(key, session);
    schedule.push(session);
  };
}
