import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import { type ChooseKitRequest, type ChosenKit, PlanningInputError, planModelVersion } from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type TripMemberRow, tripKits } from '../database/schema';
import { gearSpecChangedAt } from './gear-spec-changed';
import { assertKitSelection } from './kit-selection';
import { PlanSolver } from './plan-solver';
import { optimumAsChosenKit, toChosenKit, withDeviceNames } from './plan-view';
import { PlanningInputBuilder } from './planning-input.builder';
import { PlansService, planningInputBadRequest } from './plans.service';

const noSuchPlanMessage = 'No such plan on this trip';

/**
 * The trip's chosen kit: what the packing list, the share page and the e-mails use. The leader stores one (a
 * plan's optimum, a swap, or a kit picked by hand), simulated when chosen; until then the latest plan's optimum
 * stands.
 */
@Injectable()
export class ChosenKitService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly inputs: PlanningInputBuilder,
    private readonly solver: PlanSolver,
    private readonly plans: PlansService,
  ) {}

  /**
   * Stores the kit the leader picked, with its simulation on the trip as it stands now.
   * @throws BadRequestException (400) for a plan id that is not this trip's (`planId`), an item not among the
   * trip's gear or more units than owned (`kit.<i>.…`); 422 for a trip with no devices.
   */
  async choose(member: TripMemberRow, body: ChooseKitRequest): Promise<ChosenKit> {
    if (body.planId !== undefined && !(await this.plans.has(member.tripId, body.planId))) {
      throw new BadRequestException({
        message: noSuchPlanMessage,
        errors: [{ path: 'planId', message: noSuchPlanMessage }],
      });
    }
    const { input } = await this.inputs.forTrip(member.tripId);
    assertKitSelection(input, body.kit);
    let evaluated;
    try {
      evaluated = (await this.solver.evaluate(input, body.kit)).value;
    } catch (error) {
      if (error instanceof PlanningInputError) throw planningInputBadRequest(error);
      throw error;
    }
    const values = {
      source: body.source,
      planId: body.planId ?? null,
      lines: body.kit,
      kit: evaluated.kit,
      evaluation: withDeviceNames(evaluated.evaluation, input.deviceNames),
      modelVersion: planModelVersion,
      chosenBy: member.accountId,
      chosenAt: this.clock.now(),
    };
    const [row] = await this.db
      .insert(tripKits)
      .values({ tripId: member.tripId, ...values })
      .onConflictDoUpdate({ target: tripKits.tripId, set: values })
      .returning();
    if (!row) throw new Error('upsert returned no row');
    return this.withGearChangedAt(toChosenKit(row));
  }

  /** The kit the leader chose, else the latest plan's optimum, else null. */
  async current(tripId: string): Promise<ChosenKit | null> {
    const [row] = await this.db.select().from(tripKits).where(eq(tripKits.tripId, tripId));
    if (row) return this.withGearChangedAt(toChosenKit(row));
    const latest = await this.plans.latest(tripId);
    const optimum = latest ? optimumAsChosenKit(latest) : null;
    return optimum ? this.withGearChangedAt(optimum) : null;
  }

  /** The kit with the latest locker spec change of its gear (a bank's capacity edited after the choice, say). */
  private async withGearChangedAt(chosen: ChosenKit): Promise<ChosenKit> {
    const at = await gearSpecChangedAt(
      this.db,
      chosen.kit.lines.map((line) => line.itemId),
    );
    return { ...chosen, gearChangedAt: at?.toISOString() ?? null };
  }
}
