import { type DynamicModule, Module } from '@nestjs/common';
import { TRIP_PLAN_SUMMARY } from '../share/trip-plan-summary';
import { TripsModule } from '../trips/trips.module';
import { ChosenKitService } from './chosen-kit.service';
import { PLAN_WORKER_FILE, PlanSolver, defaultPlanWorkerFile } from './plan-solver';
import { PlanningInputBuilder } from './planning-input.builder';
import { PlansController } from './plans.controller';
import { PlansService } from './plans.service';
import { TripPlanSummaryFromChosenKit } from './trip-plan-summary.source';

/**
 * Plans: the trip and its gear turned into the planner's input, solved in worker threads (`PlanSolver`), stored
 * and read; hand checks; the trip's chosen kit, whose summary the share page and the e-mails read through
 * `TRIP_PLAN_SUMMARY`. Configured by the `plans` namespace (threads, queue, time limits).
 */
@Module({
  imports: [TripsModule],
  controllers: [PlansController],
  providers: [
    PlanSolver,
    PlanningInputBuilder,
    PlansService,
    ChosenKitService,
    { provide: TRIP_PLAN_SUMMARY, useClass: TripPlanSummaryFromChosenKit },
  ],
  exports: [PlanningInputBuilder, PlanSolver, ChosenKitService, TRIP_PLAN_SUMMARY],
})
export class PlansModule {
  /**
   * The module with the solver's worker script: the real one by default; tests pass one that holds its thread, so
   * that filling every thread and queue place does not depend on how fast the engine solves.
   */
  static forRoot(options: { workerFile?: string } = {}): DynamicModule {
    return {
      module: PlansModule,
      providers: [{ provide: PLAN_WORKER_FILE, useValue: options.workerFile ?? defaultPlanWorkerFile }],
    };
  }
}
