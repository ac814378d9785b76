import {
  leadAcidRatedHours,
  leadAcidUsableShare,
  lifepo4UsableShare,
  liIonUsableShare,
  lipoUsableShare,
  type BatteryChemistry,
} from '../constants/station.js';
import { packVolts } from './pack-volts.js';
import { defaultPeukertExponent, peukertCapacityAh } from './peukert.js';
import type { StationBattery } from './types.js';

/** Share of the rating each chemistry is drained to, 0–1 (sources in `constants/station.ts`). */
export const usableShareByChemistry: Readonly<Record<BatteryChemistry, number>> = {
  lipo: lipoUsableShare,
  'li-ion': liIonUsableShare,
  lifepo4: lifepo4UsableShare,
  'lead-acid': leadAcidUsableShare,
};

/**
 * Share of a pack's rating the plan uses, 0–1: lead-acid about half (common practice), LiFePO₄ nearly all (0.9),
 * lithium polymer and lithium-ion 0.8 (common practice).
 * @example usableShare('lead-acid') // 0.5
 */
export function usableShare(chemistry: BatteryChemistry): number {
  return usableShareByChemistry[chemistry];
}

/**
 * Capacity a pack delivers at a steady discharge current, Ah: by Peukert's law with the pack's exponent (lead-acid
 * default 1.15; lithium 1, so its rating), capped at the rating. With no current given, the rating.
 * @example packCapacityAtCurrentAh({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 }, 1.19) // ≈ 5.83
 */
export function packCapacityAtCurrentAh(battery: StationBattery, dischargeCurrentA?: number): number {
  if (dischargeCurrentA === undefined) return battery.capacityAh;
  return peukertCapacityAh(battery.capacityAh, dischargeCurrentA, {
    ratedHours: battery.ratedHours ?? leadAcidRatedHours,
    exponent: battery.peukertExponent ?? defaultPeukertExponent(battery.chemistry),
  });
}

/**
 * Usable energy of a pack, Wh: capacity at the discharge current (Peukert; the rating when no current is given) ×
 * nominal pack volts × usable share by chemistry.
 * @example packUsableWh({ chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 6 }) // 6 × 12.8 × 0.9 = 69.12
 * @example packUsableWh({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 }) // 7 × 12 × 0.5 = 42
 */
export function packUsableWh(battery: StationBattery, dischargeCurrentA?: number): number {
  return (
    packCapacityAtCurrentAh(battery, dischargeCurrentA) *
    packVolts(battery.chemistry, battery.cellsInSeries).nominalVolts *
    usableShare(battery.chemistry)
  );
}
