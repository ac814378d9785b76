/**
 * A small synthetic world for the optimiser's tests and benchmarks: invented items, a bump-shaped sun, cloudy runs,
 * frosty mornings and an hour-by-hour pooled-storage simulation as the judge. It is physically sensible and monotone
 * in every item, but it is NOT a check value from the outside world: it tests the optimiser against exhaustive search
 * on the same rules, nothing more. Randomness comes only from the generator passed in.
 */
import type { KitCandidate, KitCounts, KitJudge, OptimisationProblem, PathAlternative, PathNeed } from './types.js';

/** Hours in a synthetic trip day. */
export const syntheticHoursPerDay = 24;
/** Sunrise and sunset hours of the synthetic sun (a half-sine between them). */
const sunriseHour = 6;
const sunsetHour = 19;

export interface SyntheticPanel {
  itemId: string;
  massG: number;
  ownedCount: number;
  /** Wh per hour at the store input under full synthetic sun (label × field losses already applied). */
  peakW: number;
  /** `12v` panels harvest only with a controller, through the best controller packed. */
  group: 'usb' | '12v';
}
export interface SyntheticBank {
  itemId: string;
  massG: number;
  ownedCount: number;
  usableWh: number;
  inputW: number;
}
export interface SyntheticPathItem {
  itemId: string;
  kind: 'converter' | 'lead' | 'controller';
  massG: number;
  ownedCount: number;
  /** Share of energy passed on, 0–1. */
  efficiency: number;
}
export interface SyntheticDevice {
  deviceId: string;
  /** Wh per day at the device (after its own battery). */
  demandWh: number;
  /** Alternatives of path item ids; [] = the locker has no path for it. */
  alternatives: string[][];
}
export interface SyntheticWorld {
  dayCount: number;
  /** `[sky][day]` share of the synthetic clear sun that gets through, 0–1. */
  skyShare: number[][];
  /** Per day: first hours below 0 °C (no charging of lithium), from midnight. */
  frozenUntilHour: number[];
  /** Multiplies every panel's output (the "more sun" property). */
  sunScale: number;
  /** Multiplies every device's demand (the "more demand" property). */
  demandScale: number;
  /** Camp hours when devices draw their day's demand evenly. */
  demandHours: number[];
  chargeEfficiency: number;
  reserveShare: number;
  panels: SyntheticPanel[];
  banks: SyntheticBank[];
  pathItems: SyntheticPathItem[];
  devices: SyntheticDevice[];
}

/**
 * A seeded generator (mulberry32), so tests and benchmarks are reproducible.
 * @example seededRandom(1)() // 0.627…
 * Source: T. Ettinger's public-domain mulberry32 (a 32-bit multiply-xorshift generator), from memory.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Share of the synthetic clear-sky peak in hour `h` (a half-sine from sunrise to sunset). */
export function sunShare(h: number): number {
  const mid = h + 0.5;
  if (mid <= sunriseHour || mid >= sunsetHour) return 0;
  return Math.sin((Math.PI * (mid - sunriseHour)) / (sunsetHour - sunriseHour));
}

function pathEfficiency(world: SyntheticWorld, alternative: readonly string[]): number {
  const byId = new Map(world.pathItems.map((p) => [p.itemId, p]));
  return alternative.reduce((e, id) => e * (byId.get(id)?.efficiency ?? 1), 1);
}

function present(kit: KitCounts, alternative: readonly string[]): boolean {
  const need = new Map<string, number>();
  for (const id of alternative) need.set(id, (need.get(id) ?? 0) + 1);
  return [...need].every(([id, n]) => (kit.get(id) ?? 0) >= n);
}

const controllerIds = (world: SyntheticWorld): string[] =>
  world.pathItems.filter((p) => p.kind === 'controller').map((p) => p.itemId);

/**
 * The judge: hour by hour in every sky, panels feed one pooled store (capacity Σ usable Wh, input limit Σ input W,
 * no charging in frozen hours), devices draw their demand evenly over the camp hours through the best path packed,
 * and the store must never go below the reserve. Monotone in every item: more capacity, input, harvest or a better
 * path never lowers the energy above the reserve at any hour.
 * @example syntheticJudge(world)(new Map([['bank-1', 2]])).feasible // true or false
 */
