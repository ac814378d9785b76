import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { db, seedAccount } from '@/testing/mocks/db';
import { partyDb, seedInvite, seedPartyTrip } from '@/testing/mocks/party-db';
import { server } from '@/testing/mocks/server';
import { testPassword } from '@/testing/data';
import { renderApp } from '@/testing/test-utils';

/** Signing in, joining and loading the trip's page take a few round trips on a busy machine. */
const joinTimeout = { timeout: 5000 };
/** Typing a whole form with user-event is slow on a shared machine. */
const formTestTimeoutMs = 20_000;

/** A leader's trip with one pending invite to `email`. */
const invited = (email: string, role: 'partner' | 'viewer' = 'partner') => {
  const leader = seedAccount({ displayName: 'Ash Leader' });
  const tripId = seedPartyTrip('Invented ridge walk', [{ account: leader, role: 'leader' }]);
  const invite = seedInvite(tripId, email, role);
  // The trip page the invite leads to is the trips feature's; here it only needs to answer.
  server.use(
    http.get('*/api/trips/:id', () =>
      HttpResponse.json({ statusCode: 404, message: 'Trip not found', errors: [] }, { status: 404 }),
    ),
  );
  return { tripId, invite };
};

describe('the invite page', () => {
  it(
    'shows the trip, the role and who invited, then makes an account and joins',
    async () => {
      const { tripId, invite } = invited('dale@example.test');
      const { user, router } = await renderApp(`/invites/${invite.token}`);

      expect(await screen.findByText(/Ash Leader asks you to join/)).toHaveTextContent(
        'Ash Leader asks you to join Invented ridge walk as a partner.',
      );
      await user.click(screen.getByRole('tab', { name: 'I am new here' }));
      const form = screen.getByRole('form', { name: 'Make an account to accept' });
      await user.type(within(form).getByRole('textbox', { name: /Name/ }), 'Dale');
      await user.type(within(form).getByRole('textbox', { name: 'E-mail' }), 'dale@example.test');
      await user.type(within(form).getByLabelText('Password'), testPassword);
      await user.click(within(form).getByRole('button', { name: 'Create account' }));

      await waitFor(() => expect(router.state.location.pathname).toBe(`/trips/${tripId}`), joinTimeout);
      expect(partyDb.members.get(tripId)?.map((m) => [m.email, m.role])).toContainEqual([
        'dale@example.test',
        'partner',
      ]);
      expect(invite.state).toBe('accepted');
    },
    formTestTimeoutMs,
  );

  it(
    'signs in with an existing account and joins at once',
    async () => {
      seedAccount({ email: 'erin@example.test' });
      const { tripId, invite } = invited('erin@example.test', 'viewer');
      const { user, router } = await renderApp(`/invites/${invite.token}`);

      expect(await screen.findByText(/asks you to join/)).toHaveTextContent('as a viewer');
      const form = screen.getByRole('form', { name: 'Sign in to accept' });
      await user.type(within(form).getByRole('textbox', { name: 'E-mail' }), 'erin@example.test');
      await user.type(within(form).getByLabelText('Password'), testPassword);
      await user.click(within(form).getByRole('button', { name: 'Sign in' }));
      await waitFor(() => expect(router.state.location.pathname).toBe(`/trips/${tripId}`), joinTimeout);
    },
    formTestTimeoutMs,
  );

  it('joins with one button when already signed in with the invited address', async () => {
    seedAccount({ email: 'fen@example.test', displayName: 'Fen' }, { signedIn: true });
    const { tripId, invite } = invited('fen@example.test');
    const { user, router } = await renderApp(`/invites/${invite.token}`);
    expect(await screen.findByText(/Signed in as Fen \(fen@example.test\)/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Join Invented ridge walk' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/trips/${tripId}`), joinTimeout);
  });

  it('explains an invite meant for another address and offers to sign out', async () => {
    seedAccount({ email: 'other@example.test' }, { signedIn: true });
    const { invite } = invited('gale@example.test');
    const { user } = await renderApp(`/invites/${invite.token}`);
    await user.click(await screen.findByRole('button', { name: /^Join/ }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('sent to another e-mail address');
    await user.click(within(alert).getByRole('button', { name: 'Sign out and use that address' }));
    expect(await screen.findByRole('tab', { name: 'I have an account' })).toBeInTheDocument();
    expect(db.sessionAccountId).toBeNull();
  });

  it.each([
    ['accepted', 'This invite was already used'],
    ['revoked', 'This invite was withdrawn by the trip leader'],
    ['expired', 'This invite has expired: ask the trip leader for a new one'],
  ] as const)('says plainly that a %s invite no longer works', async (state, message) => {
    const { invite } = invited('hal@example.test');
    invite.state = state;
    await renderApp(`/invites/${invite.token}`);
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This invite no longer works');
    expect(alert).toHaveTextContent(message);
    expect(screen.queryByRole('tab')).toBeNull();
  });

  it('says an unknown link is not recognised', async () => {
    await renderApp('/invites/not-a-token-of-ours');
    expect(await screen.findByRole('alert')).toHaveTextContent('This invite link is not recognised');
  });
});
