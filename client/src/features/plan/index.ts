import { createElement } from 'react';

/** Props every plan tab takes from the trip page. */
export interface PlanTabProps {
  tripId: string;
  canSolve: boolean;
  canChooseKit: boolean;
}

// Stand-ins until the plan feature lands its own tabs in this file.
const placeholder = (text: string) =>
  function Placeholder(_props: PlanTabProps) {
    return createElement('p', { className: 'text-scree-700' }, text);
  };

export const PlanTab = placeholder('The plan for this trip will appear here.');
export const TryKitTab = placeholder('Trying a kit by hand will appear here.');
export const PackingListTab = placeholder('The packing list will appear here.');
