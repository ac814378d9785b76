import { z } from 'zod';

/**
 * The fixed list of connectors Gramwatt knows. For a port without a captive cable it is the socket; for a port
 * with a captive cable it is the plug at the cable's free end.
 */
export const connectors = [
  'usb-a',
  'usb-c',
  'micro-usb',
  'barrel-5.5x2.1',
  'barrel-5.5x2.5',
  '12v-accessory',
  'ring-terminal',
  'radio-dc',
  'other',
] as const;
export const connectorSchema = z.enum(connectors, { error: 'Pick a connector from the list' });
export type Connector = z.infer<typeof connectorSchema>;

/** A finite number (zod 4's `z.number()` already rejects NaN and ±Infinity). */
export function finiteNumber(label: string) {
  return z.number({ error: `${label} must be a number` });
}

/** A share 0–1 that must be above zero (efficiencies). */
export function efficiencyShare(label: string) {
  return finiteNumber(label)
    .gt(0, { error: `${label} must be above 0` })
    .max(1, { error: `${label} is a share from 0 to 1 (100 % is 1)` });
}

/** A mass in grams: a positive whole-number-or-decimal up to 50 kg. */
export const massGSchema = finiteNumber('Mass')
  .gt(0, { error: 'Mass must be above 0 g' })
  .max(50_000, { error: 'Mass may be at most 50,000 g' });

/** One port of an item: its connector and whether a cable is fixed to it. */
export const portSchema = z.object({
  connector: connectorSchema,
  captiveCable: z.boolean({ error: 'Say whether the port has a captive cable' }),
});
export type Port = z.infer<typeof portSchema>;

/** A DC output port: its connector, volts, maximum current and, for USB-C, the USB PD voltages it offers. */
export const outputPortSchema = portSchema.extend({
  volts: finiteNumber('Port voltage')
    .gt(0, { error: 'Port voltage must be above 0 V' })
    .max(60, { error: 'Port voltage may be at most 60 V' }),
  maxA: finiteNumber('Port current')
    .gt(0, { error: 'Port current must be above 0 A' })
    .max(20, { error: 'Port current may be at most 20 A' }),
  usbPdVolts: z
    .array(
      finiteNumber('USB PD voltage')
        .gt(0, { error: 'USB PD voltage must be above 0 V' })
        .max(48, { error: 'USB PD voltage may be at most 48 V' }),
    )
    .max(8, { error: 'At most 8 USB PD voltages' })
    .default([]),
});
export type OutputPort = z.infer<typeof outputPortSchema>;
