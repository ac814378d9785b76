import type { MailKind } from '@gramwatt/shared';
import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import { type MailMessageRow, mailMessages } from '../database/schema';
import { type MailConfig, mailConfigKey } from './mail.config';
import type { RenderedMail } from './mail-layout';
import { MAIL_TRANSPORT, type MailTransport } from './mail-transport';
import { retryDelayMs } from './retry-backoff';
import { errorMessage } from '../common/error-message';

/** A message to send. */
export interface MailRequest extends RenderedMail {
  kind: MailKind;
  to: string;
  subject: string;
  tripId?: string | null;
}

/** Thrown for a recipient that is not an e-mail address. */
export class InvalidMailAddressError extends Error {
  constructor(address: string) {
    super(`Not an e-mail address: ${address}`);
  }
}

const recipientSchema = z.email().max(254);

/** Longest error text kept on a message (SMTP replies can be long). */
const maxErrorLength = 500;

/**
 * Sends e-mail through the outbox: every message is written to `mail_messages` first, then handed to SMTP.
 * A failed attempt is retried with capped exponential backoff up to the configured count, then marked
 * failed with its last error; messages still queued at shutdown are picked up at the next start.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('Mail');
  private readonly timers = new Map<string, NodeJS.Timeout>();
  private readonly inFlight = new Set<Promise<unknown>>();
  private stopped = false;

  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(MAIL_TRANSPORT) private readonly transport: MailTransport,
    private readonly config: ConfigService,
  ) {}

  private get settings(): MailConfig {
    return this.config.getOrThrow<MailConfig>(mailConfigKey);
  }

  /** Whether mail goes to the in-process fake (the outbox can then be read in the app). */
  get isLocal(): boolean {
    return this.settings.transport.mode === 'local-fake';
  }

  /** The app's origin for links in messages, without a trailing slash. */
  get publicUrl(): string {
    return this.settings.publicUrl;
  }

  /**
   * Records the message and makes the first attempt before answering; later attempts run in the
   * background. Resolves with the row after the first attempt (`sent`, or `queued` awaiting a retry, or
   * `failed` when only one attempt is allowed).
   * @throws InvalidMailAddressError when `to` is not an address.
   */
  async send(request: MailRequest): Promise<MailMessageRow> {
    const to = request.to.trim().toLowerCase();
    if (!recipientSchema.safeParse(to).success) throw new InvalidMailAddressError(request.to);
    const now = this.clock.now();
    const [row] = await this.db
      .insert(mailMessages)
      .values({
        kind: request.kind,
        toAddress: to,
        subject: request.subject,
        textBody: request.text,
        htmlBody: request.html,
        tripId: request.tripId ?? null,
        status: 'queued',
        nextAttemptAt: now,
        createdAt: now,
        updatedAt: now,
      })
      .returning();
    if (!row) throw new Error('insert returned no row');
    return this.track(this.attempt(row.id));
  }

  /** Delivery status of every message, newest first (the admin's view: no content). */
  async list(limit = 200): Promise<MailMessageRow[]> {
    return this.db
      .select()
      .from(mailMessages)
      .orderBy(desc(mailMessages.createdAt), desc(mailMessages.id))
      .limit(limit);
  }

  /** Resolves once no attempt is running or waiting (tests; shutdown). */
  async whenIdle(): Promise<void> {
    while (this.inFlight.size > 0 || this.timers.size > 0) {
      if (this.inFlight.size > 0) await Promise.allSettled([...this.inFlight]);
      else await new Promise((resolve) => setTimeout(resolve, 5));
    }
  }

  /** Picks up messages left queued by an earlier run. */
  async onApplicationBootstrap(): Promise<void> {
    const queued = await this.db.select().from(mailMessages).where(eq(mailMessages.status, 'queued'));
    const now = this.clock.now().getTime();
    for (const row of queued) this.schedule(row.id, Math.max(0, (row.nextAttemptAt?.getTime() ?? now) - now));
    if (queued.length > 0) this.logger.log(`Resuming ${queued.length} queued message(s)`);
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    for (const timer of this.timers.values()) clearTimeout(timer);
    this.timers.clear();
    await Promise.allSettled([...this.inFlight]);
    this.transport.close();
  }

  private track<T>(promise: Promise<T>): Promise<T> {
    this.inFlight.add(promise);
    void promise.finally(() => this.inFlight.delete(promise)).catch(() => undefined);
    return promise;
  }

  private schedule(id: string, delayMs: number): void {
    if (this.stopped) return;
    const timer = setTimeout(() => {
      this.timers.delete(id);
      this.track(this.attempt(id)).catch((error: unknown) => this.logger.error(`Mail ${id}: ${String(error)}`));
    }, delayMs);
    timer.unref();
    this.timers.set(id, timer);
  }

  /** One attempt: claims the queued row (so two servers never send it twice), hands it to SMTP, records the outcome. */
  private async attempt(id: string): Promise<MailMessageRow> {
    const [current] = await this.db.select().from(mailMessages).where(eq(mailMessages.id, id));
    if (!current) throw new Error(`mail message ${id} is gone`);
    if (current.status !== 'queued') return current;
    const attempt = current.attempts + 1;
    const [claimed] = await this.db
      .update(mailMessages)
      .set({ attempts: attempt, nextAttemptAt: null, updatedAt: this.clock.now() })
      .where(
        and(eq(mailMessages.id, id), eq(mailMessages.status, 'queued'), eq(mailMessages.attempts, current.attempts)),
      )
      .returning();
    if (!claimed) return current;
    try {
      const { messageId } = await this.transport.send({
        from: this.settings.from,
        to: claimed.toAddress,
        subject: claimed.subject,
        text: claimed.textBody,
        html: claimed.htmlBody,
      });
      const now = this.clock.now();
      const [sent] = await this.db
        .update(mailMessages)
        .set({ status: 'sent', sentAt: now, smtpMessageId: messageId, updatedAt: now })
        .where(eq(mailMessages.id, id))
        .returning();
      return sent ?? claimed;
    } catch (error) {
      const message = errorMessage(error).slice(0, maxErrorLength);
      const delayMs = retryDelayMs(attempt, this.settings.retry);
      const now = this.clock.now();
      const [updated] = await this.db
        .update(mailMessages)
        .set(
          delayMs === null
            ? { status: 'failed', lastError: message, nextAttemptAt: null, updatedAt: now }
            : { lastError: message, nextAttemptAt: new Date(now.getTime() + delayMs), updatedAt: now },
        )
        .where(eq(mailMessages.id, id))
        .returning();
      if (delayMs === null)
        this.logger.warn(`Mail ${id} to ${claimed.toAddress} failed after ${attempt} attempt(s): ${message}`);
      else this.schedule(id, delayMs);
      return updated ?? claimed;
    }
  }
}
