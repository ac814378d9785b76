import { lithiumMinChargeTemperatureC } from '../constants/electrical.js';
import { deviceDemandWhPerDay, needsChargingPath } from '../demand/device-demand.js';
import { panelPowerSeries } from '../harvest/panel-series.js';
import type { BankSpec, UsbPanelSpec } from '../schemas/items.js';
import type { BatterySpec, TwelveVoltPanelSpec } from '../schemas/station-items.js';
import { bankUsableWh } from '../storage/bank.js';
import {
  chargePaths,
  panelReachesBank,
  type ChargePath,
  type KitConverter,
  type KitLead,
  type MissingLink,
} from './connections.js';
import {
  packChargePaths,
  tripPackStore,
  panelReachesPack,
  stationPanelSeries,
  stationSeriesKey,
  type KitController,
  type StationReach,
} from './station-path.js';
import type { DeviceUnit, KitSimulationInput, StoreUnit } from './types.js';

/** The kit turned into flat typed arrays for the step loop (no allocation per step). */
export interface CompiledKit {
  stepCount: number;
  dayCount: number;
  stepDurationH: Float64Array;
  stepDay: Int32Array;
  stepCamp: Uint8Array;
  /** Hours from a camp step's start to the end of its camp window (0 outside camp). */
  stepCampLeftH: Float64Array;
  stepFrozen: Uint8Array;
  /** Trip hours after the end of each step, h: a device's use for the rest of the trip is its hourly use × this. */
  stepHoursAfter: Float64Array;
  /** Panels (kit lines), each series already × count: [sky][panel]. */
  panelCount: number;
  panelItemIds: string[];
  panelSeries: Float64Array[][];
  /** Stores in merit order. */
  storeCount: number;
  stores: StoreUnit[];
  storeCapWh: Float64Array;
  storeFloorWh: Float64Array;
  storeInputMaxW: Float64Array;
  storeChargeEff: Float64Array;
  storeOutputEff: Float64Array;
  /**
   * Per store: at the first unit of an item, how many units of it the kit has (adjacent in the order: they share every
   * sort key but the unit); 0 at the others. The units of one item are drawn together, in proportion to what each can
   * give, so they stay alike (they start full and take the same harvest), and how two devices share them never hangs
   * on which unit each happened to draw first (the README's known gap (8)).
   */
  storeGroupSize: Int32Array;
  /** panel × store: 1 where the panel's port reaches the store's input. */
  panelReach: Uint8Array;
  /** panel × store: the leads of the hop (a 12 V panel's: into and out of its controller). */
  panelReachLeads: string[][];
  /** panel × store: the charge controller a 12 V panel reaches a pack through (null for a USB panel). */
  panelReachController: (string | null)[];
  deviceCount: number;
  devices: DeviceUnit[];
  deviceCapWh: Float64Array;
  deviceDemandWhPerH: Float64Array;
  /**
   * Per device: the most battery gain it can take in a step's hour, W — the fastest path of any one store (the top of
   * its hull). A device has one charge socket and one cable at a time: moved from store to store within a step it
   * never charges faster than the fastest of them, where adding the stores' rates let a camera that one bank port caps
   * at 5.3 W take 7 W from two banks at once.
   */
  deviceGainMaxW: Float64Array;
  deviceChargeEff: Float64Array;
  /** store × device: best path efficiency (0 = no path). */
  pathEff: Float64Array;
  /**
   * store × device: efficiency of a live path (a device that can run live, on a straight DC lead from a pack; 0 =
   * none). Once its own battery is empty, such a device draws its use straight from the pack (merit order, above
   * the reserve) instead of running dry.
   */
  liveEff: Float64Array;
  /**
   * store × device: the lower convex hull of the paths' (battery gain W, store draw W) points, from the origin —
   * the least a store gives up for each charge rate when the device may be switched between paths within a step.
   * Points `hullOffset[i] … + hullCount[i]`, rising in both coordinates; `hullPathEff` is each point's path efficiency.
   */
  hullOffset: Int32Array;
  hullCount: Int32Array;
  hullGainW: Float64Array;
  hullDrawW: Float64Array;
  hullPathEff: Float64Array;
  /** Devices that need a charging path (own battery short of the trip); only they are topped up. */
  deviceTopsUp: Uint8Array;
  /**
   * Per store: 1 when two or more of the trip's devices have a charging path from it (a shared store; whether they
   * need charging does not matter, so the split does not move with demand). A device is topped up from the stores only
   * it reaches first, then from shared stores; one that reaches a shared store only as far as it still needs for the
   * rest of the trip (from every store), any other to full.
   */
  storeShared: Uint8Array;
  /** Per device: 1 when it is topped up and reaches a shared store (its battery is then filled, from every store, only as far as it needs). */
  deviceSharesStores: Uint8Array;
  /** Whether any store is shared. */
  anyShared: boolean;
  /**
   * store × store: `[s * storeCount + t]` is 1 when store t outranks store s for harvest — t keeps more of each input Wh
   * (charge × output efficiency, strictly) and, for every device s can charge, t can charge it too, at least as fast and
   * through a path at least as efficient. Harvest reaches s in a later tier than every such t the panel reaches (see
   * `harvestTiers` in run-sky.ts), so a lossy bank added beside a better one never takes the harvest the better one
   * would have kept.
   */
  storeOutranks: Uint8Array;
  freezeBlocksDeviceTopUps: boolean;
  reserveShare: number;
  usedItemIds: Set<string>;
}

