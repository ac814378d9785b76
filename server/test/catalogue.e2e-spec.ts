import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { type AccountRow, catalogueEntries, lockerItems } from '../src/database/schema';
import { type TestApp, insertAccount, signInToken, startTestApp } from './support/test-app';

const bankEntry = {
  name: 'Generic 10,000 mAh bank',
  notes: 'Invented example',
  spec: {
    kind: 'bank',
    capacityMah: 10_000,
    cellVolts: 3.7,
    inputMaxW: 18,
    inputPort: { connector: 'usb-c', captiveCable: false },
    outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 }],
    massG: 212.4,
  },
};

const panelEntry = {
  name: 'Generic 10 W USB panel',
  spec: {
    kind: 'panel',
    panelType: 'usb',
    ratedW: 10,
    portVolts: 5,
    portMaxA: 2,
    outputPort: { connector: 'usb-a', captiveCable: false },
    massG: 320,
  },
};

/** The 12 V path's gear, invented: a 12 V panel, a PWM controller and a small LiFePO4 pack. */
const twelveVoltEntries = [
  {
    name: 'Generic 20 W 12 V panel',
    spec: {
      kind: 'panel',
      panelType: '12v',
      ratedW: 20,
      maxPowerVolts: 18,
      maxPowerAmps: 1.11,
      openCircuitVolts: 21.6,
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
      massG: 700,
    },
  },
  {
    name: 'Generic 5 A PWM controller',
    spec: {
      kind: 'controller',
      controllerType: 'pwm',
      maxInputVolts: 25,
      maxChargeA: 5,
      inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      outputPort: { connector: 'ring-terminal', captiveCable: false },
      massG: 80,
    },
  },
  {
    name: 'Generic 3 Ah LiFePO4 pack',
    spec: {
      kind: 'battery',
      chemistry: 'lifepo4',
      cellsInSeries: 4,
      capacityAh: 3,
      port: { connector: 'ring-terminal', captiveCable: false },
      massG: 420,
    },
  },
];

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

