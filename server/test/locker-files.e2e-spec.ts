import { mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { type ItemSpec, maxLockerFileBytes, maxLockerFilesPerItem } from '@gramwatt/shared';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { type AccountRow, accounts, lockerItemFiles, lockerItems, storedObjectDeletions } from '../src/database/schema';
import { LockerFilesService } from '../src/locker-files/locker-files.service';
import { MemoryObjectStore } from '../src/storage/memory-object-store';
import { OBJECT_STORE } from '../src/storage/object-store';
import { type TestApp, insertAccount, signInToken, startTestApp } from './support/test-app';

const panelSpec: ItemSpec = {
  kind: 'panel',
  panelType: 'usb',
  ratedW: 10,
  portVolts: 5,
  portMaxA: 2,
  dropoutIrradianceWm2: 0,
  tempCoeffPctPerC: -0.4,
  outputPort: { connector: 'usb-a', captiveCable: false },
  massG: 310,
};

async function insertItem(t: TestApp, owner: AccountRow, name = 'Test panel'): Promise<string> {
  const [row] = await t.db
    .insert(lockerItems)
    .values({ ownerId: owner.id, kind: 'panel', name, spec: panelSpec, massG: 310 })
    .returning();
  if (!row) throw new Error('no item');
  return row.id;
}

/** A photo of noise: it does not compress, so the bytes are a real test of the round trip. */
async function noisePhoto(width: number, height: number, format: 'png' | 'jpeg' | 'webp'): Promise<Buffer> {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } })
    .toFormat(format)
    .toBuffer();
}

