import { describe, expect, it } from 'vitest';
import { itemSpecSchema, kitSchema } from './kit.js';
import { bankSpecSchema, converterSpecSchema, leadSpecSchema, usbPanelSpecSchema } from './items.js';
import { deviceSpecSchema } from './devices.js';

const usbA = { connector: 'usb-a', captiveCable: false } as const;
const panel = {
  kind: 'panel',
  panelType: 'usb',
  ratedW: 10,
  portVolts: 5,
  portMaxA: 2,
  dropoutIrradianceWm2: 150,
  tempCoeffPctPerC: -0.4,
  outputPort: usbA,
  massG: 300,
};
const bank = {
  kind: 'bank',
  capacityMah: 10000,
  inputMaxW: 10,
  inputPort: { connector: 'usb-c', captiveCable: false },
  outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 }],
  massG: 190,
};
const phone = {
  kind: 'device',
  deviceKind: 'phone',
  ownBatteryWh: 15,
  chargesVia: 'usb-5v',
  chargePowerW: 10,
  chargePort: { connector: 'usb-c', captiveCable: false },
  useProfile: { basis: 'battery-share', batterySharePerDay: 0.5 },
};
const radio = {
  kind: 'device',
  deviceKind: 'radio',
  ownBatteryWh: 14,
  chargesVia: '12v-dc',
  chargeCurrentA: 1,
  chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false },
  supplyVoltsNominal: 13.8,
  supplyVoltsMin: 11,
  supplyVoltsMax: 16,
  transmitCurrentA: 1.5,
  receiveCurrentA: 0.25,
  standbyCurrentA: 0.05,
  useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 3, standbyHoursPerDay: 10 },
};

function paths(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }): string[] {
  return (result.error?.issues ?? []).map((i) => i.path.join('.'));
}

describe('item schemas: valid specs', () => {
  it('accepts a USB panel, a bank, a boost converter, a lead and devices, and fills defaults', () => {
    const b = bankSpecSchema.parse(bank);
    expect(b.cellVolts).toBeCloseTo(3.7, 12);
    expect(b.outputEfficiency).toBeGreaterThan(0);
    expect(b.outputPorts[0]?.usbPdVolts).toEqual([]);
    expect(usbPanelSpecSchema.parse(panel).ratedW).toBe(10);
    expect(
      converterSpecSchema.parse({
        kind: 'converter',
        converterType: 'boost',
        inputVolts: 5,
        outputVolts: 13.8,
        maxOutputA: 1,
        efficiency: 0.85,
        inputPort: { connector: 'usb-a', captiveCable: true },
        outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
        massG: 40,
      }).converterType,
    ).toBe('boost');
    expect(
      leadSpecSchema.parse({ kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 })
        .lengthM,
    ).toBe(0.3);
    expect(deviceSpecSchema.parse(radio).canRunLive).toBe(false);
    expect(itemSpecSchema.parse(phone).kind).toBe('device');
  });
  it('dispatches on kind and panelType in the item union', () => {
    expect(itemSpecSchema.parse(panel).kind).toBe('panel');
    expect(itemSpecSchema.safeParse({ ...panel, panelType: '12v' }).success).toBe(false);
    expect(itemSpecSchema.safeParse({ ...panel, kind: 'battery' }).success).toBe(false);
  });
});

describe('item schemas: invalid specs name the field', () => {
  it('rejects negative grams', () => {
    expect(paths(usbPanelSpecSchema.safeParse({ ...panel, massG: -5 }))).toEqual(['massG']);
  });
  it('rejects zero capacity and NaN', () => {
    expect(paths(bankSpecSchema.safeParse({ ...bank, capacityMah: 0 }))).toEqual(['capacityMah']);
    expect(paths(bankSpecSchema.safeParse({ ...bank, inputMaxW: Number.NaN }))).toEqual(['inputMaxW']);
    expect(paths(usbPanelSpecSchema.safeParse({ ...panel, ratedW: Number.POSITIVE_INFINITY }))).toEqual(['ratedW']);
  });
  it('needs exactly one of mAh and Wh', () => {
    const { capacityMah: _omit, ...noCapacity } = bank;
    expect(paths(bankSpecSchema.safeParse(noCapacity))).toEqual(['capacityMah']);
    expect(paths(bankSpecSchema.safeParse({ ...bank, capacityWh: 37 }))).toEqual(['capacityWh']);
    expect(bankSpecSchema.safeParse({ ...noCapacity, capacityWh: 37 }).success).toBe(true);
  });
  it('keeps cell voltage within 3.6–3.7 V and efficiencies within (0, 1]', () => {
    expect(paths(bankSpecSchema.safeParse({ ...bank, cellVolts: 3.2 }))).toEqual(['cellVolts']);
    expect(paths(bankSpecSchema.safeParse({ ...bank, outputEfficiency: 1.2 }))).toEqual(['outputEfficiency']);
    expect(paths(bankSpecSchema.safeParse({ ...bank, chargeEfficiency: 0 }))).toEqual(['chargeEfficiency']);
  });
  it('gives nested port paths', () => {
    expect(paths(bankSpecSchema.safeParse({ ...bank, outputPorts: [{ ...bank.outputPorts[0], maxA: -1 }] }))).toEqual([
      'outputPorts.0.maxA',
    ]);
    expect(
      paths(usbPanelSpecSchema.safeParse({ ...panel, outputPort: { connector: 'usb-z', captiveCable: false } })),
    ).toEqual(['outputPort.connector']);
  });
  it('a radio needs its currents and volts; a boost converter puts out 12–13.8 V', () => {
    const { transmitCurrentA: _t, ...noTx } = radio;
    expect(paths(deviceSpecSchema.safeParse(noTx))).toEqual(['transmitCurrentA']);
    expect(
      paths(
        converterSpecSchema.safeParse({
          kind: 'converter',
          converterType: 'boost',
          inputVolts: 5,
          outputVolts: 9,
          maxOutputA: 1,
          inputPort: usbA,
          outputPort: usbA,
          massG: 30,
        }),
      ),
    ).toEqual(['outputVolts']);
  });
  it('rejects a radio day longer than 24 h and a device with neither charge power nor current', () => {
    expect(
      paths(deviceSpecSchema.safeParse({ ...radio, useProfile: { ...radio.useProfile, standbyHoursPerDay: 23 } })),
    ).toEqual(['useProfile.standbyHoursPerDay']);
    const { chargePowerW: _c, ...noCharge } = phone;
    expect(paths(deviceSpecSchema.safeParse(noCharge))).toEqual(['chargePowerW']);
  });
  it('rejects duplicate item ids and zero counts in a kit', () => {
    const spec = usbPanelSpecSchema.parse(panel);
    expect(
      paths(
        kitSchema.safeParse([
          { itemId: 'a', count: 1, spec },
          { itemId: 'a', count: 1, spec },
        ]),
      ),
    ).toEqual(['1.itemId']);
    expect(paths(kitSchema.safeParse([{ itemId: 'a', count: 0, spec }]))).toEqual(['0.count']);
  });
});
