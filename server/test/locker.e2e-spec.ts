import type { LockerItem, LockerItemInputRaw } from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { accounts, lockerItemFiles, lockerItems } from '../src/database/schema';
import { type TestApp, insertAccount, signInToken, startTestApp } from './support/test-app';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** One valid item of each kind (invented gear). */
const samples: Record<LockerItem['kind'], LockerItemInputRaw> = {
  panel: {
    name: 'Test fold-out 10 W',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 10,
      portVolts: 5,
      portMaxA: 2,
      outputPort: { connector: 'usb-a', captiveCable: false },
      massG: 280.4,
    },
  },
  bank: {
    name: 'Test brick 10k',
    notes: 'Charges from the panel',
    countOwned: 2,
    spec: {
      kind: 'bank',
      capacityMah: 10000,
      inputMaxW: 18,
      inputPort: { connector: 'usb-c', captiveCable: false },
      outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] }],
      massG: 180,
    },
  },
  converter: {
    name: 'Test 9 V → 12 V boost',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 9,
      outputVolts: 12,
      maxOutputA: 1.5,
      inputPort: { connector: 'usb-c', captiveCable: true },
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      massG: 35,
    },
  },
  battery: {
    name: 'Test LiFePO4 6 Ah',
    countOwned: 1,
    spec: {
      kind: 'battery',
      chemistry: 'lifepo4',
      cellsInSeries: 4,
      capacityAh: 6,
      dischargeCRate: 1,
      port: { connector: 'ring-terminal', captiveCable: false },
      massG: 780,
    },
  },
  controller: {
    name: 'Test MPPT 5 A',
    countOwned: 1,
    spec: {
      kind: 'controller',
      controllerType: 'mppt',
      maxInputVolts: 30,
      maxChargeA: 5,
      inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      outputPort: { connector: 'ring-terminal', captiveCable: false },
      massG: 120,
    },
  },
  lead: {
    name: 'Test USB-A to C',
    countOwned: 3,
    spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 },
  },
  device: {
    name: 'Test handheld',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'radio',
      ownBatteryWh: 14,
      chargesVia: '12v-dc',
      chargeCurrentA: 1,
      chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      supplyVoltsNominal: 13.8,
      transmitCurrentA: 1.5,
      receiveCurrentA: 0.15,
      standbyCurrentA: 0.05,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
    },
  },
};

/** A 12 V panel and a fused DC lead: the 12 V path's kinds that are variants of panel and lead. */
const twelveVoltPanel: LockerItemInputRaw = {
  name: 'Test 30 W 12 V panel',
  countOwned: 1,
  spec: {
    kind: 'panel',
    panelType: '12v',
    ratedW: 30,
    maxPowerVolts: 18,
    maxPowerAmps: 1.67,
    openCircuitVolts: 21.6,
    outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
    massG: 900,
  },
};
const fusedLead: LockerItemInputRaw = {
  name: 'Test fused radio lead',
  countOwned: 1,
  spec: {
    kind: 'lead',
    fromConnector: 'ring-terminal',
    toConnector: 'radio-dc',
    lengthM: 1.5,
    gaugeAwg: 16,
    fuseA: 7.5,
    massG: 60,
  },
};

