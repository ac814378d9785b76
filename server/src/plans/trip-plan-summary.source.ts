import { planModelVersion } from '@gramwatt/shared';
import { Injectable } from '@nestjs/common';
import type { TripPlanSummary, TripPlanSummarySource } from '../share/trip-plan-summary';
import { ChosenKitService } from './chosen-kit.service';
import { PlanningInputBuilder } from './planning-input.builder';

/**
 * What the share page and the plan e-mail say about a trip's chosen kit: the verdict, the grams, who carries
 * what (a party's kit as the solver shared it out; a solo trip's leader carries it all) and the cautions that apply.
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
    // A party's kit says who carries what; a kit without carriers is the leader's to carry.
    const carriers = chosen.kit.carriers
      ? chosen.kit.carriers
          .filter((carrier) => carrier.lines.length > 0)
          .map((carrier) => ({
            name: carrier.name,
            massG: carrier.massG,
            items: carrier.lines.map((line) => ({ name: line.name, count: line.count })),
          }))
      : [
          {
            name: (await this.inputs.leaderOf(tripId)).displayName,
            massG: chosen.kit.massG,
            items: chosen.kit.lines.map((line) => ({ name: line.name, count: line.count })),
          },
        ];
    return {
      verdict: chosen.evaluation.verdict.text,
      kitMassG: chosen.kit.massG,
      carriers,
      cautions: chosen.evaluation.cautions.map((caution) => caution.text),
      earlierPlanner: chosen.modelVersion !== planModelVersion,
    };
  }
}
