import { describe, expect, it } from 'vitest';
import { chargeCurrentA, packChargeLimit } from './charge-current.js';
import { chargeTemperatureLimit } from './charge-temperature.js';
import { checkDischargeCurrent } from './discharge-current.js';

describe('largest charge current = charge C-rate × Ah', () => {
  it('typical rates when the maker gives none (common practice: LiPo ~1C, LiFePO₄ ~0.5C, lead-acid ~0.1C)', () => {
    expect(packChargeLimit({ chemistry: 'lipo', capacityAh: 5 })).toEqual({
      chargeCRate: 1,
      maxChargeA: 5,
      basis: 'typical',
    });
    expect(packChargeLimit({ chemistry: 'lifepo4', capacityAh: 6 }).maxChargeA).toBeCloseTo(3, 12);
    expect(packChargeLimit({ chemistry: 'lead-acid', capacityAh: 7 }).maxChargeA).toBeCloseTo(0.7, 12);
    expect(packChargeLimit({ chemistry: 'li-ion', capacityAh: 3 }).maxChargeA).toBeCloseTo(1.5, 12);
  });
  it('the maker’s rating wins when given', () => {
    expect(packChargeLimit({ chemistry: 'lifepo4', capacityAh: 6, chargeCRate: 1 })).toEqual({
      chargeCRate: 1,
      maxChargeA: 6,
      basis: 'maker',
    });
  });
  it('caps what a controller puts in: a panel that could push 5.2 A into a 6 Ah LiFePO₄ pack is held to 3 A', () => {
    expect(chargeCurrentA(5.2, { maxChargeA: 10 }, packChargeLimit({ chemistry: 'lifepo4', capacityAh: 6 }))).toEqual({
      currentA: 3,
      cappedBy: 'pack',
    });
  });
  it('the controller’s own limit, the cold limit, or simply what is offered', () => {
    expect(chargeCurrentA(8, { maxChargeA: 5 }, { maxChargeA: 6 })).toEqual({ currentA: 5, cappedBy: 'controller' });
    expect(chargeCurrentA(8, { maxChargeA: 10 }, { maxChargeA: 6 }, 0)).toEqual({ currentA: 0, cappedBy: 'cold' });
    expect(chargeCurrentA(1.2, { maxChargeA: 10 }, { maxChargeA: 6 })).toEqual({ currentA: 1.2, cappedBy: 'offered' });
    expect(chargeCurrentA(-1, { maxChargeA: 10 }, { maxChargeA: 6 }).currentA).toBe(0);
  });
});

describe('discharge current against the maker’s continuous rating', () => {
  it('a 20 A transmit draw from a 6 Ah pack rated 2C (12 A) is over its rating', () => {
    const check = checkDischargeCurrent({ capacityAh: 6, dischargeCRate: 2 }, 20);
    expect(check.maxDischargeA).toBeCloseTo(12, 12);
    expect(check.drawCRate).toBeCloseTo(20 / 6, 12);
    expect(check.warning?.id).toBe('discharge-over-rating');
  });
  it('within the rating: no warning; exactly at it: no warning', () => {
    expect(checkDischargeCurrent({ capacityAh: 6, dischargeCRate: 2 }, 2).warning).toBeUndefined();
    expect(checkDischargeCurrent({ capacityAh: 6, dischargeCRate: 2 }, 12).warning).toBeUndefined();
  });
  it('no maker rating: a warning that it cannot be checked', () => {
    const check = checkDischargeCurrent({ capacityAh: 6 }, 2);
    expect(check.warning?.id).toBe('discharge-rating-missing');
    expect(check.warning?.severity).toBe('warning');
    expect(check.maxDischargeA).toBeUndefined();
  });
});

describe('charging temperature', () => {
  it('lithium is never charged below 0 °C (cell makers’ 0–45 °C charge range, common practice)', () => {
    for (const chemistry of ['lipo', 'li-ion', 'lifepo4'] as const) {
      const cold = chargeTemperatureLimit({ chemistry, capacityAh: 6 }, -0.1);
      expect(cold.maxChargeA).toBe(0);
      expect(cold.warning?.id).toBe('charge-too-cold');
      expect(chargeTemperatureLimit({ chemistry, capacityAh: 6 }, 0).maxChargeA).toBe(Infinity);
    }
  });
  it('lead-acid may charge below freezing at 0.3C or less, and not below −20 °C (Battery University BU-410, from memory)', () => {
    const frosty = chargeTemperatureLimit({ chemistry: 'lead-acid', capacityAh: 7 }, -5);
    expect(frosty.maxChargeA).toBeCloseTo(2.1, 12);
    expect(frosty.warning?.id).toBe('charge-cold-reduced');
    expect(chargeTemperatureLimit({ chemistry: 'lead-acid', capacityAh: 7 }, -20).maxChargeA).toBeCloseTo(2.1, 12);
    expect(chargeTemperatureLimit({ chemistry: 'lead-acid', capacityAh: 7 }, -20.5).maxChargeA).toBe(0);
    expect(chargeTemperatureLimit({ chemistry: 'lead-acid', capacityAh: 7 }, 5).warning).toBeUndefined();
  });
});
