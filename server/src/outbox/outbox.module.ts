import { Module } from '@nestjs/common';
import { OutboxController } from './outbox.controller';

/** The in-app outbox over the local fake's messages (`CAPTURED_MAIL` from the global mail module). */
@Module({ controllers: [OutboxController] })
export class OutboxModule {}
