import { describe, expect, it } from 'vitest';
import { packVolts } from './pack-volts.js';
import { checkSupplyWindow, defaultRadioSupplyWindow } from './supply-window.js';

// Radio makers commonly specify 13.8 V DC ± 15 % (common practice): about 11.73–15.87 V.
const radio = defaultRadioSupplyWindow();

describe('the radio’s supply window', () => {
  it('the default window is 13.8 V ± 15 %', () => {
    expect(radio.minVolts).toBeCloseTo(11.73, 9);
    expect(radio.maxVolts).toBeCloseTo(15.87, 9);
  });
  it('3S lithium polymer (11.1 V nominal) sits below the minimum: reduced power (common practice)', () => {
    const ids = checkSupplyWindow(packVolts('lipo', 3), radio).map((w) => w.id);
    expect(ids).toEqual(['supply-nominal-below-min']);
  });
  it('4S lithium polymer (16.8 V full) is above most radios’ maximum: danger first', () => {
    const warnings = checkSupplyWindow(packVolts('lipo', 4), radio);
    expect(warnings[0]?.id).toBe('supply-above-max');
    expect(warnings[0]?.severity).toBe('danger');
  });
  it('4S LiFePO₄ and 6-cell lead-acid fit, only dropping out near empty', () => {
    expect(checkSupplyWindow(packVolts('lifepo4', 4), radio).map((w) => w.id)).toEqual(['supply-empty-below-min']);
    expect(checkSupplyWindow(packVolts('lead-acid', 6), radio).map((w) => w.id)).toEqual(['supply-empty-below-min']);
  });
  it('a narrower radio (11–14.6 V): LiFePO₄’s 14.6 V full is at the edge, not over; 4S lithium-ion’s 16.8 V is over', () => {
    const narrow = { minVolts: 11, maxVolts: 14.6 };
    expect(checkSupplyWindow(packVolts('lifepo4', 4), narrow).map((w) => w.id)).toEqual(['supply-empty-below-min']);
    expect(checkSupplyWindow(packVolts('li-ion', 4), narrow)[0]?.id).toBe('supply-above-max');
  });
  it('a pack inside the window all the way: no warnings', () => {
    expect(checkSupplyWindow({ nominalVolts: 13, fullVolts: 14, emptyVolts: 12 }, radio)).toEqual([]);
  });
});
