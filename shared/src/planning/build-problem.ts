import { lithiumMinChargeTemperatureC } from '../constants/electrical.js';
import { deviceDemandWhPerDay, needsChargingPath } from '../demand/device-demand.js';
import { panelPowerSeries } from '../harvest/panel-series.js';
import type {
  DominanceAttribute,
  HarvestGroup,
  KitCandidate,
  KitCounts,
  KitJudge,
  OptimisationProblem,
  PanelCoefficients,
  PathAlternative,
  PathNeed,
  StoreCoefficients,
} from '../optimisation/types.js';
import type { BankSpec, ConverterSpec, LeadSpec, UsbPanelSpec } from '../schemas/items.js';
import type { KitEntry } from '../schemas/kit.js';
import type { BatterySpec, ControllerSpec, TwelveVoltPanelSpec } from '../schemas/station-items.js';
import {
  boostFitsBank,
  chargePaths,
  joinPorts,
  leadSetMayAddTail,
  type ChargePath,
  type KitConverter,
  type KitLead,
} from '../simulation/connections.js';
import {
  packChargePaths,
  panelReachesPack,
  tripPackStore,
  stationPanelSeries,
  stationSeriesKey,
  type KitController,
  type PackPath,
} from '../simulation/station-path.js';
import { kitFeasibility, simulateKit } from '../simulation/simulate-kit.js';
import type { KitSimulation } from '../simulation/types.js';
import { bankUsableWh } from '../storage/bank.js';
import { packVolts } from '../station/pack-volts.js';
import { computeTripSolar, type TripSolarOptions } from '../sun/trip-solar.js';
import type { TripSolarSeries } from '../sun/trip-solar-types.js';
import type { PlanningGear, PlanningInput } from './planning-input.js';
import { keepCompiled } from '../jit/keep-compiled.js';

/** A planning input made ready for the optimiser and the simulation: sun series, problem, judge, kit builder. */
export interface PlanningContext {
  input: PlanningInput;
  /** The solar options the sun series was computed with. */
  solarOptions: TripSolarOptions;
  solar: TripSolarSeries;
  gearById: ReadonlyMap<string, PlanningGear>;
  /** One panel's power per step, per sky, by panel item id (computed once for every kit tried). */
  panelSeriesCache: ReadonlyMap<string, readonly Float64Array[]>;
  problem: OptimisationProblem;
  judge: KitJudge;
  /** Kit entries (with specs) for counts by item id. */
  kitEntries(counts: KitCounts): KitEntry[];
  /** The full hour-by-hour simulation of a kit. */
  simulate(counts: KitCounts): KitSimulation;
}

type Grid = number[][];

const gridOf = (skies: number, width: number): Grid =>
  Array.from({ length: skies }, () => new Array<number>(width).fill(0));

/** Same connectors and everything else that has no "better" direction: only such items are compared by dominance. */
const signature = (spec: object, omit: readonly string[]): DominanceAttribute => ({
  name: `same:${JSON.stringify(Object.fromEntries(Object.entries(spec).filter(([k]) => !omit.includes(k))))}`,
  value: 1,
  better: 'higher',
});

/**
 * Builds the optimiser's problem for a trip and its candidate gear, and the judge (the hourly simulation).
 *
 * The daily coefficients are a RELAXATION of the simulation, so no kit the simulation accepts is lost:
 * - panels: per step the power `panelPowerSeries` gives at the port, with no harvest in steps below 0 °C (every store
 *   is a lithium bank), summed per day; when some owned bank does not take a panel's plug directly, the panel counts
 *   only with a bank that does, or a lead together with a bank it joins the plug to;
 * - banks: usable Wh, usable Wh gained per input Wh (charge × output efficiency, as the simulation books harvest), and
 *   the input limit × step hours outside frozen steps;
 * - devices: the LEAST cumulative draw by each day's end — what the device has used beyond its own battery (which
 *   starts full) over its best path's efficiency — for the reserve rows, and the MOST (everything it used, over its
 *   worst path, since a battery is never topped up past full) for the room rows;
 * - the first camp step of each day: before it no store gives energy to a device, so a full bank spills the morning;
 * - charging paths: from every store, converter and lead combination `chargePaths` (or `packChargePaths`) accepts (each
 *   lead needed once), the device needs one converter-and-lead set together with one of the stores it starts a path
 *   from (exact, one alternative per set), and each set carries its best share of a drawn Wh that reaches the device;
 *   the need carries what the device must gain each day, so the search can check a kit by the sets it holds.
 * `reuse`: a context of the same trip (same `solarInput` object and solar options) whose sun series and panels' power
 * this one may share — the gram prices change only demand or the reserve.
 * @example planningContext(input).problem.candidates.length // input.gear.length
 */
