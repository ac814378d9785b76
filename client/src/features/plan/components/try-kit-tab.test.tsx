import { screen, waitFor, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { fixtureLockerItems, installPlanApi, linesFor } from '@/testing/mocks/plan-handlers';
import { buildCheckResult, buildChosenKit, buildPlanTrip, fixtureGear, planTripId } from '@/testing/plan-data';
import { renderWithProviders } from '@/testing/test-utils';
import { TryKitTab } from './try-kit-tab';

const renderTryKit = (props: { canSolve?: boolean; canChooseKit?: boolean } = {}) =>
  renderWithProviders(
    <TryKitTab tripId={planTripId} canSolve={props.canSolve ?? true} canChooseKit={props.canChooseKit ?? true} />,
  );

const countOf = (name: string) => screen.getByRole('spinbutton', { name });

/** The check's one shave while the small bank is in the kit: leave it home. */
const smallBankShave = {
  change: { kind: 'remove' as const, itemId: fixtureGear.smallBank.itemId },
  text: `Leave one ${fixtureGear.smallBank.name} at home: saves 105 g and still keeps every device charged.`,
  savedG: 105,
  massG: 788,
};

describe('TryKitTab', () => {
  it('starts from the chosen kit and checks it once the steppers rest', async () => {
    const api = installPlanApi({ chosen: buildChosenKit() });
    renderTryKit();
    await waitFor(() => expect(countOf(fixtureGear.panel.name)).toHaveValue(1));
    expect(countOf(fixtureGear.spareLead.name)).toHaveValue(0);
    expect(await screen.findByText(/^Lasts the trip: 16 % to spare/)).toBeInTheDocument();
    expect(api.requests.checks).toHaveLength(1);
    expect(api.requests.checks[0]).toHaveLength(6);
  });

  it('without the panel the kit runs dry, and the dry days are marked in the strip', async () => {
    const api = installPlanApi({ chosen: buildChosenKit() });
    const { user } = renderTryKit();
    await screen.findByText(/^Lasts the trip/);
    await user.click(screen.getByRole('button', { name: `One fewer ${fixtureGear.panel.name}` }));
    expect(await screen.findByText(/^Runs dry on day 3/)).toBeInTheDocument();
    const strip = screen.getByRole('list', { name: 'Day by day' });
    expect(within(strip).getAllByText(/: dry — a device goes without/)).toHaveLength(4);
    expect(api.requests.checks.at(-1)?.some((l) => l.itemId === fixtureGear.panel.itemId)).toBe(false);
  });

  it('checks the kit as changed by the steppers, bounded by the units owned', async () => {
    const api = installPlanApi({ chosen: buildChosenKit() });
    const { user } = renderTryKit();
    await screen.findByText(/^Lasts the trip/);
    const before = api.requests.checks.length;
    const more = screen.getByRole('button', { name: `One more ${fixtureGear.bigBank.name}` });
    await user.click(more);
    expect(countOf(fixtureGear.bigBank.name)).toHaveValue(2);
    expect(more).toBeDisabled();
    await user.click(screen.getByRole('button', { name: `One more ${fixtureGear.spareLead.name}` }));
    await waitFor(() => expect(api.requests.checks.at(-1)).toHaveLength(7));
    // Two clicks make at most two checks; the debounce itself is timed in use-debounced-value.test.ts.
    expect(api.requests.checks.length - before).toBeLessThanOrEqual(2);
    expect(api.requests.checks.at(-1)).toEqual(
      expect.arrayContaining([
        { itemId: fixtureGear.bigBank.itemId, count: 2 },
        { itemId: fixtureGear.spareLead.itemId, count: 1 },
      ]),
    );
  });

  it('lists the changes that shave grams and tries one on click', async () => {
    const shave = smallBankShave;
    installPlanApi({
      chosen: buildChosenKit(),
      check: (kit) => buildCheckResult(linesFor(kit), kit.some((l) => l.itemId === shave.change.itemId) ? [shave] : []),
    });
    const { user } = renderTryKit();
    await user.click(await screen.findByRole('button', { name: `Try it: ${shave.text}` }, { timeout: 4000 }));
    expect(countOf(fixtureGear.smallBank.name)).toHaveValue(0);
    expect(await screen.findByText(/Nothing can come out of this kit/)).toBeInTheDocument();
  });

  it('says how many changes went untried when the check ran out of time', async () => {
    const shave = smallBankShave;
    installPlanApi({
      chosen: buildChosenKit(),
      check: (kit) =>
        kit.some((l) => l.itemId === shave.change.itemId)
          ? buildCheckResult(linesFor(kit), [shave], 1_240)
          : buildCheckResult(linesFor(kit), [], 1),
    });
    const { user } = renderTryKit();
    expect(
      await screen.findByText(
        /1,240 changes were not tried \(it tries the biggest savings first\)/,
        {},
        { timeout: 4000 },
      ),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: `Try it: ${shave.text}` }));
    expect(await screen.findByText('No change tried in time keeps every device charged.')).toBeInTheDocument();
    expect(screen.getByText(/1 change was not tried/)).toBeInTheDocument();
  });

  it('stores a hand-picked kit as the chosen kit', async () => {
    const api = installPlanApi({ chosen: buildChosenKit() });
    const { user } = renderTryKit();
    await screen.findByText(/^Lasts the trip/);
    await user.click(screen.getByRole('button', { name: `One more ${fixtureGear.spareLead.name}` }));
    await waitFor(() => expect(api.requests.checks.at(-1)).toHaveLength(7));
    await user.click(await screen.findByRole('button', { name: 'Use this kit' }));
    await screen.findByText(/chosen kit: the packing list uses it/);
    expect(api.requests.chosen[0]).toMatchObject({ source: 'hand' });
    expect(api.requests.chosen[0]?.kit).toHaveLength(7);
  });

  it('asks for gear when the kit is empty, and says when the planner is busy', async () => {
    installPlanApi({
      check: () =>
        HttpResponse.json(
          { statusCode: 503, message: 'Busy', errors: [] },
          { status: 503, headers: { 'Retry-After': '7' } },
        ),
    });
    const { user } = renderTryKit();
    expect(await screen.findByRole('heading', { name: 'Pick some gear' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: `One more ${fixtureGear.panel.name}` }));
    expect(await screen.findByText(/The planner is busy, try again in/)).toHaveTextContent(/in [67] s\./);
    expect(screen.getByRole('button', { name: 'Check again' })).toBeDisabled();
  });

  it('lets a partner pick from the shared gear, naming whose it is, and says the leader’s locker is the leader’s', async () => {
    const panel = fixtureLockerItems().find((item) => item.spec.kind === 'panel');
    if (panel?.spec.kind !== 'panel') throw new Error('the fixture locker has a panel');
    installPlanApi({
      trip: buildPlanTrip('partner'),
      pool: {
        leaderWholeLocker: true,
        items: [
          {
            id: '00000000-0000-4000-a000-000000000050',
            itemId: panel.id,
            name: panel.name,
            kind: 'panel',
            massG: panel.massG,
            count: 1,
            countOwned: 1,
            ownerAccountId: '00000000-0000-4000-a000-000000000051',
            ownerName: 'Test Partner',
            spec: panel.spec,
            createdAt: '2027-02-01T08:00:00.000Z',
            updatedAt: '2027-02-01T08:00:00.000Z',
          },
        ],
      },
    });
    renderTryKit({ canChooseKit: false });
    expect(await screen.findByText(/which only the leader can pick from/)).toBeInTheDocument();
    expect(screen.getAllByRole('spinbutton')).toHaveLength(1);
    expect(screen.getByText(/Test Partner’s/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Use this kit' })).toBeNull();
  });

  it('leaves a viewer without steppers', async () => {
    installPlanApi({ trip: buildPlanTrip('viewer') });
    renderTryKit({ canSolve: false, canChooseKit: false });
    expect(
      await screen.findByRole('heading', { name: 'Trying kits is for the leader and partners' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('spinbutton')).toBeNull();
  });
});
