import { formatGrams } from './format';
import { kindLabels } from './labels';
import { groupByPowerRole } from './power-roles';
import { specSummary } from './spec-summary';

/** How the locker shows gear, for other screens that list gear the same way (the catalogue). */
export const gearPresenter = {
  specSummary,
  kindLabel: (kind: keyof typeof kindLabels) => kindLabels[kind],
  groupByPowerRole,
  formatGrams,
};
