import { Controller, Get, HttpStatus, Inject, NotFoundException, Param } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow } from '../database/schema';
import type { CapturedMail, CapturedMailStore } from '../mail/captured-mail-store';
import { CAPTURED_MAIL } from '../mail/mail.module';
import {
  OutboxListResponseDto,
  OutboxMessageParamsDto,
  OutboxMessageResponseDto,
  OutboxStatusResponseDto,
  toOutboxEntry,
  toOutboxMessage,
} from './outbox.dto';

const outboxOffMessage = 'The outbox is only kept while mail goes to the local fake';
const messageNotFound = 'Message not found';

/**
 * The in-app outbox: while mail goes to the local fake SMTP server, each account reads the messages
 * delivered to its own address (so a demo invite can be followed). With a real SMTP server it answers 404.
 */
@ApiTags('outbox')
@ApiSession()
@Controller('outbox')
export class OutboxController {
  constructor(@Inject(CAPTURED_MAIL) private readonly captured: CapturedMailStore | null) {}

  /** Whether the outbox is on (the client shows its link only then). */
  @Get('status')
  @ZodResponse({ status: HttpStatus.OK, type: OutboxStatusResponseDto })
  status() {
    return { local: this.captured !== null };
  }

  /** Messages delivered to the caller's address, newest first. */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: OutboxListResponseDto })
  @ApiErrorResponses(404)
  list(@CurrentAccount() account: AccountRow) {
    return { messages: this.own(account).map(toOutboxEntry) };
  }

  /** One message with its text and HTML parts. */
  @Get(':messageId')
  @ZodResponse({ status: HttpStatus.OK, type: OutboxMessageResponseDto })
  @ApiErrorResponses(400, 404)
  get(@CurrentAccount() account: AccountRow, @Param() params: OutboxMessageParamsDto) {
    const mail = this.store().get(params.messageId);
    if (!mail || !deliveredTo(mail, account)) throw new NotFoundException(messageNotFound);
    return { message: toOutboxMessage(mail) };
  }

  private store(): CapturedMailStore {
    if (!this.captured) throw new NotFoundException(outboxOffMessage);
    return this.captured;
  }

  private own(account: AccountRow): CapturedMail[] {
    return this.store()
      .list()
      .filter((mail) => deliveredTo(mail, account));
  }
}

/** Delivered to the account's address by the SMTP envelope (not merely named in a header). */
function deliveredTo(mail: CapturedMail, account: AccountRow): boolean {
  return mail.envelopeTo.includes(account.email.toLowerCase());
}
