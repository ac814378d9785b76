import type { ItemKind } from '@gramwatt/shared';

/** What a piece of gear does in a power path; the locker is grouped by it. */
export type PowerRole = 'collect' | 'store' | 'convert' | 'connect' | 'use';

export interface PowerRoleInfo {
  role: PowerRole;
  label: string;
  /** One line under the group's heading. */
  blurb: string;
}

/** The groups in the order energy flows: from the sun, into storage, through converters and leads, to devices. */
export const powerRoles: readonly PowerRoleInfo[] = [
  { role: 'collect', label: 'Collect', blurb: 'Panels that turn sunlight into charge.' },
  {
    role: 'store',
    label: 'Store',
    blurb: 'Banks and 12 V batteries that hold charge for the night and the cloudy days.',
  },
  {
    role: 'convert',
    label: 'Convert',
    blurb:
      'Converters that change one voltage into another, and charge controllers between a 12 V panel and a battery.',
  },
  { role: 'connect', label: 'Connect', blurb: 'Leads and adapters between two connectors.' },
  {
    role: 'use',
    label: 'Use',
    blurb: 'Devices that use energy. They are carried anyway, so their grams are not in the total.',
  },
];

/** Each kind's group: batteries store like banks, controllers convert like converters. */
export const powerRoleOfKind: Record<ItemKind, PowerRole> = {
  panel: 'collect',
  bank: 'store',
  battery: 'store',
  converter: 'convert',
  controller: 'convert',
  lead: 'connect',
  device: 'use',
};

/** Devices are carried anyway: a locker's or a kit's grams count the power gear only. */
export const countsTowardGrams = (kind: ItemKind): boolean => kind !== 'device';

/**
 * Splits items into the power-role groups, in flow order, keeping the items' order within each group and
 * leaving out groups with no items.
 * @example groupByPowerRole([{ kind: 'lead' }, { kind: 'panel' }]) // [{ role: collect, items: [panel] }, { role: connect, items: [lead] }]
 */
export const groupByPowerRole = <T extends { kind: ItemKind }>(
  items: readonly T[],
): Array<PowerRoleInfo & { items: T[] }> =>
  powerRoles
    .map((info) => ({ ...info, items: items.filter((item) => powerRoleOfKind[item.kind] === info.role) }))
    .filter((group) => group.items.length > 0);

/** Σ grams × count over the power gear (devices left out), in g. */
export const totalGramsOf = (items: readonly { kind: ItemKind; massG: number; countOwned: number }[]): number =>
  items.reduce((sum, item) => (countsTowardGrams(item.kind) ? sum + item.massG * item.countOwned : sum), 0);
