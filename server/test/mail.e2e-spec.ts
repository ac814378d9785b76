import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { mailMessages } from '../src/database/schema';
import { renderMail } from '../src/mail/mail-layout';
import { InvalidMailAddressError, MailService } from '../src/mail/mail.service';
import { FlakyTransport, capturedMail, mailTo, startTestAppWithTransport } from './support/party-fixtures';
import { type TestApp, startTestApp } from './support/test-app';
import { signedInHiker } from './support/trip-fixtures';

function sample(to: string, subject = 'A note about the ridge walk') {
  return {
    kind: 'trip-invite' as const,
    to,
    subject,
    ...renderMail(subject, [{ type: 'paragraph', text: 'Bring the <small> panel & a lead.' }], 'Sent by a test.'),
  };
}

describe('mail through the local fake SMTP server', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  it('delivers over SMTP to the fake, which parses the text and HTML parts', async () => {
    const mail = t.app.get(MailService);
    expect(mail.isLocal).toBe(true);
    const row = await mail.send(sample('Wren@Example.Test'));
    expect(row).toMatchObject({ status: 'sent', attempts: 1, toAddress: 'wren@example.test', lastError: null });
    expect(row.smtpMessageId).toMatch(/^<.+>$/);
    const [received] = await mailTo(t, 'wren@example.test');
    expect(received).toMatchObject({
      subject: 'A note about the ridge walk',
      envelopeTo: ['wren@example.test'],
      toHeader: 'wren@example.test',
      messageId: row.smtpMessageId,
    });
    expect(received?.fromHeader).toContain('gramwatt@outbox.invalid');
    expect(received?.text).toContain('Bring the <small> panel & a lead.');
    // The HTML part escapes the text and loads nothing from anywhere (no tracking).
    expect(received?.html).toContain('Bring the &lt;small&gt; panel &amp; a lead.');
    expect(received?.html).not.toMatch(/<img|<script|src=|url\(/i);
  });

  it('refuses a recipient that is not an address and records nothing', async () => {
    const mail = t.app.get(MailService);
    const before = await t.db.select().from(mailMessages);
    await expect(mail.send(sample('not an address'))).rejects.toBeInstanceOf(InvalidMailAddressError);
    expect(await t.db.select().from(mailMessages)).toHaveLength(before.length);
  });

  describe('outbox', () => {
    it('shows each account the messages delivered to its own address, with both parts', async () => {
      const wren = await signedInHiker(t);
      const moss = await signedInHiker(t);
      const mail = t.app.get(MailService);
      await mail.send(sample(wren.email, 'For Wren'));
      await mail.send(sample(moss.email, 'For Moss'));
      await mail.whenIdle();

      const status = await t.http().get('/api/outbox/status').set(wren.auth).expect(200);
      expect(status.body).toEqual({ local: true });
      const list = await t.http().get('/api/outbox').set(wren.auth).expect(200);
      expect(list.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['For Wren']);
      expect(list.body.messages[0].preview).toContain('Bring the <small> panel');

      const id = list.body.messages[0].id as string;
      const one = await t.http().get(`/api/outbox/${id}`).set(wren.auth).expect(200);
      expect(one.body.message).toMatchObject({ subject: 'For Wren', html: expect.stringContaining('<!doctype html>') });
      expect(one.body.message.text).toContain('Sent by a test.');
      // Another account cannot open it, and the same 404 answers for an id that was never sent.
      const theirs = await t.http().get(`/api/outbox/${id}`).set(moss.auth).expect(404);
      expect(theirs.body.message).toBe('Message not found');
      await t.http().get('/api/outbox/5b0c8f4e-3a51-4f7e-9d2b-6c1e0a7f9b3d').set(moss.auth).expect(404);
      await t.http().get('/api/outbox').expect(401);
    });

    it('admins see delivery status of every message but no content; members get 403', async () => {
      const admin = await signedInHiker(t, 'admin');
      const member = await signedInHiker(t);
      const response = await t.http().get('/api/admin/mail').set(admin.auth).expect(200);
      expect(response.body.messages.length).toBeGreaterThanOrEqual(3);
      for (const message of response.body.messages) {
        expect(Object.keys(message).sort()).toEqual(
          ['attempts', 'createdAt', 'id', 'kind', 'lastError', 'nextAttemptAt', 'sentAt', 'status', 'toAddress'].sort(),
        );
      }
      expect(response.body.messages[0]).toMatchObject({ status: 'sent', attempts: 1 });
      await t.http().get('/api/admin/mail').set(member.auth).expect(403);
      // An admin's own outbox still holds only their own messages.
      const outbox = await t.http().get('/api/outbox').set(admin.auth).expect(200);
      expect(outbox.body.messages).toEqual([]);
    });
  });
});

