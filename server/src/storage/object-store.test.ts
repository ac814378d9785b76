import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type LocalS3Server, localS3Credentials, startLocalS3Server } from './local-s3-server';
import { MemoryObjectStore } from './memory-object-store';
import type { ObjectStore } from './object-store';
import { S3ObjectStore } from './s3-object-store';

/** The contract every store keeps, run against the in-memory store and the S3 client over s3rver. */
function storeContract(name: string, open: () => ObjectStore) {
  describe(name, () => {
    it('gives back exactly the bytes and type it was given', async () => {
      const store = open();
      const body = randomBytes(1_500_000);
      await store.put('owners/a/items/b/c/original', body, 'image/png');
      const got = await store.get('owners/a/items/b/c/original');
      expect(got?.contentType).toBe('image/png');
      expect(got && Buffer.compare(got.body, body)).toBe(0);
    });

    it('replaces an object put again under the same key', async () => {
      const store = open();
      await store.put('k/replace', Buffer.from('first'), 'application/pdf');
      await store.put('k/replace', Buffer.from('second'), 'application/pdf');
      expect((await store.get('k/replace'))?.body.toString()).toBe('second');
    });

    it('answers undefined for a missing key and forgets a deleted one; deleting twice is fine', async () => {
      const store = open();
      expect(await store.get('k/never')).toBeUndefined();
      await store.put('k/gone', Buffer.from([1, 2, 3]), 'image/webp');
      await store.delete('k/gone');
      await store.delete('k/gone');
      expect(await store.get('k/gone')).toBeUndefined();
    });

    it('stores an empty object', async () => {
      const store = open();
      await store.put('k/empty', Buffer.alloc(0), 'image/jpeg');
      expect((await store.get('k/empty'))?.body.length).toBe(0);
    });
  });
}

storeContract('MemoryObjectStore', () => new MemoryObjectStore());

describe('S3ObjectStore over the local fake', () => {
  let dir: string;
  let fake: LocalS3Server;
  let store: S3ObjectStore;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'gramwatt-s3-'));
    fake = await startLocalS3Server({ directory: dir, bucket: 'gw-contract', port: 0 });
    store = new S3ObjectStore({
      endpoint: fake.endpoint,
      bucket: 'gw-contract',
      region: 'us-east-1',
      forcePathStyle: true,
      checksumsWhenRequired: true,
      ...localS3Credentials,
    });
  });

  afterAll(async () => {
    store.destroy();
    await fake.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('listens on 127.0.0.1 only', () => {
    expect(fake.endpoint).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  });

  storeContract('contract', () => store);

  it('keeps the bucket and its objects across a restart of the fake on the same folder', async () => {
    await store.put('k/kept', Buffer.from('still here'), 'application/pdf');
    await fake.close();
    fake = await startLocalS3Server({ directory: dir, bucket: 'gw-contract', port: 0 });
    store.destroy();
    store = new S3ObjectStore({
      endpoint: fake.endpoint,
      bucket: 'gw-contract',
      region: 'us-east-1',
      forcePathStyle: true,
      checksumsWhenRequired: true,
      ...localS3Credentials,
    });
    expect((await store.get('k/kept'))?.body.toString()).toBe('still here');
  });
});
