import { describe, expect, it } from 'vitest';
import {
  ampHoursToWattHours,
  convertCharge,
  convertDuration,
  convertEnergy,
  hoursToMinutes,
  joulesToWattHours,
  milliampHoursToWattHours,
  minutesToHours,
  wattHoursToJoules,
  wattHoursToMilliampHours,
  wattsFromVoltsAmps,
  type EnergyUnit,
} from './energy.js';

// Reference values: SI Brochure, 9th edition (BIPM 2019), tables 4 and 8 — 1 W = 1 J/s, 1 h = 3600 s, 1 C = 1 A·s.
describe('units: reference values', () => {
  it('1 Wh is 3600 J and 1 kWh is 3.6 MJ', () => {
    expect(wattHoursToJoules(1)).toBeCloseTo(3600, 9);
    expect(convertEnergy(1, 'kWh', 'J')).toBeCloseTo(3.6e6, 3);
  });
  it('1 Ah is 3600 C', () => {
    expect(convertCharge(1, 'Ah', 'C')).toBeCloseTo(3600, 9);
  });
  it('a 10,000 mAh bank at 3.7 V holds 37 Wh (the rating printed on such banks, common practice)', () => {
    expect(milliampHoursToWattHours(10000, 3.7)).toBeCloseTo(37, 9);
  });
  it('a 6 Ah pack at 12.8 V holds 76.8 Wh', () => {
    expect(ampHoursToWattHours(6, 12.8)).toBeCloseTo(76.8, 9);
  });
  it('5 V at 2 A is 10 W', () => {
    expect(wattsFromVoltsAmps(5, 2)).toBeCloseTo(10, 12);
  });
});

describe('units: round trips', () => {
  const units: EnergyUnit[] = ['Wh', 'mWh', 'kWh', 'J', 'kJ'];
  it.each(units.flatMap((a) => units.map((b) => [a, b] as const)))('%s → %s → back', (a, b) => {
    expect(convertEnergy(convertEnergy(12.345, a, b), b, a)).toBeCloseTo(12.345, 9);
  });
  it('mAh ↔ Wh, J ↔ Wh, minutes ↔ hours', () => {
    expect(wattHoursToMilliampHours(milliampHoursToWattHours(5000, 3.6), 3.6)).toBeCloseTo(5000, 9);
    expect(joulesToWattHours(wattHoursToJoules(7.5))).toBeCloseTo(7.5, 12);
    expect(hoursToMinutes(minutesToHours(45))).toBeCloseTo(45, 12);
    expect(convertDuration(1, 'h', 'ms')).toBeCloseTo(3.6e6, 3);
  });
});
