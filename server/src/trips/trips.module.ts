import { Module } from '@nestjs/common';
import { TripAccessGuard } from './trip-access.guard';
import { TripAccessService } from './trip-access.service';
import { TripDevicesController } from './trip-devices.controller';
import { TripDevicesService } from './trip-devices.service';
import { TripsController } from './trips.controller';
import { TripsService } from './trips.service';

/**
 * Trips, their members and devices. Exports the access policy (service and guard) so later trip features
 * (plans, kit, party, share links) check roles the same way.
 */
@Module({
  controllers: [TripsController, TripDevicesController],
  providers: [TripsService, TripDevicesService, TripAccessService, TripAccessGuard],
  exports: [TripsService, TripDevicesService, TripAccessService, TripAccessGuard],
})
export class TripsModule {}