// Signatures from the format definitions: ELF e_ident (TIS ELF spec v1.2), the PE "MZ" DOS stub
// (Microsoft PE Format specification), the PDF header (ISO 32000-1:2008, 7.5.2).
const elfBytes = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), randomBytes(4096)]);
const peBytes = Buffer.concat([Buffer.from('MZ', 'ascii'), Buffer.alloc(4094, 0x90)]);
const pdfBytes = Buffer.from(
  '%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

describe('locker files (in-memory store)', () => {
  let t: TestApp;
  let alice: AccountRow;
  let bob: AccountRow;
  let aliceToken: string;
  let bobToken: string;
  let store: MemoryObjectStore;

  beforeAll(async () => {
    t = await startTestApp();
    alice = await insertAccount(t.db);
    bob = await insertAccount(t.db);
    aliceToken = await signInToken(t, alice.email);
    bobToken = await signInToken(t, bob.email);
    const provided = t.app.get(OBJECT_STORE);
    if (!(provided instanceof MemoryObjectStore)) throw new Error('NODE_ENV=test should default to the memory store');
    store = provided;
  });

  afterAll(async () => {
    await t.close();
  });

  const upload = (
    token: string,
    itemId: string,
    bytes: Buffer,
    filename: string,
    purpose: string | undefined,
    contentType = 'image/jpeg',
  ) => {
    const req = t.http().post(`/api/locker/items/${itemId}/files`).set(bearer(token));
    if (purpose !== undefined) req.field('purpose', purpose);
    return req.attach('file', bytes, { filename, contentType });
  };

  it('stores a photo, lists it and gives it back byte for byte with a thumbnail', async () => {
    const itemId = await insertItem(t, alice);
    const photo = await noisePhoto(640, 480, 'jpeg');
    const created = await upload(aliceToken, itemId, photo, 'fold-out panel.jpg', 'photo').expect(201);
    const file = created.body.file;
    expect(file).toMatchObject({
      purpose: 'photo',
      contentType: 'image/jpeg',
      sizeBytes: photo.length,
      fileName: 'fold-out panel.jpg',
    });
    expect(file.url).toBe(`/api/locker/items/${itemId}/files/${file.id}`);
    expect(file.thumbUrl).toBe(`${file.url}/thumb`);

    const listed = await t.http().get(`/api/locker/items/${itemId}/files`).set(bearer(aliceToken)).expect(200);
    expect(listed.body.files).toEqual([file]);

    const got = await t.http().get(file.url).set(bearer(aliceToken)).responseType('blob').expect(200);
    expect(Buffer.compare(got.body as Buffer, photo)).toBe(0);
    expect(got.headers['content-type']).toBe('image/jpeg');
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect(got.headers['content-disposition']).toBe(
      `inline; filename="fold-out panel.jpg"; filename*=UTF-8''fold-out%20panel.jpg`,
    );
    expect(Number(got.headers['content-length'])).toBe(photo.length);

    const thumb = await t.http().get(file.thumbUrl).set(bearer(aliceToken)).responseType('blob').expect(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['x-content-type-options']).toBe('nosniff');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 320, 240]);
  });

  it('names the type from the bytes: a PNG called .jpg is stored as PNG with a .png name', async () => {
    const itemId = await insertItem(t, alice);
    const png = await noisePhoto(50, 40, 'png');
    const created = await upload(aliceToken, itemId, png, 'panel.jpg', 'photo', 'image/jpeg').expect(201);
    expect(created.body.file).toMatchObject({ contentType: 'image/png', fileName: 'panel.png' });
  });

  it('stores a PDF spec sheet as an attachment without a thumbnail', async () => {
    const itemId = await insertItem(t, alice);
    const created = await upload(aliceToken, itemId, pdfBytes, 'sheet.pdf', 'spec-sheet', 'application/pdf').expect(
      201,
    );
    expect(created.body.file).toMatchObject({ purpose: 'spec-sheet', contentType: 'application/pdf', thumbUrl: null });
    const got = await t.http().get(created.body.file.url).set(bearer(aliceToken)).responseType('blob').expect(200);
    expect(Buffer.compare(got.body as Buffer, pdfBytes)).toBe(0);
    expect(got.headers['content-type']).toBe('application/pdf');
    expect(got.headers['content-disposition']).toMatch(/^attachment; filename="sheet.pdf"/);
    const thumb = await t.http().get(`${created.body.file.url}/thumb`).set(bearer(aliceToken)).expect(404);
    expect(thumb.body.message).toMatch(/only photos/);
  });

  describe('refuses what it must not store, writing nothing', () => {
    let itemId: string;
    let keysBefore: string[];

    beforeAll(async () => {
      itemId = await insertItem(t, alice, 'Refusals');
      keysBefore = store.keys();
    });

    const expectNothingStored = async () => {
      expect(store.keys()).toEqual(keysBefore);
      const rows = await t.db.select().from(lockerItemFiles);
      expect(rows.filter((r) => r.itemId === itemId)).toEqual([]);
    };

    it('a text file called .jpg: 415 naming the file', async () => {
      const response = await upload(
        aliceToken,
        itemId,
        Buffer.from('just some notes\n'.repeat(40)),
        'photo.jpg',
        'photo',
      ).expect(415);
      expect(response.body).toMatchObject({ statusCode: 415, errors: [{ path: 'file' }] });
      expect(response.body.message).toMatch(/not a JPEG, PNG or WebP photo or a PDF spec sheet/);
      await expectNothingStored();
    });

    it('a renamed Linux program (ELF) declared as a JPEG: 415 naming what it is', async () => {
      const response = await upload(aliceToken, itemId, elfBytes, 'summit.jpg', 'photo', 'image/jpeg').expect(415);
      expect(response.body.message).toMatch(/ELF executable/);
      expect(response.body.errors).toEqual([{ path: 'file', message: response.body.message }]);
      await expectNothingStored();
    });

    it('a renamed Windows program (MZ) declared as a PDF: 415', async () => {
      const response = await upload(aliceToken, itemId, peBytes, 'manual.pdf', 'spec-sheet', 'application/pdf').expect(
        415,
      );
      expect(response.body.message).toMatch(/Windows program/);
      await expectNothingStored();
    });

    it('a PNG sent as a spec sheet: 415 naming `purpose`', async () => {
      const png = await noisePhoto(20, 20, 'png');
      const response = await upload(aliceToken, itemId, png, 'sheet.pdf', 'spec-sheet', 'application/pdf').expect(415);
      expect(response.body.errors).toEqual([{ path: 'purpose', message: response.body.message }]);
      expect(response.body.message).toMatch(/purpose spec-sheet takes a PDF/);
      await expectNothingStored();
    });

    it('a file over 5 MB: 413 naming the limit', async () => {
      const tooBig = Buffer.concat([await noisePhoto(16, 16, 'png'), Buffer.alloc(maxLockerFileBytes)]);
      const response = await upload(aliceToken, itemId, tooBig, 'huge.png', 'photo', 'image/png').expect(413);
      expect(response.body.message).toMatch(/larger than 5 MB/);
      expect(response.body.errors).toEqual([{ path: 'file', message: response.body.message }]);
      await expectNothingStored();
    });

    it('a request without a file, a missing or unknown purpose, a second file: 400 naming the field', async () => {
      const noFile = await t
        .http()
        .post(`/api/locker/items/${itemId}/files`)
        .set(bearer(aliceToken))
        .field('purpose', 'photo')
        .expect(400);
      expect(noFile.body.errors).toEqual([{ path: 'file', message: 'Send one file, in the multipart field `file`' }]);
      const png = await noisePhoto(8, 8, 'png');
      const noPurpose = await upload(aliceToken, itemId, png, 'a.png', undefined).expect(400);
      expect(noPurpose.body.errors.map((e: { path: string }) => e.path)).toEqual(['purpose']);
      const badPurpose = await upload(aliceToken, itemId, png, 'a.png', 'selfie').expect(400);
      expect(badPurpose.body.errors).toEqual([{ path: 'purpose', message: 'Purpose must be photo or spec-sheet' }]);
      const twoFiles = await upload(aliceToken, itemId, png, 'a.png', 'photo').attach('file', png, 'b.png').expect(400);
      expect(twoFiles.body.errors[0].path).toBe('file');
      const wrongField = await t
        .http()
        .post(`/api/locker/items/${itemId}/files`)
        .set(bearer(aliceToken))
        .field('purpose', 'photo')
        .attach('photo', png, 'a.png')
        .expect(400);
      expect(wrongField.body.message).toBe('Send one file, in the multipart field `file`');
      await expectNothingStored();
    });

    it('bytes that start like a PNG but do not decode: 415', async () => {
      const png = await noisePhoto(64, 64, 'png');
      const cut = png.subarray(0, 60);
      const response = await upload(aliceToken, itemId, cut, 'cut.png', 'photo', 'image/png').expect(415);
      expect(response.body.message).toMatch(/could not be read/);
      await expectNothingStored();
    });
  });

  it('keeps at most the per-item number of files (409 for one more)', async () => {
    const itemId = await insertItem(t, alice, 'Full');
    const png = await noisePhoto(8, 8, 'png');
    for (let i = 0; i < maxLockerFilesPerItem; i += 1)
      await upload(aliceToken, itemId, png, `p${i}.png`, 'photo').expect(201);
    const response = await upload(aliceToken, itemId, png, 'one-more.png', 'photo').expect(409);
    expect(response.body.message).toMatch(/at most 10 files/);
  });

  it("answers 404 to another member for every route of an item's files, and leaves them untouched", async () => {
    const itemId = await insertItem(t, alice, "Alice's panel");
    const photo = await noisePhoto(32, 32, 'webp');
    const { body } = await upload(aliceToken, itemId, photo, 'mine.webp', 'photo').expect(201);
    const url: string = body.file.url;

    await t.http().get(`/api/locker/items/${itemId}/files`).set(bearer(bobToken)).expect(404);
    await t.http().get(url).set(bearer(bobToken)).expect(404);
    await t.http().get(`${url}/thumb`).set(bearer(bobToken)).expect(404);
    const deleted = await t.http().delete(url).set(bearer(bobToken)).expect(404);
    expect(deleted.body.message).toBe('No such file on this item');
    const uploaded = await upload(bobToken, itemId, photo, 'theirs.webp', 'photo').expect(404);
    expect(uploaded.body.message).toBe('No such item in your locker');
    // Bob's own item with Alice's file id: still 404.
    const bobItem = await insertItem(t, bob);
    await t.http().get(`/api/locker/items/${bobItem}/files/${body.file.id}`).set(bearer(bobToken)).expect(404);
    await t.http().get(url).expect(401);

    const still = await t.http().get(url).set(bearer(aliceToken)).responseType('blob').expect(200);
    expect(Buffer.compare(still.body as Buffer, photo)).toBe(0);
  });

  it('deletes a file with its thumbnail from the store', async () => {
    const itemId = await insertItem(t, alice, 'Short-lived');
    const before = store.keys();
    const { body } = await upload(aliceToken, itemId, await noisePhoto(16, 16, 'jpeg'), 'x.jpg', 'photo').expect(201);
    expect(store.keys()).toHaveLength(before.length + 2);
    await t.http().delete(body.file.url).set(bearer(aliceToken)).expect(204);
    expect(store.keys()).toEqual(before);
    await t.http().get(body.file.url).set(bearer(aliceToken)).expect(404);
    await t.http().delete(body.file.url).set(bearer(aliceToken)).expect(404);
  });

  it('removes the stored objects of files whose item or account was deleted (cascades queue them)', async () => {
    const before = store.keys();
    const files = t.app.get(LockerFilesService);
    const itemId = await insertItem(t, alice, 'Goes with its files');
    await upload(aliceToken, itemId, await noisePhoto(16, 16, 'png'), 'x.png', 'photo').expect(201);
    await upload(aliceToken, itemId, pdfBytes, 'y.pdf', 'spec-sheet').expect(201);
    expect(store.keys()).toHaveLength(before.length + 3);
    // Deleted the way the locker deletes an item: the file rows go by cascade.
    await t.db.delete(lockerItems).where(eq(lockerItems.id, itemId));
    expect(await files.drainDeletedObjects()).toBe(3);
    expect(store.keys()).toEqual(before);
    expect(await t.db.select().from(storedObjectDeletions)).toEqual([]);

    const carol = await insertAccount(t.db);
    const carolToken = await signInToken(t, carol.email);
    const carolItem = await insertItem(t, carol);
    await upload(carolToken, carolItem, await noisePhoto(16, 16, 'webp'), 'z.webp', 'photo').expect(201);
    await t.db.delete(accounts).where(eq(accounts.id, carol.id));
    expect(await files.drainDeletedObjects()).toBe(2);
    expect(store.keys()).toEqual(before);
  });

  it('puts a key back in the queue when the store fails to delete it, and removes it on a later drain', async () => {
    const files = t.app.get(LockerFilesService);
    const itemId = await insertItem(t, alice, 'Stubborn');
    const before = store.keys();
    await upload(aliceToken, itemId, pdfBytes, 'y.pdf', 'spec-sheet').expect(201);
    const realDelete = store.delete.bind(store);
    store.delete = async () => {
      throw new Error('store is down');
    };
    try {
      await t.db.delete(lockerItems).where(eq(lockerItems.id, itemId));
      expect(await files.drainDeletedObjects()).toBe(0);
      expect(await t.db.select().from(storedObjectDeletions)).toHaveLength(1);
    } finally {
      store.delete = realDelete;
    }
    expect(await files.drainDeletedObjects()).toBe(1);
    expect(store.keys()).toEqual(before);
  });

  it('lists many items’ files at once for the locker, only the owner’s', async () => {
    const a1 = await insertItem(t, alice, 'A1');
    const a2 = await insertItem(t, alice, 'A2');
    await upload(aliceToken, a1, pdfBytes, 'a.pdf', 'spec-sheet').expect(201);
    t.clock.advanceS(1);
    await upload(aliceToken, a1, await noisePhoto(8, 8, 'png'), 'b.png', 'photo').expect(201);
    const files = t.app.get(LockerFilesService);
    const mine = await files.listForItems(alice.id, [a1, a2]);
    expect(mine.get(a1)?.map((f) => f.fileName)).toEqual(['a.pdf', 'b.png']);
    expect(mine.has(a2)).toBe(false);
    expect((await files.listForItems(bob.id, [a1])).size).toBe(0);
  });
});