/**
 * Merit order of stores for top-ups: most usable Wh per input Wh first (charge × output efficiency) — the store
 * cheapest to refill is used first, so a less efficient store added to a kit stays full as a spare and takes no
 * harvest — then larger input limit, larger capacity, then item id. It depends only on each store's own spec.
 */
function meritCompare(a: StoreEntry, b: StoreEntry): number {
  const ea = a.chargeEff * a.outputEff;
  const eb = b.chargeEff * b.outputEff;
  return (
    eb - ea ||
    b.inputMaxW - a.inputMaxW ||
    b.usableWh - a.usableWh ||
    (a.itemId < b.itemId ? -1 : a.itemId > b.itemId ? 1 : 0) ||
    a.unit - b.unit
  );
}

/** One store unit before compiling: a USB bank or a 12 V pack, with the figures dispatch reads. */
type StoreEntry = {
  itemId: string;
  unit: number;
  usableWh: number;
  chargeEff: number;
  outputEff: number;
  inputMaxW: number;
} & ({ kind: 'bank'; spec: BankSpec } | { kind: 'battery'; spec: BatterySpec; volts: number });

/** What a compiled kit takes from the trip's steps alone (the same for every kit of a trip). */
interface TripSteps {
  fields: Pick<
    CompiledKit,
    'dayCount' | 'stepDurationH' | 'stepDay' | 'stepCamp' | 'stepFrozen' | 'stepCampLeftH' | 'stepHoursAfter'
  >;
  coldestAirC: number;
  tripDays: number;
}

/** Per trip sun: the solver compiles thousands of kits of one trip, and the arrays are only read. */
const tripStepsCache = new WeakMap<KitSimulationInput['solar'], TripSteps>();