export function syntheticJudge(world: SyntheticWorld): KitJudge {
  const controllers = controllerIds(world);
  const ctrlEff = new Map(world.pathItems.map((p) => [p.itemId, p.efficiency]));
  return (kit) => {
    let dailyDemandWh = 0;
    for (const d of world.devices) {
      if (d.demandWh <= 0) continue;
      let best = 0;
      for (const alt of d.alternatives) if (present(kit, alt)) best = Math.max(best, pathEfficiency(world, alt));
      if (best === 0)
        return { feasible: false, runsDry: { dayIndex: 0, deviceId: d.deviceId, reason: 'no-charging-path' } };
      dailyDemandWh += (d.demandWh * world.demandScale) / best;
    }
    const controllerEff = Math.max(
      0,
      ...controllers.filter((id) => (kit.get(id) ?? 0) > 0).map((id) => ctrlEff.get(id) ?? 0),
    );
    let peakW = 0;
    for (const p of world.panels)
      peakW += (kit.get(p.itemId) ?? 0) * p.peakW * (p.group === '12v' ? controllerEff : 1) * world.sunScale;
    let capacityWh = 0;
    let inputW = 0;
    for (const b of world.banks) {
      capacityWh += (kit.get(b.itemId) ?? 0) * b.usableWh;
      inputW += (kit.get(b.itemId) ?? 0) * b.inputW;
    }
    const reserveWh = world.reserveShare * capacityWh;
    const perHourWh = dailyDemandWh / world.demandHours.length;
    let worst = Infinity;
    for (let s = 0; s < world.skyShare.length; s++) {
      let storedWh = capacityWh;
      for (let t = 0; t < world.dayCount; t++) {
        const share = world.skyShare[s]?.[t] ?? 0;
        for (let h = 0; h < syntheticHoursPerDay; h++) {
          if (h >= (world.frozenUntilHour[t] ?? 0)) {
            const inWh = Math.min(peakW * share * sunShare(h), inputW);
            storedWh = Math.min(capacityWh, storedWh + world.chargeEfficiency * inWh);
          }
          if (world.demandHours.includes(h)) {
            storedWh -= perHourWh;
            if (storedWh < reserveWh - 1e-9) {
              return { feasible: false, runsDry: { skyId: `sky-${s}`, dayIndex: t, shortWh: reserveWh - storedWh } };
            }
            worst = Math.min(worst, storedWh - reserveWh);
          }
        }
      }
    }
    return { feasible: true, margin: worst === Infinity ? capacityWh - reserveWh : worst };
  };
}

/**
 * The optimiser's problem for a synthetic world, built the way a real caller must: optimistic daily bounds
 * (harvest = Σ unfrozen hours of full output with the best controller; acceptance = input W × unfrozen sun hours;
 * demand with each device's best path in the locker).
 * @example syntheticProblem(world).coefficients.dayCount // world.dayCount
 */
