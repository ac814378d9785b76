import { describe, expect, it } from 'vitest';
import {
  batterySpecSchema,
  controllerSpecSchema,
  dcLeadFieldsSchema,
  twelveVoltPanelSpecSchema,
} from './station-items.js';
import { leadSpecSchema } from './items.js';
import { itemSpecSchema, kitItemSpecSchema } from './kit.js';
import { lockerItemInputSchema } from './locker.js';
import { checkLeadDrop } from '../station/lead-drop.js';
import { mpptHarvestW } from '../station/controller-harvest.js';
import { packUsableWh } from '../station/usable-energy.js';
import type { DcLead, StationBattery, StationController, StationPanel } from '../station/types.js';

const ring = { connector: 'ring-terminal', captiveCable: false } as const;
const battery = { kind: 'battery', chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 6, port: ring, massG: 800 };
const controller = {
  kind: 'controller',
  controllerType: 'mppt',
  maxInputVolts: 25,
  maxChargeA: 10,
  inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
  outputPort: ring,
  massG: 120,
};
const panel = {
  kind: 'panel',
  panelType: '12v',
  ratedW: 50,
  maxPowerVolts: 18,
  maxPowerAmps: 2.78,
  openCircuitVolts: 21.6,
  outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
  massG: 1400,
};

function paths(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }): string[] {
  return result.success ? [] : (result.error?.issues ?? []).map((i) => i.path.join('.'));
}

describe('12 V item specs', () => {
  it('parse into what the station engine takes (type-checked assignments)', () => {
    const b: StationBattery = batterySpecSchema.parse(battery);
    const c: StationController = controllerSpecSchema.parse(controller);
    const p: StationPanel = twelveVoltPanelSpecSchema.parse(panel);
    const lead: DcLead = leadSpecSchema.extend(dcLeadFieldsSchema.shape).required({ gaugeAwg: true }).parse({
      kind: 'lead',
      fromConnector: 'ring-terminal',
      toConnector: 'radio-dc',
      lengthM: 2,
      massG: 90,
      gaugeAwg: 12,
      fuseA: 25,
    });
    expect(packUsableWh(b)).toBeCloseTo(6 * 12.8 * 0.9, 9);
    expect(
      mpptHarvestW(p, c.efficiency, 13, { irradianceWm2: 1000, cellTempC: 25 }, { panelLossFactor: 1 }),
    ).toBeCloseTo(0.95 * 18 * 2.78, 9);
    expect(checkLeadDrop(lead, 20, 13.2, 11.7).warning).toBeUndefined();
  });
  it('defaults: MPPT efficiency 0.95, panel coefficients −0.4 (power) and −0.3 %/°C (Voc), no dropout', () => {
    expect(controllerSpecSchema.parse(controller).efficiency).toBeCloseTo(0.95, 12);
    const p = twelveVoltPanelSpecSchema.parse(panel);
    expect(p.tempCoeffPctPerC).toBeCloseTo(-0.4, 12);
    expect(p.tempCoeffVocPctPerC).toBeCloseTo(-0.3, 12);
    expect(p.dropoutIrradianceWm2).toBe(0);
  });
  it('rejects bad batteries with field paths', () => {
    expect(paths(batterySpecSchema.safeParse({ ...battery, chemistry: 'nimh' }))).toEqual(['chemistry']);
    expect(paths(batterySpecSchema.safeParse({ ...battery, cellsInSeries: 3.5 }))).toEqual(['cellsInSeries']);
    expect(paths(batterySpecSchema.safeParse({ ...battery, capacityAh: 0 }))).toEqual(['capacityAh']);
    expect(paths(batterySpecSchema.safeParse({ ...battery, chargeCRate: -1 }))).toEqual(['chargeCRate']);
    expect(paths(batterySpecSchema.safeParse({ ...battery, peukertExponent: 0.9 }))).toEqual(['peukertExponent']);
    expect(paths(batterySpecSchema.safeParse({ ...battery, capacityAh: Number.NaN }))).toEqual(['capacityAh']);
  });
  it('rejects a bad controller type or efficiency', () => {
    expect(paths(controllerSpecSchema.safeParse({ ...controller, controllerType: 'shunt' }))).toEqual([
      'controllerType',
    ]);
    expect(paths(controllerSpecSchema.safeParse({ ...controller, efficiency: 1.2 }))).toEqual(['efficiency']);
  });
  it('rejects a panel whose datasheet does not hang together', () => {
    expect(paths(twelveVoltPanelSpecSchema.safeParse({ ...panel, openCircuitVolts: 17 }))).toEqual([
      'openCircuitVolts',
    ]);
    expect(paths(twelveVoltPanelSpecSchema.safeParse({ ...panel, shortCircuitAmps: 2 }))).toEqual(['shortCircuitAmps']);
    expect(paths(twelveVoltPanelSpecSchema.safeParse({ ...panel, maxPowerAmps: 4 }))).toEqual(['maxPowerAmps']);
    expect(paths(twelveVoltPanelSpecSchema.safeParse({ ...panel, tempCoeffVocPctPerC: 0.1 }))).toEqual([
      'tempCoeffVocPctPerC',
    ]);
  });
  it('DC lead fields: whole gauges 0–40, a positive fuse, both optional', () => {
    expect(dcLeadFieldsSchema.parse({})).toEqual({});
    expect(paths(dcLeadFieldsSchema.safeParse({ gaugeAwg: 12.5 }))).toEqual(['gaugeAwg']);
    expect(paths(dcLeadFieldsSchema.safeParse({ gaugeAwg: 41 }))).toEqual(['gaugeAwg']);
    expect(paths(dcLeadFieldsSchema.safeParse({ fuseA: 0 }))).toEqual(['fuseA']);
  });
});

