import type { ItemKind } from '@gramwatt/shared';

/** The kinds a member can add today, in power-role order (batteries and controllers come with the 12 V path). */
export const itemKinds: readonly ItemKind[] = ['panel', 'bank', 'converter', 'lead', 'device'];
