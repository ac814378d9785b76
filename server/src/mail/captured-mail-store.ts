import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** A message as the local fake SMTP server received it, parsed. */
export interface CapturedMail {
  id: string;
  /** When the fake accepted it (ISO 8601). */
  receivedAt: string;
  /** SMTP envelope sender (MAIL FROM). */
  envelopeFrom: string;
  /** SMTP envelope recipients (RCPT TO), lower-case: who the message was delivered to. */
  envelopeTo: string[];
  /** The From and To headers as written. */
  fromHeader: string;
  toHeader: string;
  subject: string;
  /** The plain-text part. */
  text: string;
  /** The HTML part, or null when there was none. */
  html: string | null;
  /** Message-ID header. */
  messageId: string | null;
  /** Size of the raw message in bytes. */
  sizeBytes: number;
}

/** Where the local fake keeps what it received. Newest first on reading. */
export interface CapturedMailStore {
  add(mail: Omit<CapturedMail, 'id'>, raw: Buffer): CapturedMail;
  list(): CapturedMail[];
  get(id: string): CapturedMail | undefined;
}

const newestFirst = (a: CapturedMail, b: CapturedMail) =>
  b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id);

/** Messages in memory, lost at shutdown (tests). */
export class MemoryCapturedMailStore implements CapturedMailStore {
  private readonly mails: CapturedMail[] = [];

  add(mail: Omit<CapturedMail, 'id'>): CapturedMail {
    const stored = { ...mail, id: randomUUID() };
    this.mails.push(stored);
    return stored;
  }

  list(): CapturedMail[] {
    return [...this.mails].sort(newestFirst);
  }

  get(id: string): CapturedMail | undefined {
    return this.mails.find((mail) => mail.id === id);
  }
}

const idPattern = /^[0-9a-f-]{36}$/;

/**
 * Messages in a folder: `<id>.eml` (the raw message as received) beside `<id>.json` (the parsed fields),
 * so they survive a restart and can be opened in any mail program.
 */
export class DirectoryCapturedMailStore implements CapturedMailStore {
  constructor(private readonly directory: string) {
    mkdirSync(directory, { recursive: true });
  }

  add(mail: Omit<CapturedMail, 'id'>, raw: Buffer): CapturedMail {
    const stored = { ...mail, id: randomUUID() };
    writeFileSync(join(this.directory, `${stored.id}.eml`), raw);
    writeFileSync(join(this.directory, `${stored.id}.json`), `${JSON.stringify(stored, null, 2)}\n`);
    return stored;
  }

  list(): CapturedMail[] {
    return readdirSync(this.directory)
      .filter((name) => name.endsWith('.json'))
      .map((name) => this.read(name.slice(0, -'.json'.length)))
      .filter((mail): mail is CapturedMail => mail !== undefined)
      .sort(newestFirst);
  }

  get(id: string): CapturedMail | undefined {
    return idPattern.test(id) ? this.read(id) : undefined;
  }

  private read(id: string): CapturedMail | undefined {
    try {
      return JSON.parse(readFileSync(join(this.directory, `${id}.json`), 'utf8')) as CapturedMail;
    } catch {
      return undefined;
    }
  }
}
