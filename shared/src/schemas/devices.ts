import { z } from 'zod';
import { efficiencyShare, finiteNumber, portSchema } from './ports.js';

/** What a device is, for grouping, demand defaults and cautions. */
export const deviceKinds = ['radio', 'phone', 'messenger', 'headlamp', 'camera', 'other'] as const;
export const deviceKindSchema = z.enum(deviceKinds, { error: 'Pick a device kind from the list' });
export type DeviceKind = z.infer<typeof deviceKindSchema>;

/** How a device takes charge: USB at 5 V, USB Power Delivery, or 12 V DC. */
export const chargeInputs = ['usb-5v', 'usb-pd', '12v-dc'] as const;
export const chargeInputSchema = z.enum(chargeInputs, { error: 'Charges via usb-5v, usb-pd or 12v-dc' });
export type ChargeInput = z.infer<typeof chargeInputSchema>;

const hoursPerDay = (label: string) =>
  finiteNumber(label)
    .min(0, { error: `${label} cannot be negative` })
    .max(24, { error: `${label} is at most 24 h a day` });

/** A radio's day: minutes transmitting, hours listening, hours on standby. */
export const radioUseProfileSchema = z
  .object({
    basis: z.literal('radio-hours'),
    transmitMinutesPerDay: finiteNumber('Transmit time')
      .min(0, { error: 'Transmit time cannot be negative' })
      .max(1440, { error: 'Transmit time is at most 1440 minutes a day' }),
    receiveHoursPerDay: hoursPerDay('Receive time'),
    standbyHoursPerDay: hoursPerDay('Standby time'),
  })
  .superRefine((p, ctx) => {
    if (p.transmitMinutesPerDay / 60 + p.receiveHoursPerDay + p.standbyHoursPerDay > 24 + 1e-9) {
      ctx.addIssue({
        code: 'custom',
        path: ['standbyHoursPerDay'],
        message: 'Transmit, receive and standby add up to more than 24 h',
      });
    }
  });

/** A share of the device's own battery used per day (a phone using 60 % a day: 0.6). */
export const batteryShareUseProfileSchema = z.object({
  basis: z.literal('battery-share'),
  batterySharePerDay: finiteNumber('Battery share per day')
    .min(0, { error: 'Battery share per day cannot be negative' })
    .max(20, { error: 'Battery share per day may be at most 20 (2000 %)' }),
});

/** Energy used per day at the device, Wh. */
export const energyUseProfileSchema = z.object({
  basis: z.literal('energy'),
  energyWhPerDay: finiteNumber('Energy per day')
    .min(0, { error: 'Energy per day cannot be negative' })
    .max(1000, { error: 'Energy per day may be at most 1000 Wh' }),
});

/** How a device is used per day (the locker keeps a default; a trip may override it per device). */
export const useProfileSchema = z.discriminatedUnion(
  'basis',
  [radioUseProfileSchema, batteryShareUseProfileSchema, energyUseProfileSchema],
  { error: 'Use profile basis must be radio-hours, battery-share or energy' },
);
export type UseProfile = z.infer<typeof useProfileSchema>;
export type RadioUseProfile = z.infer<typeof radioUseProfileSchema>;

const volts = (label: string) =>
  finiteNumber(label)
    .gt(0, { error: `${label} must be above 0 V` })
    .max(30, { error: `${label} may be at most 30 V` });
const amps = (label: string) =>
  finiteNumber(label)
    .min(0, { error: `${label} cannot be negative` })
    .max(30, { error: `${label} may be at most 30 A` });

/** A device that uses energy: its own battery, how it charges and, for radios, its supply window and currents. */
export const deviceSpecSchema = z
  .object({
    kind: z.literal('device'),
    deviceKind: deviceKindSchema,
    ownBatteryWh: finiteNumber('Own battery')
      .min(0, { error: 'Own battery cannot be negative' })
      .max(500, { error: 'Own battery may be at most 500 Wh' }),
    chargesVia: chargeInputSchema,
    chargePowerW: finiteNumber('Charge power')
      .gt(0, { error: 'Charge power must be above 0 W' })
      .max(240, { error: 'Charge power may be at most 240 W' })
      .optional(),
    chargeCurrentA: finiteNumber('Charge current')
      .gt(0, { error: 'Charge current must be above 0 A' })
      .max(20, { error: 'Charge current may be at most 20 A' })
      .optional(),
    /** For `usb-pd`: the PD voltage the device asks for (default 9 V). */
    usbPdVolts: volts('USB PD voltage').optional(),
    chargeEfficiency: efficiencyShare('Charge efficiency').default(0.85),
    chargePort: portSchema,
    supplyVoltsNominal: volts('Nominal supply voltage').optional(),
    supplyVoltsMin: volts('Minimum supply voltage').optional(),
    supplyVoltsMax: volts('Maximum supply voltage').optional(),
    transmitCurrentA: amps('Transmit current').optional(),
    receiveCurrentA: amps('Receive current').optional(),
    standbyCurrentA: amps('Standby current').optional(),
    canRunLive: z.boolean({ error: 'Say whether it can run live from a 12 V pack' }).default(false),
    massG: finiteNumber('Mass')
      .gt(0, { error: 'Mass must be above 0 g' })
      .max(50_000, { error: 'Mass may be at most 50,000 g' })
      .optional(),
    useProfile: useProfileSchema,
  })
  .superRefine((d, ctx) => {
    if (d.chargePowerW === undefined && d.chargeCurrentA === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['chargePowerW'],
        message: 'Give the charge power (W) or the charge current (A)',
      });
    }
    if (d.deviceKind === 'radio') {
      for (const key of ['supplyVoltsNominal', 'transmitCurrentA', 'receiveCurrentA', 'standbyCurrentA'] as const) {
        if (d[key] === undefined) ctx.addIssue({ code: 'custom', path: [key], message: 'A radio needs this value' });
      }
    }
    if (d.useProfile.basis === 'radio-hours' && d.deviceKind !== 'radio') {
      ctx.addIssue({ code: 'custom', path: ['useProfile', 'basis'], message: 'Transmit/receive hours are for radios' });
    }
    if (d.supplyVoltsMin !== undefined && d.supplyVoltsMax !== undefined && d.supplyVoltsMin > d.supplyVoltsMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['supplyVoltsMin'],
        message: 'Minimum supply voltage is above the maximum',
      });
    }
    if (d.supplyVoltsNominal !== undefined) {
      if (d.supplyVoltsMin !== undefined && d.supplyVoltsNominal < d.supplyVoltsMin) {
        ctx.addIssue({
          code: 'custom',
          path: ['supplyVoltsNominal'],
          message: 'Nominal supply voltage is below the minimum',
        });
      }
      if (d.supplyVoltsMax !== undefined && d.supplyVoltsNominal > d.supplyVoltsMax) {
        ctx.addIssue({
          code: 'custom',
          path: ['supplyVoltsNominal'],
          message: 'Nominal supply voltage is above the maximum',
        });
      }
    }
  });
export type DeviceSpec = z.infer<typeof deviceSpecSchema>;
