import { Module } from '@nestjs/common';
import { AccountsService } from './accounts.service';

/** Accounts and their rules; the auth and admin modules build on it. */
@Module({
  providers: [AccountsService],
  exports: [AccountsService],
})
export class UsersModule {}
