import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// The demo scenario's source modules, read directly (as the sign-in test does).
import { demoAccounts, demoPassword } from '../seed/src/demo-accounts';
import { demoTrips } from '../seed/src/demo-trips';
import { appUrl, browserMissing, launchBrowser, newContext, saveScreenshot, signIn } from './browser';

/** The demo trip with a radio: its leader, name and the radio the evening net uses. */
const radioTrip = demoTrips.find((t) => t.devices.some((d) => d.itemName.includes('radio')))!;
const leader = demoAccounts.find((a) => a.email === radioTrip.leaderEmail)!;
const radioName = radioTrip.devices.find((d) => d.itemName.includes('radio'))!.itemName;
/** A solve waits for the planner's whole time budget at worst; the browser waits a little longer. */
const solveTimeoutMs = 120_000;

interface SolvedPlan {
  headline: string;
  massG: number | null;
  gramPrices: { requirement: string; kind: string; extraG: number | null; text: string }[];
}

/** The demo trip where only the 12 V station keeps the radio going (its notes say so). */
const stationTrip = demoTrips.find((t) => t.trip.name.includes('radio weekend'))!;

async function openTrip(page: Page, tripName = radioTrip.trip.name): Promise<string> {
  await page.goto(appUrl('/trips'));
  await page.getByRole('link', { name: tripName }).click();
  await page.getByRole('tab', { name: 'Plan' }).waitFor();
  return new URL(page.url()).pathname;
}

/** Clicks the solve button and waits for the answer on screen; returns the plan and the time it took. */
async function solve(page: Page): Promise<{ plan: SolvedPlan; elapsedMs: number }> {
  const button = page.getByRole('button', { name: /^Find the lightest kit/ });
  const answered = page.waitForResponse(
    (r) => r.request().method() === 'POST' && /\/api\/trips\/[^/]+\/plans$/.test(new URL(r.url()).pathname),
    { timeout: solveTimeoutMs },
  );
  const startMs = Date.now();
  await button.click();
  const response = await answered;
  expect(response.status()).toBe(201);
  const { plan } = (await response.json()) as {
    plan: {
      result: {
        headline: string;
        kit: { massG: number } | null;
        gramPrices: SolvedPlan['gramPrices'];
      };
    };
  };
  await page.getByRole('heading', { level: 2, name: plan.result.headline }).waitFor({ timeout: solveTimeoutMs });
  const elapsedMs = Date.now() - startMs;
  return {
    elapsedMs,
    plan: {
      headline: plan.result.headline,
      massG: plan.result.kit?.massG ?? null,
      gramPrices: plan.result.gramPrices,
    },
  };
}

const scrollsSideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);

