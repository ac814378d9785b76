/**
 * What the share page and the plan e-mail say about a trip's chosen kit. The plans feature provides a
 * {@link TripPlanSummarySource} under {@link TRIP_PLAN_SUMMARY} (any module, exported); until one is
 * registered the share page and the e-mail carry the trip without a plan.
 */
export interface TripPlanSummary {
  /** The verdict as a sentence, e.g. "Keeps up: 31 % to spare on the worst day". */
  verdict: string;
  /** Grams of the chosen kit's power gear. */
  kitMassG: number;
  /** Who carries what. */
  carriers: { name: string; massG: number; items: { name: string; count: number }[] }[];
  /** Cautions that apply to this kit, as sentences. */
  cautions: string[];
  /** Whether an earlier version of the planner judged the kit. */
  earlierPlanner: boolean;
  /** Whether the trip or one of its devices changed after the kit was chosen (its verdict is for the trip as it was). */
  tripChanged: boolean;
}

/** Reads the chosen kit's summary of a trip, or null when the trip has no plan yet. */
export interface TripPlanSummarySource {
  summaryFor(tripId: string): Promise<TripPlanSummary | null>;
}

/** Injection token the plans feature provides its {@link TripPlanSummarySource} under. */
export const TRIP_PLAN_SUMMARY = Symbol.for('gramwatt:TRIP_PLAN_SUMMARY');