describe('mail with a real SMTP server configured', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp({
      env: { SMTP_HOST: '127.0.0.1', SMTP_PORT: '1', MAIL_FROM: 'Trips <trips@example.test>' },
    });
  });

  afterAll(async () => {
    await t.close();
  });

  it('turns the outbox off: status says so and the outbox answers 404', async () => {
    const hiker = await signedInHiker(t);
    expect(t.app.get(MailService).isLocal).toBe(false);
    const status = await t.http().get('/api/outbox/status').set(hiker.auth).expect(200);
    expect(status.body).toEqual({ local: false });
    await t.http().get('/api/outbox').set(hiker.auth).expect(404);
    await t.http().get('/api/outbox/5b0c8f4e-3a51-4f7e-9d2b-6c1e0a7f9b3d').set(hiker.auth).expect(404);
  });
});

describe('retries', () => {
  let t: TestApp | undefined;

  afterEach(async () => {
    await t?.close();
    t = undefined;
  });

  it('retries a failing transport with backoff and records attempts and the last error, then sends', async () => {
    const transport = new FlakyTransport(2);
    t = await startTestAppWithTransport(transport, { MAIL_RETRY_BASE_DELAY_MS: '1', MAIL_MAX_ATTEMPTS: '4' });
    const mail = t.app.get(MailService);
    const first = await mail.send(sample('retry@example.test'));
    // The first attempt failed: still queued, with the error and a next attempt due.
    expect(first).toMatchObject({ status: 'queued', attempts: 1, lastError: 'connect ECONNREFUSED 127.0.0.1:2525' });
    expect(first.nextAttemptAt).not.toBeNull();
    await mail.whenIdle();
    const [row] = await t.db.select().from(mailMessages).where(eq(mailMessages.id, first.id));
    expect(row).toMatchObject({ status: 'sent', attempts: 3, nextAttemptAt: null });
    expect(row?.lastError).toContain('ECONNREFUSED');
    expect(transport.calls).toBe(3);
    expect(transport.accepted.map((m) => m.to)).toEqual(['retry@example.test']);
  });

  it('gives up after the allowed attempts and keeps the message as failed with its last error', async () => {
    const transport = new FlakyTransport(99, '550 5.1.1 mailbox unavailable');
    t = await startTestAppWithTransport(transport, { MAIL_RETRY_BASE_DELAY_MS: '0', MAIL_MAX_ATTEMPTS: '3' });
    const mail = t.app.get(MailService);
    const first = await mail.send(sample('bounce@example.test'));
    await mail.whenIdle();
    const [row] = await t.db.select().from(mailMessages).where(eq(mailMessages.id, first.id));
    expect(row).toMatchObject({
      status: 'failed',
      attempts: 3,
      lastError: '550 5.1.1 mailbox unavailable',
      sentAt: null,
    });
    expect(transport.calls).toBe(3);
    const admin = await signedInHiker(t, 'admin');
    const listed = await t.http().get('/api/admin/mail').set(admin.auth).expect(200);
    expect(listed.body.messages[0]).toMatchObject({ id: first.id, status: 'failed', attempts: 3 });
  });

  it('sends messages an earlier run left queued when the app starts', async () => {
    const transport = new FlakyTransport(0);
    t = await startTestAppWithTransport(transport, { MAIL_RETRY_BASE_DELAY_MS: '0' });
    const [left] = await t.db
      .insert(mailMessages)
      .values({
        kind: 'trip-plan',
        toAddress: 'left@example.test',
        subject: 'Left behind',
        textBody: 't',
        htmlBody: '<p>t</p>',
        attempts: 1,
      })
      .returning();
    await t.app.get(MailService).onApplicationBootstrap();
    await t.app.get(MailService).whenIdle();
    const [row] = await t.db.select().from(mailMessages).where(eq(mailMessages.id, left!.id));
    expect(row).toMatchObject({ status: 'sent', attempts: 2 });
    expect(capturedMail(t)).toEqual([]);
  });
});
