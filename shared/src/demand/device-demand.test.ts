import { describe, expect, it } from 'vitest';
import { deviceChargePowerW, deviceDemandWhPerDay, needsChargingPath, storageDrawWh } from './device-demand.js';
import { testPhone, testRadio } from '../testing/fixtures.js';

describe('device demand', () => {
  it('battery-life duty cycle 5 % transmit / 5 % receive / 90 % standby gives ~10–14 h for a 5 W handheld on a 7.4 V 2000 mAh pack (5-5-90 cycle of TIA-603 and ~12 h life: common practice, from memory; currents from memory)', () => {
    // 24 h at 5-5-90: 1.2 h transmit, 1.2 h receive, 21.6 h standby, at the pack's 7.4 V.
    const radio = testRadio({ supplyVoltsNominal: 7.4, supplyVoltsMin: 6, supplyVoltsMax: 9 });
    const perDayWh = deviceDemandWhPerDay(radio, {
      basis: 'radio-hours',
      transmitMinutesPerDay: 72,
      receiveHoursPerDay: 1.2,
      standbyHoursPerDay: 21.6,
    });
    const batteryLifeH = 14.8 / (perDayWh / 24);
    expect(batteryLifeH).toBeGreaterThan(10);
    expect(batteryLifeH).toBeLessThan(14);
  });
  it('hand worked: radio 20 min TX at 1.6 A, 2 h RX at 0.35 A, 8 h standby at 0.08 A, all at 13.8 V', () => {
    // 13.8 × (1.6 × 1/3 + 0.35 × 2 + 0.08 × 8) = 13.8 × (0.5333 + 0.7 + 0.64) = 13.8 × 1.87333 = 25.852 Wh
    expect(deviceDemandWhPerDay(testRadio())).toBeCloseTo(25.852, 3);
  });
  it('hand worked: phone using half its 15 Wh battery a day needs 7.5 Wh; an energy profile is taken as given', () => {
    expect(deviceDemandWhPerDay(testPhone(0.5))).toBeCloseTo(7.5, 12);
    expect(deviceDemandWhPerDay(testPhone(), { basis: 'energy', energyWhPerDay: 3.2 })).toBeCloseTo(3.2, 12);
  });
  it('storage draw divides by converter and device charging efficiency only', () => {
    // 10 Wh / (0.85 × 0.9) = 13.0719 Wh
    expect(storageDrawWh(10, { converterEfficiency: 0.85, deviceChargeEfficiency: 0.9 })).toBeCloseTo(13.0719, 4);
    expect(storageDrawWh(10, { deviceChargeEfficiency: 0.8 })).toBeCloseTo(12.5, 12);
  });
  it('a charging path is needed only when the own battery cannot cover the trip', () => {
    // 15 Wh battery, 7.5 Wh/day: 2 days = 15 Wh is covered, 3 days is not.
    expect(needsChargingPath(testPhone(0.5), 2)).toBe(false);
    expect(needsChargingPath(testPhone(0.5), 3)).toBe(true);
  });
  it('charge power from current × charge voltage', () => {
    // 0.5 A at 13.8 V = 6.9 W; USB 5 V at 2 A = 10 W.
    expect(deviceChargePowerW(testRadio())).toBeCloseTo(6.9, 12);
    expect(deviceChargePowerW(testPhone(0.5, { chargePowerW: undefined, chargeCurrentA: 2 }))).toBeCloseTo(10, 12);
  });
  it('zero use needs zero energy', () => {
    expect(deviceDemandWhPerDay(testPhone(0))).toBe(0);
  });
});
