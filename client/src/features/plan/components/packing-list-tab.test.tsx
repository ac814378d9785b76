import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { installPlanApi } from '@/testing/mocks/plan-handlers';
import { buildChosenKit, buildPlanTrip, fixtureGear, kitLines, optimumLines, planTripId } from '@/testing/plan-data';
import { renderWithProviders } from '@/testing/test-utils';
import { PackingListTab } from './packing-list-tab';

const renderPackingList = () => renderWithProviders(<PackingListTab tripId={planTripId} canSolve canChooseKit />);

describe('PackingListTab', () => {
  it('says no kit is chosen yet', async () => {
    installPlanApi();
    renderPackingList();
    expect(await screen.findByRole('heading', { name: 'No kit chosen yet' })).toBeInTheDocument();
  });

  it('lists the chosen kit by carrier with grams, the devices, every lead per hop, the schedule and the cautions', async () => {
    installPlanApi({ chosen: buildChosenKit([...optimumLines(), ...kitLines({ spareLead: 1 })], { source: 'swap' }) });
    renderPackingList();
    expect(await screen.findByRole('heading', { name: 'Packing list: Test high route' })).toBeInTheDocument();
    expect(screen.getByText(/10 Mar 2027 to 15 Mar 2027 · 6 days · times in Africa\/Johannesburg/)).toBeInTheDocument();
    expect(screen.getByText('From a swap from the plan, chosen 20 Feb 2027.')).toBeInTheDocument();

    const carrier = screen.getByRole('region', { name: 'Carried by Test Leader (leader)' });
    const gear = within(carrier).getByRole('table', { name: 'Power gear Test Leader packs' });
    expect(within(gear).getByRole('rowheader', { name: fixtureGear.boost.name }).closest('tr')).toHaveTextContent(
      '× 145 g',
    );
    expect(within(gear).getByRole('rowheader', { name: 'Power gear in all' }).closest('tr')).toHaveTextContent('907 g');
    expect(within(carrier).getByText(/^Devices \(500 g, carried anyway/)).toBeInTheDocument();

    const leads = screen.getByRole('region', { name: 'Leads for each hop' });
    expect(
      within(leads)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual([
      `${fixtureGear.panel.name} → ${fixtureGear.bigBank.name}: ${fixtureGear.usbLead.name}`,
      `${fixtureGear.bigBank.name} → ${fixtureGear.boost.name} → Test handheld radio: ${fixtureGear.dcLead.name}`,
      `${fixtureGear.bigBank.name} → Test phone: ${fixtureGear.usbLead.name}`,
    ]);
    expect(
      within(leads).getByText(`Also in the kit, for no hop of the schedule: ${fixtureGear.spareLead.name}.`),
    ).toBeInTheDocument();

    const schedule = screen.getByRole('table', { name: 'Charging schedule, local time' });
    const rows = within(schedule).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(18);
    expect(rows[0]).toHaveTextContent(
      `Day 108:30–14:30Sun: ${fixtureGear.bigBank.name} from ${fixtureGear.panel.name}21 Wh`,
    );
    expect(rows[1]).toHaveTextContent(
      `Day 116:00–08:30ends the next morningTop-up: Test handheld radio from ${fixtureGear.bigBank.name} via ${fixtureGear.boost.name}22 Wh`,
    );

    expect(screen.getByRole('region', { name: 'Cautions' })).toHaveTextContent(/Fuse DC leads on the positive side/);
  });

  it('says when an earlier version of the planner judged the chosen kit, and not otherwise', async () => {
    installPlanApi({ chosen: buildChosenKit(optimumLines(), { modelVersion: 'gramwatt-plan-1' }) });
    renderPackingList();
    expect(await screen.findByText('An earlier version of the planner judged this kit')).toBeInTheDocument();
    expect(screen.getByText(/Choose the kit again/)).toBeInTheDocument();
  });

  it('shows neither caution for a kit the current planner judged on the trip as it is', async () => {
    installPlanApi({ chosen: buildChosenKit() });
    renderPackingList();
    expect(await screen.findByRole('heading', { name: 'Packing list: Test high route' })).toBeInTheDocument();
    expect(screen.queryByText(/earlier version of the planner/)).toBeNull();
    expect(screen.queryByText('The trip or its gear changed after this kit was chosen')).toBeNull();
  });

  it('says when the trip changed after the kit was chosen', async () => {
    const trip = buildPlanTrip();
    const changed = {
      ...trip,
      devices: trip.devices.map((d, i) => (i === 0 ? { ...d, updatedAt: '2027-02-21T09:00:00.000Z' } : d)),
    };
    installPlanApi({ trip: changed, chosen: buildChosenKit() });
    renderPackingList();
    expect(await screen.findByText('The trip or its gear changed after this kit was chosen')).toBeInTheDocument();
    expect(screen.getByText(/for the devices, use and gear the trip had then/)).toBeInTheDocument();
  });

  it("says when the kit's gear was edited in the locker after the kit was chosen", async () => {
    installPlanApi({ chosen: buildChosenKit(optimumLines(), { gearChangedAt: '2027-02-21T09:00:00.000Z' }) });
    renderPackingList();
    expect(await screen.findByText('The trip or its gear changed after this kit was chosen')).toBeInTheDocument();
  });

  it('prints from the Print button', async () => {
    installPlanApi({ chosen: buildChosenKit() });
    const print = vi.spyOn(window, 'print').mockImplementation(() => {});
    const { user } = renderPackingList();
    await user.click(await screen.findByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledOnce();
    print.mockRestore();
  });
});
