import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { bankSpec, leadSpec, panelSpec, phoneSpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { lockerDb } from '@/testing/mocks/locker-db';
import { server } from '@/testing/mocks/server';
import { createTestQueryClient, renderApp } from '@/testing/test-utils';
import { LockerScreen } from './locker-screen';

/** Records the method and path of every request to the locker items API. */
const recordRequests = () => {
  const requests: string[] = [];
  server.events.on('request:start', ({ request }) => {
    const { pathname } = new URL(request.url);
    if (pathname.startsWith('/api/locker')) requests.push(`${request.method} ${pathname}`);
  });
  return requests;
};

const group = (label: string) => screen.getByRole('rowgroup', { name: new RegExp(`^${label}`) });
const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(name) }).closest('tr')!;

const seedMixedLocker = () => {
  const me = seedAccount({}, { signedIn: true });
  seedLockerItem(me.id, { name: 'Ridge fold-out 10 W', spec: panelSpec({ massG: 300 }), countOwned: 2 });
  seedLockerItem(me.id, { name: 'Scree 21 W panel', spec: panelSpec({ ratedW: 21, massG: 520 }) });
  seedLockerItem(me.id, { name: 'Pocket bank 10k', spec: bankSpec({ massG: 200 }) });
  seedLockerItem(me.id, { name: 'Short USB-C lead', spec: leadSpec({ massG: 30 }), countOwned: 3 });
  seedLockerItem(me.id, { name: 'Trail phone', spec: phoneSpec() });
  return me;
};

