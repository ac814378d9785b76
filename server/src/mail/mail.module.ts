import { Global, Inject, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { AdminMailController } from './admin-mail.controller';
import { type CapturedMailStore, DirectoryCapturedMailStore, MemoryCapturedMailStore } from './captured-mail-store';
import { startLocalSmtpServer } from './local-smtp-server';
import { type MailConfig, mailConfigKey } from './mail.config';
import { MailService } from './mail.service';
import { MAIL_TRANSPORT, type MailTransport, createSmtpTransport } from './mail-transport';

/** Injection token of the local fake's message store; null when mail goes to a real SMTP server. */
export const CAPTURED_MAIL = Symbol('CAPTURED_MAIL');

/** The transport the app uses and, in local mode, the fake it talks to. */
export interface MailHandle {
  transport: MailTransport;
  captured: CapturedMailStore | null;
  close(): Promise<void>;
}

const MAIL_HANDLE = Symbol('MAIL_HANDLE');

/** Opens what the config names: a real SMTP server, or the local fake started here on 127.0.0.1. */
export async function openMail(config: MailConfig, logger = new Logger('Mail')): Promise<MailHandle> {
  if (config.transport.mode === 'smtp') {
    const transport = createSmtpTransport(config.transport.smtp);
    const where =
      'url' in config.transport.smtp ? 'SMTP_URL' : `${config.transport.smtp.host}:${config.transport.smtp.port}`;
    logger.log(`Sending mail through ${where}; the in-app outbox is off`);
    return { transport, captured: null, close: async () => undefined };
  }
  const captured =
    config.transport.store === 'disk'
      ? new DirectoryCapturedMailStore(config.transport.fakeDir)
      : new MemoryCapturedMailStore();
  const fake = await startLocalSmtpServer({ port: config.transport.fakePort, store: captured });
  const transport = createSmtpTransport({ host: fake.host, port: fake.port, fake: true });
  logger.log(
    `Local fake SMTP on ${fake.host}:${fake.port}; messages kept ${config.transport.store === 'disk' ? `in ${config.transport.fakeDir}` : 'in memory'} and shown in the outbox`,
  );
  return { transport, captured, close: () => fake.close() };
}

/** Stops the fake SMTP server after the mail service has finished. */
class MailLifecycle implements OnApplicationShutdown {
  constructor(@Inject(MAIL_HANDLE) private readonly handle: MailHandle) {}

  async onApplicationShutdown(): Promise<void> {
    await this.handle.close();
  }
}

/**
 * E-mail for every feature: `MailService` (outbox record, SMTP, retries), `CAPTURED_MAIL` for the in-app
 * outbox, and the admin's delivery-status route. Tests may override `MAIL_TRANSPORT`.
 */
@Global()
@Module({
  controllers: [AdminMailController],
  providers: [
    {
      provide: MAIL_HANDLE,
      inject: [ConfigService],
      useFactory: (config: ConfigService) => openMail(config.getOrThrow<MailConfig>(mailConfigKey)),
    },
    { provide: MAIL_TRANSPORT, inject: [MAIL_HANDLE], useFactory: (handle: MailHandle) => handle.transport },
    { provide: CAPTURED_MAIL, inject: [MAIL_HANDLE], useFactory: (handle: MailHandle) => handle.captured },
    { provide: MailLifecycle, inject: [MAIL_HANDLE], useFactory: (handle: MailHandle) => new MailLifecycle(handle) },
    MailService,
  ],
  exports: [MailService, CAPTURED_MAIL],
})
export class MailModule {}
