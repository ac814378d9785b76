import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import {
  bankSpec,
  batterySpec,
  controllerSpec,
  leadSpec,
  panelSpec,
  seedCatalogueEntry,
  twelveVoltPanelSpec,
} from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { lockerDb } from '@/testing/mocks/locker-db';
import { renderApp } from '@/testing/test-utils';

describe('Catalogue', () => {
  it('lets a member browse by power role and copy an entry into the locker in one click', async () => {
    const me = seedAccount({ role: 'member' }, { signedIn: true });
    seedCatalogueEntry({ name: 'Generic 10 W fold-out', spec: panelSpec() });
    seedCatalogueEntry({ name: 'Generic 10,000 mAh bank', spec: bankSpec() });
    seedCatalogueEntry({ name: 'Generic 1 m USB-A to USB-C lead', spec: leadSpec() });
    const { user } = await renderApp('/catalogue');

    const headings = (await screen.findAllByRole('heading', { level: 2 })).map((heading) => heading.textContent);
    expect(headings).toEqual(['Collect', 'Store', 'Connect']);
    expect(screen.queryByRole('link', { name: 'Manage the catalogue' })).not.toBeInTheDocument();
    const collect = within(screen.getByRole('region', { name: 'Collect' }));
    expect(collect.getByText('10 W · 5 V 2 A')).toBeInTheDocument();

    await user.click(collect.getByRole('button', { name: 'Add Generic 10 W fold-out to my locker' }));

    expect(await screen.findByText('Generic 10 W fold-out is in your locker')).toBeInTheDocument();
    expect(collect.getByText('In your locker')).toBeInTheDocument();
    expect(lockerDb.items.filter((item) => item.ownerId === me.id).map((item) => [item.name, item.countOwned])).toEqual(
      [['Generic 10 W fold-out', 1]],
    );

    await user.click(screen.getByRole('link', { name: 'Open the locker' }));
    expect(await screen.findByRole('rowheader', { name: /Generic 10 W fold-out/ })).toBeInTheDocument();
  });

  it('lets an admin add an entry with the same per-kind form', async () => {
    seedAccount({ role: 'admin' }, { signedIn: true });
    const { user } = await renderApp('/admin/catalogue');

    await user.click(await screen.findByRole('button', { name: 'Add an entry' }));
    const panel = within(await screen.findByRole('dialog', { name: 'Add a catalogue entry' }));
    expect(panel.queryByRole('textbox', { name: /^Count owned/ })).not.toBeInTheDocument();
    await user.click(panel.getByRole('radio', { name: 'Lead' }));
    await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Generic 30 cm USB-C lead');
    await user.selectOptions(panel.getByRole('combobox', { name: 'From connector' }), 'usb-c');
    await user.type(panel.getByRole('textbox', { name: /^Length/ }), '0.3');
    await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '15');
    await user.click(panel.getByRole('button', { name: 'Add to the catalogue' }));

    expect(await screen.findByText('Generic 30 cm USB-C lead is in the catalogue.')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: /catalogue entries/i });
    expect(within(table).getByRole('rowheader', { name: 'Generic 30 cm USB-C lead' })).toBeInTheDocument();
    expect(lockerDb.catalogue[0]?.spec).toEqual({
      kind: 'lead',
      fromConnector: 'usb-c',
      toConnector: 'usb-c',
      lengthM: 0.3,
      massG: 15,
    });
  });

  it('shows the 12 V gear in its power roles: a 12 V panel in Collect, a battery in Store, a controller in Convert', async () => {
    seedAccount({ role: 'member' }, { signedIn: true });
    seedCatalogueEntry({ name: 'Generic 30 W 12 V panel', spec: twelveVoltPanelSpec() });
    seedCatalogueEntry({ name: 'Generic 6 Ah LiFePO4 pack', spec: batterySpec() });
    seedCatalogueEntry({ name: 'Generic 5 A PWM controller', spec: controllerSpec() });
    await renderApp('/catalogue');

    const headings = (await screen.findAllByRole('heading', { level: 2 })).map((heading) => heading.textContent);
    expect(headings).toEqual(['Collect', 'Store', 'Convert']);
    expect(
      within(screen.getByRole('region', { name: 'Collect' })).getByText(
        '30 W 12 V · 18 V 1.67 A at max power · 21.6 V open circuit',
      ),
    ).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Store' })).getByText('LiFePO4 4S · 6 Ah')).toBeInTheDocument();
    expect(
      within(screen.getByRole('region', { name: 'Convert' })).getByText('PWM · up to 25 V in · 5 A charge'),
    ).toBeInTheDocument();
  });

  it('keeps members out of the catalogue admin screen', async () => {
    seedAccount({ role: 'member' }, { signedIn: true });
    await renderApp('/admin/catalogue');
    expect(screen.getByRole('heading', { level: 1, name: 'Not for your account' })).toBeInTheDocument();
  });
});
