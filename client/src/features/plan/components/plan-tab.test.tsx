import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import { installPlanApi } from '@/testing/mocks/plan-handlers';
import {
  buildNothingFeasibleResult,
  buildOverLimitResult,
  buildPlanRecord,
  buildPlanResult,
  buildPlanTrip,
  planTripId,
} from '@/testing/plan-data';
import { renderWithProviders } from '@/testing/test-utils';
import { PlanTab } from './plan-tab';

const renderPlanTab = (props: { canSolve?: boolean; canChooseKit?: boolean } = {}) =>
  renderWithProviders(
    <PlanTab tripId={planTripId} canSolve={props.canSolve ?? true} canChooseKit={props.canChooseKit ?? true} />,
  );

describe('PlanTab', () => {
  // The charts load on their own (the chart library is large); load them once up front so each test finds them soon.
  beforeAll(() => import('./plan-charts'), 30_000);

  it('says there is no plan yet, then solves and shows the answer, the kit and the day strip', async () => {
    const api = installPlanApi();
    const { user } = renderPlanTab();
    expect(await screen.findByRole('heading', { name: 'No plan yet — find the lightest kit' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Find the lightest kit' }));

    const answer = await screen.findByRole('heading', { level: 2, name: /lightest kit that works weighs 893 g/ });
    expect(answer).toHaveFocus();
    expect(api.requests.solves).toBe(1);
    const kit = screen.getByRole('table', { name: 'The kit' });
    expect(within(kit).getByRole('rowheader', { name: 'Test fold-out panel 12 W' })).toBeInTheDocument();
    expect(within(kit).getByText('893 g')).toBeInTheDocument();
    expect(screen.getByText(/893 g/, { selector: 'strong' }).parentElement).toHaveTextContent(
      '893 g of the 1,200 g limit — 307 g to spare.',
    );
    const strip = screen.getByRole('list', { name: 'Day by day' });
    expect(within(strip).getAllByRole('listitem')).toHaveLength(6);
    expect(within(strip).getByText(/^Day 3, Fri 12 Mar: 69 % stored at the day's end \(103 Wh\)$/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Find the lightest kit again' })).toBeEnabled();
    expect(screen.queryByText('The trip or its gear changed after this plan was made')).toBeNull();
    expect(screen.queryByText('An earlier version of the planner made this plan')).toBeNull();
    expect(screen.queryByText('Gear joined the trip after this plan was made')).toBeNull();
  });

  it('shows the newest stored plan on load, with gram prices, swaps, the ledger and the cautions', async () => {
    const older = buildPlanRecord(buildPlanResult({ headline: 'An older answer.' }));
    const newer = buildPlanRecord(buildPlanResult());
    installPlanApi({ plans: [newer, older] });
    renderPlanTab();

    expect(await screen.findByRole('heading', { name: /weighs 893 g/ })).toBeInTheDocument();
    expect(screen.queryByText('An older answer.')).toBeNull();
    expect(screen.getByText('10 more transmit minutes a day cost 85 g.')).toBeInTheDocument();
    expect(screen.getByText(/^245 g more: adds Test bank 20 000 mAh/)).toBeInTheDocument();
    const ledger = screen.getByRole('table', { name: /^Ledger, cloudy run at the end/ });
    expect(within(ledger).getAllByRole('row')).toHaveLength(7);
    expect(within(ledger).getByRole('rowheader', { name: 'Day 1' }).closest('tr')).toHaveTextContent('150 Wh');
    expect(screen.getByText(/Fuse DC leads on the positive side/)).toBeInTheDocument();
    const stored = await screen.findByRole('figure', { name: 'Stored energy through the trip' }, { timeout: 5000 });
    expect(stored).toHaveAccessibleDescription(
      /Cloudy run at the end: from 150 Wh to 33 Wh; Expected sky: from 150 Wh to 33 Wh/,
    );
    expect(screen.getByRole('figure', { name: "The sun's path, first and last day" })).toHaveAccessibleDescription(
      /Day 1, Wed 10 Mar: the sun is up about \d+ h and stands highest at 78° around/,
    );
    expect(screen.getAllByText(/estimates, not a guarantee/).length).toBeGreaterThan(0);
  });

  it('says when the trip changed after the plan was made, and not before', async () => {
    const trip = buildPlanTrip();
    const plan = buildPlanRecord();
    const changed = {
      ...trip,
      devices: trip.devices.map((d, i) => (i === 0 ? { ...d, updatedAt: '2027-02-21T09:00:00.000Z' } : d)),
    };
    installPlanApi({ trip: changed, plans: [plan] });
    renderPlanTab();
    expect(await screen.findByText('The trip or its gear changed after this plan was made')).toBeInTheDocument();
  });

  it('says when the gear the plan weighed was edited in the locker after the plan was made', async () => {
    installPlanApi({ plans: [buildPlanRecord(buildPlanResult(), { gearChangedAt: '2027-02-21T09:00:00.000Z' })] });
    renderPlanTab();
    expect(await screen.findByText('The trip or its gear changed after this plan was made')).toBeInTheDocument();
  });

  it('says when gear joined the trip after the plan, which the plan never weighed', async () => {
    installPlanApi({ plans: [buildPlanRecord(buildPlanResult(), { gearAddedCount: 2 })] });
    renderPlanTab();
    expect(await screen.findByText('Gear joined the trip after this plan was made')).toBeInTheDocument();
    expect(
      screen.getByText(
        /Since then, 2 items of power gear were added .* This plan did not weigh them; they may make a lighter kit\. Find the lightest kit again to weigh them\./,
      ),
    ).toBeInTheDocument();
  });

  it('says when an earlier version of the planner made the plan, and not for the current one', async () => {
    const earlier = buildPlanRecord({ ...buildPlanResult(), modelVersion: 'gramwatt-plan-1' });
    installPlanApi({ plans: [earlier] });
    renderPlanTab();
    expect(await screen.findByText('An earlier version of the planner made this plan')).toBeInTheDocument();
    expect(screen.getByText(/Find the lightest kit again to see the current answer/)).toBeInTheDocument();
  });

  it('says who carries what on a party’s kit', async () => {
    const result = buildPlanResult();
    const kit = result.kit!;
    const carriers = [
      { memberId: 'm1', name: 'Test Leader', lines: kit.lines.slice(0, 2), massG: 670, gramLimitG: 600, overG: 70 },
      { memberId: 'm2', name: 'Test Partner', lines: kit.lines.slice(2), massG: 223, gramLimitG: null, overG: 0 },
    ];
    installPlanApi({ plans: [buildPlanRecord({ ...result, kit: { ...kit, carriers } })] });
    renderPlanTab();
    const who = await screen.findByRole('heading', { name: 'Who carries what' });
    const list = within(who.parentElement!).getByRole('list');
    expect(
      within(list)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual([
      'Test Leader: 670 g, 70 g over their 600 g limit — Test fold-out panel 12 W, Test bank 20 000 mAh',
      expect.stringMatching(/^Test Partner: 223 g — Test bank 5 000 mAh, /),
    ]);
  });

  it('switches the ledger between the tightest sky and the expected sky', async () => {
    installPlanApi({ plans: [buildPlanRecord()] });
    const { user } = renderPlanTab();
    await user.selectOptions(await screen.findByLabelText('Sky'), 'Expected sky');
    expect(screen.getByRole('table', { name: /^Ledger, expected sky/ })).toBeInTheDocument();
  });

  it('stores a swap as the chosen kit, with the plan it came from', async () => {
    const plan = buildPlanRecord();
    const api = installPlanApi({ plans: [plan] });
    const { user } = renderPlanTab();
    await user.click(await screen.findByRole('button', { name: /^Use this kit: adds Test bank 20 000 mAh/ }));
    await screen.findAllByText(/chosen kit: the packing list uses it/);
    expect(api.requests.chosen).toEqual([
      { kit: expect.arrayContaining([{ itemId: expect.any(String), count: 2 }]), source: 'swap', planId: plan.id },
    ]);
  });

  it('gives a viewer the plan without solve or choose buttons', async () => {
    installPlanApi({ trip: buildPlanTrip('viewer'), plans: [buildPlanRecord()] });
    renderPlanTab({ canSolve: false, canChooseKit: false });
    await screen.findByRole('heading', { name: /weighs 893 g/ });
    expect(screen.queryByRole('button', { name: /Find the lightest kit/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Use this kit/ })).toBeNull();
  });

  it('says when the planner is busy and how long to wait, and holds the button until then', async () => {
    installPlanApi({
      solve: () =>
        HttpResponse.json(
          { statusCode: 503, message: 'The planner is busy', errors: [] },
          { status: 503, headers: { 'Retry-After': '12' } },
        ),
    });
    const { user } = renderPlanTab();
    await user.click(await screen.findByRole('button', { name: 'Find the lightest kit' }));
    expect(await screen.findByText(/The planner is busy, try again in/)).toHaveTextContent(/try again in 1[12] s\./);
    expect(screen.getByRole('button', { name: 'Find the lightest kit' })).toBeDisabled();
  });

  it('shows the reason when the trip cannot be solved as asked (422)', async () => {
    installPlanApi({
      solve: () =>
        HttpResponse.json(
          { statusCode: 422, message: 'The trip has no devices to charge', errors: [] },
          { status: 422 },
        ),
    });
    const { user } = renderPlanTab();
    await user.click(await screen.findByRole('button', { name: 'Find the lightest kit' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This trip cannot be solved as asked');
    expect(alert).toHaveTextContent('The trip has no devices to charge');
  });

  it('shows a progress bar with the seconds so far when a solve takes more than a moment', async () => {
    let finish: () => void = () => {};
    const held = new Promise<void>((resolve) => (finish = resolve));
    installPlanApi({ solve: () => held.then(() => buildPlanResult()) });
    const { user } = renderPlanTab();
    await user.click(await screen.findByRole('button', { name: 'Find the lightest kit' }));
    // The bar shows after a grace of 0.6 s; a loaded CI machine may take longer than the default 1 s wait to paint it.
    const progress = await screen.findByRole('progressbar', { name: 'Finding the lightest kit' }, { timeout: 5000 });
    expect(progress).toHaveAttribute('aria-valuetext', expect.stringMatching(/^\d+ s so far$/));
    finish();
    await screen.findByRole('heading', { name: /weighs 893 g/ });
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('says what is missing when no kit from the gear works', async () => {
    installPlanApi({ plans: [buildPlanRecord(buildNothingFeasibleResult())] });
    renderPlanTab();
    expect(
      await screen.findByRole('heading', { name: /^No kit from this gear keeps every device charged/ }),
    ).toBeInTheDocument();
    const missing = screen.getByRole('region', { name: 'What is missing' });
    expect(within(missing).getByText(/Nothing in this gear can charge Test handheld radio/)).toBeInTheDocument();
    expect(within(missing).getByRole('table', { name: /runs short/ })).toHaveTextContent(
      'Day 4Cloudy run mid-trip12 Wh',
    );
    expect(screen.queryByRole('table', { name: 'The kit' })).toBeNull();
  });

  it('says how far over the gram limit the lightest working kit is', async () => {
    installPlanApi({ plans: [buildPlanRecord(buildOverLimitResult())] });
    renderPlanTab();
    expect(await screen.findByRole('heading', { name: /Nothing that works fits under 800 g/ })).toBeInTheDocument();
    expect(screen.getByText(/93 g over the 800 g limit/)).toBeInTheDocument();
    expect(screen.getByText(/^Lasts the trip: 16 % to spare/)).toBeInTheDocument();
  });

  it('says so when the plans cannot be loaded', async () => {
    installPlanApi();
    const { server } = await import('@/testing/mocks/server');
    server.use(
      http.get('*/api/trips/:tripId/plans', () =>
        HttpResponse.json({ statusCode: 404, message: 'No such trip', errors: [] }, { status: 404 }),
      ),
    );
    renderPlanTab();
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent('The plans could not be loaded'));
    expect(screen.getByRole('alert')).toHaveTextContent('No such trip');
  });
});
