import { Injectable } from '@nestjs/common';
import type { TripPlanSummary, TripPlanSummarySource } from '../share/trip-plan-summary';
import { ChosenKitService } from './chosen-kit.service';
import { PlanningInputBuilder } from './planning-input.builder';

/**
 * What the share page and the plan e-mail say about a trip's chosen kit: the verdict, the grams, who carries
 * what (the leader carries the whole kit until the party's gear is pooled) and the cautions that apply.
 * Provided under `TRIP_PLAN_SUMMARY`.
 */
@Injectable()
export class TripPlanSummaryFromChosenKit implements TripPlanSummarySource {
  constructor(
    private readonly chosen: ChosenKitService,
    private readonly inputs: PlanningInputBuilder,
  ) {}

  async summaryFor(tripId: string): Promise<TripPlanSummary | null> {
    const chosen = await this.chosen.current(tripId);
    if (!chosen) return null;
    const leader = await this.inputs.leaderOf(tripId);
    return {
      verdict: chosen.evaluation.verdict.text,
      kitMassG: chosen.kit.massG,
      carriers: [
        {
          name: leader.displayName,
          massG: chosen.kit.massG,
          items: chosen.kit.lines.map((line) => ({ name: line.name, count: line.count })),
        },
      ],
      cautions: chosen.evaluation.cautions.map((caution) => caution.text),
    };
  }
}
