import { createTransport } from 'nodemailer';
import type { SmtpSettings } from './mail.config';

/** One e-mail ready to hand to SMTP. */
export interface OutgoingMail {
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Something that hands a message to an SMTP server (nodemailer in the app; tests may fail on purpose). */
export interface MailTransport {
  /** Resolves with the accepted Message-ID; rejects when the server refuses or cannot be reached. */
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  close(): void;
}

/** Injection token of the app's {@link MailTransport}. */
export const MAIL_TRANSPORT = Symbol('MAIL_TRANSPORT');

/** How long to wait for an SMTP server, in milliseconds, before the attempt counts as failed. */
export const smtpTimeoutMs = 15_000;

/** Where nodemailer should connect: a real server or the local fake. */
export type SmtpTarget = SmtpSettings | { host: string; port: number; fake: true };

/** A {@link MailTransport} over nodemailer's SMTP transport (one connection per message, no pooling). */
export function createSmtpTransport(target: SmtpTarget): MailTransport {
  const timeouts = { connectionTimeout: smtpTimeoutMs, greetingTimeout: smtpTimeoutMs, socketTimeout: smtpTimeoutMs };
  const transporter =
    'url' in target
      ? // nodemailer reads the host, port, TLS and credentials from the URL (its own timeouts apply).
        createTransport(target.url)
      : 'fake' in target
        ? // The fake speaks plain SMTP on 127.0.0.1 only.
          createTransport({ host: target.host, port: target.port, secure: false, ignoreTLS: true, ...timeouts })
        : createTransport({
            host: target.host,
            port: target.port,
            secure: target.secure,
            // Without implicit TLS, refuse to send credentials or mail in the clear.
            requireTLS: !target.secure,
            auth: target.user === undefined ? undefined : { user: target.user, pass: target.pass ?? '' },
            ...timeouts,
          });
  return {
    async send(mail) {
      const info = await transporter.sendMail({ ...mail, disableFileAccess: true, disableUrlAccess: true });
      return { messageId: info.messageId };
    },
    close: () => transporter.close(),
  };
}
