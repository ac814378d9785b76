import { describe, expect, it } from 'vitest';
import { panelPortCapW, panelPowerW, panelTemperatureFactor } from './panel-power.js';
import { panelPowerSeries, seriesEnergyWh } from './panel-series.js';
import { defaultUsbPanelLosses, panelSystemFactor } from './system-factor.js';
import { testUsbPanel } from '../testing/fixtures.js';
import { syntheticTripSolar } from '../testing/synthetic-solar.js';
import { clearSkyIrradiance } from '../sun/clear-sky.js';
import { groundReflectedWm2, isotropicSkyDiffuseWm2 } from '../sun/transposition.js';

// Plane irradiance for "aimed at the sun in clear sky near noon": ~1000 W/m² (the STC level, IEC 61215; a clear
// noon sky at mid latitudes gives 900–1050 W/m² normal to the beam plus diffuse — common practice).
const aimedNoonWm2 = 1000;

describe('panel harvest against the trade', () => {
  it('a panel aimed at the sun near noon at 20 °C air gives 50–70 % of its label (common practice: a 50 W panel ≈ 30 W)', () => {
    const fifty = testUsbPanel({ ratedW: 50, portVolts: 5, portMaxA: 10 });
    const shareOfLabel = panelPowerW(fifty, aimedNoonWm2, 20) / 50;
    expect(shareOfLabel).toBeGreaterThan(0.5);
    expect(shareOfLabel).toBeLessThan(0.7);
  });
  it('a 10 W USB panel facing the sun delivers about 1 A at 5 V — half a 2 A wall charger (common practice)', () => {
    const tenW = testUsbPanel({ ratedW: 10, portVolts: 5, portMaxA: 2 });
    const amps = panelPowerW(tenW, aimedNoonWm2, 20) / 5;
    // "about 1 A": accepted 0.7–1.4 A (the trade's figure is a rounded field reading).
    expect(amps).toBeGreaterThan(0.7);
    expect(amps).toBeLessThan(1.4);
    expect(amps).toBeLessThan(2); // below a 2 A wall charger
  });
});

describe('panel harvest against the trade, with the sun module’s clear sky', () => {
  // Ineichen–Perez clear sky (the sun module) for a 60° sun on day 172 at sea level, Linke turbidity 3; the panel faces
  // the sun (tilt 30°, no angle of incidence): plane = DNI + isotropic sky diffuse + ground reflection (albedo 0.2).
  const sky = clearSkyIrradiance(60, 172);
  const planeWm2 = sky.dniWm2 + isotropicSkyDiffuseWm2(30, sky.dhiWm2) + groundReflectedWm2(30, sky.ghiWm2, 0.2);
  it('the aimed plane gets roughly the STC level (900–1100 W/m²)', () => {
    expect(planeWm2).toBeGreaterThan(900);
    expect(planeWm2).toBeLessThan(1100);
  });
  it('a 50 W panel gives 50–70 % of its label at 20 °C air (common practice: about 30 W)', () => {
    const share = panelPowerW(testUsbPanel({ ratedW: 50, portMaxA: 10 }), planeWm2, 20) / 50;
    expect(share).toBeGreaterThan(0.5);
    expect(share).toBeLessThan(0.7);
  });
  it('a 10 W USB panel gives about 1 A at 5 V (common practice)', () => {
    const amps = panelPowerW(testUsbPanel({ ratedW: 10 }), planeWm2, 20) / 5;
    expect(amps).toBeGreaterThan(0.7);
    expect(amps).toBeLessThan(1.4);
  });
});

describe('panel power model', () => {
  it('temperature factor: −0.4 %/°C at 50 °C cell is 0.9; at STC 25 °C it is 1 (IEC 61215 STC)', () => {
    expect(panelTemperatureFactor(-0.4, 50)).toBeCloseTo(0.9, 12);
    expect(panelTemperatureFactor(-0.4, 25)).toBeCloseTo(1, 12);
  });
  it('system factor is the product of its named losses, none of them zero by default', () => {
    expect(panelSystemFactor()).toBeCloseTo(0.88 * 0.98 ** 3 * 0.9, 12);
    for (const v of Object.values(defaultUsbPanelLosses)) expect(v).toBeGreaterThan(0);
  });
  it('is zero below the dropout irradiance and in the dark', () => {
    const panel = testUsbPanel({ dropoutIrradianceWm2: 150 });
    expect(panelPowerW(panel, 149, 20)).toBe(0);
    expect(panelPowerW(panel, 151, 20)).toBeGreaterThan(0);
    expect(panelPowerW(panel, 0, 20)).toBe(0);
  });
  it('is capped by the port (a 30 W panel behind a 5 V 2 A port gives at most 10 W)', () => {
    const panel = testUsbPanel({ ratedW: 30 });
    expect(panelPortCapW(panel)).toBeCloseTo(10, 12);
    expect(panelPowerW(panel, 1000, 0)).toBeCloseTo(10, 12);
  });
  it('a colder cell gives more power (negative coefficient)', () => {
    const panel = testUsbPanel();
    expect(panelPowerW(panel, 600, -10)).toBeGreaterThan(panelPowerW(panel, 600, 30));
  });
});

describe('panel power series', () => {
  it('one series per sky, zero at night, the cloudy run lower', () => {
    const solar = syntheticTripSolar({ nights: 4 });
    const series = panelPowerSeries(testUsbPanel(), solar);
    expect(series).toHaveLength(4);
    expect(series[0]).toHaveLength(solar.steps.length);
    const nightIndex = solar.steps.findIndex((s) => s.localTime === '23:00');
    expect(series[0]?.[nightIndex]).toBe(0);
    const expectedDay0 = seriesEnergyWh(series[0] ?? new Float64Array(), solar, 0);
    const cloudyDay0 = seriesEnergyWh(series[1] ?? new Float64Array(), solar, 0);
    expect(cloudyDay0).toBeLessThan(expectedDay0);
    expect(expectedDay0).toBeGreaterThan(0);
  });
});