function tripStepsOf(solar: KitSimulationInput['solar']): TripSteps {
  const hit = tripStepsCache.get(solar);
  if (hit) return hit;
  const stepCount = solar.steps.length;
  const dayCount = solar.days.length || (stepCount ? (solar.steps[stepCount - 1]?.dayIndex ?? 0) + 1 : 0);
  const stepDurationH = new Float64Array(stepCount);
  const stepDay = new Int32Array(stepCount);
  const stepCamp = new Uint8Array(stepCount);
  const stepFrozen = new Uint8Array(stepCount);
  solar.steps.forEach((s, i) => {
    stepDurationH[i] = s.durationH;
    stepDay[i] = s.dayIndex;
    stepCamp[i] = s.window === 'camp' ? 1 : 0;
    stepFrozen[i] = s.airTempC < lithiumMinChargeTemperatureC ? 1 : 0;
  });
  const stepCampLeftH = new Float64Array(stepCount);
  for (let i = stepCount - 1, left = 0; i >= 0; i--) {
    left = stepCamp[i] === 1 ? left + (stepDurationH[i] ?? 0) : 0;
    stepCampLeftH[i] = left;
  }
  const stepHoursAfter = new Float64Array(stepCount);
  for (let i = stepCount - 2; i >= 0; i--)
    stepHoursAfter[i] = (stepHoursAfter[i + 1] ?? 0) + (stepDurationH[i + 1] ?? 0);
  const steps: TripSteps = {
    fields: { dayCount, stepDurationH, stepDay, stepCamp, stepFrozen, stepCampLeftH, stepHoursAfter },
    coldestAirC: solar.steps.reduce((m, s) => Math.min(m, s.airTempC), Infinity),
    tripDays: solar.steps.reduce((h, s) => h + s.durationH, 0) / 24,
  };
  tripStepsCache.set(solar, steps);
  return steps;
}

