import { deflateSync } from 'node:zlib';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appUrl, browserMissing, launchBrowser, newContext, saveScreenshot, signIn } from './browser';

/** CRC-32 as PNG chunks need it (ISO/IEC 15948:2004 annex D; polynomial 0xEDB88320). */
function crc32(bytes: Uint8Array): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let bit = 0; bit < 8; bit += 1) crc = crc & 1 ? (crc >>> 1) ^ 0xedb88320 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}

function pngChunk(type: string, data: Buffer): Buffer {
  const typeAndData = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** A small valid PNG (truecolour, 8 bits) with a diagonal two-tone pattern, built by hand so no fixture file is needed. */
function tinyPng(size = 24): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header.set([8, 2, 0, 0, 0], 8); // bit depth 8, colour type 2 (RGB), deflate, no filter method, no interlace
  const rows: number[] = [];
  for (let y = 0; y < size; y += 1) {
    rows.push(0); // filter type: none
    for (let x = 0; x < size; x += 1) rows.push(...(x > y ? [0x44, 0x6a, 0x35] : [0xdd, 0xe4, 0xe2]));
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', header),
    pngChunk('IDAT', deflateSync(Buffer.from(rows))),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Two invented banks in the locker's own CSV columns (see the README's locker CSV section). */
const banksCsv = [
  'kind,name,count_owned,mass_g,capacity_mah,input_max_w,input_connector,output_ports',
  'bank,Pebble bank 10k,1,185,10000,18,usb-c,usb-a:5:2.4|usb-c:5:3:pd=9/12',
  'bank,Slab bank 20k,2,350,20000,30,usb-c,usb-c:5:3:pd=9/12/15',
  '',
].join('\n');

const password = 'a-long-test-passphrase';

async function signUp(page: Page, email: string) {
  await page.goto(appUrl('/sign-up'));
  await page.getByLabel('Name').fill('Locker Tester');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect.poll(() => new URL(page.url()).pathname).toBe('/locker');
}

describe.skipIf(browserMissing)('the locker in the built app', () => {
  let browser: Browser;
  const email = `locker-${Date.now()}@example.test`;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('adds a panel with the form, imports banks from CSV, shows both and takes a photo', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await signUp(page, email);

    // A fresh account starts empty.
    await expect
      .poll(() => page.getByRole('region', { name: 'Nothing in your locker yet' }).isVisible(), { timeout: 10_000 })
      .toBe(true);
    await saveScreenshot(page, 'locker-empty');

    await page.getByRole('button', { name: 'Add an item by hand' }).click();
    const addPanel = page.getByRole('dialog', { name: 'Add gear' });
    await addPanel.getByRole('textbox', { name: /^Name/ }).fill('Ridge fold-out 10 W');
    await addPanel.getByRole('textbox', { name: /^Rated power/ }).fill('10');
    await addPanel.getByRole('textbox', { name: /^USB port maximum current/ }).fill('2');
    await addPanel.getByRole('textbox', { name: /^Mass/ }).fill('310');
    await saveScreenshot(page, 'locker-add-panel-form');
    await addPanel.getByRole('button', { name: 'Add to locker' }).click();

    // The panel stays open on the saved item: add its photo there.
    const editPanel = page.getByRole('dialog', { name: 'Edit Ridge fold-out 10 W' });
    // The dialog element itself has no box (its panel is fixed-position): wait for its heading.
    await expect
      .poll(() => editPanel.getByRole('heading', { name: 'Edit Ridge fold-out 10 W' }).isVisible(), { timeout: 10_000 })
      .toBe(true);
    await editPanel
      .getByLabel('Add a photo')
      .setInputFiles({ name: 'ridge.png', mimeType: 'image/png', buffer: tinyPng() });
    await expect
      .poll(() => editPanel.getByRole('link', { name: 'ridge.png' }).isVisible(), { timeout: 15_000 })
      .toBe(true);
    await editPanel.getByRole('button', { name: 'Cancel' }).click();

    await page.getByRole('button', { name: 'Import CSV' }).click();
    const importPanel = page.getByRole('dialog', { name: 'Import gear from a CSV file' });
    await importPanel
      .getByLabel('CSV file')
      .setInputFiles({ name: 'banks.csv', mimeType: 'text/csv', buffer: Buffer.from(banksCsv) });
    await importPanel.getByRole('button', { name: 'Check the file' }).click();
    await expect
      .poll(() => importPanel.getByRole('button', { name: 'Import 2 items' }).isVisible(), { timeout: 10_000 })
      .toBe(true);
    await saveScreenshot(page, 'locker-import-preview');
    await importPanel.getByRole('button', { name: 'Import 2 items' }).click();
    await expect.poll(() => page.getByText('Imported 2 items.').isVisible(), { timeout: 10_000 }).toBe(true);

    const table = page.getByRole('table');
    for (const name of ['Ridge fold-out 10 W', 'Pebble bank 10k', 'Slab bank 20k'])
      expect(await table.getByRole('rowheader', { name: new RegExp(name) }).isVisible()).toBe(true);
    // 310 + 185 + 350 × 2 = 1,195 g of power gear.
    expect(await page.getByLabel('Locker total: 1,195 g').isVisible()).toBe(true);

    // The photo's thumbnail is served by the owner-checked route and decodes as an image.
    const thumb = table.getByRole('rowheader', { name: /Ridge fold-out/ }).locator('img');
    await expect
      .poll(() => thumb.evaluate((img) => (img as HTMLImageElement).complete && (img as HTMLImageElement).naturalWidth))
      .toBeGreaterThan(0);
    await saveScreenshot(page, 'locker-desktop');
    await context.close();
  });

  it('reads well at phone width', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    await signIn(page, email, password);
    await expect.poll(() => page.getByRole('table').isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => page.getByRole('rowheader', { name: /Slab bank 20k/ }).isVisible()).toBe(true);
    // Nothing pushes the page sideways: only the table's own region scrolls.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await saveScreenshot(page, 'locker-phone');
    await context.close();
  });
});
