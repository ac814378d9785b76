import { z } from 'zod';
import { defaultPanelTempCoeffPctPerC } from '../constants/electrical.js';
import { batteryChemistries, defaultMpptEfficiency, defaultPanelVocTempCoeffPctPerC } from '../constants/station.js';
import { efficiencyShare, finiteNumber, massGSchema, portSchema } from './ports.js';

/**
 * Item specs of the 12 V path: a battery pack, a charge controller, a 12 V panel, and the gauge and fuse of a DC
 * lead. Each parses into what the station engine (`src/station/`) takes. The battery and the controller are
 * members of `itemSpecSchema`, the 12 V panel of `panelSpecSchema`, and the DC fields are part of `leadSpecSchema`.
 */

/** Largest gap allowed between the label's rated power and Vmp × Imp, share 0–1 (datasheets round both; a planning choice). */
export const panelRatingMismatchShare = 0.1;

/** A battery pack for the 12 V path (the maker's C-ratings when given; count lives on the locker line). */
export const batterySpecSchema = z.object({
  kind: z.literal('battery'),
  chemistry: z.enum(batteryChemistries, { error: 'Chemistry must be lipo, li-ion, lifepo4 or lead-acid' }),
  cellsInSeries: finiteNumber('Cells in series')
    .int({ error: 'Cells in series is a whole number' })
    .min(1, { error: 'A pack has at least 1 cell in series' })
    .max(12, { error: 'At most 12 cells in series' }),
  capacityAh: finiteNumber('Capacity')
    .gt(0, { error: 'Capacity must be above 0 Ah' })
    .max(200, { error: 'Capacity may be at most 200 Ah' }),
  chargeCRate: finiteNumber('Charge rate')
    .gt(0, { error: 'Charge rate must be above 0 C' })
    .max(10, { error: 'Charge rate may be at most 10 C' })
    .optional(),
  dischargeCRate: finiteNumber('Discharge rate')
    .gt(0, { error: 'Discharge rate must be above 0 C' })
    .max(200, { error: 'Discharge rate may be at most 200 C' })
    .optional(),
  ratedHours: finiteNumber('Rated hours')
    .gt(0, { error: 'Rated hours must be above 0 h' })
    .max(100, { error: 'Rated hours may be at most 100 h' })
    .optional(),
  peukertExponent: finiteNumber('Peukert exponent')
    .min(1, { error: 'A Peukert exponent is at least 1' })
    .max(2, { error: 'A Peukert exponent is at most 2' })
    .optional(),
  port: portSchema,
  massG: massGSchema,
});
export type BatterySpec = z.infer<typeof batterySpecSchema>;

/** Controller types of the 12 V path. */
export const controllerTypes = ['pwm', 'mppt'] as const;

/** A solar charge controller (PWM or MPPT). The efficiency is used for MPPT; a PWM switch is treated as lossless. */
export const controllerSpecSchema = z.object({
  kind: z.literal('controller'),
  controllerType: z.enum(controllerTypes, { error: 'Controller type must be pwm or mppt' }),
  maxInputVolts: finiteNumber('Input voltage limit')
    .gt(0, { error: 'Input voltage limit must be above 0 V' })
    .max(150, { error: 'Input voltage limit may be at most 150 V' }),
  maxChargeA: finiteNumber('Charge current')
    .gt(0, { error: 'Charge current must be above 0 A' })
    .max(60, { error: 'Charge current may be at most 60 A' }),
  efficiency: efficiencyShare('Efficiency').default(defaultMpptEfficiency),
  inputPort: portSchema,
  outputPort: portSchema,
  massG: massGSchema,
});
export type ControllerSpec = z.infer<typeof controllerSpecSchema>;

