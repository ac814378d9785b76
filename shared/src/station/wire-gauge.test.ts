import { describe, expect, it } from 'vitest';
import { awgAreaMm2, awgDiameterMm, copperResistanceOhmPerKm } from './wire-gauge.js';
import { checkLeadDrop, leadLoopResistanceOhm } from './lead-drop.js';

const mmPerInch = 25.4;
const metresPerThousandFeet = 304.8;

/**
 * Solid annealed copper at 20 °C, as printed in a copper wire table: diameter in inches and resistance in Ω per
 * 1000 ft. Source: NBS Handbook 100, Copper Wire Tables (U.S. National Bureau of Standards, 1966), table 1 — values
 * from memory; the same figures are in the wire tables of the ARRL Handbook.
 */
const copperWireTable = [
  { gaugeAwg: 10, diameterIn: 0.1019, ohmPerThousandFt: 0.9989 },
  { gaugeAwg: 12, diameterIn: 0.0808, ohmPerThousandFt: 1.588 },
  { gaugeAwg: 14, diameterIn: 0.0641, ohmPerThousandFt: 2.525 },
  { gaugeAwg: 16, diameterIn: 0.0508, ohmPerThousandFt: 4.016 },
  { gaugeAwg: 18, diameterIn: 0.0403, ohmPerThousandFt: 6.385 },
  { gaugeAwg: 22, diameterIn: 0.0253, ohmPerThousandFt: 16.14 },
] as const;

function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / expected;
}

describe('AWG copper wire against a published copper wire table (NBS Handbook 100, from memory), within 2 %', () => {
  for (const row of copperWireTable) {
    it(`${row.gaugeAwg} AWG: ${row.diameterIn} in and ${row.ohmPerThousandFt} Ω/1000 ft`, () => {
      expect(relativeError(awgDiameterMm(row.gaugeAwg), row.diameterIn * mmPerInch)).toBeLessThan(0.02);
      const tableOhmPerKm = (row.ohmPerThousandFt * 1000) / metresPerThousandFeet;
      expect(relativeError(copperResistanceOhmPerKm(row.gaugeAwg), tableOhmPerKm)).toBeLessThan(0.02);
    });
  }
});

describe('AWG definition points and identities', () => {
  it('36 AWG is 0.005 in and 0000 AWG is 0.46 in (ASTM B258 definition); 0000 is written −3 and not modelled', () => {
    expect(awgDiameterMm(36)).toBeCloseTo(0.005 * mmPerInch, 9);
    // 0000 is 3 steps above 0 AWG: d(0) × 92^(3/39) reproduces 0.46 in.
    expect(awgDiameterMm(0) * 92 ** (3 / 39)).toBeCloseTo(0.46 * mmPerInch, 6);
  });
  it('six gauges halve the diameter, within 0.5 % (the rule of thumb that follows from 92^(6/39) ≈ 2.005)', () => {
    expect(relativeError(awgDiameterMm(10) / awgDiameterMm(16), 2)).toBeLessThan(0.005);
  });
  it('three gauges double the resistance, within 1 % (92^(6/39) ≈ 2.005 in area)', () => {
    expect(relativeError(copperResistanceOhmPerKm(15) / copperResistanceOhmPerKm(12), 2)).toBeLessThan(0.01);
  });
  it('area is π d² / 4', () => {
    const d = awgDiameterMm(14);
    expect(awgAreaMm2(14)).toBeCloseTo((Math.PI * d * d) / 4, 12);
  });
  it('copper at 60 °C is 15.7 % more resistive than at 20 °C (IEC 60028, α₂₀ = 0.00393 /°C)', () => {
    expect(copperResistanceOhmPerKm(12, 60) / copperResistanceOhmPerKm(12)).toBeCloseTo(1 + 0.00393 * 40, 12);
  });
  it('rejects gauges outside 0–40 and part gauges', () => {
    expect(() => awgDiameterMm(-1)).toThrow(RangeError);
    expect(() => awgDiameterMm(41)).toThrow(RangeError);
    expect(() => awgDiameterMm(12.5)).toThrow(RangeError);
  });
});

describe('DC lead voltage drop', () => {
  it('hand worked: 12 AWG, 2 m one way, 20 A → 4 m × 5.21 Ω/km ≈ 0.0208 Ω → ≈ 0.417 V', () => {
    const loopOhm = leadLoopResistanceOhm({ gaugeAwg: 12, lengthM: 2 });
    expect(relativeError(loopOhm, 4 * 0.005211)).toBeLessThan(0.01);
    const check = checkLeadDrop({ gaugeAwg: 12, lengthM: 2 }, 20, 13.2, 11.7);
    expect(check.dropVolts).toBeCloseTo(20 * loopOhm, 12);
    expect(check.voltsAtRadio).toBeCloseTo(13.2 - check.dropVolts, 12);
    expect(check.warning).toBeUndefined();
  });
  it('the loop is twice the one-way length', () => {
    const one = leadLoopResistanceOhm({ gaugeAwg: 16, lengthM: 1 });
    expect(leadLoopResistanceOhm({ gaugeAwg: 16, lengthM: 2 })).toBeCloseTo(2 * one, 12);
    expect(one).toBeCloseTo((2 / 1000) * copperResistanceOhmPerKm(16), 12);
  });
  it('warns when an 18 AWG, 3 m lead at 20 A leaves a LiFePO₄ pack’s 12.8 V below the radio’s 11.7 V (6 m × 20.9 Ω/km × 20 A ≈ 2.5 V)', () => {
    const check = checkLeadDrop({ gaugeAwg: 18, lengthM: 3 }, 20, 12.8, 11.7);
    expect(check.dropVolts).toBeGreaterThan(2.4);
    expect(check.dropVolts).toBeLessThan(2.6);
    expect(check.warning?.id).toBe('lead-drop-below-min');
  });
  it('no current, no drop', () => {
    expect(checkLeadDrop({ gaugeAwg: 22, lengthM: 5 }, 0, 12, 11).dropVolts).toBe(0);
  });
});
