/**
 * Solar cell temperature from air temperature and the irradiance on the panel's plane.
 * Default: the NOCT model (Ross 1976; Duffie & Beckman, Solar Engineering of Thermal Processes, 3rd ed.,
 * eq. 23.3.3 without the efficiency term, equation number `from memory`): T_c = T_a + (NOCT − 20 °C) × G / 800 W/m².
 * Alternative: Faiman (2008), T_c = T_a + G / (U0 + U1 × wind).
 */
import {
  defaultNoctC,
  defaultWindSpeedMs,
  faimanU0WPerM2K,
  faimanU1WsPerM3K,
  noctAirTempC,
  noctIrradianceWm2,
} from '../constants/solar.js';

/** Options of `cellTemperatureC`, all with documented defaults. */
export interface CellTemperatureOptions {
  /** `noct` (default) or `faiman`. */
  model?: 'noct' | 'faiman';
  /** Nominal operating cell temperature, °C (NOCT model); default `defaultNoctC` (45). */
  noctC?: number;
  /** Wind speed at the panel, m/s (Faiman model); default `defaultWindSpeedMs` (1). */
  windSpeedMs?: number;
  /** Faiman U0, W/(m²·K); default 25. */
  u0WPerM2K?: number;
  /** Faiman U1, W·s/(m³·K); default 6.84. */
  u1WsPerM3K?: number;
}

/**
 * Cell temperature, °C, from air temperature (°C) and plane irradiance (W/m²).
 * Limits: steady state (no thermal lag), open-rack NOCT; a panel lying on a pack or on warm rock runs
 * hotter than this.
 * @example cellTemperatureC(20, 1000, { noctC: 40 }) // 45 (pvlib `temperature.ross` test value)
 * @example cellTemperatureC(10, 500, { model: 'faiman', windSpeedMs: 5 }) // ≈ 18.446 (pvlib `temperature.faiman` test value)
 */
export function cellTemperatureC(
  airTempC: number,
  planeIrradianceWm2: number,
  options: CellTemperatureOptions = {},
): number {
  const irradianceWm2 = Math.max(0, planeIrradianceWm2);
  if (options.model === 'faiman') {
    const u0 = options.u0WPerM2K ?? faimanU0WPerM2K;
    const u1 = options.u1WsPerM3K ?? faimanU1WsPerM3K;
    const wind = Math.max(0, options.windSpeedMs ?? defaultWindSpeedMs);
    return airTempC + irradianceWm2 / (u0 + u1 * wind);
  }
  const noctC = options.noctC ?? defaultNoctC;
  return airTempC + ((noctC - noctAirTempC) * irradianceWm2) / noctIrradianceWm2;
}
