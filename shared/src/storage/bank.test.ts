import { describe, expect, it } from 'vitest';
import { bankRatedWh, bankUsableGainWh, bankUsableWh, canChargeLithium, frozenHours } from './bank.js';
import { testBank } from '../testing/fixtures.js';

describe('bank energy', () => {
  it('IATA Lithium Battery Guidance Document worked example: 14.4 V × 4.4 Ah = 63.36 Wh (from memory)', () => {
    expect(bankRatedWh({ capacityMah: 4400, cellVolts: 14.4 })).toBeCloseTo(63.36, 9);
  });
  it('a 10,000 mAh bank is 37 Wh rated and delivers 60–90 % of that at its USB port (common practice)', () => {
    const bank = testBank();
    expect(bankRatedWh(bank)).toBeCloseTo(37, 9);
    const usableShare = bankUsableWh(bank) / bankRatedWh(bank);
    expect(usableShare).toBeGreaterThan(0.6);
    expect(usableShare).toBeLessThan(0.9);
  });
  it('a Wh rating is used as given', () => {
    expect(bankRatedWh({ capacityWh: 99, cellVolts: 3.7 })).toBeCloseTo(99, 12);
  });
  it('hand worked: 10 Wh in at 90 % charge and 85 % output efficiency adds 7.65 usable Wh', () => {
    expect(bankUsableGainWh(10, testBank())).toBeCloseTo(7.65, 12);
  });
});

describe('lithium charging temperature (cell makers: 0–45 °C charge range, common practice)', () => {
  it('blocks charging below 0 °C and allows it at 0 °C', () => {
    expect(canChargeLithium(-0.1)).toBe(false);
    expect(canChargeLithium(0)).toBe(true);
  });
  it('counts frozen hours, including part steps', () => {
    expect(
      frozenHours([
        { airTempC: -3, durationH: 1 },
        { airTempC: -1, durationH: 0.5 },
        { airTempC: 2, durationH: 1 },
      ]),
    ).toBeCloseTo(1.5, 12);
  });
});
