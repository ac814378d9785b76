import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow, TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from '../trips/trip-access.guard';
import { InviteCreateDto, InviteIdParamsDto, InviteListResponseDto, InviteResponseDto } from './invites.dto';
import { InvitesService } from './invites.service';

/** The leader invites people to the trip by e-mail, sees the invites and withdraws them. */
@ApiTags('party')
@ApiSession()
@UseGuards(TripAccessGuard)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@Controller('trips/:id/invites')
export class TripInvitesController {
  constructor(private readonly invites: InvitesService) {}

  /** Invites an address as partner or viewer and e-mails the link (a pending invite to the same address is replaced). */
  @Post()
  @TripAction('manageInvites')
  @ZodResponse({ status: HttpStatus.CREATED, type: InviteResponseDto })
  @ApiErrorResponses(400, 403, 404, 409)
  async create(
    @CurrentTripMember() member: TripMemberRow,
    @CurrentAccount() account: AccountRow,
    @Body() body: InviteCreateDto,
  ) {
    return { invite: await this.invites.create(member, account, body) };
  }

  /** Every invite of the trip, newest first, with its state and the e-mail's delivery status. */
  @Get()
  @TripAction('manageInvites')
  @ZodResponse({ status: HttpStatus.OK, type: InviteListResponseDto })
  @ApiErrorResponses(403, 404)
  async list(@CurrentTripMember() member: TripMemberRow) {
    return { invites: await this.invites.list(member.tripId) };
  }

  /** Withdraws a pending invite: its link stops working. */
  @Delete(':inviteId')
  @TripAction('manageInvites')
  @ApiParam({ name: 'inviteId', format: 'uuid' })
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(400, 403, 404, 409)
  async revoke(@CurrentTripMember() member: TripMemberRow, @Param() params: InviteIdParamsDto): Promise<void> {
    await this.invites.revoke(member.tripId, params.inviteId);
  }
}