export function planningContext(
  input: PlanningInput,
  solarOptions: TripSolarOptions = {},
  reuse?: PlanningContext,
): PlanningContext {
  // A context for the same trip's sun (a changed demand or reserve) shares its sun series and panels' power.
  const sameSun =
    reuse !== undefined &&
    reuse.input.solarInput === input.solarInput &&
    (reuse.solarOptions.extraCloudyRunDays ?? 0) === (solarOptions.extraCloudyRunDays ?? 0);
  const solar = sameSun ? reuse.solar : computeTripSolar(input.solarInput, solarOptions);
  const gearById = new Map(input.gear.map((g) => [g.itemId, g]));
  const owned = input.gear.filter((g) => g.countOwned > 0);
  const skyCount = solar.skies.length;
  const steps = solar.steps;
  const stepCount = steps.length;
  const dayCount = solar.days.length;
  const frozen = steps.map((s) => s.airTempC < lithiumMinChargeTemperatureC);

  const dayFirstStep: number[] = [];
  for (let t = 0, i = 0; t <= dayCount; t++) {
    while (i < stepCount && (steps[i]?.dayIndex ?? 0) < t) i++;
    dayFirstStep.push(i);
  }
  const firstTopUpStep = Array.from({ length: dayCount }, (_, t) => {
    for (let i = dayFirstStep[t] ?? 0; i < (dayFirstStep[t + 1] ?? 0); i++) if (steps[i]?.window === 'camp') return i;
    return dayFirstStep[t + 1] ?? stepCount;
  });
  const perDay = (byStep: readonly number[]): number[] => {
    const out = new Array<number>(dayCount).fill(0);
    byStep.forEach((wh, i) => {
      const d = steps[i]?.dayIndex ?? 0;
      out[d] = (out[d] ?? 0) + wh;
    });
    return out;
  };

  const banks = owned.filter((g): g is PlanningGear & { spec: BankSpec } => g.spec.kind === 'bank');
  const packs = owned.filter((g): g is PlanningGear & { spec: BatterySpec } => g.spec.kind === 'battery');
  const controllers: KitController[] = owned.flatMap((g) =>
    g.spec.kind === 'controller' ? [{ itemId: g.itemId, spec: g.spec as ControllerSpec }] : [],
  );
  const leads: KitLead[] = owned.flatMap((g) =>
    g.spec.kind === 'lead' ? [{ itemId: g.itemId, spec: g.spec as LeadSpec }] : [],
  );
  const converters: KitConverter[] = owned.flatMap((g) =>
    g.spec.kind === 'converter' ? [{ itemId: g.itemId, spec: g.spec as ConverterSpec }] : [],
  );

  // Panels.
  const panelSeriesCache = new Map<string, Float64Array[]>();
  const panels: PanelCoefficients[] = [];
  const harvestGroups: HarvestGroup[] = [];
  const anySun: boolean[][] = Array.from({ length: skyCount }, () => new Array<boolean>(stepCount).fill(false));
  for (const g of owned) {
    if (g.spec.kind !== 'panel' || g.spec.panelType !== 'usb') continue;
    const spec = g.spec as UsbPanelSpec;
    const directBanks = banks.filter((b) => joinPorts(spec.outputPort, b.spec.inputPort, []).joined);
    // Leads count even when some bank takes the plug directly: another bank (the one the optimum needs) may not.
    const viaLeads =
      directBanks.length === banks.length
        ? []
        : leads.filter((l) =>
            banks.some((b) => {
              const hop = joinPorts(spec.outputPort, b.spec.inputPort, [l]);
              return hop.joined && hop.leadItemId === l.itemId;
            }),
          );
    if (directBanks.length === 0 && viaLeads.length === 0) continue;
    const known =
      sameSun && reuse.gearById.get(g.itemId)?.spec === g.spec ? reuse.panelSeriesCache.get(g.itemId) : undefined;
    const series = known ? [...known] : panelPowerSeries(spec, solar);
    panelSeriesCache.set(g.itemId, series);
    const byStep = gridOf(skyCount, stepCount);
    series.forEach((one, s) => {
      for (let i = 0; i < stepCount; i++) {
        const wh = frozen[i] ? 0 : (one[i] ?? 0) * (steps[i]?.durationH ?? 0);
        (byStep[s] as number[])[i] = wh;
        if (wh > 0) (anySun[s] as boolean[])[i] = true;
      }
    });
    let groupId: string | undefined;
    if (directBanks.length < banks.length) {
      // Harvest needs a bank the plug fits, or a lead with a bank it joins the plug to (one hop, as the simulation).
      const joinedBy = (l: KitLead): string[] =>
        banks
          .filter((b) => {
            const hop = joinPorts(spec.outputPort, b.spec.inputPort, [l]);
            return hop.joined && hop.leadItemId === l.itemId;
          })
          .map((b) => b.itemId)
          .sort();
      const requiresAnyOf: PathAlternative[] = [
        ...(directBanks.length > 0 ? [{ itemIds: [], anyOfItemIds: directBanks.map((b) => b.itemId).sort() }] : []),
        ...viaLeads.map((l) => ({ itemIds: [l.itemId], anyOfItemIds: joinedBy(l) })),
      ];
      groupId = `reach:${requiresAnyOf.map((a) => `${a.itemIds.join('+')}>${(a.anyOfItemIds ?? []).join('|')}`).join(',')}`;
      if (!harvestGroups.some((h) => h.groupId === groupId)) harvestGroups.push({ groupId, requiresAnyOf });
    }
    panels.push({
      itemId: g.itemId,
      harvestWh: byStep.map(perDay),
      harvestWhByStep: byStep,
      ...(groupId ? { groupId } : {}),
    });
  }

  // 12 V panels: each reaches a pack only through a controller (and the leads of its two hops); its harvest counts
  // only with one such set. Per step, the best of every owned (controller, pack voltage) pairing — the simulation takes
  // the best of the kit's pairings, never more.
  const coldestAirC = steps.reduce((m, s) => Math.min(m, s.airTempC), Infinity);
  for (const g of owned) {
    if (g.spec.kind !== 'panel' || g.spec.panelType !== '12v') continue;
    const spec = g.spec as TwelveVoltPanelSpec;
    const requiresAnyOf: PathAlternative[] = [];
    const best = gridOf(skyCount, stepCount);
    for (const pack of packs) {
      const volts = packVolts(pack.spec.chemistry, pack.spec.cellsInSeries).nominalVolts;
      for (const reach of panelReachesPack(spec, pack.spec, controllers, leads, coldestAirC)) {
        requiresAnyOf.push({ itemIds: [reach.controllerItemId, pack.itemId, ...reach.leadItemIds].sort() });
        const key = stationSeriesKey(g.itemId, reach.controllerItemId, volts);
        let series = panelSeriesCache.get(key);
        if (!series) {
          const controller = controllers.find((c) => c.itemId === reach.controllerItemId);
          const known = sameSun ? reuse.panelSeriesCache.get(key) : undefined;
          series = known ? [...known] : controller ? stationPanelSeries(spec, controller.spec, volts, solar) : [];
          panelSeriesCache.set(key, series);
        }
        series.forEach((one, k) => {
          const row = best[k] as number[];
          for (let i = 0; i < stepCount; i++) {
            const wh = frozen[i] ? 0 : (one[i] ?? 0) * (steps[i]?.durationH ?? 0);
            if (wh > (row[i] ?? 0)) row[i] = wh;
          }
        });
      }
    }
    if (requiresAnyOf.length === 0) continue;
    best.forEach((row, k) => row.forEach((wh, i) => wh > 0 && ((anySun[k] as boolean[])[i] = true)));
    const unique = [...new Map(requiresAnyOf.map((a) => [a.itemIds.join('+'), a])).values()].sort((a, b) =>
      a.itemIds.join('+') < b.itemIds.join('+') ? -1 : 1,
    );
    const groupId = `station:${unique.map((a) => a.itemIds.join('+')).join('|')}`;
    if (!harvestGroups.some((h) => h.groupId === groupId)) harvestGroups.push({ groupId, requiresAnyOf: unique });
    panels.push({ itemId: g.itemId, harvestWh: best.map(perDay), harvestWhByStep: best, groupId });
  }

  // Stores.
  const acceptGrids = (inputMaxW: number) => {
    const byStep = gridOf(skyCount, stepCount);
    const daily = gridOf(skyCount, dayCount);
    for (let s = 0; s < skyCount; s++) {
      for (let i = 0; i < stepCount; i++) {
        const wh = frozen[i] ? 0 : inputMaxW * (steps[i]?.durationH ?? 0);
        (byStep[s] as number[])[i] = wh;
        if (anySun[s]?.[i]) {
          const d = steps[i]?.dayIndex ?? 0;
          (daily[s] as number[])[d] = (daily[s]?.[d] ?? 0) + wh;
        }
      }
    }
    return { acceptWh: daily, acceptWhByStep: byStep };
  };
  // A pack takes at most its own charge limit (its controllers can only lower it): an upper bound, as the model needs.
  const packStores: StoreCoefficients[] = packs.map((b) => {
    const pack = tripPackStore(b.spec, input.devices);
    return {
      itemId: b.itemId,
      usableWh: pack.usableWh,
      chargeEfficiency: pack.chargeEfficiency,
      ...acceptGrids(pack.packInputMaxW),
    };
  });
  const bankStores: StoreCoefficients[] = banks.map((b) => ({
    itemId: b.itemId,
    usableWh: bankUsableWh(b.spec),
    // Usable Wh gained per input Wh: the simulation books the output loss as harvest enters (`bankUsableGainWh`).
    chargeEfficiency: b.spec.chargeEfficiency * b.spec.outputEfficiency,
    ...acceptGrids(b.spec.inputMaxW),
  }));
  const stores = [...bankStores, ...packStores];

  // Devices: paths and demand.
  const tripHours = steps.reduce((h, s) => h + s.durationH, 0);
  const hoursBefore: number[] = [0];
  steps.forEach((s, i) => hoursBefore.push((hoursBefore[i] ?? 0) + s.durationH));
  const hoursByDayEnd = Array.from(
    { length: dayCount },
    (_, t) => hoursBefore[dayFirstStep[t + 1] ?? stepCount] ?? tripHours,
  );
  // No top-up happens between a day's end and the next day's first camp step, so by the day's end a device must
  // already hold what it uses until then: the least draw counts the use up to the next top-up.
  const hoursToNextTopUp = Array.from(
    { length: dayCount },
    (_, t) => hoursBefore[t + 1 < dayCount ? (firstTopUpStep[t + 1] ?? stepCount) : stepCount] ?? tripHours,
  );
  const needs: PathNeed[] = [];
  /** Whether some device can run live from a pack (then stores give energy outside the top-ups). */
  let anyLive = false;
  const leastCum = new Array<number>(dayCount).fill(0);
  const mostCum = new Array<number>(dayCount).fill(0);
  for (const d of input.devices) {
    if (!needsChargingPath(d.spec, tripHours / 24)) continue;
    /**
     * The best path efficiency per store and tail (banks with the same ports share their paths, so per group of them),
     * by key: only its least and greatest are read (the device's most and least draw).
     */
    const pathEfficiency = new Map<string, number>();
    const notePath = (key: string, efficiency: number): void => {
      if (!(efficiency <= (pathEfficiency.get(key) ?? -Infinity))) pathEfficiency.set(key, efficiency);
    };
    /** What a path needs besides its store (converter and leads), by key. */
    const tails = new Map<string, string[]>();
    /** Per tail (by key): the stores it starts a path from, and the best share of a drawn Wh that reaches the device. */
    const tailStores = new Map<string, Set<string>>();
    const tailShare = new Map<string, number>();
    /** Notes a path's tail with the stores it starts from and its share; returns the tail's key. */
    const noteTail = (tail: string[], storeIds: readonly string[], share: number): string => {
      const key = tail.join('|');
      tails.set(key, tail);
      let stores = tailStores.get(key);
      if (!stores) tailStores.set(key, (stores = new Set()));
      for (const id of storeIds) stores.add(id);
      tailShare.set(key, Math.max(tailShare.get(key) ?? 0, share));
      return key;
    };
    // Only leads that fit some hop of this device's paths can be part of one; a 12 V device's paths pair a lead into
    // the converter with a lead out of it. Banks with the same output ports have the same paths: found once.
    const hopPorts = banks.flatMap((b) => b.spec.outputPorts.map((p) => p.connector));
    const fits = (l: KitLead, from: readonly string[], to: readonly string[]): boolean =>
      (from.includes(l.spec.fromConnector) && to.includes(l.spec.toConnector)) ||
      (from.includes(l.spec.toConnector) && to.includes(l.spec.fromConnector));
    const twelveVolt = d.spec.chargesVia === '12v-dc';
    const intoDevice = leads.filter((l) =>
      fits(l, twelveVolt ? converters.map((c) => c.spec.outputPort.connector) : hopPorts, [
        d.spec.chargePort.connector,
      ]),
    );
    const intoConverter = twelveVolt
      ? leads.filter((l) =>
          fits(
            l,
            hopPorts,
            converters.map((c) => c.spec.inputPort.connector),
          ),
        )
      : [];
    const leadSets: KitLead[][] = [[], ...[...new Set([...intoDevice, ...intoConverter])].map((l) => [l])];
    for (const a of intoConverter) for (const b of intoDevice) if (a !== b) leadSets.push([a, b]);
    const converterSets: KitConverter[][] = twelveVolt ? converters.map((c) => [c]) : [[]];
    const banksByPorts = new Map<string, (PlanningGear & { spec: BankSpec })[]>();
    for (const bank of banks) {
      const key = JSON.stringify(bank.spec.outputPorts);
      banksByPorts.set(key, [...(banksByPorts.get(key) ?? []), bank]);
    }
    for (const [group, sameBanks] of [...banksByPorts.values()].entries()) {
      const groupBank = (sameBanks[0] as PlanningGear & { spec: BankSpec }).spec;
      const groupPorts = groupBank.outputPorts.map((p) => p.connector);
      for (const cs of converterSets) {
        // A converter that fits no port of these banks (input volts, output in the device's window) has no path.
        if (cs[0] && !boostFitsBank(groupBank, d.spec, cs[0].spec)) continue;
        for (const ls of leadSets) {
          if (!leadSetMayAddTail(ls, groupPorts, cs[0], d.spec.chargePort.connector)) continue;
          for (const path of chargePaths(groupBank, d.spec, cs, ls).paths) {
            const tail = [
              ...new Set([...(path.converterItemId ? [path.converterItemId] : []), ...path.leadItemIds]),
            ].sort();
            const key = noteTail(
              tail,
              sameBanks.map((b) => b.itemId),
              d.spec.chargeEfficiency * path.pathEfficiency,
            );
            notePath(`banks ${group}|${key}`, path.pathEfficiency);
          }
        }
      }
    }
    // Paths from 12 V packs: a 12 V device over a DC lead (or a captive plug), a USB device through a 12 V → USB
    // adapter and the leads of its two hops. Only leads with an end on the pack, the adapters or the device can be part
    // of one.
    const adapters = converters.filter((c) => c.spec.converterType === '12v-to-usb');
    const packEnds = [
      ...packs.map((b) => b.spec.port.connector),
      ...adapters.flatMap((c) => [c.spec.inputPort.connector, c.spec.outputPort.connector]),
      d.spec.chargePort.connector,
    ];
    const packLeads = leads.filter(
      (l) => packEnds.includes(l.spec.fromConnector) || packEnds.includes(l.spec.toConnector),
    );
    const packLeadSets: KitLead[][] = [[], ...packLeads.map((l) => [l])];
    if (!twelveVolt)
      for (const a of packLeads) for (const b of packLeads) if (a.itemId < b.itemId) packLeadSets.push([a, b]);
    const packConverterSets: KitConverter[][] = twelveVolt ? [[]] : adapters.map((c) => [c]);
    let liveShare = 0;
    for (const pack of packs) {
      for (const cs of packConverterSets) {
        for (const ls of packLeadSets) {
          for (const path of packChargePaths(pack.spec, d.spec, cs, ls).paths) {
            const tail = [
              ...new Set([...(path.converterItemId ? [path.converterItemId] : []), ...path.leadItemIds]),
            ].sort();
            const live = (path as ChargePath & Partial<PackPath>).live === true;
            const key = noteTail(
              tail,
              [pack.itemId],
              live ? path.pathEfficiency : d.spec.chargeEfficiency * path.pathEfficiency,
            );
            notePath(`pack ${pack.itemId}|${key}`, path.pathEfficiency);
            if ((path as ChargePath & Partial<PackPath>).live) liveShare = Math.max(liveShare, path.pathEfficiency);
          }
        }
      }
    }
    const list = [...pathEfficiency.values()];
    const label = input.deviceNames?.[d.deviceId] ?? d.deviceId;
    // One alternative per tail, with the stores it starts a path from (exact: "this tail and one of these stores",
    // without one alternative per store). A tail holding another is left out when the smaller one fits every store it
    // fits at least as well.
    const storesOf = (t: readonly string[]): Set<string> => tailStores.get(t.join('|')) ?? new Set<string>();
    const shareOf = (t: readonly string[]): number => tailShare.get(t.join('|')) ?? 0;
    const usefulTails = [...tails.values()].filter(
      (t) =>
        ![...tails.values()].some(
          (o) =>
            o.length < t.length &&
            o.every((id) => t.includes(id)) &&
            shareOf(o) >= shareOf(t) &&
            [...storesOf(t)].every((b) => storesOf(o).has(b)),
        ),
    );
    const need: PathNeed = {
      needId: d.deviceId,
      label,
      alternatives: usefulTails.map((t): PathAlternative => ({
        itemIds: t,
        anyOfItemIds: [...storesOf(t)].sort(),
        pathId: t.join(' + '),
        ...(shareOf(t) > 0 ? { efficiency: Math.min(1, shareOf(t)) } : {}),
      })),
    };
    needs.push(need);
    if (list.length === 0) continue;
    const best = Math.max(...list);
    const worst = Math.min(...list);
    // A device that can run live from a pack draws its use straight through the lead (no charging loss) and only as
    // it uses it: its least draw by a day's end counts the use up to then, at the better of the two shares.
    const bestShare = Math.max(d.spec.chargeEfficiency * best, liveShare);
    if (liveShare > 0) anyLive = true;
    const perHourWh = deviceDemandWhPerDay(d.spec) / 24;
    /** What the device must have gained from stores by each day's end (its least draw × the best share). */
    const gainCum = new Array<number>(dayCount).fill(0);
    hoursByDayEnd.forEach((h, t) => {
      const usedWh = perHourWh * h;
      const neededWh = liveShare > 0 ? usedWh : perHourWh * (hoursToNextTopUp[t] ?? h);
      gainCum[t] = Math.max(0, neededWh - d.spec.ownBatteryWh);
      leastCum[t] = (leastCum[t] ?? 0) + (gainCum[t] ?? 0) / bestShare;
      mostCum[t] = (mostCum[t] ?? 0) + usedWh / (d.spec.chargeEfficiency * worst);
    });
    need.gainWh = Array.from({ length: skyCount }, () =>
      gainCum.map((v, t) => Math.max(0, v - (t > 0 ? (gainCum[t - 1] ?? 0) : 0))),
    );
    need.demandShare = bestShare;
  }
  const daily = (cum: readonly number[]): Grid =>
    Array.from({ length: skyCount }, () => cum.map((v, t) => Math.max(0, v - (t > 0 ? (cum[t - 1] ?? 0) : 0))));

  const candidates: KitCandidate[] = input.gear.map((g) => ({
    itemId: g.itemId,
    kind: g.spec.kind,
    massG: Math.round(g.massG),
    ownedCount: Math.max(0, Math.floor(g.countOwned)),
    dominanceAttributes: dominanceOf(g),
  }));
  const problem: OptimisationProblem = {
    candidates,
    ...(input.gramLimitG !== null ? { gramLimitG: input.gramLimitG } : {}),
    coefficients: {
      skyIds: solar.skies.map((s) => s.id),
      dayCount,
      demandWh: daily(leastCum),
      roomDemandWh: daily(mostCum),
      reserveShare: input.reserveShare,
      panels,
      stores,
      harvestGroups,
      needs,
      timing: 'overlapping',
      dayFirstStep,
      firstTopUpStep,
      earlyRoomCapped: !anyLive,
    },
  };

  const kitEntries = (counts: KitCounts): KitEntry[] =>
    [...counts]
      .filter(([, n]) => n > 0)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .flatMap(([itemId, count]) => {
        const g = gearById.get(itemId);
        return g ? [{ itemId, count, spec: g.spec }] : [];
      });
  const simulationInput = (counts: KitCounts) => ({
    solar,
    kit: kitEntries(counts),
    devices: input.devices,
    reserveShare: input.reserveShare,
    options: { panelSeriesCache },
  });
  const simulate = (counts: KitCounts): KitSimulation => simulateKit(simulationInput(counts));
  /** The sky the last rejected kit ran dry in: the next kit is run there first (the search's kits fail alike). */
  let lastDrySkyIndex = 0;
  const converterSpecs = new Map(
    input.gear.flatMap((g) => (g.spec.kind === 'converter' ? [[g.itemId, g.spec] as const] : [])),
  );
  /**
   * Whether converter `id` may be left home when `counts` runs dry as packed: another held converter of the same type is
   * faster and less efficient — the one pair the top-ups can use worse than either alone (below).
   */
  const spareConverter = (id: string, counts: KitCounts): boolean => {
    const c = converterSpecs.get(id);
    if (!c) return false;
    for (const [other, n] of counts) {
      const d = other !== id && n > 0 ? converterSpecs.get(other) : undefined;
      if (
        d &&
        d.converterType === c.converterType &&
        d.efficiency < c.efficiency &&
        d.maxOutputA * d.outputVolts > c.maxOutputA * c.outputVolts
      )
        return true;
    }
    return false;
  };
  /**
   * The kits a kit that runs dry as packed is tried as next, the smaller change first: with its most efficient spare
   * converter left home (the slow one that shadows a fast path), then with every spare converter left home. So a kit
   * that works as packed still works with a spare added that is more efficient than its own spares (the gap's slow
   * boost), and one that works with every spare home, with any spare added (a converter that makes another spare is
   * itself beaten by a faster, lossier one, which makes the other spare already). Two tries at most, where trying every
   * set of spares left home took 2^s simulations of a kit with s of them: a 200-item locker's grown repairs, with a
   * dozen spare converters and 0.5 s a simulation, held a search for minutes.
   */
  const leaveHomeTries = (counts: KitCounts): KitCounts[] => {
    const spares = [...counts.keys()].filter((id) => (counts.get(id) ?? 0) > 0 && spareConverter(id, counts));
    if (spares.length === 0) return [];
    const efficiency = (id: string): number => converterSpecs.get(id)?.efficiency ?? 0;
    const first = spares.reduce((a, b) =>
      efficiency(b) > efficiency(a) || (efficiency(b) === efficiency(a) && b < a) ? b : a,
    );
    const without = (ids: readonly string[]): KitCounts => {
      const kit = new Map(counts);
      for (const id of ids) kit.delete(id);
      return kit;
    };
    return spares.length === 1 ? [without([first])] : [without([first]), without(spares)];
  };
  /**
   * A kit works when it works as packed, or with its spare converters left home (`leaveHomeTries`): a hiker can always
   * leave one in the bag. The simulation's top-ups take the most efficient path first, so a slow, efficient converter
   * added beside a fast, lossy one of the same type can leave a tiny bank full when the sun comes and spill what the
   * fast path would have passed on (shared README, known gap (4)) — the kit with both runs dry where the fast one alone
   * lasts, and the search, taking the judge as monotone, could cut off the working kit or call a locker that holds it
   * hopeless. Only kits that run dry as packed and hold such a pair pay for the extra runs; the verdict names the
   * lighter kit that works (`works`), which the search offers instead.
   */
  const judge: KitJudge = (counts) => {
    /** The kit's margin when it lasts, else undefined (and its dry sky is run first next time). */
    const marginIfItLasts = (kit: KitCounts): number | undefined => {
      const answer = kitFeasibility(simulationInput(kit), lastDrySkyIndex);
      if (answer.feasible) return answer.worstMarginShare;
      lastDrySkyIndex = answer.drySkyIndex ?? 0;
      return undefined;
    };
    keepCompiled('judge', marginIfItLasts);
    const margin = marginIfItLasts(counts);
    if (margin !== undefined) return { feasible: true, margin };
    for (const kit of leaveHomeTries(counts)) {
      const left = marginIfItLasts(kit);
      if (left !== undefined) return { feasible: true, margin: left, works: kit };
    }
    return { feasible: false };
  };
  keepCompiled('planning context', judge, simulate, acceptGrids);
  return { input, solarOptions, solar, gearById, panelSeriesCache, problem, judge, kitEntries, simulate };
}

