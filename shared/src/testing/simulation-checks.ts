import type { KitEntry, KitItemSpec, TripDevice } from '../schemas/kit.js';
import type { KitSimulation } from '../simulation/types.js';

/**
 * The measures the simulation's property tests assert on (energy conserved, monotone in sun and demand, adding an
 * item), written once for the USB-only and the both-path properties.
 */

/** Every device using `factor` times as much (a radio's transmit minutes capped at a day). */
export function scaleDemand(devices: readonly TripDevice[], factor: number): TripDevice[] {
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

/**
 * The largest daily imbalance in any sky, Wh: |Δ stored − (harvest − each loss − delivered)| and |available −
 * taken − spilled|.
 */
export function worstLedgerImbalanceWh(result: KitSimulation): number {
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
  return worst;
}

/** The most any unit (store or device) holds less in `more` than in `base` at any step of any sky, Wh. */
export function worstUnitDropWh(base: KitSimulation, more: KitSimulation): number {
  let worst = 0;
  base.skies.forEach((sky, k) => {
    const other = more.skies[k]?.unitWhByStep ?? new Float64Array();
    sky.unitWhByStep.forEach((wh, i) => (worst = Math.max(worst, wh - (other[i] ?? -Infinity))));
  });
  return worst;
}

/** The most any store holds more in `more` than in `base` at any step of any sky, Wh (devices left out). */
export function worstStoreRiseWh(base: KitSimulation, more: KitSimulation): number {
  const units = base.stores.length + base.devices.length;
  let worst = 0;
  base.skies.forEach((sky, k) => {
    const other = more.skies[k]?.unitWhByStep ?? new Float64Array();
    sky.unitWhByStep.forEach((wh, i) => {
      if (i % units < base.stores.length) worst = Math.max(worst, (other[i] ?? Infinity) - wh);
    });
  });
  return worst;
}

/** The kit with one more unit of line `where` (`asCount`), or with `extra` inserted as a new line at `where`. */
export function kitWithOneMore(
  kit: readonly KitEntry[],
  extra: KitItemSpec,
  where: number,
  asCount: boolean,
): KitEntry[] {
  if (asCount && kit.length > 0) {
    const i = where % kit.length;
    return kit.map((e, j) => (j === i ? { ...e, count: e.count + 1 } : e));
  }
  // Inserted anywhere, so the new line's position in the kit cannot matter.
  const i = where % (kit.length + 1);
  return [...kit.slice(0, i), { itemId: 'added', count: 1, spec: extra }, ...kit.slice(i)];
}
