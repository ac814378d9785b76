import { z } from 'zod';
import { defaultBankCellVolts, maxBankCellVolts, minBankCellVolts } from '../constants/electrical.js';
import { connectorSchema, efficiencyShare, finiteNumber, massGSchema, outputPortSchema, portSchema } from './ports.js';
import { dcLeadFieldsSchema, twelveVoltPanelSpecSchema } from './station-items.js';

/**
 * The engine's item specs (what the locker stores per item, without name, notes or counts). `kind` is the
 * discriminator; the 12 V path's `battery` and `controller` and the 12 V panel are in `station-items.ts`.
 */

/** USB panel: a portable panel with a regulated USB output. */
export const usbPanelSpecSchema = z.object({
  kind: z.literal('panel'),
  panelType: z.literal('usb'),
  ratedW: finiteNumber('Rated power')
    .gt(0, { error: 'Rated power must be above 0 W' })
    .max(400, { error: 'Rated power may be at most 400 W' }),
  portVolts: finiteNumber('Port voltage')
    .gt(0, { error: 'Port voltage must be above 0 V' })
    .max(24, { error: 'A USB port is at most 24 V' }),
  portMaxA: finiteNumber('Port current')
    .gt(0, { error: 'Port current must be above 0 A' })
    .max(10, { error: 'Port current may be at most 10 A' }),
  dropoutIrradianceWm2: finiteNumber('Dropout irradiance')
    .min(0, { error: 'Dropout irradiance cannot be negative' })
    .max(1000, { error: 'Dropout irradiance may be at most 1000 W/m²' })
    .default(0),
  tempCoeffPctPerC: finiteNumber('Temperature coefficient')
    .min(-1, { error: 'Temperature coefficient may be at least −1 %/°C' })
    .max(0, { error: 'Temperature coefficient of power is 0 or negative' })
    .default(-0.4),
  outputPort: portSchema,
  massG: massGSchema,
});
export type UsbPanelSpec = z.infer<typeof usbPanelSpecSchema>;

/**
 * Any panel: a USB panel or a 12 V panel, told apart by `panelType`. Stored USB panels carry `panelType: 'usb'`
 * already, so they parse unchanged.
 */
export const panelSpecSchema = z.discriminatedUnion('panelType', [usbPanelSpecSchema, twelveVoltPanelSpecSchema], {
  error: 'Panel type must be usb or 12v',
});
export type PanelSpec = z.infer<typeof panelSpecSchema>;

const bankInputPortSchema = portSchema;

/** USB power bank, rated either in mAh at its cell voltage or in Wh. */
export const bankSpecSchema = z
  .object({
    kind: z.literal('bank'),
    capacityMah: finiteNumber('Capacity')
      .gt(0, { error: 'Capacity must be above 0 mAh' })
      .max(100_000, { error: 'Capacity may be at most 100,000 mAh' })
      .optional(),
    cellVolts: finiteNumber('Cell voltage')
      .min(minBankCellVolts, { error: `Cell voltage is ${minBankCellVolts}–${maxBankCellVolts} V` })
      .max(maxBankCellVolts, { error: `Cell voltage is ${minBankCellVolts}–${maxBankCellVolts} V` })
      .default(defaultBankCellVolts),
    capacityWh: finiteNumber('Capacity')
      .gt(0, { error: 'Capacity must be above 0 Wh' })
      .max(500, { error: 'Capacity may be at most 500 Wh' })
      .optional(),
    inputMaxW: finiteNumber('Input limit')
      .gt(0, { error: 'Input limit must be above 0 W' })
      .max(240, { error: 'Input limit may be at most 240 W' }),
    inputPort: bankInputPortSchema,
    outputPorts: z
      .array(outputPortSchema)
      .min(1, { error: 'A bank needs at least one output port' })
      .max(8, { error: 'At most 8 output ports' }),
    outputEfficiency: efficiencyShare('Output efficiency').default(0.85),
    chargeEfficiency: efficiencyShare('Charge efficiency').default(0.9),
    massG: massGSchema,
  })
  .superRefine((bank, ctx) => {
    const hasMah = bank.capacityMah !== undefined;
    const hasWh = bank.capacityWh !== undefined;
    if (hasMah && hasWh) {
      ctx.addIssue({ code: 'custom', path: ['capacityWh'], message: 'Give the capacity in mAh or in Wh, not both' });
    } else if (!hasMah && !hasWh) {
      ctx.addIssue({ code: 'custom', path: ['capacityMah'], message: 'Give the capacity in mAh or in Wh' });
    }
  });
export type BankSpec = z.infer<typeof bankSpecSchema>;

/** Converter types: a boost from USB (5 V or a USB PD voltage) to 12–13.8 V DC, or a 12 V DC → USB adapter. */
export const converterTypes = ['boost', '12v-to-usb'] as const;

/** A DC-DC converter cable or box. */
export const converterSpecSchema = z
  .object({
    kind: z.literal('converter'),
    converterType: z.enum(converterTypes, { error: 'Converter type must be boost or 12v-to-usb' }),
    inputVolts: finiteNumber('Input voltage')
      .gt(0, { error: 'Input voltage must be above 0 V' })
      .max(30, { error: 'Input voltage may be at most 30 V' }),
    outputVolts: finiteNumber('Output voltage')
      .gt(0, { error: 'Output voltage must be above 0 V' })
      .max(30, { error: 'Output voltage may be at most 30 V' }),
    maxOutputA: finiteNumber('Output current')
      .gt(0, { error: 'Output current must be above 0 A' })
      .max(20, { error: 'Output current may be at most 20 A' }),
    efficiency: efficiencyShare('Efficiency').default(0.85),
    inputPort: portSchema,
    outputPort: portSchema,
    massG: massGSchema,
  })
  .superRefine((c, ctx) => {
    if (c.converterType === 'boost' && !(c.outputVolts >= 12 && c.outputVolts <= 13.8)) {
      ctx.addIssue({ code: 'custom', path: ['outputVolts'], message: 'A boost converter puts out 12–13.8 V' });
    }
    if (c.converterType === 'boost' && c.inputVolts >= c.outputVolts) {
      ctx.addIssue({ code: 'custom', path: ['inputVolts'], message: 'A boost converter raises the voltage' });
    }
    if (c.converterType === '12v-to-usb' && !(c.inputVolts >= 10 && c.inputVolts <= 15)) {
      ctx.addIssue({ code: 'custom', path: ['inputVolts'], message: 'A 12 V → USB adapter takes 10–15 V' });
    }
  });
export type ConverterSpec = z.infer<typeof converterSpecSchema>;

/**
 * A cable or adapter between two connectors; `lengthM` is one way (the loop is twice that). A DC lead may also
 * give its copper gauge and its inline fuse (`gaugeAwg`, `fuseA`, both optional), which the lead-drop and fuse
 * checks of the 12 V path read.
 */
export const leadSpecSchema = z.object({
  kind: z.literal('lead'),
  fromConnector: connectorSchema,
  toConnector: connectorSchema,
  lengthM: finiteNumber('Length')
    .gt(0, { error: 'Length must be above 0 m' })
    .max(20, { error: 'Length may be at most 20 m' }),
  ...dcLeadFieldsSchema.shape,
  massG: massGSchema,
});
export type LeadSpec = z.infer<typeof leadSpecSchema>;
