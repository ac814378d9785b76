import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellTemperatureC } from '../temperature/cell-temperature.js';
import {
  controllerHarvestW,
  mpptBreakEvenEfficiency,
  mpptHarvestW,
  pwmHarvestW,
  stationPanelLossFactor,
} from './controller-harvest.js';
import { checkControllerInputVolts } from './controller-input.js';
import { panelCurrentAtVoltsA, panelCurvePoints, panelOpenCircuitVoltsAt } from './panel-curve.js';
import type { StationPanel } from './types.js';

/**
 * A 12 V-class panel as the trade describes one: about 17–18 V at maximum power and 21–22 V open circuit (a 36-cell
 * crystalline panel; common practice). Invented test items, not products.
 */
function panel12V(ratedW: number, overrides: Partial<StationPanel> = {}): StationPanel {
  return {
    maxPowerVolts: 18,
    maxPowerAmps: ratedW / 18,
    openCircuitVolts: 21.6,
    tempCoeffPctPerC: -0.4,
    tempCoeffVocPctPerC: -0.3,
    ...overrides,
  };
}

const stc = { irradianceWm2: 1000, cellTempC: 25 };
const lossless = { panelLossFactor: 1 };

describe('PWM versus MPPT: a worked example checkable by hand', () => {
  // 100 W panel: Vmp 18 V, Imp 100/18 = 5.5556 A; battery at 13 V; STC; no panel losses; MPPT 95 %.
  const panel = panel12V(100);
  it('PWM pulls the panel to 13 V: 13 V × 5.5556 A = 72.22 W (current flat at Imp below Vmp)', () => {
    expect(pwmHarvestW(panel, 13, stc, lossless)).toBeCloseTo((13 * 100) / 18, 9);
  });
  it('with Isc 6 A the current at 13 V is 6 − (6 − 5.5556) × 13/18 = 5.679 A → 73.83 W', () => {
    const withIsc = panel12V(100, { shortCircuitAmps: 6 });
    const amps = 6 - (6 - 100 / 18) * (13 / 18);
    expect(panelCurrentAtVoltsA(panelCurvePoints(withIsc, stc), 13)).toBeCloseTo(amps, 9);
    expect(pwmHarvestW(withIsc, 13, stc, lossless)).toBeCloseTo(13 * amps, 9);
  });
  it('MPPT: 100 W × 0.95 = 95 W', () => {
    expect(mpptHarvestW(panel, 0.95, 13, stc, lossless)).toBeCloseTo(95, 9);
  });
  it('hot cells (50 °C): Vmp 18 × (1 − 0.004 × 25) = 16.2 V, MPPT 0.95 × 16.2 × 5.5556 = 85.5 W; PWM unchanged at 72.22 W', () => {
    const hot = { irradianceWm2: 1000, cellTempC: 50 };
    expect(mpptHarvestW(panel, 0.95, 13, hot, lossless)).toBeCloseTo(0.95 * 16.2 * (100 / 18), 9);
    expect(pwmHarvestW(panel, 13, hot, lossless)).toBeCloseTo((13 * 100) / 18, 9);
  });
  it('half the light, half the harvest (currents scale with irradiance)', () => {
    const half = { irradianceWm2: 500, cellTempC: 25 };
    expect(mpptHarvestW(panel, 0.95, 13, half, lossless)).toBeCloseTo(47.5, 9);
    expect(pwmHarvestW(panel, 13, half, lossless)).toBeCloseTo((13 * 50) / 18, 9);
  });
  it('very hot cells (75 °C) with a full LiFePO₄ pack at 14.6 V above Vmp 14.4 V: MPPT can only work at 14.6 V too, and PWM wins', () => {
    const scorching = { irradianceWm2: 1000, cellTempC: 75 };
    const points = panelCurvePoints(panel, scorching);
    expect(points.maxPowerVolts).toBeCloseTo(14.4, 9);
    expect(points.openCircuitVolts).toBeCloseTo(21.6 * 0.85, 9);
    // I(14.6) on the segment from (14.4 V, 5.5556 A) to (18.36 V, 0 A): 5.5556 × 3.76 / 3.96 = 5.275 A.
    const amps = ((100 / 18) * (18.36 - 14.6)) / (18.36 - 14.4);
    expect(pwmHarvestW(panel, 14.6, scorching, lossless)).toBeCloseTo(14.6 * amps, 9);
    expect(mpptHarvestW(panel, 0.95, 14.6, scorching, lossless)).toBeCloseTo(0.95 * 14.6 * amps, 9);
  });
  it('a battery at or above the panel’s open-circuit voltage gets nothing; no battery voltage, nothing', () => {
    expect(pwmHarvestW(panel, 21.6, stc, lossless)).toBe(0);
    expect(pwmHarvestW(panel, 0, stc, lossless)).toBe(0);
  });
  it('controllerHarvestW dispatches on the controller type', () => {
    expect(controllerHarvestW(panel, { controllerType: 'mppt', efficiency: 0.95 }, 13, stc, lossless)).toBeCloseTo(
      95,
      9,
    );
    expect(controllerHarvestW(panel, { controllerType: 'pwm', efficiency: 0.95 }, 13, stc, lossless)).toBeCloseTo(
      (13 * 100) / 18,
      9,
    );
  });
  it('rejects a panel whose open-circuit voltage is not above its maximum-power voltage, or Isc below Imp', () => {
    expect(() => panelCurvePoints(panel12V(100, { openCircuitVolts: 17 }), stc)).toThrow(RangeError);
    expect(() => panelCurvePoints(panel12V(100, { shortCircuitAmps: 5 }), stc)).toThrow(RangeError);
  });
});

