import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// The demo accounts' source module, read directly (as the sign-in test does).
import { demoAccounts, demoPassword } from '../seed/src/demo-accounts';
import { appUrl, browserMissing, launchBrowser, newContext, saveScreenshot, signIn } from './browser';

const leader = demoAccounts.find((a) => a.role === 'member')!;
const admin = demoAccounts.find((a) => a.role === 'admin')!;

/** An invented walker the leader invites; `.example` can never reach a real mailbox (RFC 2606). */
const stamp = Date.now();
const invitee = {
  email: `rowan.fellgate.${stamp}@gramwatt.example`,
  displayName: 'Rowan Fellgate',
  password: 'cairn-and-cloud-42',
};
const tripName = `Invented Hollowmere crossing ${stamp}`;

const scrollsSideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);

const pathOf = (page: Page) => new URL(page.url()).pathname;

/** How long a page change or a delivered e-mail may take on a busy machine. */
const patient = { timeout: 20_000, interval: 250 };
/** A solve waits for the planner's whole time budget at worst; the browser waits a little longer. */
const solveTimeoutMs = 120_000;

/**
 * The partner's one piece of gear: an invented 20,000 mAh bank (74 Wh at 3.7 V) whose USB-C port gives the 9 V a
 * phone's fast charge asks for, so with a USB-C lead it alone keeps a phone going for the trip's four days.
 */
const partnerBank = {
  name: 'Brackwater 20 000 mAh bank',
  countOwned: 1,
  spec: {
    kind: 'bank',
    capacityMah: 20_000,
    cellVolts: 3.7,
    inputMaxW: 18,
    inputPort: { connector: 'usb-c', captiveCable: false },
    outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] }],
    outputEfficiency: 0.85,
    chargeEfficiency: 0.9,
    massG: 355,
  },
};
/** The partner's own limit on this trip: room for their bank, not for everything (an invented figure). */
const partnerLimitG = 500;
/** From the leader's demo locker: the phone that comes on the trip and the lead that joins it to a bank. */
const leaderPhoneName = 'Trail phone';
const leaderLeadName = 'USB-C to USB-C lead, 1 m';

const grams = (massG: number) => `${massG.toLocaleString('en-GB')} g`;

interface PlanCarrier {
  name: string;
  massG: number;
  gramLimitG: number | null;
  lines: { name: string }[];
}

/** The id of the leader's locker item with this exact name, through the API with the page's session. */
async function lockerItemId(page: Page, name: string): Promise<string> {
  const response = await page.request.get(appUrl(`/api/locker/items?q=${encodeURIComponent(name)}`));
  expect(response.status()).toBe(200);
  const { items } = (await response.json()) as { items: { id: string; name: string }[] };
  const item = items.find((i) => i.name === name);
  expect(item, `${name} in the locker`).toBeDefined();
  return item!.id;
}

/** The leader's trip, made through the API with the page's session: the trip form has its own browser test. */
async function createTrip(page: Page): Promise<string> {
  const response = await page.request.post(appUrl('/api/trips'), {
    data: { name: tripName, latitudeDeg: 46.21, longitudeDeg: 8.31, startDate: '2027-08-10', nights: 3 },
  });
  expect(response.status()).toBe(201);
  const { trip } = (await response.json()) as { trip: { id: string } };
  return trip.id;
}

