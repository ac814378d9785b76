import { Module } from '@nestjs/common';
import { StorageModule } from '../storage/storage.module';
import { LockerFilesController } from './locker-files.controller';
import { LockerFilesService } from './locker-files.service';

/** Photo and spec-sheet uploads of locker items. Exports the service so the locker can add `files` to items. */
@Module({
  imports: [StorageModule],
  controllers: [LockerFilesController],
  providers: [LockerFilesService],
  exports: [LockerFilesService],
})
export class LockerFilesModule {}
