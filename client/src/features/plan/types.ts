/** Props every plan tab takes from the trip page (the same shape as the trip page's `TripTabProps`). */
export interface PlanTabProps {
  tripId: string;
  /** Leader or partner: may solve and check. */
  canSolve: boolean;
  /** Leader: may store the trip's chosen kit. */
  canChooseKit: boolean;
}
