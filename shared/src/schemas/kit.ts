import { z } from 'zod';
import { bankSpecSchema, converterSpecSchema, leadSpecSchema, panelSpecSchema } from './items.js';
import { deviceSpecSchema } from './devices.js';
import { batterySpecSchema, controllerSpecSchema } from './station-items.js';

/**
 * Any item spec, discriminated by `kind` (a panel by `panelType` within it): the USB path's panel, bank, converter
 * and lead, the 12 V path's battery and controller (and 12 V panel), and devices.
 */
export const itemSpecSchema = z.discriminatedUnion(
  'kind',
  [
    panelSpecSchema,
    bankSpecSchema,
    batterySpecSchema,
    converterSpecSchema,
    controllerSpecSchema,
    leadSpecSchema,
    deviceSpecSchema,
  ],
  { error: 'Item kind must be panel, bank, battery, converter, controller, lead or device' },
);
export type ItemSpec = z.infer<typeof itemSpecSchema>;
export type ItemKind = ItemSpec['kind'];

/**
 * The power gear a kit can hold (devices are carried anyway and are not kit items). The simulation and the
 * planner do not yet use batteries, controllers or 12 V panels: such lines are left out of their paths and
 * reported unused.
 */
export const kitItemSpecSchema = z.discriminatedUnion(
  'kind',
  [panelSpecSchema, bankSpecSchema, batterySpecSchema, converterSpecSchema, controllerSpecSchema, leadSpecSchema],
  { error: 'Kit item kind must be panel, bank, battery, converter, controller or lead' },
);
export type KitItemSpec = z.infer<typeof kitItemSpecSchema>;

/** One line of a kit: a locker item, how many of it, and its spec. */
export const kitEntrySchema = z.object({
  itemId: z.string({ error: 'Item id is required' }).min(1, { error: 'Item id is required' }).max(100),
  count: z
    .number({ error: 'Count must be a number' })
    .int({ error: 'Count is a whole number' })
    .min(1, { error: 'Count is at least 1' })
    .max(20, { error: 'Count may be at most 20' }),
  spec: kitItemSpecSchema,
});
export type KitEntry = z.infer<typeof kitEntrySchema>;

/** A kit: a list of locker items with counts. Item ids are unique within a kit. */
export const kitSchema = z
  .array(kitEntrySchema)
  .max(200, { error: 'A kit has at most 200 lines' })
  .superRefine((kit, ctx) => {
    const seen = new Set<string>();
    kit.forEach((entry, i) => {
      if (seen.has(entry.itemId))
        ctx.addIssue({ code: 'custom', path: [i, 'itemId'], message: 'This item is already in the kit' });
      seen.add(entry.itemId);
    });
  });
export type Kit = z.infer<typeof kitSchema>;

/** A device on a trip with its effective use profile (the trip's override or the locker default). */
export const tripDeviceSchema = z.object({
  deviceId: z.string({ error: 'Device id is required' }).min(1, { error: 'Device id is required' }).max(100),
  spec: deviceSpecSchema,
});
export type TripDevice = z.infer<typeof tripDeviceSchema>;