describe('12 V panels against the trade (common practice)', () => {
  // Aimed at the sun near noon: ~1000 W/m² on the plane (STC level, IEC 61215); air 20 °C; NOCT 45 °C cell model.
  // The panels' default losses apply (mismatch, dust, wiring 2 % each — PVWatts; label 10 % — from memory).
  // "About 3 A" / "about 6 A" are rounded field readings: accepted within ±25 %.
  const field = { irradianceWm2: 1000, cellTempC: cellTemperatureC(20, 1000) };
  const batteryVolts = 13.2;
  for (const [ratedW, aboutA] of [
    [50, 3],
    [100, 6],
  ] as const) {
    it(`a ${ratedW} W 12 V panel gives about ${aboutA} A in the field, through PWM and through MPPT`, () => {
      const panel = panel12V(ratedW);
      for (const w of [pwmHarvestW(panel, batteryVolts, field), mpptHarvestW(panel, 0.95, batteryVolts, field)]) {
        const amps = w / batteryVolts;
        expect(amps).toBeGreaterThan(0.75 * aboutA);
        expect(amps).toBeLessThan(1.25 * aboutA);
      }
    });
  }
  it('the default panel loss factor is 0.98³ × 0.90 (no USB regulator in a 12 V panel)', () => {
    expect(stationPanelLossFactor()).toBeCloseTo(0.98 ** 3 * 0.9, 12);
  });
});

