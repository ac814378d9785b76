import { type AddressObject, simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { CapturedMail, CapturedMailStore } from './captured-mail-store';

/** Largest message the fake accepts, in bytes (our messages are a few kB). */
export const localSmtpMaxMessageBytes = 2 * 1024 * 1024;

export interface LocalSmtpServerOptions {
  /** TCP port on 127.0.0.1; 0 picks a free one. */
  port: number;
  store: CapturedMailStore;
  /** Called with each message once stored (tests wait on it). */
  onMessage?: (mail: CapturedMail) => void;
}

/** A running local fake SMTP server. */
export interface LocalSmtpServer {
  host: '127.0.0.1';
  port: number;
  close(): Promise<void>;
}

function addressText(value: AddressObject | AddressObject[] | undefined): string {
  if (value === undefined) return '';
  return (Array.isArray(value) ? value : [value]).map((address) => address.text).join(', ');
}

/**
 * Starts an SMTP server (smtp-server) on 127.0.0.1 that accepts every message without authentication or
 * TLS, parses it (mailparser) and keeps it in `store`. It never relays anything: it is the end of the line,
 * so a demo's invites can be read in the app's outbox.
 *
 * @example
 * const fake = await startLocalSmtpServer({ port: 0, store: new MemoryCapturedMailStore() });
 * // nodemailer.createTransport({ host: fake.host, port: fake.port, secure: false, ignoreTLS: true })
 * await fake.close();
 */
export async function startLocalSmtpServer(options: LocalSmtpServerOptions): Promise<LocalSmtpServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: localSmtpMaxMessageBytes,
    banner: 'Gramwatt local outbox (delivers nothing)',
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
          return;
        }
        const raw = Buffer.concat(chunks);
        simpleParser(raw)
          .then((parsed) => {
            const mailFrom = session.envelope.mailFrom;
            const stored = options.store.add(
              {
                receivedAt: new Date().toISOString(),
                envelopeFrom: mailFrom ? mailFrom.address : '',
                envelopeTo: session.envelope.rcptTo.map((rcpt) => rcpt.address.toLowerCase()),
                fromHeader: addressText(parsed.from),
                toHeader: addressText(parsed.to),
                subject: parsed.subject ?? '',
                text: parsed.text ?? '',
                html: typeof parsed.html === 'string' ? parsed.html : null,
                messageId: parsed.messageId ?? null,
                sizeBytes: raw.length,
              },
              raw,
            );
            options.onMessage?.(stored);
            callback();
          })
          .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
      });
    },
  });
  const port = await new Promise<number>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, '127.0.0.1', () => {
      const address = server.server.address();
      resolve(typeof address === 'object' && address ? address.port : options.port);
    });
  });
  return { host: '127.0.0.1', port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
