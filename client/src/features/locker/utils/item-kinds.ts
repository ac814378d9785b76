import type { ItemKind } from '@gramwatt/shared';

/** The kinds a member can add, in power-role order (Collect, Store, Convert, Connect, Use). */
export const itemKinds: readonly ItemKind[] = ['panel', 'bank', 'battery', 'converter', 'controller', 'lead', 'device'];
