import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isKitFeasible, simulateKit } from './simulate-kit.js';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import { devicesArb, kitArb, kitItemArb, share, tripArb } from '../testing/arbitraries.js';
import { compileKit } from './compile-kit.js';
import { scaleSolar } from '../testing/synthetic-solar.js';

const reserveArb = share(0, 0.3);
const runs = { numRuns: 300 };

function scaleDemand(devices: TripDevice[], factor: number): TripDevice[] {
  return devices.map((d) => {
    const p = d.spec.useProfile;
    const useProfile =
      p.basis === 'radio-hours'
        ? {
            ...p,
            transmitMinutesPerDay: p.transmitMinutesPerDay * factor,
            receiveHoursPerDay: p.receiveHoursPerDay * factor,
            standbyHoursPerDay: p.standbyHoursPerDay * factor,
          }
        : p.basis === 'battery-share'
          ? { ...p, batterySharePerDay: p.batterySharePerDay * factor }
          : { ...p, energyWhPerDay: p.energyWhPerDay * factor };
    return { ...d, spec: { ...d.spec, useProfile } };
  });
}

// Property runs take seconds; the timeout is for CI machines under load, not a speed check.
const propertyTimeoutMs = 120_000;

describe('simulation properties (fast-check)', () => {
  it(
    'energy is conserved each day in every sky: harvest − each loss − delivered = change in stored energy (1e-9 Wh)',
    () => {
      fc.assert(
        fc.property(tripArb, kitArb(), devicesArb, reserveArb, (solar, kit, devices, reserveShare) => {
          const result = simulateKit({ solar, kit, devices, reserveShare });
          let worstImbalanceWh = 0;
          for (const sky of result.skies) {
            for (const d of sky.ledger) {
              const flows =
                d.harvestWh -
                d.storeChargeLossWh -
                d.storeOutputLossWh -
                d.converterLossWh -
                d.deviceChargeLossWh -
                d.deliveredWh;
              worstImbalanceWh = Math.max(
                worstImbalanceWh,
                Math.abs(d.storedEndWh - d.storedStartWh - flows),
                Math.abs(d.availableHarvestWh - d.harvestWh - d.spilledWh),
              );
            }
          }
          expect(worstImbalanceWh).toBeLessThan(1e-9);
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
            let bigger: KitEntry[];
            if (asCount && kit.length > 0) {
              const i = where % kit.length;
              bigger = kit.map((e, j) => (j === i ? { ...e, count: e.count + 1 } : e));
            } else {
              // Insert anywhere, so the new line's position in the kit cannot matter.
              const i = where % (kit.length + 1);
              bigger = [...kit.slice(0, i), { itemId: 'added', count: 1, spec: extra }, ...kit.slice(i)];
            }
            expect(isKitFeasible({ solar, kit: bigger, devices, reserveShare })).toBe(true);
          },
        ),
        { numRuns: 2000 },
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
            let worstDropWh = 0;
            base.skies.forEach((sky, k) => {
              const more = sunnier.skies[k]?.unitWhByStep ?? new Float64Array();
              sky.unitWhByStep.forEach((wh, i) => (worstDropWh = Math.max(worstDropWh, wh - (more[i] ?? -Infinity))));
            });
            expect(worstDropWh).toBeLessThan(1e-9);
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