/** What makes one unit better or worse in the simulation's eyes beyond the daily coefficients. */
function dominanceOf(g: PlanningGear): DominanceAttribute[] {
  const spec = g.spec;
  switch (spec.kind) {
    case 'panel':
      // A 12 V panel's harvest depends on its controller and pack hour by hour (PWM follows the pack's voltage): never
      // compared by dominance.
      return spec.panelType === 'usb' ? [signature({ port: spec.outputPort, panelType: spec.panelType }, [])] : [];
    case 'bank':
      return [
        signature(spec, [
          'massG',
          'capacityMah',
          'capacityWh',
          'cellVolts',
          'inputMaxW',
          'chargeEfficiency',
          'outputEfficiency',
        ]),
        { name: 'usableWh', value: bankUsableWh(spec), better: 'higher' },
        { name: 'inputMaxW', value: spec.inputMaxW, better: 'higher' },
        { name: 'chargeEfficiency', value: spec.chargeEfficiency, better: 'higher' },
        { name: 'outputEfficiency', value: spec.outputEfficiency, better: 'higher' },
      ];
    case 'converter':
      return [
        signature(spec, ['massG', 'efficiency', 'maxOutputA']),
        { name: 'efficiency', value: spec.efficiency, better: 'higher' },
        { name: 'maxOutputA', value: spec.maxOutputA, better: 'higher' },
      ];
    case 'lead':
      return [signature(spec, ['massG'])];
    case 'battery':
    case 'controller':
      return [];
  }
}
