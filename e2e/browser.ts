import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { chromiumArgs } from './chromium';

/** Screenshots kept as test artefacts (ignored by git). */
export const artefactsDir = resolve(__dirname, 'artefacts');

/** True when the global setup found no Chromium (outside CI): each browser suite skips itself. */
export const browserMissing = inject('chromiumPath') === '';

/** The running app's base URL, from the global setup. */
export function appUrl(path = '/'): string {
  return `${inject('baseUrl')}${path}`;
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: inject('chromiumPath'), args: chromiumArgs });
}

/** A fresh context (own cookies) at a desktop or a phone viewport. */
export async function newContext(browser: Browser, viewport: 'desktop' | 'phone' = 'desktop'): Promise<BrowserContext> {
  const size = viewport === 'phone' ? { width: 390, height: 844 } : { width: 1280, height: 860 };
  return browser.newContext({ viewport: size, baseURL: inject('baseUrl') });
}

export async function saveScreenshot(page: Page, name: string): Promise<void> {
  mkdirSync(artefactsDir, { recursive: true });
  await page.screenshot({ path: join(artefactsDir, `${name}.png`), fullPage: true });
}

/** Signs in through the real form, as a hiker would. */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(appUrl('/sign-in'));
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
}
