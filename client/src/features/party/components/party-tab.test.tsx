import { screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { seedAccount } from '@/testing/mocks/db';
import { partyDb, seedInvite, seedPartyTrip } from '@/testing/mocks/party-db';
import { renderWithProviders } from '@/testing/test-utils';
import { PartyTab } from './party-tab';

/** The tab as the trip page holds it: inside the router (the share link opens an in-app page). */
const renderTab = (tripId: string) =>
  renderWithProviders(
    <MemoryRouter>
      <PartyTab tripId={tripId} />
    </MemoryRouter>,
  );

/** An invented party: a leader (signed in unless told), a partner and, optionally, a viewer at home. */
const party = ({
  signedIn = 'leader',
  withViewer = false,
}: { signedIn?: 'leader' | 'partner'; withViewer?: boolean } = {}) => {
  const leader = seedAccount(
    { displayName: 'Ash Leader', email: 'ash@example.test' },
    { signedIn: signedIn === 'leader' },
  );
  const partner = seedAccount(
    { displayName: 'Bryn Partner', email: 'bryn@example.test' },
    { signedIn: signedIn === 'partner' },
  );
  const viewer = seedAccount({ displayName: 'Cal Home', email: 'cal@example.test' });
  const tripId = seedPartyTrip('Invented ridge walk', [
    { account: leader, role: 'leader', gramLimitG: 900 },
    { account: partner, role: 'partner' },
    ...(withViewer ? [{ account: viewer, role: 'viewer' as const }] : []),
  ]);
  return { tripId, leader, partner, viewer };
};

const memberCard = (name: RegExp) => screen.getByRole('heading', { level: 3, name }).closest('li') as HTMLElement;

describe('PartyTab for the leader', () => {
  it('lists everyone with role and gram limit, and changes a partner to a viewer with a limit of their own', async () => {
    const { tripId, partner } = party();
    const { user } = renderTab(tripId);

    expect(await screen.findByRole('heading', { name: 'Ash Leader (you)' })).toBeInTheDocument();
    const bryn = within(memberCard(/Bryn Partner/));
    await user.selectOptions(bryn.getByRole('combobox', { name: 'Role of Bryn Partner' }), 'viewer');
    expect(await screen.findByText('Bryn Partner is now a viewer.')).toBeInTheDocument();

    await user.type(bryn.getByRole('textbox', { name: /Gram limit for Bryn Partner/ }), '650');
    await user.click(bryn.getByRole('button', { name: 'Save limit for Bryn Partner' }));
    expect(await screen.findByText('Bryn Partner: gram limit 650 g.')).toBeInTheDocument();
    const stored = partyDb.members.get(tripId)?.find((m) => m.accountId === partner.id);
    expect(stored).toMatchObject({ role: 'viewer', gramLimitG: 650 });
  });

  it('refuses a gram limit the schema refuses, beside the field, without asking the server', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    const bryn = within(await waitFor(() => memberCard(/Bryn Partner/)));
    const field = bryn.getByRole('textbox', { name: /Gram limit for Bryn Partner/ });
    await user.type(field, '12.5');
    await user.click(bryn.getByRole('button', { name: 'Save limit for Bryn Partner' }));
    expect(field).toHaveAccessibleDescription(expect.stringContaining('whole number of grams'));
    expect(partyDb.members.get(tripId)?.[1]?.gramLimitG).toBeNull();
  });

  it('clears the leader’s own limit when the field is emptied', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    const ash = within(await waitFor(() => memberCard(/Ash Leader/)));
    const field = ash.getByRole('textbox', { name: /Gram limit for Ash Leader/ });
    expect(field).toHaveValue('900');
    await user.clear(field);
    await user.click(ash.getByRole('button', { name: 'Save limit for Ash Leader' }));
    expect(await screen.findByText('Ash Leader: no own gram limit.')).toBeInTheDocument();
    expect(ash.queryByRole('combobox')).toBeNull();
    expect(ash.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('asks before removing a member; keeping them changes nothing, removing takes them off', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    const remove = await screen.findByRole('button', { name: 'Remove Bryn Partner from the trip' });

    await user.click(remove);
    const dialog = await screen.findByRole('dialog', { name: 'Remove Bryn Partner from the trip?' });
    expect(within(dialog).getByRole('button', { name: 'Keep them' })).toHaveFocus();
    await user.click(within(dialog).getByRole('button', { name: 'Keep them' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(partyDb.members.get(tripId)).toHaveLength(2);

    await user.click(remove);
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Remove' }));
    expect(await screen.findByText(/Bryn Partner is off the trip/)).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('heading', { name: 'Bryn Partner' })).toBeNull());
    expect(partyDb.members.get(tripId)).toHaveLength(1);
  });

  it('invites by e-mail with a role, lists the invite as waiting, and withdraws it', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    const email = await screen.findByRole('textbox', { name: 'E-mail address' });

    await user.type(email, 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Send invite' }));
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address');

    await user.clear(email);
    await user.type(email, '  Dale@Example.test ');
    await user.click(screen.getByRole('radio', { name: /Viewer/ }));
    await user.click(screen.getByRole('button', { name: 'Send invite' }));
    expect(await screen.findByText(/dale@example\.test gets a link that works once/)).toBeInTheDocument();
    expect(partyDb.invites[0]).toMatchObject({ email: 'dale@example.test', role: 'viewer', state: 'pending' });

    const waiting = await screen.findByRole('list', { name: 'Waiting for an answer' });
    expect(waiting).toHaveTextContent('dale@example.test as viewer');
    expect(waiting).toHaveTextContent('E-mail sent');
    await user.click(within(waiting).getByRole('button', { name: 'Withdraw the invite to dale@example.test' }));
    expect(await screen.findByText('The invite to dale@example.test no longer works.')).toBeInTheDocument();
    expect(await screen.findByText('Earlier invites (1)')).toBeInTheDocument();
    expect(partyDb.invites[0]?.state).toBe('revoked');
  });

  it('puts "already on this trip" beside the e-mail field', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    const email = await screen.findByRole('textbox', { name: 'E-mail address' });
    await user.type(email, 'bryn@example.test');
    await user.click(screen.getByRole('button', { name: 'Send invite' }));
    await waitFor(() => expect(email).toHaveAccessibleDescription('bryn@example.test is already on this trip'));
    expect(partyDb.invites).toHaveLength(0);
  });

  it('makes a share link with its expiry, copies it, and revokes it after asking', async () => {
    const { tripId } = party();
    const { user } = renderTab(tripId);
    expect(await screen.findByText('There is no link yet.')).toBeInTheDocument();

    await user.selectOptions(screen.getByRole('combobox', { name: 'Works for' }), '7');
    await user.click(screen.getByRole('button', { name: 'Make a link' }));
    const link = await screen.findByRole('textbox', { name: 'Read-only link' });
    expect((link as HTMLInputElement).value).toMatch(/^http:\/\/gramwatt\.test\/share\/link-/);
    // Made at 3 May 10:00 UTC for 7 days.
    expect(screen.getByText(/Works until 10 May 2026/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    expect(await screen.findByText('Copied.')).toBeInTheDocument();
    expect(await navigator.clipboard.readText()).toBe((link as HTMLInputElement).value);

    await user.click(screen.getByRole('button', { name: 'Revoke the link' }));
    const dialog = await screen.findByRole('dialog', { name: 'Revoke the read-only link?' });
    await user.click(within(dialog).getByRole('button', { name: 'Revoke' }));
    expect(await screen.findByText(/The last link was revoked/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Make a link' })).toBeInTheDocument();
  });

  it('cannot send the plan home without a viewer, and says why', async () => {
    const { tripId } = party();
    renderTab(tripId);
    expect(await screen.findByText(/Nobody to send it to yet/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send the plan home' })).toBeDisabled();
  });

  it('sends the plan home to the viewers with a note and says to whom it went', async () => {
    const { tripId } = party({ withViewer: true });
    const { user } = renderTab(tripId);
    await user.type(await screen.findByRole('textbox', { name: /A note at the top/ }), 'We park at the upper lot.');
    await user.click(screen.getByRole('button', { name: 'Send the plan home' }));
    expect(await screen.findByText('Cal Home (cal@example.test): sent')).toBeInTheDocument();
    expect(partyDb.outbox[0]).toMatchObject({ to: 'cal@example.test', text: 'We park at the upper lot.' });
  });
});

describe('PartyTab for a partner', () => {
  it('shows the party read-only: roles and limits as text, no invites, link or sending', async () => {
    const { tripId } = party({ signedIn: 'partner', withViewer: true });
    seedInvite(tripId, 'someone@example.test', 'partner');
    renderTab(tripId);

    expect(await screen.findByText(/You are a partner here/)).toBeInTheDocument();
    expect(within(memberCard(/Ash Leader/)).getByText('900 g')).toBeInTheDocument();
    expect(within(memberCard(/Bryn Partner \(you\)/)).getByText('No own limit')).toBeInTheDocument();
    expect(screen.queryByRole('button')).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.queryByText('someone@example.test')).toBeNull();
    expect(screen.queryByRole('heading', { name: 'Send the plan home' })).toBeNull();
  });
});
