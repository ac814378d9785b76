import { describe, expect, it } from 'vitest';
import { batteryChemistries } from '../constants/station.js';
import { packRatedWh, packVolts } from './pack-volts.js';

describe('pack voltages by chemistry and cells in series', () => {
  it('3S lithium polymer: 11.1 V nominal, 12.6 V full, 9.0 V empty (common practice: 3.7 / 4.2 / 3.0 V a cell)', () => {
    const p = packVolts('lipo', 3);
    expect(p.nominalVolts).toBeCloseTo(11.1, 9);
    expect(p.fullVolts).toBeCloseTo(12.6, 9);
    expect(p.emptyVolts).toBeCloseTo(9, 9);
  });
  it('4S lithium polymer is 16.8 V full (common practice: the figure above most radios’ maximum)', () => {
    expect(packVolts('lipo', 4).fullVolts).toBeCloseTo(16.8, 9);
  });
  it('4S LiFePO₄ is the trade’s 12.8 V battery, charged to 14.6 V, empty at 10 V (common practice)', () => {
    const p = packVolts('lifepo4', 4);
    expect(p.nominalVolts).toBeCloseTo(12.8, 9);
    expect(p.fullVolts).toBeCloseTo(14.6, 9);
    expect(p.emptyVolts).toBeCloseTo(10, 9);
  });
  it('6-cell lead-acid: 12 V nominal, 14.4 V absorption, 10.5 V end of discharge (common practice; Linden’s 1.75 V/cell, from memory)', () => {
    const p = packVolts('lead-acid', 6);
    expect(p.nominalVolts).toBeCloseTo(12, 9);
    expect(p.fullVolts).toBeCloseTo(14.4, 9);
    expect(p.emptyVolts).toBeCloseTo(10.5, 9);
  });
  it('4S lithium-ion is 14.4 V nominal — the IATA Lithium Battery Guidance Document’s 14.4 V × 4.4 Ah = 63.36 Wh example (from memory)', () => {
    expect(packVolts('li-ion', 4).nominalVolts).toBeCloseTo(14.4, 9);
    expect(packRatedWh({ chemistry: 'li-ion', cellsInSeries: 4, capacityAh: 4.4 })).toBeCloseTo(63.36, 9);
  });
  it('for every chemistry, empty < nominal < full, and voltages add in series', () => {
    for (const chemistry of batteryChemistries) {
      const one = packVolts(chemistry, 1);
      expect(one.emptyVolts).toBeLessThan(one.nominalVolts);
      expect(one.nominalVolts).toBeLessThan(one.fullVolts);
      expect(packVolts(chemistry, 5).nominalVolts).toBeCloseTo(5 * one.nominalVolts, 9);
    }
  });
  it('rejects zero, negative and part cell counts', () => {
    expect(() => packVolts('lipo', 0)).toThrow(RangeError);
    expect(() => packVolts('lipo', -2)).toThrow(RangeError);
    expect(() => packVolts('lipo', 2.5)).toThrow(RangeError);
  });
});