describe.skipIf(browserMissing)('a party in the built app', () => {
  let browser: Browser;
  let tripId = '';

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the leader invites a partner by e-mail and makes a read-only link', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, leader.email, demoPassword);
    await expect.poll(() => pathOf(page), patient).not.toBe('/sign-in');
    tripId = await createTrip(page);

    await page.goto(appUrl(`/trips/${tripId}`));
    await page.getByRole('tab', { name: 'Party' }).click();
    await page.getByRole('heading', { name: `${leader.displayName} (you)` }).waitFor();
    await page.getByLabel('E-mail address').fill(invitee.email);
    await page.getByRole('radio', { name: /Partner/ }).check();
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByText(`${invitee.email} gets a link that works once`).waitFor();
    await page.getByRole('list', { name: 'Waiting for an answer' }).getByText(invitee.email).first().waitFor();

    // The leader shares one piece of power gear with the party.
    await page.getByRole('button', { name: 'Share with the party' }).click();
    await page.getByText(/shared with the party\./).waitFor();
    await page.getByRole('list', { name: 'Shared by you' }).waitFor();

    await page.getByRole('button', { name: 'Make a link' }).click();
    const link = page.getByRole('textbox', { name: 'Read-only link' });
    await link.waitFor();
    expect(await link.inputValue()).toMatch(/\/share\/[A-Za-z0-9_.-]+$/);
    await saveScreenshot(page, 'party-leader');

    // The link opens the trip for someone with no account at all.
    const sharedPath = new URL(await link.inputValue()).pathname;
    const stranger = await (await newContext(browser, 'phone')).newPage();
    await stranger.goto(appUrl(sharedPath));
    await stranger.getByRole('heading', { level: 1, name: tripName }).waitFor();
    await stranger.getByRole('region', { name: 'Cautions' }).waitFor();
    expect(await stranger.getByText(leader.displayName).first().isVisible()).toBe(true);
    expect(await scrollsSideways(stranger)).toBe(false);
    await saveScreenshot(stranger, 'party-shared-trip-phone');
  });

  it('the invite arrives in the outbox; the invited walker signs in from the link, joins and sees the trip as partner', async () => {
    expect(tripId).not.toBe('');
    const page = await (await newContext(browser, 'phone')).newPage();

    // A new account with the invited address; the outbox shows what was sent to it.
    await page.goto(appUrl('/sign-up'));
    await page.getByLabel('Name').fill(invitee.displayName);
    await page.getByLabel('E-mail').fill(invitee.email);
    await page.getByLabel('Password').fill(invitee.password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => pathOf(page), patient).toBe('/locker');

    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
    await expect.poll(() => pathOf(page), patient).toBe('/outbox');
    const message = page.getByRole('link', { name: new RegExp(tripName) });
    // The e-mail goes out through the local mail server a moment after the invite.
    await expect
      .poll(async () => {
        if (await message.isVisible()) return true;
        await page.reload();
        return message.isVisible();
      }, patient)
      .toBe(true)
      .catch(async (error: unknown) => {
        // Say what the outbox held, so a miss can be told from a slow delivery.
        const outbox = await (await page.request.get(appUrl('/api/outbox'))).text();
        await saveScreenshot(page, 'party-outbox-miss');
        throw new Error(`${String(error)} at ${page.url()}; the outbox answered ${outbox}`);
      });
    await message.click();
    const openInvite = page.getByRole('link', { name: 'Open the invite' });
    await openInvite.waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'party-outbox-phone');
    await page.getByRole('tab', { name: 'As formatted' }).click();
    await page.frameLocator('iframe[sandbox=""]').getByText('Open the invite').waitFor();
    await saveScreenshot(page, 'party-outbox-formatted-phone');
    const invitePath = (await openInvite.getAttribute('href')) ?? '';
    expect(invitePath).toMatch(/^\/invites\/[A-Za-z0-9_-]{43}$/);

    // Signed out, the link offers sign-in on the spot and joins straight after.
    await page.getByRole('button', { name: /^Account:/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await expect.poll(() => pathOf(page), patient).toBe('/sign-in');
    await page.goto(appUrl(invitePath));
    await page.getByText(`asks you to join ${tripName} as a partner`).waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'party-invite-phone');
    await page.getByRole('tab', { name: 'I have an account' }).click();
    await page.getByLabel('E-mail').fill(invitee.email);
    await page.getByLabel('Password').fill(invitee.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await expect.poll(() => pathOf(page), patient).toBe(`/trips/${tripId}`);
    await page.getByRole('heading', { name: /you are partner/ }).waitFor();
    await page.getByRole('tab', { name: 'Party' }).click();
    await page.getByText(/You are a partner here/).waitFor();
    await page.getByRole('heading', { name: `${invitee.displayName} (you)` }).waitFor();
    expect(await page.getByRole('button', { name: 'Send invite' }).count()).toBe(0);
    await page.getByRole('list', { name: `Shared by ${leader.displayName}` }).waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'party-partner-phone');

    // The link is used up.
    await page.goto(appUrl(invitePath));
    await page.getByText('This invite no longer works').waitFor();
  });

  it('the leader sees the partner joined (at phone width); an admin sees the e-mail went out, not what it said', async () => {
    const page = await (await newContext(browser, 'phone')).newPage();
    await signIn(page, leader.email, demoPassword);
    await expect.poll(() => pathOf(page), patient).not.toBe('/sign-in');
    await page.goto(appUrl(`/trips/${tripId}`));
    await page.getByRole('tab', { name: 'Party' }).click();
    await page.getByRole('heading', { name: invitee.displayName }).waitFor();
    await page.getByText('Earlier invites (1)').waitFor();
    await page.getByRole('combobox', { name: `Role of ${invitee.displayName}` }).waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'party-leader-phone');

    const adminPage = await (await newContext(browser)).newPage();
    await signIn(adminPage, admin.email, demoPassword);
    await expect.poll(() => pathOf(adminPage), patient).not.toBe('/sign-in');
    await adminPage.goto(appUrl('/admin/mail'));
    const row = adminPage.getByRole('row', { name: new RegExp(invitee.email.replace(/\./g, '\\.')) });
    await row.waitFor();
    expect(await row.textContent()).toMatch(/Trip invite.*Sent/);
    await saveScreenshot(adminPage, 'party-admin-mail');
  });

  it('the partner shares a bank from the party tab and sees it under their name', async () => {
    expect(tripId).not.toBe('');
    const page = await (await newContext(browser, 'phone')).newPage();
    await signIn(page, invitee.email, invitee.password);
    await expect.poll(() => pathOf(page), patient).not.toBe('/sign-in');
    // The invited account's locker starts empty: the bank goes in through the API (the locker form has its own test).
    const created = await page.request.post(appUrl('/api/locker/items'), { data: partnerBank });
    expect(created.status()).toBe(201);

    await page.goto(appUrl(`/trips/${tripId}`));
    await page.getByRole('tab', { name: 'Party' }).click();
    const shareFrom = page.getByLabel('Share from your locker');
    await shareFrom.waitFor();
    await shareFrom.selectOption({ label: `${partnerBank.name} (${grams(partnerBank.spec.massG)})` });
    await page.getByRole('button', { name: 'Share with the party' }).click();
    await page.getByText(`${partnerBank.name} × 1 shared with the party.`).waitFor();
    await page.getByRole('heading', { name: 'You brought' }).waitFor();
    await page
      .getByRole('list', { name: 'Shared by you' })
      .getByRole('listitem')
      .filter({ hasText: partnerBank.name })
      .waitFor();
    // The leader's gear stays listed under the leader's name beside it.
    await page.getByRole('list', { name: `Shared by ${leader.displayName}` }).waitFor();
    await page.getByText('Everything in your locker that can be shared is in the pool.').waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await saveScreenshot(page, 'party-partner-shared-phone');
  });

  it(
    "the leader adds a phone and a lead, solves the party's plan and sees who carries what",
    { timeout: 300_000 },
    async () => {
      expect(tripId).not.toBe('');
      const page = await (await newContext(browser)).newPage();
      await signIn(page, leader.email, demoPassword);
      await expect.poll(() => pathOf(page), patient).not.toBe('/sign-in');

      // Set-up through the API with the page's session: the device list and the gram limits have their own tests.
      const lead = await page.request.post(appUrl(`/api/trips/${tripId}/pool`), {
        data: { itemId: await lockerItemId(page, leaderLeadName), count: 1 },
      });
      expect(lead.status()).toBe(201);
      const phone = await page.request.post(appUrl(`/api/trips/${tripId}/devices`), {
        data: { itemId: await lockerItemId(page, leaderPhoneName) },
      });
      expect(phone.status()).toBe(201);
      const membersResponse = await page.request.get(appUrl(`/api/trips/${tripId}/members`));
      const { members } = (await membersResponse.json()) as { members: { accountId: string; email: string }[] };
      const partner = members.find((m) => m.email === invitee.email);
      expect(partner).toBeDefined();
      const limit = await page.request.patch(appUrl(`/api/trips/${tripId}/members/${partner!.accountId}`), {
        data: { gramLimitG: partnerLimitG },
      });
      expect(limit.status()).toBe(200);

      // The leader sees the partner's bank in the pool, under the partner's name.
      await page.goto(appUrl(`/trips/${tripId}`));
      await page.getByRole('tab', { name: 'Party' }).click();
      await page
        .getByRole('list', { name: `Shared by ${invitee.displayName}` })
        .getByRole('listitem')
        .filter({ hasText: partnerBank.name })
        .waitFor();

      // Solve from the plan tab.
      await page.getByRole('tab', { name: 'Plan' }).click();
      const button = page.getByRole('button', { name: /^Find the lightest kit/ });
      const answered = page.waitForResponse(
        (r) => r.request().method() === 'POST' && new URL(r.url()).pathname === `/api/trips/${tripId}/plans`,
        { timeout: solveTimeoutMs },
      );
      await button.click();
      const response = await answered;
      expect(response.status()).toBe(201);
      const { plan } = (await response.json()) as {
        plan: { result: { headline: string; kit: { massG: number; carriers?: PlanCarrier[] } | null } };
      };
      await page.getByRole('heading', { level: 2, name: plan.result.headline }).waitFor({ timeout: solveTimeoutMs });
      const carriers = plan.result.kit?.carriers ?? [];
      console.info(
        `party plan: ${plan.result.headline} | ${carriers.map((c) => `${c.name} ${c.massG} g [${c.lines.map((l) => l.name).join(', ')}]`).join('; ')}`,
      );

      // Both walkers carry: the partner their own bank within their limit, the leader the lead.
      expect(carriers.map((c) => c.name).sort()).toEqual([leader.displayName, invitee.displayName].sort());
      const partnerCarries = carriers.find((c) => c.name === invitee.displayName)!;
      const leaderCarries = carriers.find((c) => c.name === leader.displayName)!;
      expect(partnerCarries.gramLimitG).toBe(partnerLimitG);
      expect(partnerCarries.lines.map((l) => l.name)).toContain(partnerBank.name);
      expect(leaderCarries.lines.map((l) => l.name)).toContain(leaderLeadName);
      expect(partnerCarries.massG + leaderCarries.massG).toBe(plan.result.kit!.massG);

      const who = page.getByRole('heading', { name: 'Who carries what' }).first();
      await who.waitFor();
      const carrierList = who.locator('xpath=following-sibling::ul[1]');
      const partnerRow = carrierList.getByRole('listitem').filter({ hasText: invitee.displayName });
      expect(await partnerRow.innerText()).toContain(
        `${invitee.displayName}: ${grams(partnerCarries.massG)} of their ${grams(partnerLimitG)} limit`,
      );
      expect(await partnerRow.innerText()).toContain(partnerBank.name);
      const leaderRow = carrierList.getByRole('listitem').filter({ hasText: leader.displayName });
      expect(await leaderRow.innerText()).toContain(`${leader.displayName}: ${grams(leaderCarries.massG)}`);
      expect(await leaderRow.innerText()).toContain(leaderLeadName);
      // The charts load after the verdict; the screenshot waits for them.
      await page.getByRole('figure', { name: 'Stored energy through the trip' }).locator('svg').first().waitFor();
      // The pointer rests where the button was, over a chart after the answer: move it off so no tooltip shows.
      await page.mouse.move(0, 0);
      await saveScreenshot(page, 'party-plan-carriers');
    },
  );
});
