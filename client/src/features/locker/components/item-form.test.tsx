import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { bankSpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { lockerDb } from '@/testing/mocks/locker-db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

/** Records the JSON bodies sent to the locker items API, while the fake server still answers. */
const recordBodies = () => {
  const bodies: unknown[] = [];
  server.events.on('request:start', async ({ request }) => {
    if (new URL(request.url).pathname.startsWith('/api/locker/items') && ['POST', 'PUT'].includes(request.method))
      bodies.push(await request.clone().json());
  });
  return bodies;
};

const openAddPanel = async () => {
  const view = await renderApp('/locker');
  await view.user.click(await screen.findByRole('button', { name: 'Add an item by hand' }));
  const panel = await screen.findByRole('dialog', { name: 'Add gear' });
  return { ...view, panel: within(panel) };
};

describe('ItemForm in the locker', () => {
  it('shows an inline error for a missing rated power, and sends nothing', async () => {
    seedAccount({}, { signedIn: true });
    const bodies = recordBodies();
    const { user, panel } = await openAddPanel();

    await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Ridge fold-out');
    await user.type(panel.getByRole('textbox', { name: /^USB port maximum current/ }), '2');
    await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '310');
    await user.click(panel.getByRole('button', { name: 'Add to locker' }));

    const ratedW = panel.getByRole('textbox', { name: /^Rated power/ });
    expect(ratedW).toHaveAttribute('aria-invalid', 'true');
    expect(ratedW).toHaveAccessibleDescription(expect.stringContaining('Rated power is required'));
    expect(ratedW).toHaveFocus();
    expect(bodies).toEqual([]);
  });

  it('adds a panel: numbers parsed, the unit in each label, and the new row in the table', async () => {
    seedAccount({}, { signedIn: true });
    const bodies = recordBodies();
    const { user, panel } = await openAddPanel();

    expect(panel.getByRole('textbox', { name: /^Rated power/ })).toHaveAccessibleDescription(
      expect.stringMatching(/^W/),
    );
    await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Ridge fold-out');
    await user.type(panel.getByRole('textbox', { name: /^Rated power/ }), '10');
    await user.type(panel.getByRole('textbox', { name: /^USB port maximum current/ }), '2,1');
    await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '310');
    await user.selectOptions(panel.getByRole('combobox', { name: 'Output port: connector' }), 'usb-c');
    await user.click(panel.getByRole('button', { name: 'Add to locker' }));

    // The panel stays open on the new item, ready for a photo.
    expect(await screen.findByRole('dialog', { name: 'Edit Ridge fold-out' })).toBeInTheDocument();
    expect(bodies).toEqual([
      {
        name: 'Ridge fold-out',
        notes: '',
        countOwned: 1,
        spec: {
          kind: 'panel',
          panelType: 'usb',
          ratedW: 10,
          portVolts: 5,
          portMaxA: 2.1,
          dropoutIrradianceWm2: 0,
          tempCoeffPctPerC: -0.4,
          outputPort: { connector: 'usb-c', captiveCable: false },
          massG: 310,
        },
      },
    ]);
    expect(lockerDb.items).toHaveLength(1);
  });

  it('puts a server 400 on spec.ratedW under the rated power field', async () => {
    seedAccount({}, { signedIn: true });
    server.use(
      http.post('/api/locker/items', () =>
        HttpResponse.json(
          {
            statusCode: 400,
            message: 'Some fields need attention',
            errors: [{ path: 'spec.ratedW', message: 'Rated power may be at most 400 W' }],
          },
          { status: 400 },
        ),
      ),
    );
    const { user, panel } = await openAddPanel();
    await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Big sheet');
    await user.type(panel.getByRole('textbox', { name: /^Rated power/ }), '40');
    await user.type(panel.getByRole('textbox', { name: /^USB port maximum current/ }), '3');
    await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '900');
    await user.click(panel.getByRole('button', { name: 'Add to locker' }));

    const ratedW = panel.getByRole('textbox', { name: /^Rated power/ });
    await expect.poll(() => ratedW.getAttribute('aria-invalid')).toBe('true');
    expect(ratedW).toHaveAccessibleDescription(expect.stringContaining('Rated power may be at most 400 W'));
    expect(panel.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('edits a bank in percent and with a second output port, and sends shares 0–1', async () => {
    const me = seedAccount({}, { signedIn: true });
    const bank = seedLockerItem(me.id, { name: 'Pocket bank', spec: bankSpec({ outputEfficiency: 0.85 }) });
    const bodies = recordBodies();
    const { user } = await renderApp('/locker');
    await user.click(await screen.findByRole('button', { name: 'Edit Pocket bank' }));
    const panel = within(await screen.findByRole('dialog', { name: 'Edit Pocket bank' }));

    const efficiency = panel.getByRole('textbox', { name: /^Output efficiency/ });
    expect(efficiency).toHaveValue('85');
    await user.clear(efficiency);
    await user.type(efficiency, '150');
    await user.click(panel.getByRole('button', { name: 'Save changes' }));
    expect(efficiency).toHaveAccessibleDescription(
      expect.stringContaining('Output efficiency is a percentage above 0 and at most 100'),
    );

    await user.clear(efficiency);
    await user.type(efficiency, '80');
    await user.click(panel.getByRole('button', { name: 'Add an output port' }));
    await user.selectOptions(panel.getByRole('combobox', { name: 'Port 2: connector' }), 'usb-c');
    await user.clear(panel.getByRole('textbox', { name: /^Port 2: maximum current/ }));
    await user.type(panel.getByRole('textbox', { name: /^Port 2: maximum current/ }), '3');
    await user.type(panel.getByRole('textbox', { name: /^Port 2: USB PD voltages/ }), '9, 12');
    await user.click(panel.getByRole('button', { name: 'Save changes' }));

    await expect.poll(() => bodies.length).toBe(1);
    const spec = (bodies[0] as { spec: Record<string, unknown> }).spec;
    expect(spec.outputEfficiency).toBeCloseTo(0.8, 12);
    expect(spec.outputPorts).toEqual([
      { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4, usbPdVolts: [] },
      { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] },
    ]);
    expect(await screen.findByText('Pocket bank saved.')).toBeInTheDocument();
    expect(lockerDb.items.find((item) => item.id === bank.id)?.spec).toMatchObject({ outputEfficiency: 0.8 });
  });

  it('switches the device form by kind and by how its day is measured', async () => {
    seedAccount({}, { signedIn: true });
    const bodies = recordBodies();
    const { user, panel } = await openAddPanel();
    await user.click(panel.getByRole('radio', { name: 'Device' }));

    expect(panel.queryByRole('textbox', { name: /^Transmit current/ })).not.toBeInTheDocument();
    expect(panel.getByRole('textbox', { name: /^Battery used per day/ })).toBeInTheDocument();
    await user.selectOptions(panel.getByRole('combobox', { name: 'What it is' }), 'radio');
    expect(panel.getByRole('textbox', { name: /^Transmit current/ })).toBeInTheDocument();
    expect(panel.getByRole('combobox', { name: 'Measured as' })).toHaveValue('radio-hours');

    await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Handheld radio');
    await user.type(panel.getByRole('textbox', { name: /^Own battery/ }), '11');
    await user.selectOptions(panel.getByRole('combobox', { name: 'Charges by' }), '12v-dc');
    await user.type(panel.getByRole('textbox', { name: /^Charge current/ }), '1');
    await user.type(panel.getByRole('textbox', { name: /^Nominal supply/ }), '13.8');
    await user.type(panel.getByRole('textbox', { name: /^Transmit current/ }), '1.5');
    await user.type(panel.getByRole('textbox', { name: /^Receive current/ }), '0.3');
    await user.type(panel.getByRole('textbox', { name: /^Standby current/ }), '0.05');
    await user.type(panel.getByRole('textbox', { name: /^Transmit time/ }), '20');
    await user.type(panel.getByRole('textbox', { name: /^Receive time/ }), '2');
    await user.type(panel.getByRole('textbox', { name: /^Standby time/ }), '10');
    await user.click(panel.getByRole('button', { name: 'Add to locker' }));

    await expect.poll(() => bodies.length).toBe(1);
    expect((bodies[0] as { spec: unknown }).spec).toMatchObject({
      kind: 'device',
      deviceKind: 'radio',
      chargesVia: '12v-dc',
      chargeCurrentA: 1,
      supplyVoltsNominal: 13.8,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 10 },
    });
  });
});
