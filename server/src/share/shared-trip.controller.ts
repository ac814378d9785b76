import { Controller, Get, HttpStatus, Param } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { Public } from '../auth/decorators/public.decorator';
import { ApiErrorResponses } from '../common/api-error-responses.decorator';
import { SharedTripResponseDto } from './share.dto';
import { ShareService } from './share.service';

/** What a share link opens: the trip read-only, for someone without an account. */
@ApiTags('party')
@Controller('share')
export class SharedTripController {
  constructor(private readonly share: ShareService) {}

  /** 404 for a token that is not ours; 410 once expired or revoked. */
  @Public()
  @Get(':token')
  @ApiParam({ name: 'token', description: 'The token from the share link' })
  @ZodResponse({ status: HttpStatus.OK, type: SharedTripResponseDto })
  @ApiErrorResponses(404, 410)
  async read(@Param('token') token: string) {
    return { trip: await this.share.read(token) };
  }
}
