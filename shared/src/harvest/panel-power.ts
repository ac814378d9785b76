import { stcCellTemperatureC, stcIrradianceWm2 } from '../constants/electrical.js';
import type { UsbPanelSpec } from '../schemas/items.js';
import { cellTemperatureC, type CellTemperatureOptions } from '../temperature/cell-temperature.js';
import { defaultUsbPanelLosses, panelSystemFactor, type PanelSystemLosses } from './system-factor.js';

/** Options of the panel power model, all with documented defaults. */
export interface PanelPowerOptions {
  /** Named component losses; default `defaultUsbPanelLosses`. */
  losses?: Readonly<PanelSystemLosses>;
  /** Cell temperature model options; default the NOCT model with NOCT 45 °C. */
  cellTemperature?: CellTemperatureOptions;
}

/**
 * Temperature factor of a panel's power: 1 + coefficient × (T_cell − 25 °C), with the coefficient in %/°C
 * (the linear power–temperature model; Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., §23.2;
 * STC cell temperature 25 °C per IEC 61215). Never below 0.
 * @example panelTemperatureFactor(-0.4, 50) // 0.9
 */
export function panelTemperatureFactor(tempCoeffPctPerC: number, cellTempC: number): number {
  return Math.max(0, 1 + (tempCoeffPctPerC / 100) * (cellTempC - stcCellTemperatureC));
}

/**
 * The most a USB panel's port can deliver, W: port volts × port max amps.
 * @example panelPortCapW({ portVolts: 5, portMaxA: 2, … }) // 10
 */
export function panelPortCapW(panel: Pick<UsbPanelSpec, 'portVolts' | 'portMaxA'>): number {
  return panel.portVolts * panel.portMaxA;
}

/**
 * Power at a USB panel's port, W, before the input limit of what it feeds:
 * rated W × G / 1000 W/m² × temperature factor × system factor, zero below the dropout irradiance, capped by the
 * port. Limits: linear in irradiance (no low-light efficiency curve), steady-state cell temperature, no spectral
 * or angle-of-incidence loss beyond what the plane irradiance already holds.
 * @example panelPowerW(tenWattPanel, 1000, 20) // ≈ 6.67 W (cell 51.25 °C by NOCT 45)
 */
export function panelPowerW(
  panel: UsbPanelSpec,
  planeIrradianceWm2: number,
  airTempC: number,
  options: PanelPowerOptions = {},
): number {
  return panelPowerWithFactorW(
    panel,
    planeIrradianceWm2,
    airTempC,
    panelSystemFactor(options.losses ?? defaultUsbPanelLosses),
    options.cellTemperature,
  );
}

/** `panelPowerW` with the system factor already computed (for series over many steps). */
export function panelPowerWithFactorW(
  panel: UsbPanelSpec,
  planeIrradianceWm2: number,
  airTempC: number,
  systemFactor: number,
  cellTemperature?: CellTemperatureOptions,
): number {
  if (!(planeIrradianceWm2 > 0) || planeIrradianceWm2 < panel.dropoutIrradianceWm2) return 0;
  const cellC = cellTemperatureC(airTempC, planeIrradianceWm2, cellTemperature);
  const powerW =
    ((panel.ratedW * planeIrradianceWm2) / stcIrradianceWm2) *
    panelTemperatureFactor(panel.tempCoeffPctPerC, cellC) *
    systemFactor;
  return Math.min(powerW, panelPortCapW(panel));
}
