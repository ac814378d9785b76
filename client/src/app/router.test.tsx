import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { testPassword } from '@/testing/data';
import { db, seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

describe('routes', () => {
  it('sends a visitor who is not signed in to sign-in, and back to the page after signing in', async () => {
    seedAccount({ email: 'moss@example.test', role: 'admin' });
    const { user, router } = await renderApp('/admin/accounts');

    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?redirectTo=%2Fadmin%2Faccounts');
    expect(document.title).toBe('Sign in · Gramwatt');

    await user.type(screen.getByLabelText('E-mail'), 'moss@example.test');
    await user.type(screen.getByLabelText('Password'), testPassword);
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Accounts' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/accounts');
  });

  it('opens the locker at the root address for a signed-in member', async () => {
    seedAccount({}, { signedIn: true });
    const { router } = await renderApp('/');
    expect(router.state.location.pathname).toBe('/locker');
    expect(screen.getByRole('heading', { level: 1, name: 'Locker' })).toBeInTheDocument();
  });

  it('sends a signed-in member away from the sign-in page', async () => {
    seedAccount({}, { signedIn: true });
    const { router } = await renderApp('/sign-in');
    expect(router.state.location.pathname).toBe('/locker');
  });

  it('tells a member that the admin screen is not for them, inside the app frame', async () => {
    seedAccount({ role: 'member' }, { signedIn: true });
    await renderApp('/admin/accounts');
    expect(screen.getByRole('heading', { level: 1, name: 'Not for your account' })).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
  });

  it('shows a not-found page for an unknown address', async () => {
    await renderApp('/no/such/place');
    expect(screen.getByRole('heading', { level: 1, name: 'This page does not exist' })).toBeInTheDocument();
    expect(document.title).toBe('Not found · Gramwatt');
  });

  it('shows the error boundary when the API fails while checking the session', async () => {
    server.use(
      http.get('/api/auth/me', () =>
        HttpResponse.json({ statusCode: 500, message: 'Database is down', errors: [] }, { status: 500 }),
      ),
    );
    await renderApp('/locker');
    expect(screen.getByRole('heading', { level: 1, name: 'Something went wrong' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();
  });

  it('returns to sign-in when the session ends mid-visit (an admin disabled the account)', async () => {
    const me = seedAccount({ role: 'admin' }, { signedIn: true });
    const { user, router } = await renderApp('/locker');
    me.disabled = true;
    db.sessionAccountId = me.id;

    await user.click(screen.getByRole('link', { name: 'Admin' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    // The 401 may land before or after the admin page commits, so the way back is either page.
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('creates an account from the sign-up page and lands in the locker', async () => {
    const { user } = await renderApp('/sign-up');
    expect(document.title).toBe('Create an account · Gramwatt');
    await user.type(screen.getByLabelText('Name'), 'Sorrel Kite');
    await user.type(screen.getByLabelText('E-mail'), 'sorrel@example.test');
    await user.type(screen.getByLabelText('Password'), testPassword);
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Locker' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Account: Sorrel Kite' })).toBeInTheDocument();
  });
});