describe('MPPT versus PWM property (fast-check)', () => {
  // Exact condition, battery at or below the panel's maximum-power voltage at the conditions:
  //   MPPT ≥ PWM  ⇔  η · Vmp · Imp ≥ Vbat · I(Vbat)  ⇔  1 − η ≤ 1 − Vbat·I(Vbat) / (Vmp·Imp).
  // With no Isc given (I(Vbat) = Imp below Vmp) the right side is the relative voltage mismatch (Vmp − Vbat) / Vmp.
  const panelArb = fc
    .record({
      maxPowerVolts: fc.double({ min: 14, max: 22, noNaN: true }),
      maxPowerAmps: fc.double({ min: 0.2, max: 10, noNaN: true }),
      vocRatio: fc.double({ min: 1.1, max: 1.35, noNaN: true }),
      iscRatio: fc.option(fc.double({ min: 1, max: 1.15, noNaN: true }), { nil: undefined }),
      tempCoeffPctPerC: fc.double({ min: -0.5, max: -0.3, noNaN: true }),
      tempCoeffVocPctPerC: fc.double({ min: -0.35, max: -0.25, noNaN: true }),
    })
    .map((p): StationPanel => ({
      maxPowerVolts: p.maxPowerVolts,
      maxPowerAmps: p.maxPowerAmps,
      openCircuitVolts: p.maxPowerVolts * p.vocRatio,
      ...(p.iscRatio === undefined ? {} : { shortCircuitAmps: p.maxPowerAmps * p.iscRatio }),
      tempCoeffPctPerC: p.tempCoeffPctPerC,
      tempCoeffVocPctPerC: p.tempCoeffVocPctPerC,
    }));
  const conditionsArb = fc.record({
    irradianceWm2: fc.double({ min: 50, max: 1100, noNaN: true }),
    cellTempC: fc.double({ min: -20, max: 65, noNaN: true }),
  });
  // Battery as a share of Vmp at the conditions (below it), and how the efficiency loss compares with the allowance.
  const caseArb = fc.record({
    panel: panelArb,
    conditions: conditionsArb,
    batteryShareOfVmp: fc.double({ min: 0.5, max: 0.999, noNaN: true }),
  });

  function setUp(c: {
    panel: StationPanel;
    conditions: { irradianceWm2: number; cellTempC: number };
    batteryShareOfVmp: number;
  }) {
    const points = panelCurvePoints(c.panel, c.conditions);
    const batteryVolts = points.maxPowerVolts * c.batteryShareOfVmp;
    // The allowance 1 − Vbat·I(Vbat)/(Vmp·Imp), computed from the curve's points, not from the harvest functions.
    const allowance = 1 - (batteryVolts * panelCurrentAtVoltsA(points, batteryVolts)) / points.maxPowerW;
    return { points, batteryVolts, allowance };
  }

  it('MPPT never harvests less than PWM while its efficiency loss is within the allowance', () => {
    fc.assert(
      fc.property(caseArb, fc.double({ min: 0, max: 0.999, noNaN: true }), (c, lossShareOfAllowance) => {
        const { batteryVolts, allowance } = setUp(c);
        const efficiency = 1 - lossShareOfAllowance * allowance;
        const mppt = mpptHarvestW(c.panel, efficiency, batteryVolts, c.conditions);
        const pwm = pwmHarvestW(c.panel, batteryVolts, c.conditions);
        expect(mppt).toBeGreaterThanOrEqual(pwm * (1 - 1e-12));
      }),
    );
  });
  it('MPPT harvests less than PWM when its efficiency loss exceeds the allowance', () => {
    fc.assert(
      fc.property(caseArb, fc.double({ min: 1.001, max: 3, noNaN: true }), (c, lossShareOfAllowance) => {
        const { batteryVolts, allowance } = setUp(c);
        const efficiency = 1 - lossShareOfAllowance * allowance;
        fc.pre(efficiency > 0);
        const mppt = mpptHarvestW(c.panel, efficiency, batteryVolts, c.conditions);
        const pwm = pwmHarvestW(c.panel, batteryVolts, c.conditions);
        expect(mppt).toBeLessThan(pwm);
      }),
    );
  });
  it('with no Isc given, the allowance is the relative voltage mismatch (Vmp − Vbat) / Vmp', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { shortCircuitAmps: _omit, ...flat } = c.panel;
        const { points, batteryVolts } = setUp({ ...c, panel: flat });
        const breakEven = mpptBreakEvenEfficiency(flat, batteryVolts, c.conditions);
        expect(1 - breakEven).toBeCloseTo((points.maxPowerVolts - batteryVolts) / points.maxPowerVolts, 9);
      }),
    );
  });
  it('a lossless MPPT never harvests less than PWM at any battery voltage (Vmp is the curve’s maximum)', () => {
    fc.assert(
      fc.property(caseArb, fc.double({ min: 0.1, max: 1.5, noNaN: true }), (c, share) => {
        const points = panelCurvePoints(c.panel, c.conditions);
        const batteryVolts = points.maxPowerVolts * share;
        expect(mpptHarvestW(c.panel, 1, batteryVolts, c.conditions)).toBeGreaterThanOrEqual(
          pwmHarvestW(c.panel, batteryVolts, c.conditions) * (1 - 1e-12),
        );
      }),
    );
  });
});

describe('controller input against the panel’s open-circuit voltage at the trip’s coldest temperature', () => {
  // NFPA 70 (NEC) 690.7(A) method (from memory): Voc × (1 + β (T_min − 25 °C)) with the maker's coefficient.
  const panel = panel12V(50);
  it('hand worked: 21.6 V at −0.3 %/°C and −15 °C → 21.6 × 1.12 = 24.19 V, over a 23 V input', () => {
    expect(panelOpenCircuitVoltsAt(panel, -15)).toBeCloseTo(24.192, 9);
    const check = checkControllerInputVolts({ maxInputVolts: 23 }, panel, -15);
    expect(check.coldOpenCircuitVolts).toBeCloseTo(24.192, 9);
    expect(check.warning?.id).toBe('controller-input-over');
    expect(check.warning?.severity).toBe('danger');
  });
  it('a 25 V input takes it; at 25 °C the panel is at its datasheet 21.6 V', () => {
    expect(checkControllerInputVolts({ maxInputVolts: 25 }, panel, -15).warning).toBeUndefined();
    expect(panelOpenCircuitVoltsAt(panel, 25)).toBeCloseTo(21.6, 12);
  });
  it('two panels in series double it', () => {
    expect(checkControllerInputVolts({ maxInputVolts: 100 }, panel, -15, 2).coldOpenCircuitVolts).toBeCloseTo(
      48.384,
      9,
    );
  });
});
