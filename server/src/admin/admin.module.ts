import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module';
import { AdminAccountsController } from './admin-accounts.controller';

/** Account management for admins. */
@Module({
  imports: [UsersModule],
  controllers: [AdminAccountsController],
})
export class AdminModule {}
