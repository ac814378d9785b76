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
/** A trip, a kit, its devices, a reserve and a factor (1–3) that scales the sun or the demand. */
const scaledCase = [tripArb, kitArb(), devicesArb, reserveArb, share(1, 3)] as const;
type ScaledCase = [
  solar: Parameters<typeof simulateKit>[0]['solar'],
  kit: Parameters<typeof simulateKit>[0]['kit'],
  devices: Parameters<typeof simulateKit>[0]['devices'],
  reserveShare: number,
  factor: number,
];
/**
 * One fixed seed, as the both-path properties use: the runs (and the counts of meaningful cases) are the same on every
 * machine, and a failure reproduces. Wider soaks, many seeds and 100,000 runs each, are recorded in shared/README.md
 * (Dispatch); the runs that earlier dispatch rules failed are replayed below.
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
    'more sun never turns a feasible kit into one that runs dry, and a kit that lasts with more demand lasts with less',
    () => {
      // The verdict-level forms of the two properties below, which the solver relies on (a lighter optimum with less
      // sun or a heavier one with less demand would break them); counted so that the check is not vacuous.
      let lastingSunny = 0;
      let lastingHungry = 0;
      fc.assert(
        fc.property(...scaledCase, (solar, kit, devices, reserveShare, factor) => {
          if (isKitFeasible({ solar, kit, devices, reserveShare })) {
            lastingSunny++;
            expect(isKitFeasible({ solar: scaleSolar(solar, factor), kit, devices, reserveShare })).toBe(true);
          }
          if (isKitFeasible({ solar, kit, devices: scaleDemand(devices, factor), reserveShare })) {
            lastingHungry++;
            expect(isKitFeasible({ solar, kit, devices, reserveShare })).toBe(true);
          }
        }),
        { numRuns: 2000, seed: propertySeed },
      );
      expect(lastingSunny).toBeGreaterThan(200);
      expect(lastingHungry).toBeGreaterThan(200);
    },
    propertyTimeoutMs,
  );

  it(
    'more sun never lowers any step’s stored energy, in any unit',
    () => {
      fc.assert(
        fc.property(...scaledCase, (solar, kit, devices, reserveShare, factor) => {
          const base = simulateKit({ solar, kit, devices, reserveShare });
          const sunnier = simulateKit({ solar: scaleSolar(solar, factor), kit, devices, reserveShare });
          expect(worstUnitDropWh(base, sunnier)).toBeLessThan(1e-9);
        }),
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
        fc.property(...scaledCase, (solar, kit, devices, reserveShare, factor) => {
          const base = simulateKit({ solar, kit, devices, reserveShare });
          const hungrier = simulateKit({ solar, kit, devices: scaleDemand(devices, factor), reserveShare });
          expect(worstStoreRiseWh(base, hungrier)).toBeLessThan(1e-9);
        }),
        runs,
      );
    },
    propertyTimeoutMs,
  );

  it(
    'more demand never raises a store, more sun never lowers a unit: the soak runs that earlier top-up rules broke',
    () => {
      // Runs of the soaks above (seed, run), replayed by fast-check's path. With the top-up rounds at fixed hours of use
      // (2, 4 … 72 h), a hungrier device crossed a round's line, was filled sooner and drew less later, and a store ended
      // 0.002–3.9 Wh higher (five of the twelve with both kits lasting the trip); with more sun a fuller device skipped a
      // round and a unit ended 0.027 Wh lower. Then rounds at shares of the kit's own hour unit (scaling every device's
      // use leaves each round's target in Wh where it was) still failed the last six: the rounds moved a device's place
      // among the others with its demand, and with it which store its charge power went to (four), and a device
      // trickle-charged from a full bank while the bank spilled the same hour's sun (two). One pass in the trip's order
      // with the harvest after it passes them all (README, Dispatch).
      const demandRuns: [seed: number, run: number][] = [
        [3, 34195],
        [3, 36642],
        [3, 47346],
        [4, 16821],
        [4, 26126],
        [4, 58913],
        [5, 32144],
        [5, 59582],
        [7, 29595],
        [8, 5607],
        [10, 75079],
        [11, 19685],
        [4, 22748],
        [6, 14353],
        [6, 24002],
        [8, 37634],
        [9, 18455],
        [11, 54637],
      ];
      const sunRuns: [seed: number, run: number][] = [[9, 33472]];
      const replay = (runsToReplay: [number, number][], check: (c: ScaledCase) => number): void => {
        for (const [seed, run] of runsToReplay) {
          let replayed = 0;
          fc.assert(
            fc.property(...scaledCase, (...c) => {
              replayed++;
              expect(check(c), `seed ${seed}, run ${run}`).toBeLessThan(1e-9);
            }),
            { seed, path: String(run - 1), numRuns: 1 },
          );
          expect(replayed).toBe(1);
        }
      };
      replay(demandRuns, ([solar, kit, devices, reserveShare, factor]) =>
        worstStoreRiseWh(
          simulateKit({ solar, kit, devices, reserveShare }),
          simulateKit({ solar, kit, devices: scaleDemand(devices, factor), reserveShare }),
        ),
      );
      replay(sunRuns, ([solar, kit, devices, reserveShare, factor]) =>
        worstUnitDropWh(
          simulateKit({ solar, kit, devices, reserveShare }),
          simulateKit({ solar: scaleSolar(solar, factor), kit, devices, reserveShare }),
        ),
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
