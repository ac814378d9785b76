import {
  leadAcidColdChargeMaxCRate,
  leadAcidMinChargeTemperatureC,
  lithiumMinChargeTemperatureC,
} from '../constants/index.js';
import type { StationBattery, StationWarning } from './types.js';

/** Whether and how fast a pack may charge at a temperature. */
export interface ChargeTemperatureLimit {
  /** Largest charge current the temperature allows, A (0: do not charge; Infinity: no temperature limit). */
  maxChargeA: number;
  warning?: StationWarning;
}

/**
 * The charge limit a temperature sets, A. Lithium (polymer, ion, LiFePO₄) is never charged below 0 °C: lithium
 * plates on the anode (cell makers' 0–45 °C charge range, common practice). Lead-acid may charge below freezing at
 * 0.3C or less, and not below −20 °C (Battery University, BU-410, from memory).
 * @example chargeTemperatureLimit({ chemistry: 'lifepo4', capacityAh: 6 }, -2).maxChargeA // 0
 * @example chargeTemperatureLimit({ chemistry: 'lead-acid', capacityAh: 7 }, -5).maxChargeA // 2.1
 */
export function chargeTemperatureLimit(
  battery: Pick<StationBattery, 'chemistry' | 'capacityAh'>,
  temperatureC: number,
): ChargeTemperatureLimit {
  if (battery.chemistry !== 'lead-acid') {
    if (temperatureC >= lithiumMinChargeTemperatureC) return { maxChargeA: Infinity };
    return {
      maxChargeA: 0,
      warning: {
        id: 'charge-too-cold',
        severity: 'warning',
        text: `Never charge lithium below ${lithiumMinChargeTemperatureC} °C: at ${Math.round(temperatureC)} °C the pack must be warmed first. The plan does not charge it then.`,
      },
    };
  }
  if (temperatureC >= 0) return { maxChargeA: Infinity };
  if (temperatureC < leadAcidMinChargeTemperatureC) {
    return {
      maxChargeA: 0,
      warning: {
        id: 'charge-too-cold',
        severity: 'warning',
        text: `Below ${leadAcidMinChargeTemperatureC} °C a lead-acid battery is not charged; keep it charged and insulated, as a flat one can freeze.`,
      },
    };
  }
  return {
    maxChargeA: leadAcidColdChargeMaxCRate * battery.capacityAh,
    warning: {
      id: 'charge-cold-reduced',
      severity: 'info',
      text: `Below freezing a lead-acid battery charges at a reduced rate (at most ${leadAcidColdChargeMaxCRate}C here). Check the maker's limits.`,
    },
  };
}
