import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Patch, Post, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from '../trips/trip-access.guard';
import { PoolItemAddDto, PoolItemResponseDto, PoolItemUpdateDto, PoolListResponseDto } from './pool.dto';
import { PoolService } from './pool.service';

/** The party pool: power gear members share into the trip's plan, each entry with a count. */
@ApiTags('trips')
@ApiSession()
@UseGuards(TripAccessGuard)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@Controller('trips/:id/pool')
export class PoolController {
  constructor(private readonly pool: PoolService) {}

  /** The pooled items with their owners, and whether the leader's whole locker counts. */
  @Get()
  @TripAction('readPool')
  @ZodResponse({ status: HttpStatus.OK, type: PoolListResponseDto })
  @ApiErrorResponses(404)
  async list(@Param('id') tripId: string) {
    return this.pool.list(tripId);
  }

  /** Shares one of the caller's locker items (power gear) with a count of at most the count owned. */
  @Post()
  @TripAction('shareToPool')
  @ZodResponse({ status: HttpStatus.CREATED, type: PoolItemResponseDto })
  @ApiErrorResponses(400, 403, 404, 409)
  async add(@CurrentTripMember() member: TripMemberRow, @Body() body: PoolItemAddDto) {
    return { item: await this.pool.add(member, body) };
  }

  /** Changes how many of the item are pooled. */
  @Patch(':poolItemId')
  @TripAction('changePoolItem')
  @ApiParam({ name: 'poolItemId', format: 'uuid' })
  @ZodResponse({ status: HttpStatus.OK, type: PoolItemResponseDto })
  @ApiErrorResponses(400, 403, 404)
  async update(
    @CurrentTripMember() member: TripMemberRow,
    @Param('poolItemId') poolItemId: string,
    @Body() body: PoolItemUpdateDto,
  ) {
    return { item: await this.pool.update(member, poolItemId, body) };
  }

  /** Takes the item out of the pool; the locker item stays. */
  @Delete(':poolItemId')
  @TripAction('changePoolItem')
  @ApiParam({ name: 'poolItemId', format: 'uuid' })
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(403, 404)
  async remove(@CurrentTripMember() member: TripMemberRow, @Param('poolItemId') poolItemId: string): Promise<void> {
    await this.pool.remove(member, poolItemId);
  }
}