/** A 12 V-class panel with its datasheet at STC: the `panelType: '12v'` member of `panelSpecSchema`. */
export const twelveVoltPanelSpecSchema = z
  .object({
    kind: z.literal('panel'),
    panelType: z.literal('12v'),
    ratedW: finiteNumber('Rated power')
      .gt(0, { error: 'Rated power must be above 0 W' })
      .max(400, { error: 'Rated power may be at most 400 W' }),
    maxPowerVolts: finiteNumber('Maximum-power voltage')
      .gt(0, { error: 'Maximum-power voltage must be above 0 V' })
      .max(60, { error: 'Maximum-power voltage may be at most 60 V' }),
    maxPowerAmps: finiteNumber('Maximum-power current')
      .gt(0, { error: 'Maximum-power current must be above 0 A' })
      .max(20, { error: 'Maximum-power current may be at most 20 A' }),
    openCircuitVolts: finiteNumber('Open-circuit voltage')
      .gt(0, { error: 'Open-circuit voltage must be above 0 V' })
      .max(75, { error: 'Open-circuit voltage may be at most 75 V' }),
    shortCircuitAmps: finiteNumber('Short-circuit current')
      .gt(0, { error: 'Short-circuit current must be above 0 A' })
      .max(25, { error: 'Short-circuit current may be at most 25 A' })
      .optional(),
    tempCoeffPctPerC: finiteNumber('Temperature coefficient of power')
      .min(-1, { error: 'Temperature coefficient may be at least −1 %/°C' })
      .max(0, { error: 'Temperature coefficient of power is 0 or negative' })
      .default(defaultPanelTempCoeffPctPerC),
    tempCoeffVocPctPerC: finiteNumber('Temperature coefficient of open-circuit voltage')
      .min(-1, { error: 'Temperature coefficient may be at least −1 %/°C' })
      .max(0, { error: 'Temperature coefficient of open-circuit voltage is 0 or negative' })
      .default(defaultPanelVocTempCoeffPctPerC),
    dropoutIrradianceWm2: finiteNumber('Dropout irradiance')
      .min(0, { error: 'Dropout irradiance cannot be negative' })
      .max(1000, { error: 'Dropout irradiance may be at most 1000 W/m²' })
      .default(0),
    outputPort: portSchema,
    massG: massGSchema,
  })
  .superRefine((p, ctx) => {
    if (p.openCircuitVolts <= p.maxPowerVolts) {
      ctx.addIssue({
        code: 'custom',
        path: ['openCircuitVolts'],
        message: 'Open-circuit voltage must be above the maximum-power voltage',
      });
    }
    if (p.shortCircuitAmps !== undefined && p.shortCircuitAmps < p.maxPowerAmps) {
      ctx.addIssue({
        code: 'custom',
        path: ['shortCircuitAmps'],
        message: 'Short-circuit current must be at least the maximum-power current',
      });
    }
    if (Math.abs(p.maxPowerVolts * p.maxPowerAmps - p.ratedW) > panelRatingMismatchShare * p.ratedW) {
      ctx.addIssue({
        code: 'custom',
        path: ['maxPowerAmps'],
        message: 'Maximum-power voltage × current should be close to the rated power (within 10 %)',
      });
    }
  });
export type TwelveVoltPanelSpec = z.infer<typeof twelveVoltPanelSpecSchema>;

/** The DC fields of a lead (copper gauge and inline fuse), part of `leadSpecSchema`. Both optional. */
export const dcLeadFieldsSchema = z.object({
  gaugeAwg: finiteNumber('Wire gauge')
    .int({ error: 'Wire gauge is a whole AWG number' })
    .min(0, { error: 'Wire gauge is 0–40 AWG' })
    .max(40, { error: 'Wire gauge is 0–40 AWG' })
    .optional(),
  fuseA: finiteNumber('Fuse rating')
    .gt(0, { error: 'Fuse rating must be above 0 A' })
    .max(100, { error: 'Fuse rating may be at most 100 A' })
    .optional(),
});
export type DcLeadFields = z.infer<typeof dcLeadFieldsSchema>;
