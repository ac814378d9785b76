import type { ChosenKit, KitEvaluation, PlanRecord, PlanSummary } from '@gramwatt/shared';
import type { TripKitRow, TripPlanRow } from '../database/schema';

/** The plan list's columns (no input snapshot, no answer). */
export type TripPlanSummaryRow = Omit<TripPlanRow, 'input' | 'result'>;

/** A stored plan as the API shows it (the input snapshot stays on the server). */
export function toPlanRecord(
  row: TripPlanRow,
  gear: { gearChangedAt: Date | null; gearAddedCount: number },
): PlanRecord {
  return {
    ...recordFields(row),
    result: row.result,
    gearChangedAt: gear.gearChangedAt?.toISOString() ?? null,
    gearAddedCount: gear.gearAddedCount,
  };
}

/** A line of the plan list. */
export function toPlanSummary(row: TripPlanSummaryRow): PlanSummary {
  return { ...recordFields(row), status: row.status, headline: row.headline, massG: row.massG };
}

function recordFields(row: TripPlanSummaryRow) {
  return {
    id: row.id,
    tripId: row.tripId,
    createdAt: row.createdAt.toISOString(),
    // The plan outlives the account that ran it.
    createdBy: row.createdBy ?? '',
    modelVersion: row.modelVersion,
    durationMs: row.durationMs,
  };
}

/** The trip's chosen kit, as the leader stored it. */
export function toChosenKit(row: TripKitRow): ChosenKit {
  return {
    kit: row.kit,
    source: row.source,
    planId: row.planId,
    updatedAt: row.chosenAt.toISOString(),
    evaluation: row.evaluation,
    modelVersion: row.modelVersion,
    gearChangedAt: null,
  };
}

/** The chosen kit when none was stored: the plan's optimum (null when the plan found nothing that works). */
export function optimumAsChosenKit(row: TripPlanRow): ChosenKit | null {
  const { kit, evaluation } = row.result;
  if (!kit || !evaluation) return null;
  return {
    kit,
    source: 'optimum',
    planId: row.id,
    updatedAt: row.createdAt.toISOString(),
    evaluation,
    modelVersion: row.modelVersion,
    gearChangedAt: null,
  };
}

/**
 * The verdict sentence with device names: the simulation writes device ids (the trip's locker item ids), and a
 * plan names them, but a check or a single evaluation does not.
 */
export function withDeviceNames(
  evaluation: KitEvaluation,
  names: Readonly<Record<string, string>> | undefined,
): KitEvaluation {
  let text = evaluation.verdict.text;
  for (const [id, name] of Object.entries(names ?? {})) text = text.split(id).join(name);
  return { ...evaluation, verdict: { ...evaluation.verdict, text } };
}
