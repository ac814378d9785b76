import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bothPathsDevicesArb, bothPathsItemArb, bothPathsKitArb, share, tripArb } from '../testing/arbitraries.js';
import {
  kitWithOneMore,
  scaleDemand,
  worstLedgerImbalanceWh,
  worstStoreRiseWh,
  worstUnitDropWh,
} from '../testing/simulation-checks.js';
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
            expect(worstLedgerImbalanceWh(result)).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400, seed: 20261202 },
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
            const bigger = kitWithOneMore(kit, extra, where, asCount);
            expect(isKitFeasible({ solar, kit: bigger, devices, reserveShare })).toBe(true);
          },
        ),
        // A fixed seed: how many runs test the 12 V path is then the same on every machine.
        { numRuns: 2500, seed: 20261202 },
      );
      console.info(`adding an item: ${meaningful} runs on a feasible kit drawing on a pack`);
      expect(meaningful).toBeGreaterThan(20);
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
            expect(worstUnitDropWh(base, sunnier)).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400, seed: 20261202 },
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
            expect(worstStoreRiseWh(base, hungrier)).toBeLessThan(1e-9);
          },
        ),
        { numRuns: 400, seed: 20261202 },
      );
    },
    propertyTimeoutMs,
  );
});
