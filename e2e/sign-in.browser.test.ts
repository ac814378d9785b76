// The demo accounts' source module, read directly: the built seed package would load shared's sources natively.
import { demoAccounts, demoPassword } from '../seed/src/demo-accounts';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appUrl, browserMissing, launchBrowser, newContext, saveScreenshot, signIn } from './browser';

/** Sign-in hashes a password (argon2id): on a busy CI machine a page may take a few seconds to change. */
const patient = { timeout: 15_000, interval: 250 };

describe.skipIf(browserMissing)('signing in to the built app', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  const member = demoAccounts.find((a) => a.role === 'member')!;
  const admin = demoAccounts.find((a) => a.role === 'admin')!;

  it('sends a visitor who is not signed in to the sign-in page', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await page.goto(appUrl('/locker'));
    await expect.poll(() => new URL(page.url()).pathname, patient).toBe('/sign-in');
    await saveScreenshot(page, 'sign-in');
    await context.close();
  });

  it('a demo member signs in and sees Locker and Trips, but not Admin', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await signIn(page, member.email, demoPassword);
    const nav = page.getByRole('navigation', { name: /main/i });
    await expect.poll(() => nav.getByRole('link', { name: 'Locker' }).isVisible(), patient).toBe(true);
    expect(await nav.getByRole('link', { name: 'Trips' }).isVisible()).toBe(true);
    expect(await nav.getByRole('link', { name: 'Admin' }).count()).toBe(0);
    await saveScreenshot(page, 'layout-member');
    await context.close();
  });

  it('a wrong password is refused with a plain message', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    await signIn(page, member.email, 'not-the-password-at-all');
    await expect.poll(() => page.getByText(/e-mail or password is wrong/i).isVisible(), patient).toBe(true);
    await context.close();
  });

  it('an admin sees the Admin screen with the accounts, also at phone width', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    await signIn(page, admin.email, demoPassword);
    await expect.poll(() => new URL(page.url()).pathname, patient).not.toBe('/sign-in');
    await page.goto(appUrl('/admin/accounts'));
    await expect.poll(() => page.getByText(member.email).first().isVisible(), patient).toBe(true);
    await saveScreenshot(page, 'admin-phone');
    await context.close();
  });
});
