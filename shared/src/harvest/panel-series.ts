import type { UsbPanelSpec } from '../schemas/items.js';
import type { TripSolarSeries } from '../sun/trip-solar-types.js';
import { panelPowerWithFactorW, type PanelPowerOptions } from './panel-power.js';
import { defaultUsbPanelLosses, panelSystemFactor } from './system-factor.js';

/**
 * One panel's port power in every step of every design sky, W — computed once per panel and trip, then shared by
 * every kit the solver tries (the input limit of the store it feeds is applied later, by dispatch).
 * Result: one `Float64Array` per sky, in `solar.skies` order, each `solar.steps.length` long.
 * @example panelPowerSeries(panel, solar)[0][12] // W at step 12 of the expected sky
 */
export function panelPowerSeries(
  panel: UsbPanelSpec,
  solar: TripSolarSeries,
  options: PanelPowerOptions = {},
): Float64Array[] {
  const factor = panelSystemFactor(options.losses ?? defaultUsbPanelLosses);
  return solar.skies.map((sky) => {
    const series = new Float64Array(solar.steps.length);
    for (let i = 0; i < solar.steps.length; i++) {
      const step = solar.steps[i];
      const g = sky.planeIrradianceWm2[i] ?? 0;
      series[i] = step ? panelPowerWithFactorW(panel, g, step.airTempC, factor, options.cellTemperature) : 0;
    }
    return series;
  });
}

/**
 * Energy of a power series over the steps, Wh (Σ W × step hours), optionally for one trip day.
 * @example seriesEnergyWh(series, solar, 0) // Wh the panel could deliver on day 0
 */
export function seriesEnergyWh(series: Float64Array, solar: TripSolarSeries, dayIndex?: number): number {
  let energyWh = 0;
  for (let i = 0; i < series.length; i++) {
    const step = solar.steps[i];
    if (!step || (dayIndex !== undefined && step.dayIndex !== dayIndex)) continue;
    energyWh += (series[i] ?? 0) * step.durationH;
  }
  return energyWh;
}
