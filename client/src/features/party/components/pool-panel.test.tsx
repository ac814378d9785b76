import type { PoolItem, TripRole } from '@gramwatt/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { bankSpec, panelSpec, phoneSpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { partyDb, seedPartyTrip } from '@/testing/mocks/party-db';
import { renderWithProviders } from '@/testing/test-utils';
import { PoolPanel } from './pool-panel';

/** An invented party of a leader and a partner; `me` is the one signed in. */
const party = (me: TripRole) => {
  const leader = seedAccount({ displayName: 'Ash Leader' }, { signedIn: me === 'leader' });
  const partner = seedAccount({ displayName: 'Bryn Partner' }, { signedIn: me === 'partner' });
  const viewer = seedAccount({ displayName: 'Cal Home' }, { signedIn: me === 'viewer' });
  const tripId = seedPartyTrip('Invented ridge walk', [
    { account: leader, role: 'leader' },
    { account: partner, role: 'partner' },
    { account: viewer, role: 'viewer' },
  ]);
  return { tripId, leader, partner, viewer };
};

const renderPool = (tripId: string, myAccountId: string, myRole: TripRole) =>
  renderWithProviders(<PoolPanel tripId={tripId} myAccountId={myAccountId} myRole={myRole} />);

describe('PoolPanel', () => {
  it('shares one of my panels with a count, changes the count and takes it out again', async () => {
    const { tripId, partner } = party('partner');
    seedLockerItem(partner.id, { name: 'Invented fold panel', spec: panelSpec({ massG: 300 }), countOwned: 2 });
    seedLockerItem(partner.id, { name: 'Invented phone', spec: phoneSpec() });
    const { user } = renderPool(tripId, partner.id, 'partner');

    expect(await screen.findByText('Nothing shared yet.')).toBeInTheDocument();
    const choice = await screen.findByRole('combobox', { name: 'Share from your locker' });
    // Devices go on the device list, not in the pool.
    expect(
      within(choice)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Invented fold panel (300 g)']);
    await user.selectOptions(screen.getByRole('combobox', { name: 'How many' }), '2');
    await user.click(screen.getByRole('button', { name: 'Share with the party' }));
    expect(await screen.findByText('Invented fold panel × 2 shared with the party.')).toBeInTheDocument();

    const mine = await screen.findByRole('list', { name: 'Shared by you' });
    expect(mine).toHaveTextContent('panel (collect) · 300 g each');
    expect(screen.getByText('600 g of power gear in the pool — the plan picks from it.')).toBeInTheDocument();
    expect(screen.getByText(/Everything in your locker that can be shared is in the pool/)).toBeInTheDocument();

    await user.selectOptions(within(mine).getByRole('combobox', { name: 'How many of Invented fold panel' }), '1');
    await waitFor(() => expect(partyDb.pool.get(tripId)?.[0]?.count).toBe(1));
    expect(await screen.findByText('300 g of power gear in the pool — the plan picks from it.')).toBeInTheDocument();

    await user.click(within(mine).getByRole('button', { name: 'Take out Invented fold panel' }));
    expect(
      await screen.findByText(/Invented fold panel is out of the pool; it stays in the locker/),
    ).toBeInTheDocument();
    expect(await screen.findByText('Nothing shared yet.')).toBeInTheDocument();
    expect(partyDb.pool.get(tripId)).toEqual([]);
  });

  it('lets a partner change only their own entries; the leader may change any', async () => {
    const { tripId, leader, partner } = party('partner');
    const pooled = (owner: typeof leader, name: string, n: number): PoolItem => ({
      id: `00000000-0000-4000-8000-50000000000${n}`,
      itemId: `00000000-0000-4000-8000-51000000000${n}`,
      name,
      kind: 'bank',
      massG: 200,
      count: 1,
      countOwned: 1,
      ownerAccountId: owner.id,
      ownerName: owner.displayName,
      spec: bankSpec() as PoolItem['spec'],
      createdAt: '2026-05-03T10:00:00.000Z',
      updatedAt: '2026-05-03T10:00:00.000Z',
    });
    partyDb.pool.set(tripId, [pooled(leader, 'Invented brick bank', 1), pooled(partner, 'Invented slim bank', 2)]);

    const asPartner = renderPool(tripId, partner.id, 'partner');
    const leaders = await screen.findByRole('list', { name: 'Shared by Ash Leader' });
    expect(within(leaders).queryByRole('button')).toBeNull();
    expect(within(leaders).getByText('× 1')).toBeInTheDocument();
    expect(
      within(screen.getByRole('list', { name: 'Shared by you' })).getByRole('button', {
        name: 'Take out Invented slim bank',
      }),
    ).toBeInTheDocument();
    // With a leader entry in the pool, the leader's whole locker no longer counts.
    expect(screen.queryByText(/may draw on anything in the leader/)).toBeNull();
    asPartner.unmount();

    renderPool(tripId, leader.id, 'leader');
    const partners = await screen.findByRole('list', { name: 'Shared by Bryn Partner' });
    expect(within(partners).getByRole('button', { name: 'Take out Invented slim bank' })).toBeInTheDocument();
  });

  it('says the leader’s whole locker counts until the leader shares something', async () => {
    const { tripId, leader } = party('leader');
    renderPool(tripId, leader.id, 'leader');
    expect(await screen.findByText(/may draw on anything in the leader’s locker/)).toBeInTheDocument();
    expect(await screen.findByText(/Your locker has no panels, banks, converters or leads/)).toBeInTheDocument();
  });

  it('shows a viewer the pool without any controls and without asking for their locker', async () => {
    const { tripId, viewer } = party('viewer');
    renderPool(tripId, viewer.id, 'viewer');
    expect(await screen.findByText('Nothing shared yet.')).toBeInTheDocument();
    expect(screen.queryByRole('button')).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
  });
});
