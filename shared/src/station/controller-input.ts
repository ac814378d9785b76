import { panelOpenCircuitVoltsAt } from './panel-curve.js';
import type { StationController, StationPanel, StationWarning } from './types.js';

/** The outcome of checking a controller's input limit against the panel's cold open-circuit voltage. */
export interface ControllerInputCheck {
  /** Open-circuit voltage of the panel string at the trip's coldest air temperature, V. */
  coldOpenCircuitVolts: number;
  warning?: StationWarning;
}

/**
 * Checks the controller's largest input voltage against the panel's open-circuit voltage at the trip's coldest air
 * temperature (the panel's cells are at air temperature at a cold dawn, when the first light already gives nearly
 * full voltage): Voc × (1 + β / 100 × (T_min − 25 °C)) × panels in series — the method of NFPA 70 (NEC) 690.7(A)
 * with the maker's coefficient (from memory).
 * @example checkControllerInputVolts({ maxInputVolts: 23, … }, { openCircuitVolts: 21.6, tempCoeffVocPctPerC: -0.3, … }, -15).warning?.id // 'controller-input-over'
 */
export function checkControllerInputVolts(
  controller: Pick<StationController, 'maxInputVolts'>,
  panel: Pick<StationPanel, 'openCircuitVolts' | 'tempCoeffVocPctPerC'>,
  coldestAirC: number,
  panelsInSeries = 1,
): ControllerInputCheck {
  const coldOpenCircuitVolts = panelOpenCircuitVoltsAt(panel, coldestAirC) * panelsInSeries;
  if (coldOpenCircuitVolts <= controller.maxInputVolts) return { coldOpenCircuitVolts };
  return {
    coldOpenCircuitVolts,
    warning: {
      id: 'controller-input-over',
      severity: 'danger',
      text: `At ${Math.round(coldestAirC)} °C the panel can reach ${coldOpenCircuitVolts.toFixed(1)} V with no load, above the controller's ${controller.maxInputVolts} V input limit: it can destroy the controller. Use a controller rated for a higher input voltage.`,
    },
  };
}