describe.skipIf(browserMissing)('the plan in the built app', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it(
    'solves the demo trip, prices more transmit time, tries a kit without its panel, applies a swap and packs it',
    { timeout: 600_000 },
    async () => {
      const page = await (await newContext(browser)).newPage();
      await signIn(page, leader.email, demoPassword);
      await expect.poll(() => new URL(page.url()).pathname).not.toBe('/sign-in');
      await openTrip(page);

      // Solve: the verdict as a sentence and the kit with its grams.
      const first = await solve(page);
      console.info(`solve → verdict on screen: ${first.elapsedMs} ms`);
      expect(first.plan.massG).not.toBeNull();
      const kitTable = page.getByRole('table', { name: 'The kit' });
      await kitTable.waitFor();
      expect(await kitTable.locator('tfoot').innerText()).toContain(`${first.plan.massG!.toLocaleString('en-GB')} g`);
      await page.getByRole('list', { name: 'Day by day' }).waitFor();
      await page.getByRole('figure', { name: 'Stored energy through the trip' }).locator('svg').first().waitFor();
      await saveScreenshot(page, 'plan');

      // Ten more transmit minutes a day for the radio on this trip, then solve again: the plan's gram price for
      // exactly that change says what to expect, and the new kit must agree with it.
      const price = first.plan.gramPrices.find((g) => g.requirement === 'transmit-minutes');
      expect(price).toBeDefined();
      await page.getByText(price!.text).waitFor();
      const radio = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: radioName }) });
      const transmit = radio.getByRole('textbox', { name: /^Transmit time/ });
      const minutes = Number(await transmit.inputValue());
      await transmit.fill(String(minutes + 10));
      await radio.getByRole('button', { name: 'Save for this trip' }).click();
      await radio.getByText('Saved for this trip.').waitFor();
      await page.getByText('The trip or its gear changed after this plan was made').waitFor();
      const second = await solve(page);
      console.info(`second solve → verdict on screen: ${second.elapsedMs} ms`);
      console.info(
        `kit ${first.plan.massG} g → ${second.plan.massG} g with ${minutes} → ${minutes + 10} transmit min/day; the plan said: ${price!.text}`,
      );
      if (price!.kind === 'grams') expect(second.plan.massG!).toBeGreaterThan(first.plan.massG!);
      else if (price!.kind === 'free') expect(second.plan.massG).toBe(first.plan.massG);
      else expect(second.plan.massG).toBeNull();
      await saveScreenshot(page, 'plan-more-transmit');

      // Try a kit: the chosen kit without its panels runs dry.
      await page.getByRole('tab', { name: 'Try a kit' }).click();
      const collect = page.getByRole('group', { name: 'Collect' });
      await collect.waitFor();
      const counts = collect.getByRole('spinbutton');
      for (let i = 0; i < (await counts.count()); i++) {
        const count = counts.nth(i);
        if (Number(await count.inputValue()) > 0) await count.fill('0');
      }
      await page.getByText(/^Runs dry on day \d+/).waitFor({ timeout: solveTimeoutMs });
      await page.getByRole('list', { name: 'Day by day' }).getByText(/: dry/).first().waitFor({ state: 'attached' });
      await saveScreenshot(page, 'plan-try-kit');

      // A swap from the plan becomes the trip's chosen kit.
      await page.getByRole('tab', { name: 'Plan' }).click();
      const swaps = page.getByRole('region', { name: 'Swaps' });
      const swap = swaps.getByRole('listitem').first();
      await swap.getByRole('button', { name: /^Use this kit/ }).click();
      await swap.getByText(/chosen kit: the packing list uses it/).waitFor();
      const swapGrams = (await swap.locator('p').first().innerText()).match(/([\d,]+) g in all/)?.[1];
      await saveScreenshot(page, 'plan-swap-chosen');

      // The packing list follows the chosen swap, and prints alone.
      await page.getByRole('tab', { name: 'Packing list' }).click();
      await page.getByRole('heading', { name: `Packing list: ${radioTrip.trip.name}` }).waitFor();
      await page.getByRole('heading', { name: `Carried by ${leader.displayName} (leader)` }).waitFor();
      // Each carrier's table sums to their grams; together they are the swap's grams.
      const packed = page.getByRole('table', { name: /^Power gear .+ packs$/ });
      const carriedG = (await packed.locator('tfoot').allInnerTexts()).reduce(
        (sum, text) => sum + Number(text.match(/([\d,]+) g/)?.[1]?.replace(/,/g, '') ?? 0),
        0,
      );
      expect(carriedG).toBe(Number(swapGrams?.replace(/,/g, '')));
      await page.getByRole('heading', { name: 'Leads for each hop' }).waitFor();
      await page.getByRole('table', { name: /Charging schedule/ }).waitFor();
      await saveScreenshot(page, 'plan-packing-list');
      await page.emulateMedia({ media: 'print' });
      expect(await page.getByRole('navigation', { name: 'Main' }).first().isVisible()).toBe(false);
      expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
      expect(await page.getByRole('tab', { name: 'Plan' }).isVisible()).toBe(false);
      expect(await packed.first().isVisible()).toBe(true);
      await saveScreenshot(page, 'plan-packing-list-print');
      await page.emulateMedia({ media: 'screen' });
    },
  );

  it(
    'plans the 12 V station where only it keeps up, says why, and packs the controller hop and the live radio',
    {
      timeout: 300_000,
    },
    async () => {
      const page = await (await newContext(browser)).newPage();
      await signIn(page, stationTrip.leaderEmail, demoPassword);
      await expect.poll(() => new URL(page.url()).pathname).not.toBe('/sign-in');
      await openTrip(page, stationTrip.trip.name);
      const { plan } = await solve(page);
      expect(plan.massG).not.toBeNull();
      const kitTable = page.getByRole('table', { name: 'The kit' });
      await kitTable.waitFor();
      for (const kind of ['Battery', 'Controller', 'Panel']) await kitTable.getByRole('cell', { name: kind }).waitFor();
      const note = page.getByRole('note', { name: 'Power path' });
      await note.waitFor();
      expect(await note.innerText()).toMatch(/12 V pack path/i);
      await saveScreenshot(page, 'plan-twelve-volt');
      await page.getByRole('tab', { name: 'Packing list' }).click();
      await page.getByRole('heading', { name: 'Leads for each hop' }).waitFor();
      const schedule = page.getByRole('table', { name: /Charging schedule/ });
      await schedule.getByText(/ via /).first().waitFor();
      await schedule.getByText('Runs live:').first().waitFor();
      await saveScreenshot(page, 'plan-twelve-volt-packing');
    },
  );

  it('reads at phone width without sideways scrolling', { timeout: 300_000 }, async () => {
    const page = await (await newContext(browser, 'phone')).newPage();
    await signIn(page, leader.email, demoPassword);
    await expect.poll(() => new URL(page.url()).pathname).not.toBe('/sign-in');
    await openTrip(page);
    // The first test leaves a plan; alone, this test makes one.
    await page.getByRole('button', { name: /^Find the lightest kit/ }).waitFor();
    if (await page.getByRole('heading', { name: 'No plan yet — find the lightest kit' }).isVisible()) await solve(page);
    await page.getByRole('table', { name: 'The kit' }).waitFor({ timeout: solveTimeoutMs });
    await page.getByRole('figure', { name: 'Stored energy through the trip' }).locator('svg').first().waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'plan-phone');

    await page.getByRole('tab', { name: 'Try a kit' }).click();
    await page.getByRole('group', { name: 'Collect' }).waitFor();
    await page
      .getByText(/^(Runs dry|Keeps up|Lasts the trip)/)
      .first()
      .waitFor({ timeout: solveTimeoutMs });
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'plan-try-kit-phone');

    await page.getByRole('tab', { name: 'Packing list' }).click();
    await page.getByRole('heading', { name: /^Packing list:/ }).waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'plan-packing-list-phone');
  });
});
