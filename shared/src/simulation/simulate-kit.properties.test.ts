import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isKitFeasible, simulateKit } from './simulate-kit.js';
import {
  kitWithOneMore,
  scaleDemand,
  worstLedgerImbalanceWh,
  worstStoreRiseWh,
  worstUnitDropWh,
} from '../testing/simulation-checks.js';
import { devicesArb, kitArb, kitItemArb, share, tripArb } from '../testing/arbitraries.js';
import { compileKit } from './compile-kit.js';
import { scaleSolar } from '../testing/synthetic-solar.js';

const reserveArb = share(0, 0.3);
/**
 * One fixed seed, as the both-path properties use: the runs (and the counts of meaningful cases) are the same on every
 * machine, and a failure reproduces. Wider soaks, many seeds and 50,000 runs each, are recorded in shared/README.md
 * (one known gap there: "more demand" per store, 2 failures in 250,000 runs, both where the hungrier kit runs dry).
 */
const propertySeed = 20261203;
const runs = { numRuns: 300, seed: propertySeed };

// Property runs take seconds; the timeout is for CI machines under load, not a speed check.
const propertyTimeoutMs = 120_000;

describe('simulation properties (fast-check)', () => {
  it(
    'energy is conserved each day in every sky: harvest − each loss − delivered = change in stored energy (1e-9 Wh)',
    () => {
      fc.assert(
        fc.property(tripArb, kitArb(), devicesArb, reserveArb, (solar, kit, devices, reserveShare) => {
          const result = simulateKit({ solar, kit, devices, reserveShare });
          expect(worstLedgerImbalanceWh(result)).toBeLessThan(1e-9);
        }),
        runs,
      );
    },
    propertyTimeoutMs,
  );

  it(
    'adding any item never turns a feasible kit into one that runs dry',
    () => {
      // Counts the cases that test something: a feasible kit on which some device depends for charging.
      let meaningful = 0;
      fc.assert(
        fc.property(
          tripArb,
          kitArb(5),
          devicesArb,
          reserveArb,
          kitItemArb,
          fc.nat(),
          fc.boolean(),
          (solar, kit, devices, reserveShare, extra, where, asCount) => {
            if (!isKitFeasible({ solar, kit, devices, reserveShare })) return;
            if (compileKit({ solar, kit, devices, reserveShare }).devices.some((d) => d.needsChargingPath))
              meaningful++;
            const bigger = kitWithOneMore(kit, extra, where, asCount);
            expect(isKitFeasible({ solar, kit: bigger, devices, reserveShare })).toBe(true);
          },
        ),
        { numRuns: 2000, seed: propertySeed },
      );
      expect(meaningful).toBeGreaterThan(100);
    },
    propertyTimeoutMs,
  );

  it(
    'more sun never lowers any step’s stored energy, in any unit',
    () => {
      fc.assert(
        fc.property(
          tripArb,
          kitArb(),
          devicesArb,
          reserveArb,
          share(1, 3),
          (solar, kit, devices, reserveShare, factor) => {
            const base = simulateKit({ solar, kit, devices, reserveShare });
            const sunnier = simulateKit({ solar: scaleSolar(solar, factor), kit, devices, reserveShare });
            expect(worstUnitDropWh(base, sunnier)).toBeLessThan(1e-9);
          },
        ),
        runs,
      );
    },
    propertyTimeoutMs,
  );

  it(
    'more demand never raises any step’s energy in any store',
    () => {
      // Stores only: a device whose demand grows past its own battery starts being topped up, so its own battery may
      // hold more than before — paid for by the stores, which is what this property pins down.
      fc.assert(
        fc.property(
          tripArb,
          kitArb(),
          devicesArb,
          reserveArb,
          share(1, 3),
          (solar, kit, devices, reserveShare, factor) => {
            const base = simulateKit({ solar, kit, devices, reserveShare });
            const hungrier = simulateKit({ solar, kit, devices: scaleDemand(devices, factor), reserveShare });
            expect(worstStoreRiseWh(base, hungrier)).toBeLessThan(1e-9);
          },
        ),
        runs,
      );
    },
    propertyTimeoutMs,
  );

  it(
    'isKitFeasible agrees with simulateKit',
    () => {
      fc.assert(
        fc.property(tripArb, kitArb(), devicesArb, reserveArb, (solar, kit, devices, reserveShare) => {
          const full = simulateKit({ solar, kit, devices, reserveShare });
          expect(isKitFeasible({ solar, kit, devices, reserveShare })).toBe(full.verdict.status !== 'runs-dry');
        }),
        runs,
      );
    },
    propertyTimeoutMs,
  );
});
