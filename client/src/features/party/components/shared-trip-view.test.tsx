import type { SharedTrip } from '@gramwatt/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { partyDb } from '@/testing/mocks/party-db';
import { renderApp } from '@/testing/test-utils';

/** An invented trip as a share link shows it. */
const sharedTrip: SharedTrip = {
  name: 'Invented lakes loop',
  startDate: '2027-07-12',
  endDate: '2027-07-16',
  nights: 4,
  latitudeDeg: 61.2034,
  longitudeDeg: -9.8012,
  timeZone: 'Etc/GMT+1',
  gramLimitG: 1500,
  members: [
    { displayName: 'Ash Leader', role: 'leader' },
    { displayName: 'Cal Home', role: 'viewer' },
  ],
  devices: [{ name: 'Invented handheld', deviceKind: 'radio', carrierName: 'Ash Leader' }],
  plan: {
    verdict: 'Keeps up: 31 % to spare on the worst day.',
    kitMassG: 612,
    carriers: [
      {
        name: 'Ash Leader',
        massG: 612,
        items: [
          { name: 'Invented fold panel', count: 1 },
          { name: 'Invented bank', count: 2 },
        ],
      },
    ],
    cautions: [
      'Fuse DC leads on the positive side close to the battery.',
      'Figures are estimates, not a guarantee: carry a margin.',
    ],
    earlierPlanner: false,
    tripChanged: false,
  },
  linkExpiresAt: '2027-08-01T10:00:00.000Z',
};

describe('the shared trip page', () => {
  it('shows dates, start point, party, devices, the kit per carrier and the cautions, with no account', async () => {
    partyDb.sharedTrips.set('good', sharedTrip);
    await renderApp('/share/good');

    expect(await screen.findByRole('heading', { level: 1, name: 'Invented lakes loop' })).toBeInTheDocument();
    expect(screen.getByText('12 Jul 2027 to 16 Jul 2027 (4 nights)')).toBeInTheDocument();
    expect(screen.getByText('61.2034° N, 9.8012° W')).toBeInTheDocument();
    const party = within(screen.getByRole('region', { name: 'The party' }));
    expect(party.getByText('Cal Home').parentElement).toHaveTextContent('Viewer');
    expect(screen.getByRole('region', { name: 'Devices' })).toHaveTextContent(
      'Invented handheld (radio), carried by Ash Leader',
    );
    const kit = within(screen.getByRole('region', { name: 'The kit' }));
    expect(kit.getByText('Keeps up: 31 % to spare on the worst day.')).toBeInTheDocument();
    expect(kit.getByText('2 × Invented bank')).toBeInTheDocument();
    const cautions = screen.getByRole('region', { name: 'Cautions' });
    expect(cautions).toHaveTextContent('Fuse DC leads');
    expect(within(cautions).getAllByRole('listitem')).toHaveLength(2);
    expect(screen.queryByRole('navigation')).toBeNull();
    expect(screen.queryByText(/earlier version of the planner/)).toBeNull();
    expect(screen.queryByText(/trip changed after/)).toBeNull();
  });

  it.each([
    { flag: 'tripChanged', title: 'The trip or its gear changed after this kit was chosen' },
    { flag: 'earlierPlanner', title: 'An earlier version of the planner judged this kit' },
  ] as const)('says "$title" when the summary says so, and only that', async ({ flag, title }) => {
    const plan = sharedTrip.plan && { ...sharedTrip.plan, [flag]: true };
    partyDb.sharedTrips.set(flag, { ...sharedTrip, plan });
    await renderApp(`/share/${flag}`);
    const kit = within(await screen.findByRole('region', { name: 'The kit' }));
    expect(kit.getByText(title)).toBeInTheDocument();
    expect(kit.getAllByText(/Ask the trip leader to choose the kit again/)).toHaveLength(1);
    expect(kit.getByText('Keeps up: 31 % to spare on the worst day.')).toBeInTheDocument();
  });

  it('says when the leader has not chosen a kit yet, and shows the standing cautions', async () => {
    partyDb.sharedTrips.set('no-plan', { ...sharedTrip, plan: null });
    await renderApp('/share/no-plan');
    expect(await screen.findByText(/has not chosen a kit yet/)).toBeInTheDocument();
    const cautions = screen.getByRole('region', { name: 'Cautions' });
    expect(cautions).toHaveTextContent('Figures are estimates');
    expect(cautions).toHaveTextContent('Lithium batteries can burn');
  });

  it('says a revoked link no longer works, and an unknown one is not recognised', async () => {
    partyDb.sharedTrips.set('gone', { status: 410, message: 'This share link was revoked by the trip leader' });
    await renderApp('/share/gone');
    expect(await screen.findByRole('heading', { level: 1, name: 'This link no longer works' })).toBeInTheDocument();
    expect(screen.getByText('This share link was revoked by the trip leader.')).toBeInTheDocument();
  });

  it('says an unknown link is not recognised', async () => {
    await renderApp('/share/never-made');
    expect(await screen.findByRole('heading', { level: 1, name: 'This link is not recognised' })).toBeInTheDocument();
  });
});