describe('locker files through the local fake S3 (s3rver) started with the app', () => {
  let t: TestApp;
  let dataDir: string;
  let token: string;
  let owner: AccountRow;

  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'gramwatt-files-'));
    t = await startTestApp({ env: { STORAGE_DRIVER: 's3', DATA_DIR: dataDir, S3_BUCKET: 'gw-e2e' } });
    owner = await insertAccount(t.db);
    token = await signInToken(t, owner.email);
  });

  afterAll(async () => {
    await t.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('round-trips a 2 MB photo byte for byte, keeps the bytes in DATA_DIR/s3, and deletes them', async () => {
    const itemId = await insertItem(t, owner);
    const photo = await noisePhoto(1000, 700, 'png');
    expect(photo.length).toBeGreaterThan(2_000_000);
    expect(photo.length).toBeLessThan(maxLockerFileBytes);
    const created = await t
      .http()
      .post(`/api/locker/items/${itemId}/files`)
      .set(bearer(token))
      .field('purpose', 'photo')
      .attach('file', photo, { filename: 'ridge.png', contentType: 'image/png' })
      .expect(201);
    const got = await t.http().get(created.body.file.url).set(bearer(token)).responseType('blob').expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(got.body as Buffer, photo)).toBe(0);
    const thumb = await t.http().get(created.body.file.thumbUrl).set(bearer(token)).responseType('blob').expect(200);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320);

    const bucketDir = join(dataDir, 's3', 'gw-e2e');
    expect(statSync(bucketDir).isDirectory()).toBe(true);
    expect(sizesUnder(bucketDir)).toContain(photo.length);

    await t.http().delete(created.body.file.url).set(bearer(token)).expect(204);
    expect(sizesUnder(bucketDir)).not.toContain(photo.length);
  });
});

function sizesUnder(dir: string): number[] {
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile())
    .map((entry) => statSync(join(entry.parentPath, entry.name)).size);
}
