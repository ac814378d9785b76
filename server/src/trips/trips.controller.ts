import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post, Put, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow, TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from './trip-access.guard';
import { TripInputDto, TripListResponseDto, TripMemberListResponseDto, TripResponseDto } from './trips.dto';
import { TripsService } from './trips.service';

/**
 * The caller's trips. A trip they are not a member of answers 404 on every route; a role too low for the
 * action answers 403 (the trip-access policy in `trip-permissions.ts`).
 */
@ApiTags('trips')
@ApiSession()
@UseGuards(TripAccessGuard)
@Controller('trips')
export class TripsController {
  constructor(private readonly trips: TripsService) {}

  /** Trips the caller is on: upcoming and ongoing first (soonest first), then past ones (latest first). */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: TripListResponseDto })
  async list(@CurrentAccount() account: AccountRow) {
    return { trips: await this.trips.list(account.id) };
  }

  /** A new trip with the caller as leader. Leave `timeZone` out to have it derived from the start point. */
  @Post()
  @ZodResponse({ status: HttpStatus.CREATED, type: TripResponseDto })
  @ApiErrorResponses(400)
  async create(@CurrentAccount() account: AccountRow, @Body() body: TripInputDto) {
    return { trip: await this.trips.create(account.id, body) };
  }

  /** The whole trip: fields, members, devices with effective use profiles, and the engine's `solarInput`. */
  @Get(':id')
  @TripAction('readTrip')
  @ApiParam({ name: 'id', format: 'uuid' })
  @ZodResponse({ status: HttpStatus.OK, type: TripResponseDto })
  @ApiErrorResponses(404)
  async get(@CurrentTripMember() member: TripMemberRow) {
    return { trip: await this.trips.get(member) };
  }

  /** Replaces the trip's fields (leader only): the body of POST; an omitted field takes its default. */
  @Put(':id')
  @TripAction('updateTrip')
  @ApiParam({ name: 'id', format: 'uuid' })
  @ZodResponse({ status: HttpStatus.OK, type: TripResponseDto })
  @ApiErrorResponses(400, 403, 404)
  async replace(@CurrentTripMember() member: TripMemberRow, @Body() body: TripInputDto) {
    return { trip: await this.trips.replace(member, body) };
  }

  /** Deletes the trip with its members and devices (leader only); the locker is untouched. */
  @Delete(':id')
  @TripAction('deleteTrip')
  @ApiParam({ name: 'id', format: 'uuid' })
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(403, 404)
  async remove(@CurrentTripMember() member: TripMemberRow): Promise<void> {
    await this.trips.remove(member);
  }

  /** Who is on the trip, with roles and gram limits (read-only for now). */
  @Get(':id/members')
  @TripAction('readMembers')
  @ApiParam({ name: 'id', format: 'uuid' })
  @ZodResponse({ status: HttpStatus.OK, type: TripMemberListResponseDto })
  @ApiErrorResponses(404)
  async members(@Param('id') tripId: string) {
    return { members: await this.trips.members(tripId) };
  }
}
