import { describe, expect, it } from 'vitest';
import {
  bankSpec,
  batterySpec,
  controllerSpec,
  leadSpec,
  panelSpec,
  phoneSpec,
  twelveVoltPanelSpec,
} from '@/testing/locker-data';
import { groupByPowerRole, totalGramsOf } from './power-roles';
import { specSummary } from './spec-summary';

describe('specSummary', () => {
  it('gives a panel its rated watts and its USB port', () => {
    expect(specSummary(panelSpec({ ratedW: 10, portVolts: 5, portMaxA: 2 }))).toBe('10 W · 5 V 2 A');
  });

  it('gives a bank rated in mAh its Wh at the cell voltage (mAh × V / 1000)', () => {
    // 10,000 mAh × 3.7 V / 1000 = 37 Wh — the airline figure; the arithmetic of the unit, nothing tuned.
    expect(specSummary(bankSpec({ capacityMah: 10_000, cellVolts: 3.7 }))).toBe(
      '10,000 mAh · 37 Wh · in 18 W · 1 output',
    );
  });

  it('names a lead by its two ends in plain words', () => {
    expect(specSummary(leadSpec({ fromConnector: 'usb-c', toConnector: 'barrel-5.5x2.1', lengthM: 0.5 }))).toBe(
      'USB-C → DC barrel 5.5 × 2.1 mm · 0.5 m',
    );
  });

  it('gives a 12 V panel its maximum-power point and open-circuit voltage', () => {
    expect(specSummary(twelveVoltPanelSpec())).toBe('30 W 12 V · 18 V 1.67 A at max power · 21.6 V open circuit');
  });

  it('gives a battery its chemistry, cells in series and Ah, and a controller its type and limits', () => {
    expect(specSummary(batterySpec({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7 }))).toBe(
      'Lead-acid 6S · 7 Ah',
    );
    expect(specSummary(controllerSpec())).toBe('PWM · up to 25 V in · 5 A charge');
  });

  it('adds a DC lead’s gauge and fuse when given', () => {
    expect(
      specSummary(
        leadSpec({ fromConnector: 'ring-terminal', toConnector: 'radio-dc', lengthM: 1.5, gaugeAwg: 16, fuseA: 7.5 }),
      ),
    ).toBe('Ring terminal → Radio DC plug · 1.5 m · 16 AWG · 7.5 A fuse');
  });

  it('shows a device by what it is, its battery and how it charges', () => {
    expect(specSummary(phoneSpec())).toBe('Phone · 15 Wh battery · charges by USB 5 V');
  });
});

describe('groupByPowerRole and totalGramsOf', () => {
  const items = [
    { kind: 'lead' as const, massG: 30, countOwned: 3 },
    { kind: 'device' as const, massG: 190, countOwned: 1 },
    { kind: 'panel' as const, massG: 300, countOwned: 2 },
    { kind: 'bank' as const, massG: 200, countOwned: 1 },
  ];

  it('orders the groups as energy flows and leaves out empty ones', () => {
    expect(groupByPowerRole(items).map((group) => group.label)).toEqual(['Collect', 'Store', 'Connect', 'Use']);
  });

  it('sums grams × count over the power gear only (devices are carried anyway)', () => {
    expect(totalGramsOf(items)).toBe(300 * 2 + 200 + 30 * 3);
  });

  it('puts batteries in Store beside banks and controllers in Convert, and counts their grams', () => {
    const twelveVolt = [
      ...items,
      { kind: 'controller' as const, massG: 110, countOwned: 1 },
      { kind: 'battery' as const, massG: 760, countOwned: 1 },
    ];
    const groups = groupByPowerRole(twelveVolt);
    expect(groups.map((group) => group.label)).toEqual(['Collect', 'Store', 'Convert', 'Connect', 'Use']);
    expect(groups.find((g) => g.role === 'store')?.items.map((i) => i.kind)).toEqual(['bank', 'battery']);
    expect(groups.find((g) => g.role === 'convert')?.items.map((i) => i.kind)).toEqual(['controller']);
    expect(totalGramsOf(twelveVolt)).toBe(300 * 2 + 200 + 30 * 3 + 110 + 760);
  });

  it('is 0 for an empty locker', () => {
    expect(totalGramsOf([])).toBe(0);
  });
});
