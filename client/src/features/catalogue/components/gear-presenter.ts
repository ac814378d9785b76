import type { ItemKind, ItemSpec } from '@gramwatt/shared';

/**
 * How gear is shown: spec summaries, kind names, power-role groups and grams. The locker feature owns these;
 * the page hands them in, so both screens show gear the same way without one feature importing the other.
 */
export interface GearPresenter {
  specSummary: (spec: ItemSpec) => string;
  kindLabel: (kind: ItemKind) => string;
  groupByPowerRole: <T extends { kind: ItemKind }>(
    items: readonly T[],
  ) => Array<{ role: string; label: string; blurb: string; items: T[] }>;
  formatGrams: (massG: number) => string;
}
