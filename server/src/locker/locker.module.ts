import { Module } from '@nestjs/common';
import { LockerCsvController } from './locker-csv.controller';
import { LockerCsvService } from './locker-csv.service';
import { LockerItemsController } from './locker-items.controller';
import { LockerService } from './locker.service';

/** The member's locker: item CRUD, CSV import and export. `LockerService` is exported for the trips and catalogue modules. */
@Module({
  controllers: [LockerItemsController, LockerCsvController],
  providers: [LockerService, LockerCsvService],
  exports: [LockerService],
})
export class LockerModule {}