/** Compiles a simulation input into typed arrays. */
export function compileKit(input: KitSimulationInput): CompiledKit {
  const { solar, kit, devices, reserveShare } = input;
  const options = input.options ?? {};
  const stepCount = solar.steps.length;
  const { fields: stepFields, coldestAirC, tripDays } = tripStepsOf(solar);

  const leads: KitLead[] = [];
  const converters: KitConverter[] = [];
  const controllers: KitController[] = [];
  const controllerCount = new Map<string, number>();
  const panels: { itemId: string; count: number; spec: UsbPanelSpec }[] = [];
  const stationPanels: { itemId: string; count: number; spec: TwelveVoltPanelSpec }[] = [];
  const bankLines: { itemId: string; count: number; spec: BankSpec }[] = [];
  const packLines: { itemId: string; count: number; spec: BatterySpec }[] = [];
  for (const entry of kit) {
    const spec = entry.spec;
    if (spec.kind === 'lead') leads.push({ itemId: entry.itemId, spec });
    else if (spec.kind === 'converter') converters.push({ itemId: entry.itemId, spec });
    else if (spec.kind === 'controller') {
      controllers.push({ itemId: entry.itemId, spec });
      controllerCount.set(entry.itemId, (controllerCount.get(entry.itemId) ?? 0) + entry.count);
    } else if (spec.kind === 'panel' && spec.panelType === 'usb')
      panels.push({ itemId: entry.itemId, count: entry.count, spec });
    else if (spec.kind === 'panel') stationPanels.push({ itemId: entry.itemId, count: entry.count, spec });
    else if (spec.kind === 'bank') bankLines.push({ itemId: entry.itemId, count: entry.count, spec });
    else if (spec.kind === 'battery') packLines.push({ itemId: entry.itemId, count: entry.count, spec });
  }
  // Panels water-fill one after another; a fixed order by item id keeps the result independent of the kit's line order.
  const byId = (a: { itemId: string }, b: { itemId: string }) =>
    a.itemId < b.itemId ? -1 : a.itemId > b.itemId ? 1 : 0;
  panels.sort(byId);
  stationPanels.sort(byId);
  const usedItemIds = new Set<string>();
  // Which controllers join each 12 V panel to each pack line (the cold open-circuit check included).
  const packReach = new Map<string, StationReach[]>();
  for (const p of stationPanels)
    for (const b of packLines)
      packReach.set(`${p.itemId}|${b.itemId}`, panelReachesPack(p.spec, b.spec, controllers, leads, coldestAirC));

  const storeEntries: StoreEntry[] = [];
  for (const b of bankLines) {
    for (let u = 1; u <= b.count; u++) {
      storeEntries.push({
        kind: 'bank',
        itemId: b.itemId,
        unit: u,
        spec: b.spec,
        usableWh: bankUsableWh(b.spec),
        chargeEff: b.spec.chargeEfficiency,
        outputEff: b.spec.outputEfficiency,
        inputMaxW: b.spec.inputMaxW,
      });
    }
  }
  for (const b of packLines) {
    const pack = tripPackStore(b.spec, devices);
    // The controllers feeding a pack cap its input with their charge current (each controller counted once per pack).
    const feeding = new Set<string>();
    for (const p of stationPanels)
      for (const r of packReach.get(`${p.itemId}|${b.itemId}`) ?? []) feeding.add(r.controllerItemId);
    const controllerW =
      [...feeding].reduce(
        (a, id) =>
          a + (controllers.find((c) => c.itemId === id)?.spec.maxChargeA ?? 0) * (controllerCount.get(id) ?? 0),
        0,
      ) * pack.volts.nominalVolts;
    for (let u = 1; u <= b.count; u++) {
      storeEntries.push({
        kind: 'battery',
        itemId: b.itemId,
        unit: u,
        spec: b.spec,
        volts: pack.volts.nominalVolts,
        usableWh: pack.usableWh,
        chargeEff: pack.chargeEfficiency,
        outputEff: pack.outputEfficiency,
        inputMaxW: Math.min(pack.packInputMaxW, controllerW),
      });
    }
  }
  // Every path from each store item to each device, found once: they rank the stores and then become the hulls.
  const pathsByItem = new Map<string, ReturnType<typeof chargePaths>[]>();
  for (const e of storeEntries) {
    if (pathsByItem.has(e.itemId)) continue;
    pathsByItem.set(
      e.itemId,
      devices.map((d) =>
        e.kind === 'bank'
          ? chargePaths(e.spec, d.spec, converters, leads)
          : packChargePaths(e.spec, d.spec, converters, leads),
      ),
    );
  }
  // How many of the trip's devices each store item can charge (needed or not, so the order never moves with demand).
  const reachCount = new Map(
    [...pathsByItem].map(([itemId, found]) => [itemId, found.filter((f) => f.paths.length > 0).length]),
  );
  // Top-ups draw the least contested stores first (fewest devices that can charge from them), then in merit order: a
  // device whose banks it shares with a headlamp keeps off a pack that the radio also needs while its banks hold
  // energy — an added 12 V → USB adapter gives the phone that pack without letting it drain it first.
  storeEntries.sort((a, b) => (reachCount.get(a.itemId) ?? 0) - (reachCount.get(b.itemId) ?? 0) || meritCompare(a, b));

  const storeCount = storeEntries.length;
  const stores: StoreUnit[] = storeEntries.map((s) => ({
    storeId: `${s.itemId}#${s.unit}`,
    itemId: s.itemId,
    unit: s.unit,
    kind: s.kind,
    usableWh: s.usableWh,
    reserveWh: s.usableWh * reserveShare,
  }));
  const storeCapWh = Float64Array.from(stores, (s) => s.usableWh);
  const storeFloorWh = Float64Array.from(stores, (s) => s.reserveWh);
  const storeInputMaxW = Float64Array.from(storeEntries, (s) => s.inputMaxW);
  const storeChargeEff = Float64Array.from(storeEntries, (s) => s.chargeEff);
  const storeOutputEff = Float64Array.from(storeEntries, (s) => s.outputEff);
  const storeGroupSize = new Int32Array(storeCount);
  for (let si = 0, start = 0; si < storeCount; si++) {
    if (storeEntries[si]?.itemId !== storeEntries[start]?.itemId) start = si;
    storeGroupSize[start] = (storeGroupSize[start] ?? 0) + 1;
  }

  const panelCount = panels.length + stationPanels.length;
  const panelReach = new Uint8Array(panelCount * storeCount);
  const panelReachLeads: string[][] = Array.from({ length: panelCount * storeCount }, () => []);
  const panelReachController: (string | null)[] = new Array(panelCount * storeCount).fill(null);
  const skyCount = solar.skies.length;
  const panelSeries: Float64Array[][] = Array.from({ length: skyCount }, () => []);
  const pushSeries = (perSky: readonly Float64Array[], count: number) => {
    for (let k = 0; k < skyCount; k++) {
      const one = perSky[k] ?? new Float64Array(stepCount);
      // Series are only read: a single panel's is shared, not copied.
      if (count === 1 && one.length === stepCount) {
        panelSeries[k]?.push(one);
        continue;
      }
      const scaled = new Float64Array(stepCount);
      for (let i = 0; i < stepCount; i++) scaled[i] = (one[i] ?? 0) * count;
      panelSeries[k]?.push(scaled);
    }
  };
  panels.forEach((p, pi) => {
    storeEntries.forEach((s, si) => {
      if (s.kind !== 'bank') return;
      const hop = panelReachesBank(p.spec.outputPort, s.spec, leads);
      if (hop.joined) {
        panelReach[pi * storeCount + si] = 1;
        if (hop.leadItemId) panelReachLeads[pi * storeCount + si] = [hop.leadItemId];
        usedItemIds.add(p.itemId);
        if (hop.leadItemId) usedItemIds.add(hop.leadItemId);
      }
    });
    pushSeries(options.panelSeriesCache?.get(p.itemId) ?? panelPowerSeries(p.spec, solar, options.panelPower), p.count);
  });
  stationPanels.forEach((p, j) => {
    const pi = panels.length + j;
    // The panel's power is the best of its (controller, pack voltage) pairings hour by hour: optimistic only for a kit
    // mixing packs of different voltages or controllers of different kinds, where a real station wires one pairing.
    const pairings = new Map<string, { controller: KitController; volts: number }>();
    storeEntries.forEach((s, si) => {
      if (s.kind !== 'battery') return;
      const reaches = packReach.get(`${p.itemId}|${s.itemId}`) ?? [];
      const first = reaches[0];
      if (!first) return;
      panelReach[pi * storeCount + si] = 1;
      panelReachLeads[pi * storeCount + si] = first.leadItemIds;
      panelReachController[pi * storeCount + si] = first.controllerItemId;
      usedItemIds.add(p.itemId);
      for (const r of reaches) {
        usedItemIds.add(r.controllerItemId);
        for (const id of r.leadItemIds) usedItemIds.add(id);
        const controller = controllers.find((c) => c.itemId === r.controllerItemId);
        if (controller)
          pairings.set(stationSeriesKey(p.itemId, controller.itemId, s.volts), { controller, volts: s.volts });
      }
    });
    const best = Array.from({ length: skyCount }, () => new Float64Array(stepCount));
    for (const [key, { controller, volts }] of pairings) {
      const perSky =
        options.panelSeriesCache?.get(key) ??
        stationPanelSeries(p.spec, controller.spec, volts, solar, options.panelPower);
      for (let k = 0; k < skyCount; k++) {
        const b = best[k] as Float64Array;
        const one = perSky[k];
        if (one) for (let i = 0; i < stepCount; i++) b[i] = Math.max(b[i] ?? 0, one[i] ?? 0);
      }
    }
    pushSeries(best, p.count);
  });

  const deviceCount = devices.length;
  const pathEff = new Float64Array(storeCount * deviceCount);
  const liveEff = new Float64Array(storeCount * deviceCount);
  const hullOffset = new Int32Array(storeCount * deviceCount);
  const hullCount = new Int32Array(storeCount * deviceCount);
  const hullGain: number[] = [];
  const hullDraw: number[] = [];
  const hullEff: number[] = [];
  const deviceUnits: DeviceUnit[] = devices.map((d, di) => {
    const paths: (ChargePath | null)[] = [];
    const missing = new Map<string, MissingLink>();
    storeEntries.forEach((s, si) => {
      const found = pathsByItem.get(s.itemId)?.[di] ?? { paths: [], missing: [] };
      const best = found.paths[0] ?? null;
      paths.push(best);
      const idx = si * deviceCount + di;
      if (best) {
        pathEff[idx] = best.pathEfficiency;
        usedItemIds.add(s.itemId);
        const live = found.paths.find((p) => 'live' in p && p.live === true);
        if (live) {
          liveEff[idx] = live.pathEfficiency;
          for (const id of live.leadItemIds) usedItemIds.add(id);
        }
        const hull = lowerHull(found.paths, d.spec.chargeEfficiency);
        hullOffset[idx] = hullGain.length;
        hullCount[idx] = hull.length;
        for (const h of hull) {
          hullGain.push(h.gainW);
          hullDraw.push(h.drawW);
          hullEff.push(h.path.pathEfficiency);
          if (h.path.converterItemId) usedItemIds.add(h.path.converterItemId);
          for (const id of h.path.leadItemIds) usedItemIds.add(id);
        }
      } else for (const m of found.missing) missing.set(m.text, m);
    });
    const demandWhPerDay = deviceDemandWhPerDay(d.spec);
    const needs = needsChargingPath(d.spec, tripDays);
    const anyPath = paths.some((p) => p !== null);
    const missingLinks: MissingLink[] =
      needs && !anyPath
        ? storeCount === 0
          ? [
              {
                kind: 'store',
                text:
                  d.spec.chargesVia === '12v-dc'
                    ? 'a bank or a 12 V pack that can charge it'
                    : 'a bank that can charge it',
              },
            ]
          : [...missing.values()]
        : [];
    return {
      deviceId: d.deviceId,
      demandWhPerDay,
      ownBatteryWh: d.spec.ownBatteryWh,
      needsChargingPath: needs,
      paths,
      missing: missingLinks,
    };
  });

  const deviceTopsUp = Uint8Array.from(deviceUnits, (d) => (d.needsChargingPath ? 1 : 0));
  const storeShared = new Uint8Array(storeCount);
  const deviceSharesStores = new Uint8Array(deviceCount);
  for (let si = 0; si < storeCount; si++) {
    let reaching = 0;
    for (let di = 0; di < deviceCount; di++) if ((hullCount[si * deviceCount + di] ?? 0) > 0) reaching++;
    if (reaching < 2) continue;
    storeShared[si] = 1;
    for (let di = 0; di < deviceCount; di++) {
      if (deviceTopsUp[di] === 1 && (hullCount[si * deviceCount + di] ?? 0) > 0) deviceSharesStores[di] = 1;
    }
  }

  const storeOutranks = storeOutranksMatrix(storeCount, deviceCount, storeChargeEff, storeOutputEff, {
    hullOffset,
    hullCount,
    hullGainW: hullGain,
    hullPathEff: hullEff,
  });

  return {
    stepCount,
    ...stepFields,
    panelCount,
    panelItemIds: [...panels, ...stationPanels].map((p) => p.itemId),
    panelSeries,
    storeCount,
    stores,
    storeCapWh,
    storeFloorWh,
    storeInputMaxW,
    storeChargeEff,
    storeOutputEff,
    storeGroupSize,
    panelReach,
    panelReachLeads,
    panelReachController,
    deviceCount,
    devices: deviceUnits,
    deviceCapWh: Float64Array.from(devices, (d) => d.spec.ownBatteryWh),
    deviceDemandWhPerH: Float64Array.from(deviceUnits, (d) => d.demandWhPerDay / 24),
    deviceGainMaxW: Float64Array.from(devices, (_, di) => {
      let fastestW = 0;
      for (let si = 0; si < storeCount; si++) {
        const n = hullCount[si * deviceCount + di] ?? 0;
        if (n > 0) fastestW = Math.max(fastestW, hullGain[(hullOffset[si * deviceCount + di] ?? 0) + n - 1] ?? 0);
      }
      return fastestW;
    }),
    deviceChargeEff: Float64Array.from(devices, (d) => d.spec.chargeEfficiency),
    pathEff,
    liveEff,
    hullOffset,
    hullCount,
    hullGainW: Float64Array.from(hullGain),
    hullDrawW: Float64Array.from(hullDraw),
    hullPathEff: Float64Array.from(hullEff),
    deviceTopsUp,
    storeShared,
    deviceSharesStores,
    anyShared: storeShared.some((x) => x === 1),
    storeOutranks,
    freezeBlocksDeviceTopUps: options.freezeBlocksDeviceTopUps ?? false,
    reserveShare,
    usedItemIds,
  };
}

