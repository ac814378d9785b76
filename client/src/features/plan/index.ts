/** The plan feature's tabs for the trip page: Plan, Try a kit and the Packing list. */
export { PackingListTab } from './components/packing-list-tab';
export { PlanTab } from './components/plan-tab';
export { TryKitTab } from './components/try-kit-tab';
export type { PlanTabProps } from './types';
