import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { db, seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

/** Records the bodies of PATCH /api/admin/accounts/:id while still letting the fake server answer. */
const recordPatches = () => {
  const patches: Array<{ id: string; body: unknown }> = [];
  server.events.on('request:start', async ({ request }) => {
    const match = /\/api\/admin\/accounts\/([^/]+)$/.exec(new URL(request.url).pathname);
    if (request.method === 'PATCH' && match?.[1]) patches.push({ id: match[1], body: await request.clone().json() });
  });
  return patches;
};

const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(`^${name}`) }).closest('tr')!;

describe('AccountsTable', () => {
  it('lists every account with name, e-mail, role and sign-in state', async () => {
    seedAccount({ displayName: 'Rowan Admin', email: 'rowan@example.test', role: 'admin' }, { signedIn: true });
    seedAccount({ displayName: 'Ash Member', email: 'ash@example.test', disabled: true });
    await renderApp('/admin/accounts');

    const table = await screen.findByRole('table', { name: /accounts/i });
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    const ash = within(rowOf('Ash Member'));
    expect(ash.getByRole('cell', { name: 'ash@example.test' })).toBeInTheDocument();
    expect(ash.getByRole('combobox', { name: 'Role of Ash Member' })).toHaveValue('member');
    expect(ash.getByRole('cell', { name: 'Disabled' })).toBeInTheDocument();
    expect(ash.getByRole('button', { name: 'Enable Ash Member' })).toBeInTheDocument();
    expect(within(rowOf('Rowan Admin')).getByRole('rowheader')).toHaveTextContent('(you)');
  });

  it('changes a role through PATCH and shows the new role', async () => {
    seedAccount({ displayName: 'Rowan Admin', role: 'admin' }, { signedIn: true });
    const ash = seedAccount({ displayName: 'Ash Member' });
    const patches = recordPatches();
    const { user } = await renderApp('/admin/accounts');

    await user.selectOptions(await screen.findByRole('combobox', { name: 'Role of Ash Member' }), 'admin');

    expect(await screen.findByText('Ash Member is now admin.')).toBeInTheDocument();
    expect(patches).toEqual([{ id: ash.id, body: { role: 'admin' } }]);
    expect(screen.getByRole('combobox', { name: 'Role of Ash Member' })).toHaveValue('admin');
    expect(db.accounts.find((account) => account.id === ash.id)?.role).toBe('admin');
  });

  it('shows the 409 message when the last admin would be demoted, and keeps the role shown as it is', async () => {
    const rowan = seedAccount({ displayName: 'Rowan Admin', role: 'admin' }, { signedIn: true });
    const patches = recordPatches();
    const { user } = await renderApp('/admin/accounts');

    await user.selectOptions(await screen.findByRole('combobox', { name: 'Role of Rowan Admin' }), 'member');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Change refused');
    expect(alert).toHaveTextContent('Gramwatt needs at least one admin: make someone else an admin first');
    expect(patches).toEqual([{ id: rowan.id, body: { role: 'member' } }]);
    expect(screen.getByRole('combobox', { name: 'Role of Rowan Admin' })).toHaveValue('admin');
  });

  it('disables an account only after confirming in a dialog', async () => {
    seedAccount({ displayName: 'Rowan Admin', role: 'admin' }, { signedIn: true });
    const ash = seedAccount({ displayName: 'Ash Member' });
    const patches = recordPatches();
    const { user } = await renderApp('/admin/accounts');

    await user.click(await screen.findByRole('button', { name: 'Disable Ash Member' }));
    const dialog = await screen.findByRole('dialog', { name: 'Disable Ash Member?' });
    expect(within(dialog).getByRole('button', { name: 'Keep allowed' })).toHaveFocus();
    await user.click(within(dialog).getByRole('button', { name: 'Keep allowed' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(patches).toEqual([]);

    await user.click(screen.getByRole('button', { name: 'Disable Ash Member' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Disable account' }));

    expect(await screen.findByRole('button', { name: 'Enable Ash Member' })).toBeInTheDocument();
    expect(patches).toEqual([{ id: ash.id, body: { disabled: true } }]);
  });

  it('says so when the accounts cannot be loaded', async () => {
    seedAccount({ role: 'admin' }, { signedIn: true });
    server.use(
      http.get('/api/admin/accounts', () =>
        HttpResponse.json(
          { statusCode: 503, message: 'The database is starting; try again shortly', errors: [] },
          { status: 503 },
        ),
      ),
    );
    await renderApp('/admin/accounts');
    expect(await screen.findByRole('alert')).toHaveTextContent('The database is starting; try again shortly');
  });
});