/**
 * The lower convex hull, from the origin, of the paths' (battery gain W, store draw W) points: gain = device input
 * power × device charge efficiency, draw = device input power / path efficiency. Time-sharing two paths within a step
 * reaches any point on a segment, so the hull is the least draw for each gain rate; a path that only adds choice can
 * only lower it — which keeps the dispatch monotone when a converter or lead is added.
 */
function lowerHull(
  paths: readonly ChargePath[],
  deviceChargeEff: number,
): { gainW: number; drawW: number; path: ChargePath }[] {
  const points = paths
    .filter((p) => p.maxDeviceInputW > 0 && p.pathEfficiency > 0)
    .map((path) => ({
      gainW: path.maxDeviceInputW * deviceChargeEff,
      drawW: path.maxDeviceInputW / path.pathEfficiency,
      path,
    }))
    .sort((a, b) => a.gainW - b.gainW || a.drawW - b.drawW);
  const hull: { gainW: number; drawW: number; path: ChargePath }[] = [];
  for (const p of points) {
    // Same rate as the last point but no cheaper (sorted by draw within a rate): dominated.
    const last = hull[hull.length - 1];
    if (last && last.gainW === p.gainW) continue;
    // Drop hull points that lie on or above the segment from their predecessor (or the origin) to p.
    while (hull.length > 0) {
      const b = hull[hull.length - 1];
      const a = hull.length > 1 ? hull[hull.length - 2] : { gainW: 0, drawW: 0 };
      if (!b || !a) break;
      const cross = (b.gainW - a.gainW) * (p.drawW - a.drawW) - (b.drawW - a.drawW) * (p.gainW - a.gainW);
      if (cross <= 0) hull.pop();
      else break;
    }
    hull.push(p);
  }
  return hull;
}

