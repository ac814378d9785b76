import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// The demo accounts' source module, read directly (as the sign-in test does).
import { demoAccounts, demoPassword } from '../seed/src/demo-accounts';
import { appUrl, browserMissing, launchBrowser, newContext, saveScreenshot, signIn } from './browser';

/** An invented three-day walk heading roughly north-east (no real place). */
const goodGpx = `<?xml version="1.0"?>
<gpx version="1.1" creator="gramwatt-e2e" xmlns="http://www.topografix.com/GPX/1/1">
  <trk><name>Invented Fellside traverse</name><trkseg>
    <trkpt lat="46.2000" lon="8.3000"></trkpt>
    <trkpt lat="46.2300" lon="8.3400"></trkpt>
    <trkpt lat="46.2600" lon="8.3800"></trkpt>
    <trkpt lat="46.2900" lon="8.4200"></trkpt>
  </trkseg></trk>
</gpx>`;

const dir = mkdtempSync(join(tmpdir(), 'gramwatt-trips-e2e-'));
const gpxFile = (name: string, text: string) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

const member = demoAccounts.find((a) => a.role === 'member')!;

async function createTrip(page: Page, name: string) {
  await page.goto(appUrl('/trips/new'));
  await page.getByLabel(/^Name/).fill(name);
  await page.getByLabel(/^Start date/).fill('2027-08-10');
  await page.getByLabel(/^Nights/).fill('2');
  await page.getByLabel(/GPX route or track/).setInputFiles(gpxFile('good.gpx', goodGpx));
  await page.getByRole('table', { name: /Walking days/ }).waitFor();
  await saveScreenshot(page, 'trips-form-gpx');
  await page.getByRole('button', { name: 'Create trip' }).click();
  await expect.poll(() => new URL(page.url()).pathname).toMatch(/^\/trips\/[0-9a-f-]{36}$/);
}

describe.skipIf(browserMissing)('trips in the built app', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('creates a trip from a GPX file, lists it, adds a device, overrides its use and refuses a bad GPX', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, member.email, demoPassword);
    await expect.poll(() => new URL(page.url()).pathname).not.toBe('/sign-in');
    const name = `Invented Fellside ${Date.now()}`;
    await createTrip(page, name);

    // The overview shows the start point the GPX gave.
    await page.getByText('46.2000° N, 8.3000° E', { exact: false }).waitFor();
    const tripPath = new URL(page.url()).pathname;

    await page.goto(appUrl('/trips'));
    await page.getByRole('link', { name }).waitFor();
    await saveScreenshot(page, 'trips-list');

    await page.goto(appUrl(tripPath));
    const select = page.getByLabel('Add a device from your locker');
    await expect.poll(async () => (await select.locator('option').count()) > 1).toBe(true);
    await select.selectOption({ index: 1 });
    await page.getByRole('button', { name: 'Add device' }).click();
    const firstField = page.locator('#trip-devices-heading ~ ul input').first();
    await firstField.waitFor();
    await firstField.fill(String(Number(await firstField.inputValue()) + 1));
    await page.getByRole('button', { name: 'Save for this trip' }).first().click();
    await page
      .getByText(/Changed for this trip \(locker default/)
      .first()
      .waitFor();
    await page.getByRole('button', { name: 'Reset to locker default' }).first().waitFor();
    await saveScreenshot(page, 'trips-detail');

    // A bad GPX on the edit form: a message by the upload, and the trip keeps its place.
    await page.goto(appUrl(`${tripPath}/edit`));
    await page.getByLabel(/GPX route or track/).setInputFiles(gpxFile('bad.gpx', 'not a gpx file at all'));
    await page.getByRole('alert').filter({ hasText: 'The trip is unchanged.' }).waitFor();
    expect(await page.getByLabel(/^Latitude/).inputValue()).toBe('46.2');
    await saveScreenshot(page, 'trips-bad-gpx');
    await page.goto(appUrl(tripPath));
    await page.getByText('46.2000° N, 8.3000° E', { exact: false }).waitFor();
  });

  it('reads well at phone width', async () => {
    const page = await (await newContext(browser, 'phone')).newPage();
    await signIn(page, member.email, demoPassword);
    await expect.poll(() => new URL(page.url()).pathname).not.toBe('/sign-in');
    await createTrip(page, `Invented Tarnside ${Date.now()}`);
    await page.getByRole('tab', { name: 'Plan' }).waitFor();
    const scrollsSideways = await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);
    expect(scrollsSideways).toBe(false);
    await saveScreenshot(page, 'trips-detail-phone');
    await page.goto(appUrl('/trips'));
    await saveScreenshot(page, 'trips-list-phone');
  });
});