describe('locker items', () => {
  let t: TestApp;
  let ownerId: string;
  let token: string;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  beforeEach(async () => {
    await t.db.delete(accounts);
    const owner = await insertAccount(t.db);
    ownerId = owner.id;
    token = await signInToken(t, owner.email);
  });

  const create = async (body: LockerItemInputRaw, as = token) =>
    (await t.http().post('/api/locker/items').set(bearer(as)).send(body).expect(201)).body.item as LockerItem;

  it('answers 401 without a session', async () => {
    await t.http().get('/api/locker/items').expect(401);
    await t.http().post('/api/locker/items').send(samples.lead).expect(401);
  });

  describe.each(Object.entries(samples))('CRUD of a %s', (kind, sample) => {
    it('creates, reads, lists, updates and deletes it', async () => {
      const created = await create(sample);
      expect(created).toMatchObject({
        kind,
        name: sample.name,
        notes: sample.notes ?? '',
        countOwned: sample.countOwned,
        files: [],
      });
      expect(created.spec.kind).toBe(kind);
      expect(created.massG).toBe(Math.round(sample.spec.massG ?? 0));
      expect(created.createdAt).toBe(t.clock.now().toISOString());

      const read = await t.http().get(`/api/locker/items/${created.id}`).set(bearer(token)).expect(200);
      expect(read.body.item).toEqual(created);

      const list = await t.http().get('/api/locker/items').set(bearer(token)).expect(200);
      expect(list.body.items).toEqual([created]);

      t.clock.advanceS(60);
      const changed = await t
        .http()
        .put(`/api/locker/items/${created.id}`)
        .set(bearer(token))
        .send({ ...sample, name: `${sample.name} (2)`, countOwned: 4, notes: 'changed' })
        .expect(200);
      expect(changed.body.item).toMatchObject({
        id: created.id,
        name: `${sample.name} (2)`,
        countOwned: 4,
        notes: 'changed',
        createdAt: created.createdAt,
      });
      expect(changed.body.item.updatedAt).toBe(t.clock.now().toISOString());

      await t.http().delete(`/api/locker/items/${created.id}`).set(bearer(token)).expect(204);
      await t.http().get(`/api/locker/items/${created.id}`).set(bearer(token)).expect(404);
      expect(await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId))).toEqual([]);
    });
  });

  it('applies the schema defaults and stores the spec as validated', async () => {
    const panel = await create(samples.panel);
    expect(panel.spec).toMatchObject({ dropoutIrradianceWm2: 0, tempCoeffPctPerC: -0.4, massG: 280.4 });
    expect(panel.massG).toBe(280);
    const [row] = await t.db.select().from(lockerItems).where(eq(lockerItems.id, panel.id));
    expect(row).toMatchObject({ kind: 'panel', massG: 280, ownerId });
    expect(row?.spec).toEqual(panel.spec);
  });

  describe('validation errors name the field', () => {
    it('a bad rated power is spec.ratedW', async () => {
      const body = { ...samples.panel, spec: { ...samples.panel.spec, ratedW: -3 } };
      const response = await t.http().post('/api/locker/items').set(bearer(token)).send(body).expect(400);
      expect(response.body).toEqual({
        statusCode: 400,
        message: 'Rated power must be above 0 W',
        errors: [{ path: 'spec.ratedW', message: 'Rated power must be above 0 W' }],
      });
    });

    it('count owned, name and notes', async () => {
      const response = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.lead, name: '  ', notes: 'x'.repeat(2001), countOwned: 21 })
        .expect(400);
      const paths = response.body.errors.map((e: { path: string }) => e.path).sort();
      expect(paths).toEqual(['countOwned', 'name', 'notes']);
      const count = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.lead, countOwned: 1.5 })
        .expect(400);
      expect(count.body.errors).toEqual([{ path: 'countOwned', message: 'Count owned is a whole number' }]);
      await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.lead, countOwned: 0 })
        .expect(400);
    });

    it('nested and cross-field rules: a bank port, a bank with both capacities, a radio without currents', async () => {
      const bankSpec = samples.bank.spec as Extract<LockerItemInputRaw['spec'], { kind: 'bank' }>;
      const port = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.bank, spec: { ...bankSpec, outputPorts: [{ ...bankSpec.outputPorts[0], maxA: 50 }] } })
        .expect(400);
      expect(port.body.errors).toEqual([
        { path: 'spec.outputPorts.0.maxA', message: 'Port current may be at most 20 A' },
      ]);
      const both = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.bank, spec: { ...bankSpec, capacityWh: 37 } })
        .expect(400);
      expect(both.body.errors).toEqual([
        { path: 'spec.capacityWh', message: 'Give the capacity in mAh or in Wh, not both' },
      ]);
      const { transmitCurrentA: _tx, ...radioWithoutTx } = samples.device.spec as Extract<
        LockerItemInputRaw['spec'],
        { kind: 'device' }
      >;
      const radio = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.device, spec: radioWithoutTx })
        .expect(400);
      expect(radio.body.errors).toEqual([{ path: 'spec.transmitCurrentA', message: 'A radio needs this value' }]);
    });

    it('an unknown kind, a non-uuid id and a bad sort', async () => {
      const kind = await t
        .http()
        .post('/api/locker/items')
        .set(bearer(token))
        .send({ ...samples.lead, spec: { ...samples.lead.spec, kind: 'tent' } })
        .expect(400);
      expect(kind.body.errors[0].path).toBe('spec.kind');
      await t.http().get('/api/locker/items/not-an-id').set(bearer(token)).expect(400);
      const sort = await t.http().get('/api/locker/items?sort=colour').set(bearer(token)).expect(400);
      expect(sort.body.errors[0].path).toBe('sort');
    });

    it("an item's kind cannot change (409) and nothing changes", async () => {
      const lead = await create(samples.lead);
      const response = await t
        .http()
        .put(`/api/locker/items/${lead.id}`)
        .set(bearer(token))
        .send(samples.panel)
        .expect(409);
      expect(response.body.errors).toEqual([
        { path: 'spec.kind', message: "An item's kind cannot change; add a new item instead" },
      ]);
      const [row] = await t.db.select().from(lockerItems).where(eq(lockerItems.id, lead.id));
      expect(row?.kind).toBe('lead');
    });
  });

  describe('files on an item', () => {
    it("lists the item's file records with owner-checked paths, and none of another member's", async () => {
      const item = await create(samples.panel);
      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);
      const otherItem = await create(samples.panel, otherToken);
      const [photo] = await t.db
        .insert(lockerItemFiles)
        .values({
          itemId: item.id,
          ownerId,
          purpose: 'photo',
          contentType: 'image/jpeg',
          sizeBytes: 1234,
          fileName: 'panel.jpg',
          objectKey: `test/${item.id}/photo`,
          thumbKey: `test/${item.id}/thumb`,
          createdAt: t.clock.now(),
        })
        .returning();
      await t.db.insert(lockerItemFiles).values({
        itemId: otherItem.id,
        ownerId: other.id,
        purpose: 'spec-sheet',
        contentType: 'application/pdf',
        sizeBytes: 99,
        fileName: 'sheet.pdf',
        objectKey: `test/${otherItem.id}/sheet`,
      });
      const expected = {
        id: photo?.id,
        purpose: 'photo',
        contentType: 'image/jpeg',
        sizeBytes: 1234,
        fileName: 'panel.jpg',
        createdAt: t.clock.now().toISOString(),
        url: `/api/locker/items/${item.id}/files/${photo?.id}`,
        thumbUrl: `/api/locker/items/${item.id}/files/${photo?.id}/thumb`,
      };
      const read = await t.http().get(`/api/locker/items/${item.id}`).set(bearer(token)).expect(200);
      expect(read.body.item.files).toEqual([expected]);
      const list = await t.http().get('/api/locker/items').set(bearer(token)).expect(200);
      expect(list.body.items.map((i: LockerItem) => i.files)).toEqual([[expected]]);
      const theirs = await t.http().get('/api/locker/items').set(bearer(otherToken)).expect(200);
      expect(theirs.body.items[0].files).toEqual([expect.objectContaining({ fileName: 'sheet.pdf', thumbUrl: null })]);
    });
  });

  describe('another member', () => {
    it('cannot list, read, change or delete my items (404), and my rows are untouched', async () => {
      const mine = await Promise.all([create(samples.panel), create(samples.device)]);
      const before = await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId));
      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);

      const list = await t.http().get('/api/locker/items').set(bearer(otherToken)).expect(200);
      expect(list.body).toEqual({ items: [], totalMassG: 0 });
      for (const item of mine) {
        const read = await t.http().get(`/api/locker/items/${item.id}`).set(bearer(otherToken)).expect(404);
        expect(read.body).toEqual({ statusCode: 404, message: 'No such item in your locker', errors: [] });
        const sample = samples[item.kind];
        await t
          .http()
          .put(`/api/locker/items/${item.id}`)
          .set(bearer(otherToken))
          .send({ ...sample, name: 'Taken' })
          .expect(404);
        await t.http().delete(`/api/locker/items/${item.id}`).set(bearer(otherToken)).expect(404);
      }
      // The other member's own item lives beside mine without mixing.
      await create(samples.lead, otherToken);
      const after = await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId));
      expect(after).toEqual(before);
      const mineListed = await t.http().get('/api/locker/items').set(bearer(token)).expect(200);
      expect(mineListed.body.items.map((i: LockerItem) => i.id).sort()).toEqual(mine.map((i) => i.id).sort());
    });

    it('an admin has no access to a member locker either', async () => {
      const item = await create(samples.bank);
      const admin = await insertAccount(t.db, { role: 'admin' });
      const adminToken = await signInToken(t, admin.email);
      await t.http().get(`/api/locker/items/${item.id}`).set(bearer(adminToken)).expect(404);
      expect((await t.http().get('/api/locker/items').set(bearer(adminToken)).expect(200)).body.items).toEqual([]);
    });

    it("deleting a member's account deletes their locker (cascade)", async () => {
      await create(samples.lead);
      await t.db.delete(accounts).where(eq(accounts.id, ownerId));
      expect(await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId))).toEqual([]);
    });
  });

  describe('the 12 V path', () => {
    it('adds a battery, a controller, a 12 V panel and a fused DC lead, with the schema defaults', async () => {
      const battery = await create(samples.battery);
      const controller = await create(samples.controller);
      const panel = await create(twelveVoltPanel);
      const lead = await create(fusedLead);
      expect(battery).toMatchObject({ kind: 'battery', massG: 780, spec: { chemistry: 'lifepo4', capacityAh: 6 } });
      expect(battery.spec).not.toHaveProperty('chargeCRate');
      expect(controller).toMatchObject({ kind: 'controller', spec: { controllerType: 'mppt', efficiency: 0.95 } });
      expect(panel).toMatchObject({
        kind: 'panel',
        spec: { panelType: '12v', openCircuitVolts: 21.6, tempCoeffPctPerC: -0.4, tempCoeffVocPctPerC: -0.3 },
      });
      expect(lead.spec).toMatchObject({ gaugeAwg: 16, fuseA: 7.5, lengthM: 1.5 });
      const list = await t.http().get('/api/locker/items?sort=kind').set(bearer(token)).expect(200);
      expect(list.body.items.map((i: LockerItem) => i.kind)).toEqual(['panel', 'battery', 'controller', 'lead']);
      expect(list.body.totalMassG).toBe(780 + 120 + 900 + 60);
      expect((await t.http().get('/api/locker/items?kind=battery').set(bearer(token)).expect(200)).body.items).toEqual([
        battery,
      ]);
    });

    it('field errors name the field under spec', async () => {
      const post = (spec: Record<string, unknown>) =>
        t.http().post('/api/locker/items').set(bearer(token)).send({ name: 'x', countOwned: 1, spec }).expect(400);
      const battery = await post({ ...samples.battery.spec, chemistry: 'nicad', capacityAh: 0 });
      expect(battery.body.errors.map((e: { path: string }) => e.path).sort()).toEqual([
        'spec.capacityAh',
        'spec.chemistry',
      ]);
      const controller = await post({ ...samples.controller.spec, controllerType: 'shunt' });
      expect(controller.body.errors).toEqual([
        { path: 'spec.controllerType', message: 'Controller type must be pwm or mppt' },
      ]);
      const panel = await post({ ...twelveVoltPanel.spec, openCircuitVolts: 17 });
      expect(panel.body.errors).toEqual([
        { path: 'spec.openCircuitVolts', message: 'Open-circuit voltage must be above the maximum-power voltage' },
      ]);
      const lead = await post({ ...fusedLead.spec, gaugeAwg: 16.5 });
      expect(lead.body.errors).toEqual([{ path: 'spec.gaugeAwg', message: 'Wire gauge is a whole AWG number' }]);
    });

    it('a USB panel can become a 12 V panel (same kind), but a battery cannot become a bank (409)', async () => {
      const panel = await create(samples.panel);
      const changed = await t
        .http()
        .put(`/api/locker/items/${panel.id}`)
        .set(bearer(token))
        .send(twelveVoltPanel)
        .expect(200);
      expect(changed.body.item.spec.panelType).toBe('12v');
      const battery = await create(samples.battery);
      await t.http().put(`/api/locker/items/${battery.id}`).set(bearer(token)).send(samples.bank).expect(409);
    });

    it("another member's battery, controller and 12 V panel answer 404 and stay untouched", async () => {
      const mine = await Promise.all([create(samples.battery), create(samples.controller), create(twelveVoltPanel)]);
      const before = await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId));
      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);
      expect((await t.http().get('/api/locker/items').set(bearer(otherToken)).expect(200)).body.items).toEqual([]);
      for (const item of mine) {
        await t.http().get(`/api/locker/items/${item.id}`).set(bearer(otherToken)).expect(404);
        await t
          .http()
          .put(`/api/locker/items/${item.id}`)
          .set(bearer(otherToken))
          .send(item.kind === 'panel' ? twelveVoltPanel : samples[item.kind])
          .expect(404);
        await t.http().delete(`/api/locker/items/${item.id}`).set(bearer(otherToken)).expect(404);
      }
      expect(await t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, ownerId))).toEqual(before);
    });
  });

  describe('list: filter, search, sort and total', () => {
    beforeEach(async () => {
      await create({ ...samples.panel, name: 'Bravo panel' }); // 280 g × 1
      t.clock.advanceS(1);
      await create({ ...samples.bank, name: 'alpha bank' }); // 180 g × 2
      t.clock.advanceS(1);
      await create({ ...samples.lead, name: 'Charlie 100%_lead' }); // 15 g × 3
      t.clock.advanceS(1);
      await create({ ...samples.device, name: 'Delta radio' }); // a device: not in the total
    });

    const names = async (query: string) => {
      const response = await t.http().get(`/api/locker/items${query}`).set(bearer(token)).expect(200);
      return {
        names: response.body.items.map((i: LockerItem) => i.name),
        totalMassG: response.body.totalMassG as number,
      };
    };

    it('sorts by name case-insensitively by default and sums the power gear', async () => {
      expect(await names('')).toEqual({
        names: ['alpha bank', 'Bravo panel', 'Charlie 100%_lead', 'Delta radio'],
        totalMassG: 280 + 360 + 45,
      });
    });

    it('sorts by kind in power-role order, by grams, by count and by last change, both ways', async () => {
      expect((await names('?sort=kind')).names).toEqual([
        'Bravo panel',
        'alpha bank',
        'Charlie 100%_lead',
        'Delta radio',
      ]);
      expect((await names('?sort=massG&order=desc')).names).toEqual([
        'Bravo panel',
        'alpha bank',
        'Charlie 100%_lead',
        'Delta radio',
      ]);
      expect((await names('?sort=countOwned')).names).toEqual([
        'Bravo panel',
        'Delta radio',
        'alpha bank',
        'Charlie 100%_lead',
      ]);
      expect((await names('?sort=updatedAt&order=desc')).names).toEqual([
        'Delta radio',
        'Charlie 100%_lead',
        'alpha bank',
        'Bravo panel',
      ]);
    });

    it('filters by kind, and an empty kind means all', async () => {
      expect(await names('?kind=bank')).toEqual({ names: ['alpha bank'], totalMassG: 360 });
      expect(await names('?kind=device')).toEqual({ names: ['Delta radio'], totalMassG: 0 });
      expect((await names('?kind=')).names).toHaveLength(4);
      await t.http().get('/api/locker/items?kind=tent').set(bearer(token)).expect(400);
    });

    it('searches names case-insensitively, with % and _ taken literally', async () => {
      expect((await names('?q=RADIO')).names).toEqual(['Delta radio']);
      expect((await names('?q=a%20b')).names).toEqual(['alpha bank']);
      expect((await names(`?q=${encodeURIComponent('100%_')}`)).names).toEqual(['Charlie 100%_lead']);
      expect((await names(`?q=${encodeURIComponent('%')}`)).names).toEqual(['Charlie 100%_lead']);
      expect((await names('?q=zzz')).names).toEqual([]);
      expect((await names('?kind=panel&q=alpha')).names).toEqual([]);
    });
  });
});
