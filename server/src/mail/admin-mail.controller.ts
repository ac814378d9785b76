import { Controller, Get, HttpStatus } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { Roles } from '../auth/decorators/roles.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import { MailDeliveryListResponseDto, toMailDelivery } from './mail.dto';
import { MailService } from './mail.service';

/** Admins see whether each e-mail went out (status, attempts, last error), never what it said. */
@ApiTags('admin')
@ApiSession()
@ApiErrorResponses(403)
@Roles('admin')
@Controller('admin/mail')
export class AdminMailController {
  constructor(private readonly mail: MailService) {}

  /** The latest 200 messages, newest first. */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: MailDeliveryListResponseDto })
  async list() {
    return { messages: (await this.mail.list()).map(toMailDelivery) };
  }
}
