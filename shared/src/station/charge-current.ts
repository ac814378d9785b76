import {
  leadAcidTypicalChargeCRate,
  lifepo4TypicalChargeCRate,
  liIonTypicalChargeCRate,
  lipoTypicalChargeCRate,
  type BatteryChemistry,
} from '../constants/station.js';
import type { StationBattery, StationController } from './types.js';

/** Typical charge rate by chemistry when the maker gives none, C (common practice; see `constants/station.ts`). */
export const typicalChargeCRateByChemistry: Readonly<Record<BatteryChemistry, number>> = {
  lipo: lipoTypicalChargeCRate,
  'li-ion': liIonTypicalChargeCRate,
  lifepo4: lifepo4TypicalChargeCRate,
  'lead-acid': leadAcidTypicalChargeCRate,
};

/** A pack's largest charge current and where its C-rate came from. */
export interface PackChargeLimit {
  /** Charge C-rate used, C. */
  chargeCRate: number;
  /** Largest charge current, A: C-rate × Ah. */
  maxChargeA: number;
  /** `maker` when the pack's own rating was used, `typical` when the chemistry's usual rate was. */
  basis: 'maker' | 'typical';
}

/**
 * A pack's largest charge current, A = charge C-rate × rated Ah: the maker's rating when given, otherwise the
 * chemistry's typical rate (common practice: lithium polymer 1C, lithium-ion and LiFePO₄ 0.5C, lead-acid 0.1C).
 * @example packChargeLimit({ chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 6 }) // { chargeCRate: 0.5, maxChargeA: 3, basis: 'typical' }
 */
export function packChargeLimit(
  battery: Pick<StationBattery, 'chemistry' | 'capacityAh' | 'chargeCRate'>,
): PackChargeLimit {
  const maker = battery.chargeCRate;
  const chargeCRate = maker !== undefined && maker > 0 ? maker : typicalChargeCRateByChemistry[battery.chemistry];
  return {
    chargeCRate,
    maxChargeA: chargeCRate * battery.capacityAh,
    basis: maker !== undefined && maker > 0 ? 'maker' : 'typical',
  };
}

/** Which limit set the charge current. */
export type ChargeCurrentCap = 'offered' | 'controller' | 'pack' | 'cold';

/**
 * The charge current a controller may put into a pack, A: the least of what the panel side offers, the controller's
 * largest charge current, the pack's largest charge current and the cold limit (`coldLimitA`, from
 * `chargeTemperatureLimit`). A panel that could push more is simply capped.
 * @example chargeCurrentA(5.2, { maxChargeA: 10 }, { maxChargeA: 3 }) // { currentA: 3, cappedBy: 'pack' }
 */
export function chargeCurrentA(
  offeredA: number,
  controller: Pick<StationController, 'maxChargeA'>,
  packLimit: Pick<PackChargeLimit, 'maxChargeA'>,
  coldLimitA = Infinity,
): { currentA: number; cappedBy: ChargeCurrentCap } {
  const candidates: [number, ChargeCurrentCap][] = [
    [Math.max(0, offeredA), 'offered'],
    [controller.maxChargeA, 'controller'],
    [packLimit.maxChargeA, 'pack'],
    [Math.max(0, coldLimitA), 'cold'],
  ];
  let best = candidates[0]!;
  for (const c of candidates) if (c[0] < best[0]) best = c;
  return { currentA: best[0], cappedBy: best[1] };
}