/**
 * store × store: 1 at `[s * storeCount + t]` when t outranks s for harvest (see `CompiledKit.storeOutranks`). Depends on
 * the paths only, never on demand or sun, so the order cannot move with either.
 */
function storeOutranksMatrix(
  storeCount: number,
  deviceCount: number,
  chargeEff: Float64Array,
  outputEff: Float64Array,
  hull: { hullOffset: Int32Array; hullCount: Int32Array; hullGainW: ArrayLike<number>; hullPathEff: ArrayLike<number> },
): Uint8Array {
  const outranks = new Uint8Array(storeCount * storeCount);
  const eta = (s: number) => (chargeEff[s] ?? 1) * (outputEff[s] ?? 1);
  for (let s = 0; s < storeCount; s++) {
    for (let t = 0; t < storeCount; t++) {
      if (!(eta(t) > eta(s))) continue;
      let covers = true;
      for (let d = 0; d < deviceCount && covers; d++) {
        const ns = hull.hullCount[s * deviceCount + d] ?? 0;
        if (ns === 0) continue;
        const nt = hull.hullCount[t * deviceCount + d] ?? 0;
        if (nt === 0) {
          covers = false;
          continue;
        }
        const os = hull.hullOffset[s * deviceCount + d] ?? 0;
        const ot = hull.hullOffset[t * deviceCount + d] ?? 0;
        // Fastest point last, most efficient first (the hull rises in both coordinates from the origin).
        const fasterOrEqual = (hull.hullGainW[ot + nt - 1] ?? 0) >= (hull.hullGainW[os + ns - 1] ?? 0);
        const asEfficient = (hull.hullPathEff[ot] ?? 0) >= (hull.hullPathEff[os] ?? 0);
        covers = fasterOrEqual && asEfficient;
      }
      if (covers) outranks[s * storeCount + t] = 1;
    }
  }
  return outranks;
}
