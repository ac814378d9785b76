import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

const mainNav = () => screen.getByRole('navigation', { name: 'Main' });

describe('AppLayout', () => {
  it('shows a member Locker and Trips but no Admin', async () => {
    seedAccount({ displayName: 'Ash Member', role: 'member' }, { signedIn: true });
    await renderApp('/locker');

    const nav = within(mainNav());
    expect(nav.getByRole('link', { name: 'Locker' })).toHaveAttribute('aria-current', 'page');
    expect(nav.getByRole('link', { name: 'Trips' })).toBeInTheDocument();
    expect(nav.queryByRole('link', { name: 'Admin' })).not.toBeInTheDocument();
  });

  it('shows an admin the Admin link too', async () => {
    seedAccount({ displayName: 'Rowan Admin', role: 'admin' }, { signedIn: true });
    await renderApp('/locker');

    expect(within(mainNav()).getByRole('link', { name: 'Admin' })).toHaveAttribute('href', '/admin/accounts');
  });

  it('has the landmarks and title a screen-reader user relies on', async () => {
    seedAccount({}, { signedIn: true });
    server.use(http.get('*/api/trips', () => HttpResponse.json({ trips: [] })));
    await renderApp('/trips');

    expect(screen.getByRole('banner')).toBeInTheDocument();
    expect(screen.getByRole('main')).toBeInTheDocument();
    expect(screen.getByRole('contentinfo')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveAttribute('href', '#main');
    expect(screen.getByRole('heading', { level: 1, name: 'Trips' })).toBeInTheDocument();
    expect(document.title).toBe('Trips · Gramwatt');
    expect(await screen.findByRole('region', { name: 'No trips yet' })).toBeInTheDocument();
  });

  it('opens the phone menu with the same sections, and closes it on choosing one', async () => {
    seedAccount({ role: 'admin' }, { signedIn: true });
    const { user } = await renderApp('/locker');

    const toggle = screen.getByRole('button', { name: 'Menu' });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');

    const [, phoneNav] = screen.getAllByRole('navigation', { name: 'Main' });
    expect(phoneNav).toBeDefined();
    const links = within(phoneNav!)
      .getAllByRole('link')
      .map((link) => link.textContent);
    expect(links).toEqual(['Locker', 'Trips', 'Admin']);

    await user.click(within(phoneNav!).getByRole('link', { name: 'Trips' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Trips' })).toBeInTheDocument();
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
  });

  it('shows name and e-mail in the account menu and signs out from it', async () => {
    seedAccount({ displayName: 'Ash Member', email: 'ash@example.test' }, { signedIn: true });
    const { user, router } = await renderApp('/locker');

    await user.click(screen.getByRole('button', { name: 'Account: Ash Member' }));
    const menu = await screen.findByRole('menu');
    expect(menu).toHaveTextContent('Ash Member');
    expect(menu).toHaveTextContent('ash@example.test');

    await user.click(within(menu).getByRole('menuitem', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });
});
