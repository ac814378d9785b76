import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import {
  type CheckResult,
  type KitSelection,
  type PlanRecord,
  type PlanRequest,
  type PlanSummary,
  PlanningInputError,
} from '@gramwatt/shared';
import { and, desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type TripMemberRow, type TripPlanRow, tripPlans } from '../database/schema';
import { gearSpecChangedAt } from './gear-spec-changed';
import { assertKitSelection } from './kit-selection';
import { PlanSolver } from './plan-solver';
import { toPlanRecord, toPlanSummary, withDeviceNames } from './plan-view';
import { PlanningInputBuilder } from './planning-input.builder';

export const planNotFoundMessage = 'Plan not found';

const uuidSchema = z.uuid();

/** The engine's word that a selection does not fit the gear, as the one 400 shape. */
export function planningInputBadRequest(error: PlanningInputError): BadRequestException {
  return new BadRequestException({ message: error.message, errors: [{ path: error.path, message: error.message }] });
}

/**
 * Plans of a trip: solve and store, read, and check a kit picked by hand. Callers have passed the trip-access
 * policy; every query is scoped to the trip in the route.
 */
@Injectable()
export class PlansService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly inputs: PlanningInputBuilder,
    private readonly solver: PlanSolver,
  ) {}

  /** Solves the trip on the leader's gear (or the listed items of it) and stores the plan with its input. */
  async run(member: TripMemberRow, body: PlanRequest): Promise<PlanRecord> {
    const { input } = await this.inputs.forTrip(member.tripId, { itemIds: body.itemIds });
    const solved = await this.solver.plan(input);
    const result = solved.value;
    const [row] = await this.db
      .insert(tripPlans)
      .values({
        tripId: member.tripId,
        createdBy: member.accountId,
        input,
        result,
        modelVersion: result.modelVersion,
        durationMs: solved.durationMs,
        status: result.status,
        headline: result.headline,
        massG: result.kit?.massG ?? null,
        createdAt: this.clock.now(),
      })
      .returning();
    if (!row) throw new Error('insert returned no row');
    return this.record(row);
  }

  /** The trip's plans, newest first, without their answers. */
  async list(tripId: string): Promise<PlanSummary[]> {
    // The plan screen lists the trip's plans first: a hiker who may plan next finds a warm thread (not awaited).
    void this.solver.warmUp();
    const rows = await this.db
      .select({
        id: tripPlans.id,
        tripId: tripPlans.tripId,
        createdBy: tripPlans.createdBy,
        modelVersion: tripPlans.modelVersion,
        durationMs: tripPlans.durationMs,
        status: tripPlans.status,
        headline: tripPlans.headline,
        massG: tripPlans.massG,
        createdAt: tripPlans.createdAt,
      })
      .from(tripPlans)
      .where(eq(tripPlans.tripId, tripId))
      .orderBy(desc(tripPlans.createdAt));
    return rows.map(toPlanSummary);
  }

  /** One plan of the trip. @throws NotFoundException (404) for another trip's plan or an unknown id. */
  async get(tripId: string, planId: string): Promise<PlanRecord> {
    return this.record(await this.row(tripId, planId));
  }

  /**
   * The plan as the API gives it, with the latest locker spec change of the gear it weighed and how many items of gear
   * it never weighed (`gearAddedSince`).
   */
  private async record(row: TripPlanRow): Promise<PlanRecord> {
    const weighedUnits = new Map(row.input.gear.map((g) => [g.itemId, g.countOwned]));
    return toPlanRecord(row, {
      gearChangedAt: await gearSpecChangedAt(this.db, [...weighedUnits.keys()]),
      gearAddedCount: await this.inputs.gearAddedSince(row.tripId, row.createdAt, weighedUnits),
    });
  }

  /** The stored plan row of this trip. @throws NotFoundException (404) otherwise. */
  async row(tripId: string, planId: string): Promise<TripPlanRow> {
    if (!uuidSchema.safeParse(planId).success) throw new NotFoundException(planNotFoundMessage);
    const [row] = await this.db
      .select()
      .from(tripPlans)
      .where(and(eq(tripPlans.id, planId), eq(tripPlans.tripId, tripId)));
    if (!row) throw new NotFoundException(planNotFoundMessage);
    return row;
  }

  /** Whether the trip has a plan with this id. */
  async has(tripId: string, planId: string): Promise<boolean> {
    if (!uuidSchema.safeParse(planId).success) return false;
    const [row] = await this.db
      .select({ id: tripPlans.id })
      .from(tripPlans)
      .where(and(eq(tripPlans.id, planId), eq(tripPlans.tripId, tripId)));
    return row !== undefined;
  }

  /** The newest plan of the trip, or null. */
  async latest(tripId: string): Promise<TripPlanRow | null> {
    const [row] = await this.db
      .select()
      .from(tripPlans)
      .where(eq(tripPlans.tripId, tripId))
      .orderBy(desc(tripPlans.createdAt))
      .limit(1);
    return row ?? null;
  }

  /**
   * Simulates a kit picked by hand on the trip: verdict, ledger, and the changes that shave grams.
   * @throws BadRequestException (400, path `kit.<i>.itemId` / `kit.<i>.count`) for an item not among the trip's
   * gear or more units than owned.
   */
  async check(tripId: string, selection: KitSelection): Promise<CheckResult> {
    const { input } = await this.inputs.forTrip(tripId);
    assertKitSelection(input, selection);
    try {
      const { value } = await this.solver.check(input, selection);
      return { ...value, evaluation: withDeviceNames(value.evaluation, input.deviceNames) };
    } catch (error) {
      if (error instanceof PlanningInputError) throw planningInputBadRequest(error);
      throw error;
    }
  }
}
