import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { batterySpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { lockerDb } from '@/testing/mocks/locker-db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

/** The add and edit forms of the 12 V path: battery, controller, 12 V panel and a DC lead's gauge and fuse. */

const recordBodies = () => {
  const bodies: unknown[] = [];
  server.events.on('request:start', async ({ request }) => {
    if (new URL(request.url).pathname.startsWith('/api/locker/items') && ['POST', 'PUT'].includes(request.method))
      bodies.push(await request.clone().json());
  });
  return bodies;
};

const openAddForm = async (kind: string) => {
  const view = await renderApp('/locker');
  await view.user.click(await screen.findByRole('button', { name: 'Add an item by hand' }));
  const panel = within(await screen.findByRole('dialog', { name: 'Add gear' }));
  await view.user.click(panel.getByRole('radio', { name: kind }));
  return { ...view, panel };
};

const specOf = (body: unknown) => (body as { spec: Record<string, unknown> }).spec;

/** Filling a whole form takes a while on a busy machine. */
const formTimeoutMs = 20_000;

/** Closes the side panel (which hides the table from assistive tech while open) and returns a power-role group. */
const groupAfterClosing = async (user: { click: (el: Element) => Promise<void> }, role: string) => {
  await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Cancel' }));
  return screen.findByRole('rowgroup', { name: new RegExp(`^${role}`) });
};

describe('12 V gear in the item form', () => {
  it(
    'adds a battery: chemistry, cells, Ah and the optional maker ratings; it lands in Store',
    async () => {
      seedAccount({}, { signedIn: true });
      const bodies = recordBodies();
      const { user, panel } = await openAddForm('Battery');

      expect(panel.getByRole('combobox', { name: 'Chemistry' })).toHaveValue('lifepo4');
      await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Tarn 6 Ah pack');
      await user.type(panel.getByRole('textbox', { name: /^Capacity/ }), '6');
      await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '780');
      await user.type(panel.getByRole('textbox', { name: /^Continuous discharge rate/ }), '1');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));

      await expect.poll(() => bodies.length).toBe(1);
      // Rates left empty are not sent: the engine then uses the chemistry's typical charge rate.
      expect(specOf(bodies[0])).toEqual({
        kind: 'battery',
        chemistry: 'lifepo4',
        cellsInSeries: 4,
        capacityAh: 6,
        dischargeCRate: 1,
        port: { connector: 'ring-terminal', captiveCable: false },
        massG: 780,
      });
      expect(await screen.findByRole('dialog', { name: 'Edit Tarn 6 Ah pack' })).toBeInTheDocument();
      const store = await groupAfterClosing(user, 'Store');
      expect(within(store).getByRole('rowheader', { name: /Tarn 6 Ah pack/ })).toBeInTheDocument();
      expect(within(store).getByRole('cell', { name: 'LiFePO4 4S · 6 Ah' })).toBeInTheDocument();
    },
    formTimeoutMs,
  );

  it(
    'a battery with a fractional cell count shows the schema message under the field and sends nothing',
    async () => {
      seedAccount({}, { signedIn: true });
      const bodies = recordBodies();
      const { user, panel } = await openAddForm('Battery');
      await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Odd pack');
      const cells = panel.getByRole('textbox', { name: /^Cells in series/ });
      await user.clear(cells);
      await user.type(cells, '3.5');
      await user.type(panel.getByRole('textbox', { name: /^Capacity/ }), '2');
      await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '200');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));

      expect(cells).toHaveAttribute('aria-invalid', 'true');
      expect(cells).toHaveAccessibleDescription(expect.stringContaining('Cells in series is a whole number'));
      expect(bodies).toEqual([]);
    },
    formTimeoutMs,
  );

  it(
    'adds a PWM controller with its efficiency in percent, sent as a share; it lands in Convert',
    async () => {
      seedAccount({}, { signedIn: true });
      const bodies = recordBodies();
      const { user, panel } = await openAddForm('Controller');

      expect(panel.getByRole('textbox', { name: /^Efficiency/ })).toHaveValue('95');
      await user.selectOptions(panel.getByRole('combobox', { name: 'Type' }), 'pwm');
      await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Little PWM');
      await user.type(panel.getByRole('textbox', { name: /^Input voltage limit/ }), '25');
      await user.type(panel.getByRole('textbox', { name: /^Charge current limit/ }), '5');
      await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '70');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));

      await expect.poll(() => bodies.length).toBe(1);
      expect(specOf(bodies[0])).toEqual({
        kind: 'controller',
        controllerType: 'pwm',
        maxInputVolts: 25,
        maxChargeA: 5,
        efficiency: 0.95,
        inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
        outputPort: { connector: 'ring-terminal', captiveCable: false },
        massG: 70,
      });
      const convert = await groupAfterClosing(user, 'Convert');
      expect(within(convert).getByRole('rowheader', { name: /Little PWM/ })).toBeInTheDocument();
    },
    formTimeoutMs,
  );

  it(
    'a 12 V panel swaps the USB port fields for its datasheet, and Voc must be above Vmp',
    async () => {
      seedAccount({}, { signedIn: true });
      const bodies = recordBodies();
      const { user, panel } = await openAddForm('Panel');

      await user.selectOptions(panel.getByRole('combobox', { name: 'Panel type' }), '12v');
      expect(panel.queryByRole('textbox', { name: /^USB port voltage/ })).not.toBeInTheDocument();
      // The USB-A socket a new panel starts with becomes a DC barrel.
      expect(panel.getByRole('combobox', { name: 'Output port: connector' })).toHaveValue('barrel-5.5x2.1');
      await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Slope 30 W');
      await user.type(panel.getByRole('textbox', { name: /^Rated power/ }), '30');
      await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '900');
      await user.type(panel.getByRole('textbox', { name: /^Maximum-power voltage/ }), '18');
      await user.type(panel.getByRole('textbox', { name: /^Maximum-power current/ }), '1.67');
      const voc = panel.getByRole('textbox', { name: /^Open-circuit voltage/ });
      await user.type(voc, '17');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));

      expect(voc).toHaveAccessibleDescription(
        expect.stringContaining('Open-circuit voltage must be above the maximum-power voltage'),
      );
      expect(bodies).toEqual([]);

      await user.clear(voc);
      await user.type(voc, '21.6');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));
      await expect.poll(() => bodies.length).toBe(1);
      expect(specOf(bodies[0])).toEqual({
        kind: 'panel',
        panelType: '12v',
        ratedW: 30,
        maxPowerVolts: 18,
        maxPowerAmps: 1.67,
        openCircuitVolts: 21.6,
        tempCoeffVocPctPerC: -0.3,
        dropoutIrradianceWm2: 0,
        tempCoeffPctPerC: -0.4,
        outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
        massG: 900,
      });
      const collect = await groupAfterClosing(user, 'Collect');
      expect(within(collect).getByRole('rowheader', { name: /Slope 30 W/ })).toBeInTheDocument();
    },
    formTimeoutMs,
  );

  it(
    'a DC lead sends its gauge and fuse, and the table shows them',
    async () => {
      seedAccount({}, { signedIn: true });
      const bodies = recordBodies();
      const { user, panel } = await openAddForm('Lead');
      await user.type(panel.getByRole('textbox', { name: /^Name/ }), 'Fused radio lead');
      await user.selectOptions(panel.getByRole('combobox', { name: 'From connector' }), 'ring-terminal');
      await user.selectOptions(panel.getByRole('combobox', { name: 'To connector' }), 'radio-dc');
      await user.type(panel.getByRole('textbox', { name: /^Length/ }), '1.5');
      await user.type(panel.getByRole('textbox', { name: /^Mass/ }), '60');
      await user.type(panel.getByRole('textbox', { name: /^Wire gauge/ }), '16');
      await user.type(panel.getByRole('textbox', { name: /^Inline fuse/ }), '7,5');
      await user.click(panel.getByRole('button', { name: 'Add to locker' }));

      await expect.poll(() => bodies.length).toBe(1);
      expect(specOf(bodies[0])).toEqual({
        kind: 'lead',
        fromConnector: 'ring-terminal',
        toConnector: 'radio-dc',
        lengthM: 1.5,
        gaugeAwg: 16,
        fuseA: 7.5,
        massG: 60,
      });
      const connect = await groupAfterClosing(user, 'Connect');
      expect(within(connect).getByRole('cell', { name: /16 AWG · 7\.5 A fuse$/ })).toBeInTheDocument();
    },
    formTimeoutMs,
  );

  it(
    'edits a stored battery: its values fill the form, and a changed chemistry is sent',
    async () => {
      const me = seedAccount({}, { signedIn: true });
      const item = seedLockerItem(me.id, {
        name: 'Old pack',
        spec: batterySpec({ chemistry: 'lead-acid', cellsInSeries: 6, capacityAh: 7, ratedHours: 20 }),
      });
      const bodies = recordBodies();
      const { user } = await renderApp('/locker');
      await user.click(await screen.findByRole('button', { name: 'Edit Old pack' }));
      const panel = within(await screen.findByRole('dialog', { name: 'Edit Old pack' }));

      expect(panel.getByRole('combobox', { name: 'Chemistry' })).toHaveValue('lead-acid');
      expect(panel.getByRole('textbox', { name: /^Cells in series/ })).toHaveValue('6');
      expect(panel.getByRole('textbox', { name: /^Rated over/ })).toHaveValue('20');
      await user.selectOptions(panel.getByRole('combobox', { name: 'Chemistry' }), 'lifepo4');
      const cells = panel.getByRole('textbox', { name: /^Cells in series/ });
      await user.clear(cells);
      await user.type(cells, '4');
      await user.click(panel.getByRole('button', { name: 'Save changes' }));

      await expect.poll(() => bodies.length).toBe(1);
      expect(specOf(bodies[0])).toMatchObject({
        chemistry: 'lifepo4',
        cellsInSeries: 4,
        capacityAh: 7,
        ratedHours: 20,
      });
      expect(await screen.findByText('Old pack saved.')).toBeInTheDocument();
      expect(lockerDb.items.find((i) => i.id === item.id)?.spec).toMatchObject({ chemistry: 'lifepo4' });
    },
    formTimeoutMs,
  );
});
