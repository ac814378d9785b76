import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import { bothPathsDevicesArb, bothPathsItemArb, bothPathsKitArb, share, tripArb } from '../testing/arbitraries.js';
import { scaleSolar } from '../testing/synthetic-solar.js';
import { compileKit } from './compile-kit.js';
import { isKitFeasible, simulateKit } from './simulate-kit.js';

/**
 * The engine's invariants on kits holding both power paths (USB banks and boost converters beside 12 V packs,
 * controllers, 12 V panels, DC leads and radios that may run live): energy conserved, and the monotonicity the
 * solver relies on.
 */

const reserveArb = share(0, 0.3);
// Property runs take seconds; the timeout is for CI machines under load, not a speed check.
const propertyTimeoutMs = 180_000;

function scaleDemand(devices: TripDevice[], factor: number): TripDevice[] {
  return devices.map((d) => {
    const p = d.spec.useProfile;
    const useProfile =
      p.basis === 'radio-hours'
        ? {
            ...p,
            transmitMinutesPerDay: Math.min(1440, p.transmitMinutesPerDay * factor),
            receiveHoursPerDay: p.receiveHoursPerDay * factor,
            standbyHoursPerDay: p.standbyHoursPerDay * factor,
          }
        : p.basis === 'battery-share'
          ? { ...p, batterySharePerDay: p.batterySharePerDay * factor }
          : { ...p, energyWhPerDay: p.energyWhPerDay * factor };
    return { ...d, spec: { ...d.spec, useProfile } };
  });
}

describe('both power paths: simulation properties (fast-check)', () => {
  it(
    'energy is conserved each day in every sky (1e-9 Wh), live use and lead losses included',
    () => {
      let withPack = 0;
      fc.assert(
        fc.property(
          tripArb,
          bothPathsKitArb(),
          bothPathsDevicesArb,
          reserveArb,
          (solar, kit, devices, reserveShare) => {
            const result = simulateKit({ solar, kit, devices, reserveShare });
            if (result.stores.some((s) => s.kind === 'battery')) withPack++;
            let worst = 0;
            for (const sky of result.skies) {
              for (const d of sky.ledger) {
                const flows =
                  d.harvestWh -
                  d.storeChargeLossWh -
                  d.storeOutputLossWh -
                  d.converterLossWh -
                  d.deviceChargeLossWh -
                  d.deliveredWh;
                worst = Math.max(
                  worst,
                  Math.abs(d.storedEndWh - d.storedStartWh - flows),
                  Math.abs(d.availableHarvestWh - d.harvestWh - d.spilledWh),
                );
              }
            }
            expect(worst).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400 },
      );
      expect(withPack).toBeGreaterThan(100);
    },
    propertyTimeoutMs,
  );

  it(
    'adding any item of either path never turns a feasible kit into one that runs dry',
    () => {
      // Counts the cases that test the 12 V path: a feasible kit where some device draws on a pack.
      let meaningful = 0;
      fc.assert(
        fc.property(
          tripArb,
          bothPathsKitArb(6),
          bothPathsDevicesArb,
          reserveArb,
          bothPathsItemArb,
          fc.nat(),
          fc.boolean(),
          (solar, kit, devices, reserveShare, extra, where, asCount) => {
            if (!isKitFeasible({ solar, kit, devices, reserveShare })) return;
            const k = compileKit({ solar, kit, devices, reserveShare });
            const packs = k.stores.flatMap((s, i) => (s.kind === 'battery' ? [i] : []));
            if (packs.some((s) => k.devices.some((d) => d.needsChargingPath && d.paths[s]))) meaningful++;
            let bigger: KitEntry[];
            if (asCount && kit.length > 0) {
              const i = where % kit.length;
              bigger = kit.map((e, j) => (j === i ? { ...e, count: e.count + 1 } : e));
            } else {
              const i = where % (kit.length + 1);
              bigger = [...kit.slice(0, i), { itemId: 'added', count: 1, spec: extra }, ...kit.slice(i)];
            }
            expect(isKitFeasible({ solar, kit: bigger, devices, reserveShare })).toBe(true);
          },
        ),
        { numRuns: 2500 },
      );
      expect(meaningful).toBeGreaterThan(30);
    },
    propertyTimeoutMs,
  );

  it(
    'more sun never lowers any step’s stored energy, in any unit',
    () => {
      fc.assert(
        fc.property(
          tripArb,
          bothPathsKitArb(),
          bothPathsDevicesArb,
          reserveArb,
          share(1, 3),
          (solar, kit, devices, reserveShare, factor) => {
            const base = simulateKit({ solar, kit, devices, reserveShare });
            const sunnier = simulateKit({ solar: scaleSolar(solar, factor), kit, devices, reserveShare });
            let worstDropWh = 0;
            base.skies.forEach((sky, k) => {
              const more = sunnier.skies[k]?.unitWhByStep ?? new Float64Array();
              sky.unitWhByStep.forEach((wh, i) => (worstDropWh = Math.max(worstDropWh, wh - (more[i] ?? -Infinity))));
            });
            expect(worstDropWh).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400 },
      );
    },
    propertyTimeoutMs,
  );

  it(
    'more demand never raises any step’s energy in any store',
    () => {
      fc.assert(
        fc.property(
          tripArb,
          bothPathsKitArb(),
          bothPathsDevicesArb,
          reserveArb,
          share(1, 3),
          (solar, kit, devices, reserveShare, factor) => {
            const base = simulateKit({ solar, kit, devices, reserveShare });
            const hungrier = simulateKit({ solar, kit, devices: scaleDemand(devices, factor), reserveShare });
            const units = base.stores.length + base.devices.length;
            let worstRiseWh = 0;
            base.skies.forEach((sky, k) => {
              const more = hungrier.skies[k]?.unitWhByStep ?? new Float64Array();
              sky.unitWhByStep.forEach((wh, i) => {
                if (i % units < base.stores.length) worstRiseWh = Math.max(worstRiseWh, (more[i] ?? Infinity) - wh);
              });
            });
            expect(worstRiseWh).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400 },
      );
    },
    propertyTimeoutMs,
  );
});
