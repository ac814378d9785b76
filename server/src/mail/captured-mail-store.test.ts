import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { DirectoryCapturedMailStore } from './captured-mail-store';

const mail = (subject: string, receivedAt: string) => ({
  receivedAt,
  envelopeFrom: 'gramwatt@outbox.invalid',
  envelopeTo: ['wren@example.test'],
  fromHeader: 'Gramwatt <gramwatt@outbox.invalid>',
  toHeader: 'wren@example.test',
  subject,
  text: 'hello',
  html: null,
  messageId: '<a@b>',
  sizeBytes: 5,
});

describe('DirectoryCapturedMailStore', () => {
  let dir: string | undefined;
  afterEach(() => dir && rmSync(dir, { recursive: true, force: true }));

  it('keeps messages across a reopen of the folder, newest first, with the raw message beside', () => {
    dir = mkdtempSync(join(tmpdir(), 'gramwatt-mail-'));
    const store = new DirectoryCapturedMailStore(dir);
    const older = store.add(mail('older', '2026-06-01T08:00:00.000Z'), Buffer.from('raw older'));
    store.add(mail('newer', '2026-06-01T09:00:00.000Z'), Buffer.from('raw newer'));
    const reopened = new DirectoryCapturedMailStore(dir);
    expect(reopened.list().map((m) => m.subject)).toEqual(['newer', 'older']);
    expect(reopened.get(older.id)?.subject).toBe('older');
    expect(readFileSync(join(dir, `${older.id}.eml`), 'utf8')).toBe('raw older');
    expect(reopened.get('../../etc/passwd')).toBeUndefined();
  });
});
