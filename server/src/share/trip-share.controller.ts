import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Post, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow, TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from '../trips/trip-access.guard';
import { SendHomeDto, SendHomeResponseDto, ShareCreateDto, ShareLinkResponseDto } from './share.dto';
import { ShareService } from './share.service';

/** The leader's read-only share link and "send the plan home". */
@ApiTags('party')
@ApiSession()
@UseGuards(TripAccessGuard)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@Controller('trips/:id')
export class TripShareController {
  constructor(private readonly share: ShareService) {}

  /** The current link (state `none`, `active`, `revoked` or `expired`). */
  @Get('share')
  @TripAction('manageShareLink')
  @ZodResponse({ status: HttpStatus.OK, type: ShareLinkResponseDto })
  @ApiErrorResponses(403, 404)
  async current(@CurrentTripMember() member: TripMemberRow) {
    return { share: await this.share.current(member.tripId) };
  }

  /** A new signed, expiring read-only link; any earlier link stops working. */
  @Post('share')
  @TripAction('manageShareLink')
  @ZodResponse({ status: HttpStatus.CREATED, type: ShareLinkResponseDto })
  @ApiErrorResponses(400, 403, 404)
  async create(
    @CurrentTripMember() member: TripMemberRow,
    @CurrentAccount() account: AccountRow,
    @Body() body: ShareCreateDto,
  ) {
    return { share: await this.share.create(member.tripId, account, body.expiresInDays) };
  }

  /** Revokes the link. */
  @Delete('share')
  @TripAction('manageShareLink')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(403, 404)
  async revoke(@CurrentTripMember() member: TripMemberRow): Promise<void> {
    await this.share.revoke(member.tripId);
  }

  /** E-mails the viewers the trip summary (dates, start point, party, devices, plan when chosen) and the share link. */
  @Post('send-home')
  @TripAction('sendHome')
  @ZodResponse({ status: HttpStatus.OK, type: SendHomeResponseDto })
  @HttpCode(HttpStatus.OK)
  @ApiErrorResponses(400, 403, 404, 422)
  async sendHome(
    @CurrentTripMember() member: TripMemberRow,
    @CurrentAccount() account: AccountRow,
    @Body() body: SendHomeDto,
  ) {
    return this.share.sendHome(member.tripId, account, body.note);
  }
}