describe('12 V gear in the locker item union', () => {
  const usbPanel = {
    kind: 'panel',
    panelType: 'usb',
    ratedW: 10,
    portVolts: 5,
    portMaxA: 2,
    dropoutIrradianceWm2: 0,
    tempCoeffPctPerC: -0.4,
    outputPort: { connector: 'usb-a', captiveCable: false },
    massG: 290,
  } as const;
  const usbLead = { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 } as const;

  it('a battery, a controller and a 12 V panel are locker items (and kit items)', () => {
    for (const spec of [battery, controller, panel]) {
      const item = lockerItemInputSchema.parse({ name: 'x', countOwned: 1, spec });
      expect(item.spec.kind).toBe(spec.kind);
      expect(kitItemSpecSchema.parse(spec).kind).toBe(spec.kind);
    }
    expect(itemSpecSchema.parse(panel)).toMatchObject({ panelType: '12v', tempCoeffVocPctPerC: -0.3 });
  });

  it('stored USB panels and leads without DC fields parse to exactly what they were', () => {
    expect(itemSpecSchema.parse(usbPanel)).toEqual(usbPanel);
    expect(itemSpecSchema.parse(usbLead)).toStrictEqual(usbLead);
  });

  it('a DC lead keeps its gauge and fuse', () => {
    const dc = { ...usbLead, fromConnector: 'ring-terminal', toConnector: 'radio-dc', gaugeAwg: 16, fuseA: 7.5 };
    expect(itemSpecSchema.parse(dc)).toEqual(dc);
  });

  it('errors name the field under spec, through the kind and the panel type', () => {
    const errorPaths = (spec: unknown) => paths(lockerItemInputSchema.safeParse({ name: 'x', countOwned: 1, spec }));
    expect(errorPaths({ ...battery, capacityAh: 0 })).toEqual(['spec.capacityAh']);
    expect(errorPaths({ ...controller, maxChargeA: undefined })).toEqual(['spec.maxChargeA']);
    expect(errorPaths({ ...panel, openCircuitVolts: 17 })).toEqual(['spec.openCircuitVolts']);
    expect(errorPaths({ ...panel, panelType: 'solar' })).toEqual(['spec.panelType']);
    expect(errorPaths({ ...usbLead, gaugeAwg: 16.5 })).toEqual(['spec.gaugeAwg']);
    // A 12 V panel described with a USB panel's fields is missing its datasheet values.
    expect(errorPaths({ ...usbPanel, panelType: '12v' })).toEqual(
      expect.arrayContaining(['spec.maxPowerVolts', 'spec.maxPowerAmps', 'spec.openCircuitVolts']),
    );
  });
});
