import { Module } from '@nestjs/common';
import { TripsModule } from '../trips/trips.module';
import { InviteLinksController } from './invite-links.controller';
import { InvitesService } from './invites.service';
import { TripInvitesController } from './trip-invites.controller';
import { TripMembersController } from './trip-members.controller';
import { TripMembersService } from './trip-members.service';

/** The party: invites by e-mail, accepting them, and the leader's changes to members (mail from the global MailModule). */
@Module({
  imports: [TripsModule],
  controllers: [TripInvitesController, InviteLinksController, TripMembersController],
  providers: [InvitesService, TripMembersService],
  exports: [InvitesService],
})
export class InvitesModule {}
