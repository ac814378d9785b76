import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post, Put, UseFilters, UseGuards } from '@nestjs/common';
import { ApiParam, ApiResponse, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { ApiErrorDto, ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { TripMemberRow } from '../database/schema';
import { CurrentTripMember, TripAccessGuard, TripAction } from '../trips/trip-access.guard';
import { ChosenKitService } from './chosen-kit.service';
import { PlanSolverBusyFilter } from './plan-solver-busy.filter';
import {
  CheckRequestDto,
  CheckResultDto,
  ChooseKitRequestDto,
  ChosenKitResponseDto,
  PlanListResponseDto,
  PlanRequestDto,
  PlanResponseDto,
} from './plans.dto';
import { PlansService } from './plans.service';

/** Documents the planner's 503 with its `Retry-After` header. */
const ApiPlannerBusy = () =>
  ApiResponse({
    status: HttpStatus.SERVICE_UNAVAILABLE,
    type: ApiErrorDto.Output,
    description: 'Every solver thread and queue place is taken; `Retry-After` says when to try again',
    headers: { 'Retry-After': { description: 'Seconds to wait', schema: { type: 'integer' } } },
  });

/** Plans of a trip (solve, read), a hand-picked kit's check, and the trip's chosen kit. */
@ApiTags('plans')
@ApiSession()
@UseGuards(TripAccessGuard)
@UseFilters(PlanSolverBusyFilter)
@ApiParam({ name: 'id', format: 'uuid', description: 'Trip id' })
@Controller('trips/:id')
export class PlansController {
  constructor(
    private readonly plans: PlansService,
    private readonly chosenKits: ChosenKitService,
  ) {}

  /**
   * Solves the trip on the leader's locker power gear (or the listed items of it) and stores the plan: the
   * lightest kit that works, its simulation, swaps and gram prices — or the lightest kit over the limit, the best
   * kit found in time, or what is missing. 422 for a trip with no devices, or when no kit was verified in time.
   */
  @Post('plans')
  @TripAction('runPlan')
  @HttpCode(HttpStatus.CREATED)
  @ZodResponse({ status: HttpStatus.CREATED, type: PlanResponseDto })
  @ApiErrorResponses(400, 403, 404, 422)
  @ApiPlannerBusy()
  async run(@CurrentTripMember() member: TripMemberRow, @Body() body: PlanRequestDto) {
    return { plan: await this.plans.run(member, body) };
  }

  /** The trip's plans, newest first, without their answers. */
  @Get('plans')
  @TripAction('readPlans')
  @HttpCode(HttpStatus.OK)
  @ZodResponse({ status: HttpStatus.OK, type: PlanListResponseDto })
  @ApiErrorResponses(404)
  async list(@CurrentTripMember() member: TripMemberRow) {
    return { plans: await this.plans.list(member.tripId) };
  }

  /** One stored plan with its whole answer. */
  @Get('plans/:planId')
  @TripAction('readPlans')
  @ApiParam({ name: 'planId', format: 'uuid' })
  @HttpCode(HttpStatus.OK)
  @ZodResponse({ status: HttpStatus.OK, type: PlanResponseDto })
  @ApiErrorResponses(404)
  async get(@CurrentTripMember() member: TripMemberRow, @Param('planId') planId: string) {
    return { plan: await this.plans.get(member.tripId, planId) };
  }

  /** Simulates a kit picked by hand: verdict, ledger, and the changes that shave grams and still work. */
  @Post('check')
  @TripAction('checkKit')
  @HttpCode(HttpStatus.OK)
  @ZodResponse({ status: HttpStatus.OK, type: CheckResultDto })
  @ApiErrorResponses(400, 403, 404, 422)
  @ApiPlannerBusy()
  async check(@CurrentTripMember() member: TripMemberRow, @Body() body: CheckRequestDto) {
    return this.plans.check(member.tripId, body.kit);
  }

  /** The chosen kit (the latest plan's optimum until the leader picks one), or null before any plan. */
  @Get('kit')
  @TripAction('readPlans')
  @HttpCode(HttpStatus.OK)
  @ZodResponse({ status: HttpStatus.OK, type: ChosenKitResponseDto })
  @ApiErrorResponses(404)
  async chosen(@CurrentTripMember() member: TripMemberRow) {
    return { kit: await this.chosenKits.current(member.tripId) };
  }

  /** Stores the kit the packing list and the e-mails use: a plan's optimum, a swap, or a kit picked by hand. */
  @Put('kit')
  @TripAction('chooseKit')
  @HttpCode(HttpStatus.OK)
  @ZodResponse({ status: HttpStatus.OK, type: ChosenKitResponseDto })
  @ApiErrorResponses(400, 403, 404, 422)
  @ApiPlannerBusy()
  async choose(@CurrentTripMember() member: TripMemberRow, @Body() body: ChooseKitRequestDto) {
    return { kit: await this.chosenKits.choose(member, body) };
  }
}
