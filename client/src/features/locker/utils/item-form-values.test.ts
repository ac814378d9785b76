import { lockerItemInputSchema } from '@gramwatt/shared';
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
import { emptyItemFormValues, itemFormSchema, itemToFormValues, parseNumberText, toItemBody } from './item-form-values';

const schema = itemFormSchema(lockerItemInputSchema);

describe('item form values', () => {
  it('shows shares as percent and sends them back as shares', () => {
    const values = itemToFormValues({
      name: 'Bank',
      notes: '',
      countOwned: 1,
      spec: bankSpec({ outputEfficiency: 0.85 }),
    });
    expect(values.spec.outputEfficiency).toBe('85');
    expect(values.spec.chargeEfficiency).toBe('90');
    const body = schema.parse({ ...values, spec: { ...values.spec, outputEfficiency: '80' } });
    expect(body.spec.kind === 'bank' && body.spec.outputEfficiency).toBeCloseTo(0.8, 12);
  });

  it('shows a phone’s battery share per day in percent', () => {
    const values = itemToFormValues({ name: 'Phone', notes: '', countOwned: 1, spec: phoneSpec() });
    expect(values.spec.useProfile.batterySharePerDay).toBe('60');
  });

  it.each([
    ['panel', panelSpec()],
    ['bank', bankSpec()],
    ['lead', leadSpec()],
    ['device', phoneSpec()],
    ['12 V panel', twelveVoltPanelSpec()],
    ['battery', batterySpec()],
    [
      'lead-acid battery with its rate table',
      batterySpec({
        chemistry: 'lead-acid',
        cellsInSeries: 6,
        capacityAh: 7,
        chargeCRate: 0.1,
        dischargeCRate: 3,
        ratedHours: 20,
        peukertExponent: 1.15,
      }),
    ],
    ['controller', controllerSpec()],
    ['fused DC lead', leadSpec({ fromConnector: 'ring-terminal', toConnector: 'radio-dc', gaugeAwg: 16, fuseA: 7.5 })],
  ] as const)('gives back the same %s spec after a trip through the form', (_kind, spec) => {
    const item = { name: 'Round trip', notes: 'kept', countOwned: 2, spec };
    const body = schema.parse(itemToFormValues(item));
    expect(body).toEqual(lockerItemInputSchema.parse(item));
  });

  it('reads a decimal comma, treats an empty field as not given and passes other text on to be reported', () => {
    expect(parseNumberText('2,5')).toBeCloseTo(2.5, 12);
    expect(parseNumberText('  ')).toBeUndefined();
    expect(parseNumberText('ten')).toBe('ten');
  });

  it('sends only the chosen capacity of a bank', () => {
    const values = emptyItemFormValues('bank');
    const body = toItemBody({
      ...values,
      capacityUnit: 'wh',
      spec: { ...values.spec, capacityMah: '9000', capacityWh: '20' },
    });
    expect(body.spec).toMatchObject({ capacityWh: 20 });
    expect(body.spec).not.toHaveProperty('capacityMah');
  });

  it('sends a panel only its own type’s fields: a 12 V panel no USB port, a USB panel no datasheet', () => {
    const usb = itemToFormValues({ name: 'P', notes: '', countOwned: 1, spec: panelSpec() });
    const asTwelveVolt = toItemBody({
      ...usb,
      spec: { ...usb.spec, panelType: '12v', maxPowerVolts: '18', maxPowerAmps: '0.56', openCircuitVolts: '21.6' },
    });
    expect(asTwelveVolt.spec).toMatchObject({ panelType: '12v', maxPowerVolts: 18 });
    expect(asTwelveVolt.spec).not.toHaveProperty('portVolts');
    const twelve = itemToFormValues({ name: 'P', notes: '', countOwned: 1, spec: twelveVoltPanelSpec() });
    const asUsb = toItemBody({ ...twelve, spec: { ...twelve.spec, panelType: 'usb', portMaxA: '2' } });
    expect(asUsb.spec).not.toHaveProperty('openCircuitVolts');
    expect(asUsb.spec).not.toHaveProperty('tempCoeffVocPctPerC');
  });

  it('starts a controller at the MPPT default efficiency and a battery as a 4-cell LiFePO4 pack', () => {
    expect(emptyItemFormValues('controller').spec.efficiency).toBe('95');
    expect(emptyItemFormValues('converter').spec.efficiency).toBe('85');
    expect(emptyItemFormValues('battery').spec).toMatchObject({ chemistry: 'lifepo4', cellsInSeries: '4' });
  });

  it('reports an empty rated power at spec.ratedW', () => {
    const result = schema.safeParse({ ...emptyItemFormValues('panel'), name: 'Panel' });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toContain('spec.ratedW');
  });
});