describe('reference catalogue', () => {
  let t: TestApp;
  let admin: AccountRow;
  let adminToken: string;
  let memberA: AccountRow;
  let tokenA: string;
  let tokenB: string;

  beforeAll(async () => {
    t = await startTestApp();
    admin = await insertAccount(t.db, { role: 'admin' });
    memberA = await insertAccount(t.db);
    const memberB = await insertAccount(t.db);
    adminToken = await signInToken(t, admin.email);
    tokenA = await signInToken(t, memberA.email);
    tokenB = await signInToken(t, memberB.email);
  });

  afterAll(async () => {
    await t.close();
  });

  beforeEach(async () => {
    await t.db.delete(catalogueEntries);
    await t.db.delete(lockerItems);
  });

  const create = (body: object, token = adminToken) => t.http().post('/api/catalogue').set(bearer(token)).send(body);

  it('needs a session to read', async () => {
    await t.http().get('/api/catalogue').expect(401);
  });

  it('lets an admin create entries that every member lists, in power-role order, filtered by kind', async () => {
    const bank = await create(bankEntry).expect(201);
    expect(bank.body.entry).toMatchObject({
      kind: 'bank',
      name: bankEntry.name,
      notes: 'Invented example',
      massG: 212,
    });
    expect(bank.body.entry.spec).toMatchObject({ kind: 'bank', capacityMah: 10_000, outputEfficiency: 0.85 });
    await create(panelEntry).expect(201);

    const all = await t.http().get('/api/catalogue').set(bearer(tokenA)).expect(200);
    expect(all.body.entries.map((e: { name: string }) => e.name)).toEqual([panelEntry.name, bankEntry.name]);
    expect(all.body.entries[0].notes).toBe('');
    const banks = await t.http().get('/api/catalogue?kind=bank').set(bearer(tokenB)).expect(200);
    expect(banks.body.entries.map((e: { kind: string }) => e.kind)).toEqual(['bank']);
    const one = await t.http().get(`/api/catalogue/${bank.body.entry.id}`).set(bearer(tokenB)).expect(200);
    expect(one.body.entry).toEqual(bank.body.entry);

    const badKind = await t.http().get('/api/catalogue?kind=tent').set(bearer(tokenA)).expect(400);
    expect(badKind.body.errors[0].path).toBe('kind');
  });

  it('holds the 12 V path: batteries after banks, controllers after converters; a member copies them', async () => {
    const created = [];
    for (const entry of twelveVoltEntries) created.push((await create(entry).expect(201)).body.entry);
    await create(bankEntry).expect(201);
    const all = await t.http().get('/api/catalogue').set(bearer(tokenA)).expect(200);
    expect(all.body.entries.map((e: { kind: string }) => e.kind)).toEqual(['panel', 'bank', 'battery', 'controller']);
    const batteries = await t.http().get('/api/catalogue?kind=battery').set(bearer(tokenA)).expect(200);
    expect(batteries.body.entries.map((e: { name: string }) => e.name)).toEqual(['Generic 3 Ah LiFePO4 pack']);
    for (const entry of created) {
      const copied = await t.http().post(`/api/catalogue/${entry.id}/copy`).set(bearer(tokenA)).expect(201);
      expect(copied.body.item).toMatchObject({ kind: entry.kind, countOwned: 1, spec: entry.spec });
    }
    expect((await t.http().get('/api/locker/items').set(bearer(tokenB)).expect(200)).body.items).toEqual([]);
  });

  it('answers 403 to members who create, change or delete, and changes nothing', async () => {
    const { body } = await create(panelEntry).expect(201);
    const id = body.entry.id;
    const denied = await create(bankEntry, tokenA).expect(403);
    expect(denied.body.message).toBe('Your account does not have the role this needs');
    await t
      .http()
      .put(`/api/catalogue/${id}`)
      .set(bearer(tokenA))
      .send({ ...panelEntry, name: 'Renamed' })
      .expect(403);
    await t.http().delete(`/api/catalogue/${id}`).set(bearer(tokenA)).expect(403);
    const rows = await t.db.select().from(catalogueEntries);
    expect(rows.map((r) => r.name)).toEqual([panelEntry.name]);
  });

  it('validates entries and names the field', async () => {
    const noName = await create({ ...panelEntry, name: '   ' }).expect(400);
    expect(noName.body.errors).toEqual([{ path: 'name', message: 'Name is required' }]);
    const badPower = await create({ ...panelEntry, spec: { ...panelEntry.spec, ratedW: -3 } }).expect(400);
    expect(badPower.body.errors).toEqual([{ path: 'spec.ratedW', message: 'Rated power must be above 0 W' }]);
    const badKind = await create({ ...panelEntry, spec: { ...panelEntry.spec, kind: 'kettle' } }).expect(400);
    expect(badKind.body.errors[0].path).toBe('spec.kind');
    const bothCapacities = await create({ ...bankEntry, spec: { ...bankEntry.spec, capacityWh: 37 } }).expect(400);
    expect(bothCapacities.body.errors).toEqual([
      { path: 'spec.capacityWh', message: 'Give the capacity in mAh or in Wh, not both' },
    ]);
    expect(await t.db.select().from(catalogueEntries)).toEqual([]);
  });

  it('refuses a second entry with the same name in any case (409 on `name`)', async () => {
    await create(panelEntry).expect(201);
    const clash = await create({ ...bankEntry, name: panelEntry.name.toUpperCase() }).expect(409);
    expect(clash.body.errors).toEqual([{ path: 'name', message: 'The catalogue already has an entry with this name' }]);
  });

  it('lets an admin replace and delete an entry; unknown ids are 404', async () => {
    const { body } = await create(panelEntry).expect(201);
    const id = body.entry.id;
    t.clock.advanceS(60);
    const changed = await t
      .http()
      .put(`/api/catalogue/${id}`)
      .set(bearer(adminToken))
      .send({ ...panelEntry, name: 'Generic 15 W USB panel', spec: { ...panelEntry.spec, ratedW: 15, massG: 410 } })
      .expect(200);
    expect(changed.body.entry).toMatchObject({ id, name: 'Generic 15 W USB panel', massG: 410, spec: { ratedW: 15 } });
    expect(Date.parse(changed.body.entry.updatedAt) - Date.parse(body.entry.updatedAt)).toBe(60_000);
    const invalid = await t
      .http()
      .put(`/api/catalogue/${id}`)
      .set(bearer(adminToken))
      .send({ ...panelEntry, spec: { ...panelEntry.spec, portMaxA: 'lots' } })
      .expect(400);
    expect(invalid.body.errors[0].path).toBe('spec.portMaxA');

    const missing = '00000000-0000-4000-8000-000000000000';
    await t.http().put(`/api/catalogue/${missing}`).set(bearer(adminToken)).send(panelEntry).expect(404);
    await t.http().get(`/api/catalogue/${missing}`).set(bearer(tokenA)).expect(404);
    await t.http().get('/api/catalogue/not-an-id').set(bearer(tokenA)).expect(400);

    await t.http().delete(`/api/catalogue/${id}`).set(bearer(adminToken)).expect(204);
    await t.http().delete(`/api/catalogue/${id}`).set(bearer(adminToken)).expect(404);
  });

  it("copies an entry into the caller's locker only, with count owned 1, and the copy outlives the entry", async () => {
    const { body } = await create(bankEntry).expect(201);
    const copied = await t.http().post(`/api/catalogue/${body.entry.id}/copy`).set(bearer(tokenA)).expect(201);
    expect(copied.body.item).toMatchObject({
      kind: 'bank',
      name: bankEntry.name,
      notes: 'Invented example',
      countOwned: 1,
      massG: 212,
      files: [],
      spec: body.entry.spec,
    });

    const lockerA = await t.http().get('/api/locker/items').set(bearer(tokenA)).expect(200);
    expect(lockerA.body.items.map((i: { id: string }) => i.id)).toEqual([copied.body.item.id]);
    const lockerB = await t.http().get('/api/locker/items').set(bearer(tokenB)).expect(200);
    expect(lockerB.body.items).toEqual([]);
    await t.http().get(`/api/locker/items/${copied.body.item.id}`).set(bearer(tokenB)).expect(404);
    const [row] = await t.db.select().from(lockerItems).where(eq(lockerItems.id, copied.body.item.id));
    expect(row?.ownerId).toBe(memberA.id);

    // A second copy is a second item; the admin copies into their own locker.
    await t.http().post(`/api/catalogue/${body.entry.id}/copy`).set(bearer(tokenA)).expect(201);
    await t.http().post(`/api/catalogue/${body.entry.id}/copy`).set(bearer(adminToken)).expect(201);
    const counts = await t.db.select({ ownerId: lockerItems.ownerId }).from(lockerItems);
    expect(counts.filter((c) => c.ownerId === memberA.id)).toHaveLength(2);
    expect(counts.filter((c) => c.ownerId === admin.id)).toHaveLength(1);

    await t.http().delete(`/api/catalogue/${body.entry.id}`).set(bearer(adminToken)).expect(204);
    await t.http().get(`/api/locker/items/${copied.body.item.id}`).set(bearer(tokenA)).expect(200);
    await t.http().post(`/api/catalogue/${body.entry.id}/copy`).set(bearer(tokenA)).expect(404);
  });

  it('refuses to copy an entry whose stored spec no longer passes the item checks (409 naming the field)', async () => {
    const { body } = await create(panelEntry).expect(201);
    // As if the item rules had tightened since the entry was written.
    await t.db
      .update(catalogueEntries)
      .set({ spec: { ...panelEntry.spec, ratedW: 9000 } as never })
      .where(eq(catalogueEntries.id, body.entry.id));
    const refused = await t.http().post(`/api/catalogue/${body.entry.id}/copy`).set(bearer(tokenA)).expect(409);
    expect(refused.body.errors).toEqual([{ path: 'spec.ratedW', message: 'Rated power may be at most 400 W' }]);
    expect(await t.db.select().from(lockerItems)).toEqual([]);
  });
});
