import { Module } from '@nestjs/common';
import { TripsModule } from '../trips/trips.module';
import { ShareService } from './share.service';
import { SharedTripController } from './shared-trip.controller';
import { TripShareController } from './trip-share.controller';

/**
 * Share links and the plan sent home. The plan summary comes from whichever module provides
 * `TRIP_PLAN_SUMMARY` (see `trip-plan-summary.ts`); without one, trips are shared without a plan.
 */
@Module({
  imports: [TripsModule],
  controllers: [TripShareController, SharedTripController],
  providers: [ShareService],
})
export class ShareModule {}