export function syntheticProblem(world: SyntheticWorld, gramLimitG?: number): OptimisationProblem {
  const skies = world.skyShare.length;
  const bestController = Math.max(
    0,
    ...world.pathItems.filter((p) => p.kind === 'controller' && p.ownedCount > 0).map((p) => p.efficiency),
  );
  const sunHours = (t: number): number[] => {
    const out: number[] = [];
    for (let h = world.frozenUntilHour[t] ?? 0; h < syntheticHoursPerDay; h++) if (sunShare(h) > 0) out.push(h);
    return out;
  };
  const grid = (f: (s: number, t: number) => number): number[][] =>
    Array.from({ length: skies }, (_, s) => Array.from({ length: world.dayCount }, (_, t) => f(s, t)));
  /** `[sky][step]` over every hour of the trip. */
  const steps = (f: (s: number, t: number, h: number) => number): number[][] =>
    Array.from({ length: skies }, (_, s) =>
      Array.from({ length: world.dayCount * syntheticHoursPerDay }, (_, i) =>
        f(s, Math.floor(i / syntheticHoursPerDay), i % syntheticHoursPerDay),
      ),
    );
  let dailyDemandWh = 0;
  const needs: PathNeed[] = [];
  for (const d of world.devices) {
    if (d.demandWh <= 0) continue;
    const best = Math.max(0, ...d.alternatives.map((a) => pathEfficiency(world, a)));
    if (best > 0) dailyDemandWh += (d.demandWh * world.demandScale) / best;
    // Per-device data for the kit views: the judge draws demand / (best path packed) every day.
    const efficiencies = d.alternatives.map((a) => pathEfficiency(world, a));
    const withEfficiency = efficiencies.every((e) => e > 0 && e <= 1);
    needs.push({
      needId: d.deviceId,
      label: d.deviceId,
      alternatives: d.alternatives.map((a, k): PathAlternative => ({
        itemIds: a,
        ...(withEfficiency ? { efficiency: efficiencies[k] } : {}),
      })),
      ...(withEfficiency ? { gainWh: grid(() => d.demandWh * world.demandScale) } : {}),
    });
  }
  const candidates: KitCandidate[] = [
    ...world.panels.map((p): KitCandidate => ({
      itemId: p.itemId,
      kind: 'panel',
      massG: p.massG,
      ownedCount: p.ownedCount,
      dominanceAttributes: [{ name: 'peakW', value: p.peakW, better: 'higher' }],
    })),
    ...world.banks.map((b): KitCandidate => ({
      itemId: b.itemId,
      kind: 'bank',
      massG: b.massG,
      ownedCount: b.ownedCount,
      dominanceAttributes: [
        { name: 'usableWh', value: b.usableWh, better: 'higher' },
        { name: 'inputW', value: b.inputW, better: 'higher' },
      ],
    })),
    ...world.pathItems.map((p): KitCandidate => ({
      itemId: p.itemId,
      kind: p.kind,
      massG: p.massG,
      ownedCount: p.ownedCount,
      dominanceAttributes: [{ name: 'efficiency', value: p.efficiency, better: 'higher' }],
    })),
  ];
  return {
    candidates,
    ...(gramLimitG !== undefined ? { gramLimitG } : {}),
    coefficients: {
      skyIds: Array.from({ length: skies }, (_, s) => `sky-${s}`),
      dayCount: world.dayCount,
      demandWh: grid(() => dailyDemandWh),
      reserveShare: world.reserveShare,
      timing: Math.min(...world.demandHours) >= sunsetHour ? 'after-harvest' : 'overlapping',
      dayFirstStep: Array.from({ length: world.dayCount + 1 }, (_, t) => t * syntheticHoursPerDay),
      firstTopUpStep: Array.from(
        { length: world.dayCount },
        (_, t) => t * syntheticHoursPerDay + Math.min(...world.demandHours),
      ),
      panels: world.panels.map((p) => {
        const wh = (s: number, t: number, h: number): number =>
          p.peakW *
          (p.group === '12v' ? bestController : 1) *
          world.sunScale *
          (world.skyShare[s]?.[t] ?? 0) *
          sunShare(h);
        return {
          itemId: p.itemId,
          groupId: p.group,
          harvestWh: grid((s, t) => sunHours(t).reduce((sum, h) => sum + wh(s, t, h), 0)),
          harvestWhByStep: steps((s, t, h) => (sunHours(t).includes(h) ? wh(s, t, h) : 0)),
        };
      }),
      stores: world.banks.map((b) => ({
        itemId: b.itemId,
        usableWh: b.usableWh,
        chargeEfficiency: world.chargeEfficiency,
        acceptWh: grid((_, t) => b.inputW * sunHours(t).length),
        acceptWhByStep: steps((_, t, h) => (sunHours(t).includes(h) ? b.inputW : 0)),
      })),
      harvestGroups: [{ groupId: '12v', requiresAnyOf: controllerIds(world).map((id) => ({ itemIds: [id] })) }],
      needs,
    },
  };
}

/** Shape of a random synthetic world. */
export interface SyntheticShape {
  /** Item types in the locker. */
  itemTypes: number;
  maxOwned: number;
  dayCount: number;
  skyCount: number;
  deviceCount?: number;
}

