import { Controller, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { Public } from '../auth/decorators/public.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow } from '../database/schema';
import { InviteAcceptedResponseDto, InvitePreviewResponseDto } from './invites.dto';
import { InvitesService } from './invites.service';

/**
 * The invite link's routes. Anyone with the link sees the trip's name, the role and who invited; the
 * person the invite was sent to signs in (or signs up) and accepts. Unknown token: 404; used, withdrawn
 * or expired: 410.
 */
@ApiTags('party')
@ApiParam({ name: 'token', description: 'The token from the invite link' })
@Controller('invites/:token')
export class InviteLinksController {
  constructor(private readonly invites: InvitesService) {}

  @Public()
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: InvitePreviewResponseDto })
  @ApiErrorResponses(404, 410)
  async preview(@Param('token') token: string) {
    return { invite: await this.invites.preview(token) };
  }

  /** Joins the trip with the invite's role (signed in with the invited address). */
  @Post('accept')
  @HttpCode(HttpStatus.OK)
  @ApiSession()
  @ZodResponse({ status: HttpStatus.OK, type: InviteAcceptedResponseDto })
  @ApiErrorResponses(403, 404, 409, 410)
  async accept(@Param('token') token: string, @CurrentAccount() account: AccountRow) {
    return this.invites.accept(token, account);
  }
}
