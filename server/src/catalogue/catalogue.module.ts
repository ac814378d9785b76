import { Module } from '@nestjs/common';
import { LockerModule } from '../locker/locker.module';
import { CatalogueController } from './catalogue.controller';
import { CatalogueService } from './catalogue.service';

/** The reference catalogue: read and copy for everyone signed in, edits for admins. */
@Module({
  imports: [LockerModule],
  controllers: [CatalogueController],
  providers: [CatalogueService],
})
export class CatalogueModule {}
