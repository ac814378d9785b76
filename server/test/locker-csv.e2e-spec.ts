import type { LockerItem, LockerItemInputRaw } from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { type LockerItemRow, accounts, lockerItems } from '../src/database/schema';
import { type TestApp, insertAccount, signInToken, startTestApp } from './support/test-app';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

const header =
  'kind,name,count_owned,mass_g,notes,rated_w,port_volts,port_max_a,output_connector,from_connector,to_connector,length_m';
const panelLine = (name: string) => `panel,${name},1,280,,10,5,2,usb-a,,,`;
const leadLine = (name: string, lengthM = '0.3') => `lead,${name},2,15,,,,,,usb-a,usb-c,${lengthM}`;
const goodCsv = [header, panelLine('Imported panel'), leadLine('Imported lead'), ''].join('\n');

/** Items of every kind, created through the API before an export (invented gear). */
const itemsOfEveryKind: LockerItemInputRaw[] = [
  {
    name: '=Panel with a formula-like name',
    notes: 'Line one\nline two, with "quotes"; and a semicolon',
    countOwned: 2,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 12.5,
      portVolts: 5,
      portMaxA: 2.4,
      dropoutIrradianceWm2: 80,
      tempCoeffPctPerC: -0.35,
      outputPort: { connector: 'usb-c', captiveCable: true },
      massG: 310.5,
    },
  },
  {
    name: 'Wh bank',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityWh: 37,
      inputMaxW: 20,
      inputPort: { connector: 'usb-c', captiveCable: false },
      outputPorts: [
        { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
        { connector: 'usb-c', captiveCable: true, volts: 5, maxA: 3, usbPdVolts: [9, 12, 15] },
      ],
      outputEfficiency: 0.82,
      chargeEfficiency: 0.88,
      massG: 210,
    },
  },
  {
    name: '12 V to USB',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: '12v-to-usb',
      inputVolts: 12,
      outputVolts: 5,
      maxOutputA: 2.1,
      efficiency: 0.9,
      inputPort: { connector: '12v-accessory', captiveCable: true },
      outputPort: { connector: 'usb-a', captiveCable: false },
      massG: 28,
    },
  },
  {
    name: 'Barrel to radio',
    countOwned: 1,
    spec: { kind: 'lead', fromConnector: 'barrel-5.5x2.1', toConnector: 'radio-dc', lengthM: 1.2, massG: 40 },
  },
  {
    name: 'Radio',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'radio',
      ownBatteryWh: 14.4,
      chargesVia: '12v-dc',
      chargeCurrentA: 1.2,
      chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      supplyVoltsNominal: 13.8,
      supplyVoltsMin: 11,
      supplyVoltsMax: 16,
      transmitCurrentA: 1.5,
      receiveCurrentA: 0.15,
      standbyCurrentA: 0.05,
      canRunLive: true,
      massG: 330,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 15, receiveHoursPerDay: 2, standbyHoursPerDay: 8 },
    },
  },
  {
    name: 'Phone',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'phone',
      ownBatteryWh: 16,
      chargesVia: 'usb-pd',
      chargePowerW: 20,
      usbPdVolts: 9,
      chargePort: { connector: 'usb-c', captiveCable: false },
      useProfile: { basis: 'battery-share', batterySharePerDay: 0.55 },
    },
  },
  {
    name: 'Headlamp',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'headlamp',
      ownBatteryWh: 5.5,
      chargesVia: 'usb-5v',
      chargePowerW: 5,
      chargePort: { connector: 'micro-usb', captiveCable: false },
      useProfile: { basis: 'energy', energyWhPerDay: 1.2 },
      massG: 75,
    },
  },
  // The 12 V path: a 12 V panel, a controller, a lead-acid battery with its rate table, a fused DC lead.
  {
    name: '12 V sheet',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: '12v',
      ratedW: 30,
      maxPowerVolts: 17.6,
      maxPowerAmps: 1.7,
      openCircuitVolts: 21.8,
      shortCircuitAmps: 1.85,
      tempCoeffVocPctPerC: -0.28,
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
      massG: 950,
    },
  },
  {
    name: 'PWM controller',
    countOwned: 1,
    spec: {
      kind: 'controller',
      controllerType: 'pwm',
      maxInputVolts: 25,
      maxChargeA: 5,
      inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      outputPort: { connector: 'ring-terminal', captiveCable: false },
      massG: 70,
    },
  },
  {
    name: 'Sealed lead-acid 7 Ah',
    countOwned: 1,
    spec: {
      kind: 'battery',
      chemistry: 'lead-acid',
      cellsInSeries: 6,
      capacityAh: 7,
      chargeCRate: 0.3,
      ratedHours: 20,
      peukertExponent: 1.15,
      port: { connector: 'ring-terminal', captiveCable: false },
      massG: 2100,
    },
  },
  {
    name: 'Fused ring to radio lead',
    countOwned: 1,
    spec: {
      kind: 'lead',
      fromConnector: 'ring-terminal',
      toConnector: 'radio-dc',
      lengthM: 1.5,
      gaugeAwg: 18,
      fuseA: 5,
      massG: 55,
    },
  },
];

