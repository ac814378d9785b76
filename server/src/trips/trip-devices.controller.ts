import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Patch, Post, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from './trip-access.guard';
import { TripDevicesService } from './trip-devices.service';
import { TripDeviceAddDto, TripDeviceListResponseDto, TripDeviceResponseDto, TripDeviceUpdateDto } from './trips.dto';

/** The devices that come on a trip, each with its use profile for this trip and its carrier. */
@ApiTags('trips')
@ApiSession()
@UseGuards(TripAccessGuard)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@Controller('trips/:id/devices')
export class TripDevicesController {
  constructor(private readonly devices: TripDevicesService) {}

  /** The devices with their locker specs and effective use profiles (override merged over the default). */
  @Get()
  @TripAction('readDevices')
  @ZodResponse({ status: HttpStatus.OK, type: TripDeviceListResponseDto })
  @ApiErrorResponses(404)
  async list(@Param('id') tripId: string) {
    return { devices: await this.devices.list(tripId) };
  }

  /** Adds one of the caller's locker devices; the carrier defaults to the caller. */
  @Post()
  @TripAction('addDevice')
  @ZodResponse({ status: HttpStatus.CREATED, type: TripDeviceResponseDto })
  @ApiErrorResponses(400, 403, 404, 409)
  async add(@CurrentTripMember() member: TripMemberRow, @Body() body: TripDeviceAddDto) {
    return { device: await this.devices.add(member.tripId, member, body) };
  }

  /** Changes the override (`null` clears it) or the carrier. */
  @Patch(':deviceId')
  @TripAction('changeDevice')
  @ApiParam({ name: 'deviceId', format: 'uuid' })
  @ZodResponse({ status: HttpStatus.OK, type: TripDeviceResponseDto })
  @ApiErrorResponses(400, 403, 404)
  async update(
    @CurrentTripMember() member: TripMemberRow,
    @Param('deviceId') deviceId: string,
    @Body() body: TripDeviceUpdateDto,
  ) {
    return { device: await this.devices.update(member.tripId, deviceId, member, body) };
  }

  /** Takes the device off the trip; the locker item stays. */
  @Delete(':deviceId')
  @TripAction('changeDevice')
  @ApiParam({ name: 'deviceId', format: 'uuid' })
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(403, 404)
  async remove(@CurrentTripMember() member: TripMemberRow, @Param('deviceId') deviceId: string): Promise<void> {
    await this.devices.remove(member.tripId, deviceId, member);
  }
}
