import { defaultUsbPanelLosses, panelSystemFactor } from '../harvest/system-factor.js';
import { panelCurrentAtVoltsA, panelCurvePoints, type PanelConditions } from './panel-curve.js';
import type { StationController, StationPanel } from './types.js';

/**
 * Harvest of a 12 V panel through a PWM or an MPPT charge controller, W at the battery.
 * - **PWM**: the switch ties the panel to the battery, so the panel works at the battery's voltage: harvest ≈ the
 *   panel's current at that voltage × battery volts. The switch's own small drop is not modelled.
 * - **MPPT**: a buck converter holds the panel at its maximum power point: harvest ≈ maximum power × the
 *   controller's efficiency. It can only step down, so when the battery is above the panel's maximum-power voltage
 *   (a hot panel) it works at the battery's voltage too, still through its efficiency.
 * Both are multiplied by the panel's named losses (mismatch, dust, wiring, label optimism; PVWatts defaults, Dobos
 * 2014, and our label figure — `harvest/system-factor.ts`), without the USB regulator, which a 12 V panel lacks.
 */

/** Options of the 12 V harvest model. */
export interface StationHarvestOptions {
  /** Factor 0–1 for the panel's losses before the controller; default the USB panel losses without the regulator (≈ 0.847). */
  panelLossFactor?: number;
}

/**
 * The default loss factor of a 12 V panel before its controller, 0–1: (1 − mismatch)(1 − dust)(1 − wiring)
 * (1 − label optimism) = 0.98³ × 0.90 ≈ 0.847.
 * @example stationPanelLossFactor() // ≈ 0.847
 */
export function stationPanelLossFactor(): number {
  return panelSystemFactor({ ...defaultUsbPanelLosses, regulatorEfficiency: 1 });
}

/**
 * PWM harvest, W: panel current at the battery's voltage × battery volts × the panel's loss factor (0 when the
 * battery is at or above the panel's open-circuit voltage).
 * @example pwmHarvestW(panel100W, 13, { irradianceWm2: 1000, cellTempC: 25 }, { panelLossFactor: 1 }) // 13 × 5.56 = 72.28 (no Isc given)
 */
export function pwmHarvestW(
  panel: StationPanel,
  batteryVolts: number,
  conditions: PanelConditions,
  options: StationHarvestOptions = {},
): number {
  if (!(batteryVolts > 0)) return 0;
  const points = panelCurvePoints(panel, conditions);
  return batteryVolts * panelCurrentAtVoltsA(points, batteryVolts) * lossFactor(options);
}

/**
 * MPPT harvest, W: maximum power × efficiency × the panel's loss factor; when the battery is above the panel's
 * maximum-power voltage, the power at the battery's voltage × efficiency × loss factor.
 * @example mpptHarvestW(panel100W, 0.95, 13, { irradianceWm2: 1000, cellTempC: 25 }, { panelLossFactor: 1 }) // 0.95 × 18 × 5.56 = 95.076
 */
export function mpptHarvestW(
  panel: StationPanel,
  efficiency: number,
  batteryVolts: number,
  conditions: PanelConditions,
  options: StationHarvestOptions = {},
): number {
  if (!(batteryVolts > 0)) return 0;
  const points = panelCurvePoints(panel, conditions);
  const panelW =
    batteryVolts <= points.maxPowerVolts ? points.maxPowerW : batteryVolts * panelCurrentAtVoltsA(points, batteryVolts);
  return panelW * efficiency * lossFactor(options);
}

/**
 * The MPPT efficiency at which MPPT and PWM harvest the same, 0–1: Vbat × I(Vbat) / (Vmp × Imp), for a battery at
 * or below the panel's maximum-power voltage. MPPT harvests at least as much as PWM exactly when
 * η × Vmp × Imp ≥ Vbat × I(Vbat), i.e. when its efficiency loss 1 − η is no more than 1 − Vbat·I(Vbat)/(Vmp·Imp);
 * with no short-circuit current given (I flat at Imp below Vmp) that is 1 − η ≤ (Vmp − Vbat) / Vmp, the relative
 * voltage mismatch.
 * @example mpptBreakEvenEfficiency(panel18V, 13.5, { irradianceWm2: 1000, cellTempC: 25 }) // 13.5 / 18 = 0.75
 */
export function mpptBreakEvenEfficiency(
  panel: StationPanel,
  batteryVolts: number,
  conditions: PanelConditions,
): number {
  const points = panelCurvePoints(panel, conditions);
  if (!(points.maxPowerW > 0)) return 1;
  if (batteryVolts > points.maxPowerVolts) return 1;
  return (batteryVolts * panelCurrentAtVoltsA(points, batteryVolts)) / points.maxPowerW;
}

/**
 * Harvest through a given controller, W at the battery, before the charge-current caps (`chargeCurrentA`).
 * @example controllerHarvestW(panel, { controllerType: 'mppt', efficiency: 0.95, … }, 13.2, conditions) // = mpptHarvestW(…)
 */
export function controllerHarvestW(
  panel: StationPanel,
  controller: Pick<StationController, 'controllerType' | 'efficiency'>,
  batteryVolts: number,
  conditions: PanelConditions,
  options: StationHarvestOptions = {},
): number {
  return controller.controllerType === 'mppt'
    ? mpptHarvestW(panel, controller.efficiency, batteryVolts, conditions, options)
    : pwmHarvestW(panel, batteryVolts, conditions, options);
}

function lossFactor(options: StationHarvestOptions): number {
  return options.panelLossFactor ?? stationPanelLossFactor();
}