describe('locker CSV import and export', () => {
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

  const upload = (query: string, content: string | Buffer, as = token, contentType = 'text/csv') =>
    t
      .http()
      .post(`/api/locker/import${query}`)
      .set(bearer(as))
      .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), {
        filename: 'locker.csv',
        contentType,
      });

  const rowsOf = (owner = ownerId): Promise<LockerItemRow[]> =>
    t.db.select().from(lockerItems).where(eq(lockerItems.ownerId, owner));

  /** An item already in the locker, which a rejected import must leave alone. */
  const seedExisting = async () => {
    await t.http().post('/api/locker/items').set(bearer(token)).send(itemsOfEveryKind[3]).expect(201);
    return rowsOf();
  };

  describe('a good file', () => {
    it('previews without writing anything', async () => {
      const response = await upload('', goodCsv).expect(200);
      expect(response.body).toEqual({
        ok: true,
        mode: 'add',
        committed: false,
        rowCount: 2,
        report: [],
        preview: [
          { row: 2, kind: 'panel', name: 'Imported panel', countOwned: 1, massG: 280 },
          { row: 3, kind: 'lead', name: 'Imported lead', countOwned: 2, massG: 15 },
        ],
      });
      expect(await rowsOf()).toEqual([]);
    });

    it('adds every row once to the existing locker', async () => {
      const before = await seedExisting();
      const response = await upload('?mode=add&commit=true', goodCsv).expect(200);
      expect(response.body).toMatchObject({ ok: true, committed: true, rowCount: 2 });
      const after = await rowsOf();
      expect(after).toHaveLength(3);
      expect(after.filter((r) => r.name === 'Imported panel')).toHaveLength(1);
      expect(after.filter((r) => r.name === 'Imported lead')).toHaveLength(1);
      expect(after).toEqual(expect.arrayContaining(before));
      const lead = after.find((r) => r.name === 'Imported lead');
      expect(lead).toMatchObject({ kind: 'lead', countOwned: 2, massG: 15, spec: { kind: 'lead', lengthM: 0.3 } });
    });

    it('takes a file of exactly 2,000 rows, written in one transaction', async () => {
      const lines = [header, ...Array.from({ length: 2000 }, (_, i) => leadLine(`Lead ${i + 1}`))];
      const response = await upload('?commit=true', lines.join('\n')).expect(200);
      expect(response.body).toMatchObject({ ok: true, committed: true, rowCount: 2000 });
      const rows = await rowsOf();
      expect(rows).toHaveLength(2000);
      expect(new Set(rows.map((r) => r.name)).size).toBe(2000);
      const list = await t.http().get('/api/locker/items').set(bearer(token)).expect(200);
      expect(list.body.totalMassG).toBe(2000 * 15 * 2);
    });

    it('replaces the locker with the file', async () => {
      const before = await seedExisting();
      await upload('?mode=replace&commit=true', goodCsv).expect(200);
      const after = await rowsOf();
      expect(after.map((r) => r.name).sort()).toEqual(['Imported lead', 'Imported panel']);
      expect(after.some((r) => r.id === before[0]?.id)).toBe(false);
    });

    it('reads a semicolon-separated file with decimal commas', async () => {
      const text = [
        'kind;name;count_owned;mass_g;from_connector;to_connector;length_m',
        'lead;Semicolon lead;1;12,5;usb-c;usb-c;0,25',
        '',
      ].join('\r\n');
      const response = await upload('?commit=true', text).expect(200);
      expect(response.body.report).toEqual([]);
      const [row] = await rowsOf();
      expect(row?.spec).toMatchObject({ lengthM: 0.25, massG: 12.5 });
      expect(row?.massG).toBe(13);
    });

    it('reads a file with a UTF-8 byte-order mark', async () => {
      const withBom = Buffer.concat([
        Buffer.from([0xef, 0xbb, 0xbf]),
        Buffer.from(goodCsv.replace('Imported panel', 'Panneau été'), 'utf8'),
      ]);
      await upload('?commit=true', withBom).expect(200);
      expect((await rowsOf()).map((r) => r.name).sort()).toEqual(['Imported lead', 'Panneau été']);
    });

    it("imports only into the caller's locker; replace leaves another member's items alone", async () => {
      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);
      const mine = await seedExisting();
      await upload('?mode=replace&commit=true', goodCsv, otherToken).expect(200);
      expect(await rowsOf()).toEqual(mine);
      expect(await rowsOf(other.id)).toHaveLength(2);
    });
  });

  describe('a file that is refused writes nothing', () => {
    const expectRejected = async (
      query: string,
      content: string | Buffer,
      check: (body: Record<string, unknown>) => void,
    ) => {
      const before = await seedExisting();
      const preview = await upload(query.replace('commit=true', 'commit=false'), content).expect(200);
      expect(preview.body.ok).toBe(false);
      const response = await upload(query, content).expect(400);
      expect(response.body).toMatchObject({
        statusCode: 400,
        ok: false,
        committed: false,
        mode: query.includes('replace') ? 'replace' : 'add',
      });
      expect(response.body.message).toMatch(/^Nothing was imported/);
      expect(response.body.errors.length).toBe(response.body.report.length);
      check(response.body);
      expect(await rowsOf()).toEqual(before);
    };

    it('a header without the name column', async () => {
      await expectRejected('?commit=true', 'kind,mass_g\nlead,15\n', (body) => {
        expect(body.report).toEqual([{ row: 1, column: 'name', message: 'The header needs a "name" column' }]);
        expect(body.errors).toEqual([{ path: 'rows.1.name', message: 'The header needs a "name" column' }]);
      });
    });

    it('a bad number on row 37', async () => {
      const lines = [
        header,
        ...Array.from({ length: 50 }, (_, i) => leadLine(`Lead ${i + 2}`, i + 2 === 37 ? '0.3m' : '0.3')),
      ];
      await expectRejected('?mode=add&commit=true', lines.join('\n'), (body) => {
        expect(body.rowCount).toBe(50);
        expect(body.report).toEqual([{ row: 37, column: 'length_m', message: 'Not a number: "0.3m"' }]);
      });
    });

    it('an unknown column', async () => {
      await expectRejected('?commit=true', `${header},colour\n${leadLine('A')},red\n`, (body) => {
        expect(body.report).toEqual([
          { row: 1, column: 'colour', message: expect.stringContaining('Unknown column "colour"') },
        ]);
      });
    });

    it('an empty file', async () => {
      await expectRejected('?commit=true', '', (body) => {
        expect(body.report).toEqual([{ row: 1, column: '', message: expect.stringContaining('The file is empty') }]);
      });
    });

    it('10,000 rows', async () => {
      const lines = [header, ...Array.from({ length: 10_000 }, (_, i) => leadLine(`L${i}`))];
      const text = lines.join('\n');
      expect(Buffer.byteLength(text)).toBeLessThan(1_048_576);
      await expectRejected('?commit=true', text, (body) => {
        expect(body.rowCount).toBe(10_000);
        expect(body.report).toEqual([
          { row: 2002, column: '', message: 'The file has 10,000 items; at most 2,000 can be imported at once' },
        ]);
      });
    });

    it('bytes that are not UTF-8', async () => {
      await expectRejected('?commit=true', Buffer.from(`${header}\n${leadLine('Caf\u00e9')}\n`, 'latin1'), (body) => {
        expect(body.report).toEqual([{ row: 1, column: '', message: expect.stringContaining('not UTF-8') }]);
      });
    });

    it('"replace" with a rejected file leaves the old locker intact', async () => {
      await expectRejected('?mode=replace&commit=true', `${goodCsv}${leadLine('Bad', 'long')}\n`, (body) => {
        expect(body.report).toEqual([{ row: 4, column: 'length_m', message: 'Not a number: "long"' }]);
        expect(body.preview).toHaveLength(2);
      });
    });

    it('a 3 MB file: 413 in the API error shape', async () => {
      const before = await seedExisting();
      const big = `${header}\n${`${leadLine('x'.repeat(100))}\n`.repeat(25_000)}`;
      expect(Buffer.byteLength(big)).toBeGreaterThan(3_000_000);
      const response = await upload('?mode=replace&commit=true', big).expect(413);
      expect(response.body).toEqual({
        statusCode: 413,
        message: 'The file is larger than 1 MB (1,048,576 bytes); split it into smaller files',
        errors: [],
      });
      expect(await rowsOf()).toEqual(before);
    });

    it('not a CSV or text file: 415, by declared type and by content', async () => {
      const before = await seedExisting();
      const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
      const declared = await upload('?commit=true', png, token, 'image/png').expect(415);
      expect(declared.body).toMatchObject({
        statusCode: 415,
        message: expect.stringContaining('not a CSV or text file'),
      });
      await upload('?commit=true', png, token, 'text/csv').expect(415);
      expect(await rowsOf()).toEqual(before);
    });

    it('no file, or the file in another field: 400 naming the field', async () => {
      const none = await t
        .http()
        .post('/api/locker/import?commit=true')
        .set(bearer(token))
        .field('mode', 'add')
        .expect(400);
      expect(none.body.errors).toEqual([
        { path: 'file', message: 'Attach the CSV file in the multipart field "file"' },
      ]);
      const wrong = await t
        .http()
        .post('/api/locker/import')
        .set(bearer(token))
        .attach('upload', Buffer.from(goodCsv), { filename: 'a.csv', contentType: 'text/csv' })
        .expect(400);
      expect(wrong.body.message).toBe('Attach the CSV file in the multipart field "file"');
    });

    it('a bad mode: 400', async () => {
      const response = await upload('?mode=merge', goodCsv).expect(400);
      expect(response.body.errors[0].path).toBe('mode');
    });

    it('needs a session', async () => {
      await t.http().post('/api/locker/import').attach('file', Buffer.from(goodCsv), 'a.csv').expect(401);
      await t.http().get('/api/locker/export').expect(401);
    });
  });

  describe('export', () => {
    it('writes every item as a CSV attachment, and importing it into an empty locker gives back the same items', async () => {
      const created: LockerItem[] = [];
      for (const item of itemsOfEveryKind) {
        created.push((await t.http().post('/api/locker/items').set(bearer(token)).send(item).expect(201)).body.item);
      }
      const response = await t.http().get('/api/locker/export').set(bearer(token)).buffer(true).expect(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toBe(
        `attachment; filename="gramwatt-locker-${t.clock.now().toISOString().slice(0, 10)}.csv"`,
      );
      const text = response.text;
      expect(text.split('\r\n').filter((l) => l.startsWith('device,'))).toHaveLength(3);
      // A name a spreadsheet would run as a formula is guarded on the way out.
      expect(text).toContain("'=Panel with a formula-like name");

      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);
      const imported = await upload('?commit=true', text, otherToken).expect(200);
      expect(imported.body).toMatchObject({ ok: true, committed: true, rowCount: itemsOfEveryKind.length, report: [] });

      const list = await t.http().get('/api/locker/items?sort=kind').set(bearer(otherToken)).expect(200);
      const strip = (i: LockerItem) => ({
        kind: i.kind,
        name: i.name,
        notes: i.notes,
        countOwned: i.countOwned,
        massG: i.massG,
        spec: i.spec,
      });
      const byName = (a: { name: string }, b: { name: string }) => a.name.localeCompare(b.name);
      expect(list.body.items.map(strip).sort(byName)).toEqual(created.map(strip).sort(byName));
    });

    it('an empty locker exports the header alone', async () => {
      const response = await t.http().get('/api/locker/export').set(bearer(token)).expect(200);
      expect(response.text.trim().split('\r\n')).toHaveLength(1);
      expect(response.text.replace(/^\uFEFF/, '')).toMatch(/^kind,name,count_owned,mass_g,notes,/);
    });

    it("exports only the caller's items", async () => {
      await seedExisting();
      const other = await insertAccount(t.db);
      const otherToken = await signInToken(t, other.email);
      const response = await t.http().get('/api/locker/export').set(bearer(otherToken)).expect(200);
      expect(response.text).not.toContain('Barrel to radio');
    });
  });
});
