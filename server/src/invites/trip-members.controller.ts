import { Body, Controller, Delete, HttpCode, HttpStatus, Param, Patch, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from '../trips/trip-access.guard';
import { MemberParamsDto, MemberResponseDto, MemberUpdateDto } from './invites.dto';
import { TripMembersService } from './trip-members.service';

/** The leader changes members' roles and gram limits and removes members. */
@ApiTags('party')
@ApiSession()
@UseGuards(TripAccessGuard)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@ApiParam({ name: 'accountId', format: 'uuid' })
@Controller('trips/:id/members/:accountId')
export class TripMembersController {
  constructor(private readonly members: TripMembersService) {}

  /** A new role (partner or viewer) and/or gram limit (null: no limit). */
  @Patch()
  @TripAction('manageMembers')
  @ZodResponse({ status: HttpStatus.OK, type: MemberResponseDto })
  @ApiErrorResponses(400, 403, 404, 409)
  async update(
    @CurrentTripMember() member: TripMemberRow,
    @Param() params: MemberParamsDto,
    @Body() body: MemberUpdateDto,
  ) {
    return { member: await this.members.update(member.tripId, params.accountId, body) };
  }

  /** Removes the member and the devices they brought; they lose access at once. */
  @Delete()
  @TripAction('manageMembers')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(400, 403, 404, 409)
  async remove(@CurrentTripMember() member: TripMemberRow, @Param() params: MemberParamsDto): Promise<void> {
    await this.members.remove(member.tripId, params.accountId);
  }
}