describe('LockerScreen', () => {
  it('groups the items by power role, with grams per row, per group and for the whole locker', async () => {
    seedMixedLocker();
    await renderApp('/locker');

    const table = await screen.findByRole('table');
    const groupNames = within(table)
      .getAllByRole('rowgroup')
      .map((rowgroup) => rowgroup.getAttribute('aria-labelledby'))
      .filter(Boolean)
      .map((id) => document.getElementById(id!)?.textContent?.split(/\d/)[0]);
    expect(groupNames).toEqual(['Collect', 'Store', 'Connect', 'Use']);

    expect(
      within(group('Collect'))
        .getAllByRole('rowheader')
        .map((cell) => cell.textContent),
    ).toEqual([expect.stringContaining('Ridge fold-out 10 W'), expect.stringContaining('Scree 21 W panel')]);
    // 300 g × 2 + 520 g = 1,120 g for the panels.
    expect(group('Collect')).toHaveAccessibleName(/2 items · 1,120 g/);
    const ridge = within(rowOf('Ridge fold-out'));
    expect(ridge.getByRole('cell', { name: '10 W · 5 V 2 A' })).toBeInTheDocument();
    expect(ridge.getByRole('cell', { name: '300 g' })).toBeInTheDocument();
    expect(ridge.getByRole('cell', { name: '600 g' })).toBeInTheDocument();
    // Devices show their grams but are carried anyway: not in the total.
    expect(group('Use')).toHaveAccessibleName(/190 g, not in the total/);
    // 600 + 520 + 200 + 90 = 1,410 g of power gear.
    expect(screen.getByLabelText('Locker total: 1,410 g')).toBeInTheDocument();
  });

  it('filters by search text and by kind, and sorts within each group', async () => {
    seedMixedLocker();
    const { user } = await renderApp('/locker');
    await screen.findByRole('table');

    await user.type(screen.getByRole('searchbox', { name: 'Search' }), 'scree');
    expect(screen.getAllByRole('rowheader').map((cell) => cell.textContent)).toEqual([
      expect.stringContaining('Scree 21 W panel'),
    ]);
    await user.clear(screen.getByRole('searchbox', { name: 'Search' }));

    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'lead');
    expect(screen.getAllByRole('rowheader').map((cell) => cell.textContent)).toEqual([
      expect.stringContaining('Short USB-C lead'),
    ]);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'all');

    const eachHeader = screen.getByRole('columnheader', { name: /Each/ });
    await user.click(within(eachHeader).getByRole('button'));
    expect(eachHeader).toHaveAttribute('aria-sort', 'descending');
    expect(
      within(group('Collect'))
        .getAllByRole('rowheader')
        .map((cell) => cell.textContent),
    ).toEqual([expect.stringContaining('Scree 21 W panel'), expect.stringContaining('Ridge fold-out 10 W')]);
  });

  it('offers the catalogue, an import and a hand-made item when the locker is empty', async () => {
    seedAccount({}, { signedIn: true });
    await renderApp('/locker');
    const empty = await screen.findByRole('region', { name: 'Nothing in your locker yet' });
    expect(within(empty).getByRole('link', { name: 'Start from the catalogue' })).toHaveAttribute('href', '/catalogue');
    expect(within(empty).getByRole('button', { name: 'Import a CSV file' })).toBeInTheDocument();
    expect(within(empty).getByRole('button', { name: 'Add an item by hand' })).toBeInTheDocument();
  });

  it('deletes after a confirm, hides the row at once and sends nothing when Undo is pressed', async () => {
    const me = seedMixedLocker();
    const requests = recordRequests();
    const { user } = await renderApp('/locker');
    await screen.findByRole('table');

    await user.click(screen.getByRole('button', { name: 'Delete Pocket bank 10k' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete Pocket bank 10k?' });
    await user.click(within(dialog).getByRole('button', { name: 'Delete' }));

    expect(screen.queryByRole('rowheader', { name: /Pocket bank/ })).not.toBeInTheDocument();
    expect(screen.getByLabelText('Locker total: 1,210 g')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Undo deleting Pocket bank 10k' }));

    expect(screen.getByRole('rowheader', { name: /Pocket bank/ })).toBeInTheDocument();
    expect(screen.getByLabelText('Locker total: 1,410 g')).toBeInTheDocument();
    expect(requests.filter((request) => request.startsWith('DELETE'))).toEqual([]);
    expect(lockerDb.items.filter((item) => item.ownerId === me.id)).toHaveLength(5);
  });

  it('sends the DELETE once the undo window has passed', async () => {
    const me = seedMixedLocker();
    const bank = lockerDb.items.find((item) => item.name === 'Pocket bank 10k')!;
    const requests = recordRequests();
    const user = userEvent.setup();
    render(
      <QueryClientProvider client={createTestQueryClient()}>
        <MemoryRouter>
          <LockerScreen catalogueHref="/catalogue" undoMs={200} />
        </MemoryRouter>
      </QueryClientProvider>,
    );
    await screen.findByRole('table');

    await user.click(screen.getByRole('button', { name: 'Delete Pocket bank 10k' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Delete' }));
    expect(screen.getByRole('button', { name: 'Undo deleting Pocket bank 10k' })).toBeInTheDocument();
    expect(requests.filter((request) => request.startsWith('DELETE'))).toEqual([]);

    await waitFor(() => expect(requests).toContain(`DELETE /api/locker/items/${bank.id}`));
    await waitFor(() => expect(screen.queryByRole('button', { name: /Undo deleting/ })).not.toBeInTheDocument());
    expect(screen.queryByRole('rowheader', { name: /Pocket bank/ })).not.toBeInTheDocument();
    expect(lockerDb.items.filter((item) => item.ownerId === me.id)).toHaveLength(4);
  });

  it('brings the row back and says so when the server refuses the delete', async () => {
    seedMixedLocker();
    server.use(
      http.delete('/api/locker/items/:id', () =>
        HttpResponse.json({ statusCode: 503, message: 'The database is busy', errors: [] }, { status: 503 }),
      ),
    );
    const user = userEvent.setup();
    render(
      <QueryClientProvider client={createTestQueryClient()}>
        <MemoryRouter>
          <LockerScreen catalogueHref="/catalogue" undoMs={50} />
        </MemoryRouter>
      </QueryClientProvider>,
    );
    await screen.findByRole('table');
    await user.click(screen.getByRole('button', { name: 'Delete Trail phone' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Delete' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Trail phone was not deleted');
    expect(screen.getByRole('alert')).toHaveTextContent('The database is busy');
    expect(screen.getByRole('rowheader', { name: /Trail phone/ })).toBeInTheDocument();
  });
});
