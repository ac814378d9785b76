import { stcCellTemperatureC, stcIrradianceWm2 } from '../constants/electrical.js';
import type { StationPanel } from './types.js';

/**
 * A 12 V panel's current–voltage curve at a given irradiance and cell temperature, from its datasheet's three
 * points (short circuit, maximum power, open circuit) — our engineering simplification, not a diode model:
 * - currents scale with irradiance (short-circuit current is proportional to irradiance; Duffie & Beckman, Solar
 *   Engineering of Thermal Processes, 4th ed., §23.2, from memory), their small temperature rise is ignored;
 * - the maximum-power voltage moves with the power coefficient (with the current fixed, Pmp then follows
 *   1 + γ(T − 25 °C) exactly, the same linear model as the USB panels), the open-circuit voltage with its own
 *   coefficient;
 * - between the points the curve is straight: (0 V, Isc) → (Vmp, Imp) → (Voc, 0). Without Isc the current below Vmp
 *   is flat at Imp, which understates a PWM harvest by the few % that Isc exceeds Imp.
 * Limits: linear in irradiance (no low-light voltage loss), no shading or bypass diodes.
 */

/** Irradiance on the panel's plane and its cell temperature. */
export interface PanelConditions {
  irradianceWm2: number;
  cellTempC: number;
}

/** The three points of the curve at some conditions, V and A, and the maximum power, W. */
export interface PanelCurvePoints {
  shortCircuitAmps: number;
  maxPowerVolts: number;
  maxPowerAmps: number;
  openCircuitVolts: number;
  maxPowerW: number;
}

/**
 * Open-circuit voltage at a cell temperature, V: Voc × (1 + β / 100 × (T − 25 °C)), β in %/°C (the linear
 * temperature model of datasheets; STC 25 °C per IEC 61215).
 * @example panelOpenCircuitVoltsAt({ openCircuitVolts: 21.6, tempCoeffVocPctPerC: -0.3, … }, -15) // 21.6 × 1.12 = 24.192
 */
export function panelOpenCircuitVoltsAt(
  panel: Pick<StationPanel, 'openCircuitVolts' | 'tempCoeffVocPctPerC'>,
  cellTempC: number,
): number {
  return panel.openCircuitVolts * (1 + (panel.tempCoeffVocPctPerC / 100) * (cellTempC - stcCellTemperatureC));
}

/**
 * The curve's three points at an irradiance and cell temperature.
 * @example panelCurvePoints(panel18V, { irradianceWm2: 1000, cellTempC: 25 }).maxPowerW // Vmp × Imp at STC
 */
export function panelCurvePoints(panel: StationPanel, conditions: PanelConditions): PanelCurvePoints {
  assertPanel(panel);
  const light = Math.max(0, conditions.irradianceWm2) / stcIrradianceWm2;
  const dT = conditions.cellTempC - stcCellTemperatureC;
  const openCircuitVolts = Math.max(0, panelOpenCircuitVoltsAt(panel, conditions.cellTempC));
  // Vmp stays below Voc even where the two coefficients would cross them (far outside datasheet temperatures).
  const maxPowerVolts = Math.min(
    Math.max(0, panel.maxPowerVolts * (1 + (panel.tempCoeffPctPerC / 100) * dT)),
    openCircuitVolts,
  );
  const maxPowerAmps = panel.maxPowerAmps * light;
  const shortCircuitAmps = (panel.shortCircuitAmps ?? panel.maxPowerAmps) * light;
  return {
    shortCircuitAmps,
    maxPowerVolts,
    maxPowerAmps,
    openCircuitVolts,
    maxPowerW: maxPowerVolts * maxPowerAmps,
  };
}

/**
 * The panel's current when held at a voltage, A, on the straight-segment curve.
 * @example panelCurrentAtVoltsA({ shortCircuitAmps: 6, maxPowerVolts: 18, maxPowerAmps: 5.56, openCircuitVolts: 21.6, … }, 13) // ≈ 5.68
 */
export function panelCurrentAtVoltsA(points: PanelCurvePoints, volts: number): number {
  const { shortCircuitAmps, maxPowerVolts, maxPowerAmps, openCircuitVolts } = points;
  if (volts >= openCircuitVolts) return 0;
  if (volts <= 0) return shortCircuitAmps;
  if (volts <= maxPowerVolts) {
    return shortCircuitAmps - ((shortCircuitAmps - maxPowerAmps) * volts) / maxPowerVolts;
  }
  return (maxPowerAmps * (openCircuitVolts - volts)) / (openCircuitVolts - maxPowerVolts);
}

function assertPanel(panel: StationPanel): void {
  if (!(panel.maxPowerVolts > 0) || !(panel.maxPowerAmps > 0)) {
    throw new RangeError('A panel needs a maximum-power voltage and current above 0');
  }
  if (!(panel.openCircuitVolts > panel.maxPowerVolts)) {
    throw new RangeError('A panel’s open-circuit voltage must be above its maximum-power voltage');
  }
  if (panel.shortCircuitAmps !== undefined && !(panel.shortCircuitAmps >= panel.maxPowerAmps)) {
    throw new RangeError('A panel’s short-circuit current must be at least its maximum-power current');
  }
}
