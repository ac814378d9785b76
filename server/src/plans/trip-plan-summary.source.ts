import { planModelVersion } from '@gramwatt/shared';
import { Inject, Injectable } from '@nestjs/common';
import { eq, max } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.types';
import { lockerItems, tripDevices, trips } from '../database/schema';
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
    @Inject(DRIZZLE) private readonly db: Database,
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
      tripChanged:
        Math.max(await this.changedAt(tripId), chosen.gearChangedAt ? Date.parse(chosen.gearChangedAt) : 0) >
        Date.parse(chosen.updatedAt),
    };
  }

  /**
   * When the trip, one of its devices or a device's locker spec last changed (ms), as the plan tab and the packing list
   * read it (a removed device bumps the trip's own time).
   */
  private async changedAt(tripId: string): Promise<number> {
    const [trip] = await this.db.select({ at: trips.updatedAt }).from(trips).where(eq(trips.id, tripId));
    const [devices] = await this.db
      .select({ at: max(tripDevices.updatedAt), itemAt: max(lockerItems.specChangedAt) })
      .from(tripDevices)
      .innerJoin(lockerItems, eq(lockerItems.id, tripDevices.itemId))
      .where(eq(tripDevices.tripId, tripId));
    return Math.max(trip?.at.getTime() ?? 0, devices?.at?.getTime() ?? 0, devices?.itemAt?.getTime() ?? 0);
  }
}
