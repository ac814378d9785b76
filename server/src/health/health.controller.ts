import { Controller, Get, HttpStatus, Res } from '@nestjs/common';
import { ApiResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ZodResponse } from 'nestjs-zod';
import { Public } from '../auth/decorators/public.decorator';
import { HealthDto } from './health.dto';
import { HealthService } from './health.service';

/** Liveness and database status for monitors and the start script. */
@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Public()
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: HealthDto, description: 'Up, with the database answering' })
  @ApiResponse({
    status: HttpStatus.SERVICE_UNAVAILABLE,
    type: HealthDto.Output,
    description: 'Degraded: the database does not answer',
  })
  async check(@Res({ passthrough: true }) response: Response) {
    const health = await this.health.check();
    if (health.status !== 'ok') response.status(HttpStatus.SERVICE_UNAVAILABLE);
    return health;
  }
}
