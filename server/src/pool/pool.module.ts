import { Module } from '@nestjs/common';
import { TripsModule } from '../trips/trips.module';
import { PoolController } from './pool.controller';
import { PoolService } from './pool.service';

/** The party pool of a trip (roles checked by the trips module's access policy); the plans read it through the service. */
@Module({
  imports: [TripsModule],
  controllers: [PoolController],
  providers: [PoolService],
  exports: [PoolService],
})
export class PoolModule {}