const pick = <T>(random: () => number, list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
const between = (random: () => number, lo: number, hi: number): number => lo + random() * (hi - lo);
const grams = (random: () => number, lo: number, hi: number): number => Math.round(between(random, lo, hi));

/**
 * A random synthetic world of a given shape: a mix of banks, panels (some 12 V, needing a controller), leads and
 * converters; devices with one to three path alternatives (sometimes none); cloudy runs in the skies after the first.
 * @example randomSyntheticWorld(seededRandom(7), { itemTypes: 6, maxOwned: 2, dayCount: 4, skyCount: 4 }).banks.length // ≥ 1
 */
export function randomSyntheticWorld(random: () => number, shape: SyntheticShape): SyntheticWorld {
  const types = Math.max(1, shape.itemTypes);
  const owned = (): number => 1 + Math.floor(random() * shape.maxOwned);
  const bankCount = Math.max(1, Math.round(types * between(random, 0.25, 0.45)));
  const panelCount = Math.min(types - bankCount, Math.round(types * between(random, 0.1, 0.35)));
  const pathCount = Math.max(0, types - bankCount - panelCount);
  const banks: SyntheticBank[] = Array.from({ length: bankCount }, (_, i) => {
    const usableWh = Math.round(between(random, 8, 45));
    return {
      itemId: `bank-${i}`,
      massG: grams(random, 60, 110) + Math.round(usableWh * between(random, 3, 6)),
      ownedCount: owned(),
      usableWh,
      inputW: Math.round(between(random, 5, 18)),
    };
  });
  const pathItems: SyntheticPathItem[] = Array.from({ length: pathCount }, (_, i) => {
    const kind = pick(random, ['lead', 'lead', 'converter', 'controller'] as const);
    return {
      itemId: `${kind}-${i}`,
      kind,
      massG: grams(random, 15, 120),
      ownedCount: owned(),
      efficiency: Math.round(between(random, 0.75, 0.97) * 100) / 100,
    };
  });
  const hasController = pathItems.some((p) => p.kind === 'controller');
  const panels: SyntheticPanel[] = Array.from({ length: panelCount }, (_, i) => {
    const peakW = Math.round(between(random, 2, 14));
    return {
      itemId: `panel-${i}`,
      massG: grams(random, 80, 150) + peakW * grams(random, 15, 30),
      ownedCount: owned(),
      peakW,
      group: hasController && random() < 0.4 ? '12v' : 'usb',
    };
  });
  const nonControllers = pathItems.filter((p) => p.kind !== 'controller').map((p) => p.itemId);
  const deviceCount = shape.deviceCount ?? 1 + Math.floor(random() * 2);
  const devices: SyntheticDevice[] = Array.from({ length: deviceCount }, (_, i) => {
    const alternatives: string[][] = [];
    if (nonControllers.length > 0 && random() < 0.9) {
      const n = 1 + Math.floor(random() * 3);
      for (let a = 0; a < n; a++) {
        const alt = [pick(random, nonControllers)];
        if (random() < 0.4) alt.push(pick(random, nonControllers));
        alternatives.push([...new Set(alt)]);
      }
    } else if (nonControllers.length === 0 && random() < 0.7) alternatives.push([]);
    return { deviceId: `device-${i}`, demandWh: Math.round(between(random, 2, 14) * 10) / 10, alternatives };
  });
  const k = Math.max(1, Math.round(shape.dayCount * between(random, 0.2, 0.5)));
  const clear = between(random, 0.4, 0.9);
  const cloudy = between(random, 0.05, 0.25);
  const skyShare = Array.from({ length: shape.skyCount }, (_, s) =>
    Array.from({ length: shape.dayCount }, (_, t) => {
      if (s === 0) return clear;
      const start = s === 1 ? 0 : s === 2 ? Math.floor((shape.dayCount - k) / 2) : shape.dayCount - k;
      return t >= start && t < start + k ? cloudy : clear;
    }),
  );
  const lateCamp = random() < 0.25;
  return {
    dayCount: shape.dayCount,
    skyShare,
    frozenUntilHour: Array.from({ length: shape.dayCount }, () => (random() < 0.3 ? 9 : 0)),
    sunScale: 1,
    demandScale: 1,
    demandHours: lateCamp ? [20, 21, 22] : [17, 18, 19, 20, 21],
    chargeEfficiency: Math.round(between(random, 0.8, 0.95) * 100) / 100,
    reserveShare: pick(random, [0, 0.1, 0.2]),
    panels,
    banks,
    pathItems,
    devices,
  };
}

/**
 * A small random world from a seed, the shape of the oracle cases: 2–7 item types, at most `maxOwned` of each, 2–5
 * days, 1–4 skies.
 * @example smallSyntheticWorld(3).dayCount // between 2 and 5
 */
export function smallSyntheticWorld(seed: number, maxOwned = 2): SyntheticWorld {
  const random = seededRandom(seed);
  return randomSyntheticWorld(random, {
    itemTypes: 2 + Math.floor(random() * 6),
    maxOwned,
    dayCount: 2 + Math.floor(random() * 4),
    skyCount: 1 + Math.floor(random() * 4),
  });
}
