import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { batteryChemistries } from '../constants/station.js';
import { packRatedWh } from './pack-volts.js';
import { defaultPeukertExponent, peukertCapacityAh, peukertExponentFromRates, peukertRuntimeH } from './peukert.js';
import { packCapacityAtCurrentAh, packUsableWh, usableShare } from './usable-energy.js';
import type { StationBattery } from './types.js';

const leadAcid7Ah: StationBattery = { chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 };
const lifepo4Pack: StationBattery = { chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 6 };

/**
 * Rate table of a typical 12 V 7 Ah sealed lead-acid battery to 1.75 V/cell at 25 °C (maker datasheets — from memory):
 * 20 h 7.0 Ah, 10 h 6.5 Ah, 5 h 5.95 Ah.
 */
const sealedLeadAcidRateTable = [
  { hours: 20, capacityAh: 7.0 },
  { hours: 10, capacityAh: 6.5 },
  { hours: 5, capacityAh: 5.95 },
] as const;

describe('usable share and usable energy by chemistry (common practice)', () => {
  it('lead-acid is drained only to about half its rating', () => {
    expect(usableShare('lead-acid')).toBeCloseTo(0.5, 9);
    expect(packUsableWh(leadAcid7Ah) / packRatedWh(leadAcid7Ah)).toBeCloseTo(0.5, 9);
  });
  it('LiFePO₄ can be drained nearly flat (at least 90 % of its rating)', () => {
    expect(packUsableWh(lifepo4Pack) / packRatedWh(lifepo4Pack)).toBeGreaterThanOrEqual(0.9);
  });
  it('every lithium chemistry gives a larger share than lead-acid', () => {
    for (const c of batteryChemistries)
      if (c !== 'lead-acid') expect(usableShare(c)).toBeGreaterThan(usableShare('lead-acid'));
  });
  it('hand worked: 6 Ah 4S LiFePO₄ → 6 × 12.8 × 0.9 = 69.12 Wh; 7 Ah 12 V lead-acid → 7 × 12 × 0.5 = 42 Wh', () => {
    expect(packUsableWh(lifepo4Pack)).toBeCloseTo(69.12, 9);
    expect(packUsableWh(leadAcid7Ah)).toBeCloseTo(42, 9);
  });
  it('lead-acid holds less at a radio’s draw (Peukert); lithium holds its rating', () => {
    expect(packUsableWh(leadAcid7Ah, 1.19)).toBeLessThan(packUsableWh(leadAcid7Ah));
    expect(packUsableWh(lifepo4Pack, 3)).toBeCloseTo(packUsableWh(lifepo4Pack), 12);
  });
  it('the per-chemistry Peukert exponent: sealed lead-acid 1.15 (from memory), lithium 1', () => {
    expect(defaultPeukertExponent('lead-acid')).toBeCloseTo(1.15, 12);
    expect(defaultPeukertExponent('lifepo4')).toBe(1);
  });
});

describe('Peukert capacity of sealed lead-acid against a 7 Ah rate table (from memory)', () => {
  for (const row of sealedLeadAcidRateTable) {
    it(`${row.hours} h rate: ${row.capacityAh} Ah within 3 % at k = 1.15`, () => {
      const currentA = row.capacityAh / row.hours;
      const ah = packCapacityAtCurrentAh(leadAcid7Ah, currentA);
      expect(Math.abs(ah - row.capacityAh) / row.capacityAh).toBeLessThan(0.03);
    });
  }
  it('the exponent from the table’s 20 h and 5 h lines is about 1.13, inside the 1.1–1.25 quoted for sealed lead-acid', () => {
    const [twenty, , five] = sealedLeadAcidRateTable;
    const k = peukertExponentFromRates(twenty, five);
    expect(k).toBeGreaterThan(1.1);
    expect(k).toBeLessThan(1.25);
    expect(k).toBeCloseTo(Math.log(4) / Math.log(1.19 / 0.35), 9);
  });
  it('a known limit: one exponent overstates the 1 h capacity (about 4.2 Ah, from memory) by more than 10 % (model ≈ 4.8 Ah)', () => {
    expect(peukertCapacityAh(7, 4.2) / 4.2).toBeGreaterThan(1.1);
  });
});

describe('Peukert identities and edges', () => {
  it('the rated current gives the rated hours and the rated capacity', () => {
    expect(peukertRuntimeH(7, 0.35)).toBeCloseTo(20, 9);
    expect(peukertCapacityAh(7, 0.35)).toBeCloseTo(7, 9);
  });
  it('runtime × current = capacity when not capped', () => {
    const t = peukertRuntimeH(100, 12, { exponent: 1.3 });
    expect(t * 12).toBeCloseTo(peukertCapacityAh(100, 12, { exponent: 1.3, capAtRating: false }), 9);
  });
  it('below the rated current the capacity is capped at the rating unless asked otherwise', () => {
    expect(peukertCapacityAh(7, 0.1)).toBeCloseTo(7, 12);
    expect(peukertCapacityAh(7, 0.1, { capAtRating: false })).toBeGreaterThan(7);
  });
  it('no current: the rating; exponent below 1 or no rating: an error', () => {
    expect(peukertCapacityAh(7, 0)).toBe(7);
    expect(() => peukertCapacityAh(7, 1, { exponent: 0.9 })).toThrow(RangeError);
    expect(() => peukertCapacityAh(0, 1)).toThrow(RangeError);
  });
  it('property: capacity never rises with current and never exceeds the rating (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 200, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 1.6, noNaN: true }),
        (ratedAh, i1, i2, exponent) => {
          const [lo, hi] = i1 <= i2 ? [i1, i2] : [i2, i1];
          const atLo = peukertCapacityAh(ratedAh, lo, { exponent });
          const atHi = peukertCapacityAh(ratedAh, hi, { exponent });
          expect(atHi).toBeLessThanOrEqual(atLo * (1 + 1e-12));
          expect(atLo).toBeLessThanOrEqual(ratedAh * (1 + 1e-12));
        },
      ),
    );
  });
});
