import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type LockerItemInput, lockerItemInputSchema } from '../schemas/locker.js';
import { bankSpecSchema, converterSpecSchema, leadSpecSchema, usbPanelSpecSchema } from '../schemas/items.js';
import { deviceSpecSchema } from '../schemas/devices.js';
import type { ItemSpec } from '../schemas/kit.js';
import { batterySpecSchema, controllerSpecSchema, twelveVoltPanelSpecSchema } from '../schemas/station-items.js';
import {
  bankArb,
  batteryArb,
  controllerArb,
  converterArb,
  dcLeadArb,
  deviceArb,
  leadArb,
  panelArb,
  share,
  twelveVoltPanelArb,
} from '../testing/arbitraries.js';
import { lockerCsvColumns, lockerCsvHeader } from './columns.js';
import { decodeLockerCsv, detectLockerCsvDelimiter, maxLockerCsvIssues, readLockerCsv } from './read-locker-csv.js';
import { writeLockerCsv } from './write-locker-csv.js';

/** Builds a CSV from rows given as { column: cell }, with the union of their columns as the header. */
function csvOf(rows: Record<string, string>[], delimiter = ','): string {
  const header = [...new Set(rows.flatMap((r) => Object.keys(r)))];
  return [header.join(delimiter), ...rows.map((r) => header.map((h) => r[h] ?? '').join(delimiter))].join('\n') + '\n';
}

const panelRow = {
  kind: 'panel',
  name: 'Fold-out 10',
  count_owned: '2',
  mass_g: '280',
  rated_w: '10',
  port_volts: '5',
  port_max_a: '2',
  output_connector: 'usb-a',
};
const bankRow = {
  kind: 'bank',
  name: 'Brick 10k',
  mass_g: '180',
  capacity_mah: '10000',
  input_max_w: '18',
  input_connector: 'usb-c',
  output_ports: 'usb-a:5:2.4|usb-c:5:3:pd=9/12',
};
const converterRow = {
  kind: 'converter',
  name: 'PD boost',
  mass_g: '35',
  converter_type: 'boost',
  input_volts: '9',
  output_volts: '12',
  max_output_a: '1.5',
  efficiency: '0.88',
  input_connector: 'usb-c',
  input_captive_cable: 'true',
  output_connector: 'barrel-5.5x2.1',
};
const leadRow = {
  kind: 'lead',
  name: 'Short C',
  mass_g: '15',
  from_connector: 'usb-a',
  to_connector: 'usb-c',
  length_m: '0.3',
};
// The 12 V path (invented gear): a 12 V panel, an MPPT controller, a LiFePO4 pack and a fused DC lead.
const twelveVoltPanelRow = {
  kind: 'panel',
  name: 'Ridge 30 W 12 V',
  mass_g: '900',
  panel_type: '12v',
  rated_w: '30',
  max_power_volts: '18',
  max_power_amps: '1.67',
  open_circuit_volts: '21.6',
  temp_coeff_voc_pct_per_c: '-0.29',
  output_connector: 'barrel-5.5x2.1',
  output_captive_cable: 'yes',
};
const controllerRow = {
  kind: 'controller',
  name: 'Small MPPT',
  mass_g: '120',
  controller_type: 'mppt',
  max_input_volts: '30',
  max_charge_a: '5',
  input_connector: 'barrel-5.5x2.1',
  output_connector: 'ring-terminal',
};
const batteryRow = {
  kind: 'battery',
  name: 'Pack 6 Ah',
  mass_g: '780',
  chemistry: 'lifepo4',
  cells_in_series: '4',
  capacity_ah: '6',
  discharge_c_rate: '1',
  port_connector: 'ring-terminal',
};
const dcLeadRow = {
  kind: 'lead',
  name: 'Fused radio lead',
  mass_g: '60',
  from_connector: 'ring-terminal',
  to_connector: 'radio-dc',
  length_m: '1.5',
  gauge_awg: '16',
  fuse_a: '7.5',
};
const radioRow = {
  kind: 'device',
  name: 'Handheld',
  device_kind: 'radio',
  own_battery_wh: '14',
  charges_via: '12v-dc',
  charge_current_a: '1',
  charge_connector: 'barrel-5.5x2.1',
  supply_volts_nominal: '13.8',
  supply_volts_min: '11',
  supply_volts_max: '16',
  transmit_current_a: '1.5',
  receive_current_a: '0.15',
  standby_current_a: '0.05',
  can_run_live: 'yes',
  use_basis: 'radio-hours',
  transmit_minutes_per_day: '20',
  receive_hours_per_day: '2',
  standby_hours_per_day: '6',
  mass_g: '310',
};
const phoneRow = {
  kind: 'device',
  name: 'Phone',
  device_kind: 'phone',
  own_battery_wh: '15',
  charges_via: 'usb-pd',
  charge_power_w: '18',
  usb_pd_volts: '9',
  charge_connector: 'usb-c',
  use_basis: 'battery-share',
  battery_share_per_day: '0.6',
};

describe('readLockerCsv: a good file', () => {
  const result = readLockerCsv(csvOf([panelRow, bankRow, converterRow, leadRow, radioRow, phoneRow]));

  it('reads every kind, with defaults for the empty cells', () => {
    expect(result.report).toEqual([]);
    expect(result.ok).toBe(true);
    expect(result.rowCount).toBe(6);
    expect(result.rows.map((r) => r.row)).toEqual([2, 3, 4, 5, 6, 7]);
    const [panel, bank, converter, lead, radio, phone] = result.rows.map((r) => r.item);
    expect(panel).toEqual({
      name: 'Fold-out 10',
      notes: '',
      countOwned: 2,
      spec: {
        kind: 'panel',
        panelType: 'usb',
        ratedW: 10,
        portVolts: 5,
        portMaxA: 2,
        dropoutIrradianceWm2: 0,
        tempCoeffPctPerC: -0.4,
        outputPort: { connector: 'usb-a', captiveCable: false },
        massG: 280,
      },
    });
    expect(bank?.countOwned).toBe(1);
    expect(bank?.spec).toMatchObject({
      kind: 'bank',
      capacityMah: 10000,
      cellVolts: 3.7,
      inputMaxW: 18,
      outputEfficiency: 0.85,
      chargeEfficiency: 0.9,
      outputPorts: [
        { connector: 'usb-a', volts: 5, maxA: 2.4, usbPdVolts: [], captiveCable: false },
        { connector: 'usb-c', volts: 5, maxA: 3, usbPdVolts: [9, 12], captiveCable: false },
      ],
    });
    expect(converter?.spec).toMatchObject({
      converterType: 'boost',
      inputPort: { connector: 'usb-c', captiveCable: true },
      efficiency: 0.88,
    });
    expect(lead?.spec).toEqual({ kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 });
    expect(radio?.spec).toMatchObject({
      deviceKind: 'radio',
      canRunLive: true,
      transmitCurrentA: 1.5,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
    });
    expect(phone?.spec).toMatchObject({
      chargesVia: 'usb-pd',
      usbPdVolts: 9,
      useProfile: { basis: 'battery-share', batterySharePerDay: 0.6 },
    });
    expect(phone?.spec.massG).toBeUndefined();
  });

  it('reads the 12 V path: a 12 V panel, a controller, a battery and a fused DC lead', () => {
    const result = readLockerCsv(csvOf([twelveVoltPanelRow, controllerRow, batteryRow, dcLeadRow]));
    expect(result.report).toEqual([]);
    const [panel, controller, battery, lead] = result.rows.map((r) => r.item.spec);
    expect(panel).toEqual({
      kind: 'panel',
      panelType: '12v',
      ratedW: 30,
      maxPowerVolts: 18,
      maxPowerAmps: 1.67,
      openCircuitVolts: 21.6,
      tempCoeffPctPerC: -0.4,
      tempCoeffVocPctPerC: -0.29,
      dropoutIrradianceWm2: 0,
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
      massG: 900,
    });
    expect(controller).toEqual({
      kind: 'controller',
      controllerType: 'mppt',
      maxInputVolts: 30,
      maxChargeA: 5,
      efficiency: 0.95,
      inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      outputPort: { connector: 'ring-terminal', captiveCable: false },
      massG: 120,
    });
    expect(battery).toEqual({
      kind: 'battery',
      chemistry: 'lifepo4',
      cellsInSeries: 4,
      capacityAh: 6,
      dischargeCRate: 1,
      port: { connector: 'ring-terminal', captiveCable: false },
      massG: 780,
    });
    expect(lead).toEqual({
      kind: 'lead',
      fromConnector: 'ring-terminal',
      toConnector: 'radio-dc',
      lengthM: 1.5,
      gaugeAwg: 16,
      fuseA: 7.5,
      massG: 60,
    });
  });

  it('a file written before 12 V panels (no panel_type column) still reads its panels as USB panels', () => {
    const result = readLockerCsv(csvOf([panelRow]));
    expect(result.ok).toBe(true);
    expect(result.rows[0]?.item.spec).toMatchObject({ kind: 'panel', panelType: 'usb', portVolts: 5 });
  });

  it('reads header names in any case and with spaces around them', () => {
    const text = ' KIND , Name ,From_Connector,to_connector,length_m,mass_g\nlead,Short C,usb-a,usb-c,0.3,15\n';
    expect(readLockerCsv(text).ok).toBe(true);
  });

  it('accepts a UTF-8 byte-order mark, in text and in bytes', () => {
    const text = csvOf([leadRow]);
    expect(readLockerCsv(`\uFEFF${text}`).ok).toBe(true);
    const bytes = new TextEncoder().encode(`\uFEFF${text}`);
    expect(bytes.slice(0, 3)).toEqual(new Uint8Array([0xef, 0xbb, 0xbf]));
    const decoded = decodeLockerCsv(bytes);
    expect(decoded).toBe(text);
    expect(readLockerCsv(decoded ?? '').rows[0]?.item.name).toBe('Short C');
  });

  it('refuses bytes that are not UTF-8 (a Latin-1 é)', () => {
    expect(decodeLockerCsv(new Uint8Array([0x6b, 0xe9, 0x0a]))).toBeUndefined();
  });

  it('reads a semicolon-separated file with decimal commas', () => {
    const text = csvOf(
      [
        { ...leadRow, length_m: '0,3' },
        { ...bankRow, output_ports: 'usb-a:5:2,4' },
        { ...converterRow, efficiency: '0,88' },
      ],
      ';',
    );
    expect(detectLockerCsvDelimiter(text)).toBe(';');
    const result = readLockerCsv(text);
    expect(result.report).toEqual([]);
    expect(result.delimiter).toBe(';');
    expect(result.rows[0]?.item.spec).toMatchObject({ lengthM: 0.3 });
    const bank = result.rows[1]?.item.spec;
    expect(bank?.kind === 'bank' && bank.outputPorts[0]?.maxA).toBeCloseTo(2.4, 10);
    expect(result.rows[2]?.item.spec).toMatchObject({ efficiency: 0.88 });
  });

  it('reads quoted cells per RFC 4180 §2 (rules 5–7: delimiters, line breaks and doubled quotes inside quotes)', () => {
    const text =
      'kind,name,notes,from_connector,to_connector,length_m,mass_g\r\nlead,"Short, C","say ""hi""\r\nline two; ok",usb-a,usb-c,0.3,15\r\n';
    const result = readLockerCsv(text);
    expect(result.report).toEqual([]);
    expect(result.rows[0]?.item).toMatchObject({ name: 'Short, C', notes: 'say "hi"\r\nline two; ok' });
  });

  it('skips blank lines but keeps spreadsheet row numbers', () => {
    const text = `kind,name,from_connector,to_connector,length_m,mass_g\n\nlead,A,usb-a,usb-c,0.3,15\n,,,,,\nlead,B,usb-a,usb-c,x,15\n`;
    const result = readLockerCsv(text);
    expect(result.rowCount).toBe(2);
    expect(result.report).toEqual([{ row: 5, column: 'length_m', message: 'Not a number: "x"' }]);
  });
});

describe('readLockerCsv: files that are refused (nothing is accepted)', () => {
  it('an empty file, blank lines only, or a header without rows', () => {
    for (const text of ['', '\uFEFF', '\n\n  \n']) {
      const result = readLockerCsv(text);
      expect(result.ok).toBe(false);
      expect(result.report).toEqual([{ row: 1, column: '', message: expect.stringContaining('The file is empty') }]);
    }
    const headerOnly = readLockerCsv('kind,name,mass_g\n');
    expect(headerOnly.ok).toBe(false);
    expect(headerOnly.report[0]?.message).toBe('The file has a header but no items');
  });

  it('a header without a required column', () => {
    const result = readLockerCsv('kind,mass_g,from_connector\nlead,15,usb-a\n');
    expect(result.ok).toBe(false);
    expect(result.rows).toEqual([]);
    expect(result.report).toEqual([{ row: 1, column: 'name', message: 'The header needs a "name" column' }]);
  });

  it('an unknown column, reported by name with a suggestion, never dropped', () => {
    const result = readLockerCsv(csvOf([{ ...leadRow, lenght_m: '1', colour: 'red' }]));
    expect(result.ok).toBe(false);
    expect(result.rows).toEqual([]);
    expect(result.report).toEqual([
      { row: 1, column: 'lenght_m', message: 'Unknown column "lenght_m" — did you mean "length_m"?' },
      { row: 1, column: 'colour', message: expect.stringContaining('Unknown column "colour"') },
    ]);
  });

  it('a column given twice, and a value under a nameless column', () => {
    const twice = readLockerCsv('kind,name,name\nlead,a,b\n');
    expect(twice.report).toEqual([{ row: 1, column: 'name', message: 'Column "name" appears more than once' }]);
    const nameless = readLockerCsv(
      'kind,name,,from_connector,to_connector,length_m,mass_g\nlead,a,oops,usb-a,usb-c,1,5\n',
    );
    expect(nameless.report).toEqual([{ row: 1, column: '', message: 'Column 3 has values but no name in the header' }]);
    // Trailing separators a spreadsheet adds (empty header cells over empty columns) are fine.
    expect(
      readLockerCsv('kind,name,from_connector,to_connector,length_m,mass_g,,\nlead,a,usb-a,usb-c,1,5,,\n').ok,
    ).toBe(true);
  });

  it('a bad number on row 37: exactly that cell is reported and no row is accepted as the whole file', () => {
    const rows = Array.from({ length: 50 }, (_, i) => ({ ...bankRow, name: `Bank ${i + 1}` }));
    rows[35] = { ...bankRow, name: 'Bank 36', capacity_mah: '10k' }; // data row 36 is spreadsheet row 37
    const result = readLockerCsv(csvOf(rows));
    expect(result.ok).toBe(false);
    expect(result.rowCount).toBe(50);
    expect(result.report).toEqual([{ row: 37, column: 'capacity_mah', message: 'Not a number: "10k"' }]);
  });

  it('names the schema field as its column, and a missing value as "needs"', () => {
    const result = readLockerCsv(
      csvOf([
        { ...panelRow, rated_w: '-5' },
        { ...panelRow, port_volts: '' },
        { ...radioRow, transmit_current_a: '' },
      ]),
    );
    expect(result.report).toEqual([
      { row: 2, column: 'rated_w', message: 'Rated power must be above 0 W' },
      { row: 3, column: 'port_volts', message: 'A panel needs port_volts' },
      { row: 4, column: 'transmit_current_a', message: 'A radio needs this value' },
    ]);
  });

  it('a value in a column that does not apply to the kind or to the use basis', () => {
    const result = readLockerCsv(
      csvOf([
        { ...leadRow, rated_w: '10' },
        { ...phoneRow, transmit_minutes_per_day: '5' },
      ]),
    );
    expect(result.report).toEqual([
      { row: 2, column: 'rated_w', message: 'rated_w does not apply to a lead; leave it empty' },
      {
        row: 3,
        column: 'transmit_minutes_per_day',
        message: expect.stringContaining('is for use_basis radio-hours, not battery-share'),
      },
    ]);
  });

  it('a 12 V panel with USB port values, a USB panel with 12 V values, an unknown panel type', () => {
    const result = readLockerCsv(
      csvOf([
        { ...twelveVoltPanelRow, port_volts: '5' },
        { ...panelRow, open_circuit_volts: '21' },
        { ...twelveVoltPanelRow, panel_type: 'solar' },
      ]),
    );
    expect(result.report).toEqual([
      { row: 2, column: 'port_volts', message: 'port_volts is for panel_type usb, not 12v; leave it empty' },
      {
        row: 3,
        column: 'open_circuit_volts',
        message: 'open_circuit_volts is for panel_type 12v, not usb; leave it empty',
      },
      { row: 4, column: 'panel_type', message: 'Panel type must be usb or 12v' },
    ]);
  });

  it('the 12 V gear: missing and out-of-range values, named by column', () => {
    const result = readLockerCsv(
      csvOf([
        { ...batteryRow, capacity_ah: '' },
        { ...batteryRow, chemistry: 'nicad' },
        { ...batteryRow, cells_in_series: '3.5' },
        { ...controllerRow, controller_type: '' },
        { ...twelveVoltPanelRow, open_circuit_volts: '17' },
        { ...dcLeadRow, gauge_awg: '16.5' },
        { ...dcLeadRow, fuse_a: '0' },
      ]),
    );
    expect(result.report).toEqual([
      { row: 2, column: 'capacity_ah', message: 'A battery needs capacity_ah' },
      { row: 3, column: 'chemistry', message: 'Chemistry must be lipo, li-ion, lifepo4 or lead-acid' },
      { row: 4, column: 'cells_in_series', message: 'Cells in series is a whole number' },
      { row: 5, column: 'controller_type', message: 'A controller needs controller_type' },
      {
        row: 6,
        column: 'open_circuit_volts',
        message: 'Open-circuit voltage must be above the maximum-power voltage',
      },
      { row: 7, column: 'gauge_awg', message: 'Wire gauge is a whole AWG number' },
      { row: 8, column: 'fuse_a', message: 'Fuse rating must be above 0 A' },
    ]);
  });

  it('an unknown or missing kind, a bad boolean, a bad port and a count out of range', () => {
    const result = readLockerCsv(
      csvOf([
        { ...leadRow, kind: 'tent' },
        { ...leadRow, kind: '' },
        { ...converterRow, input_captive_cable: 'sometimes' },
        { ...bankRow, output_ports: 'usb-a:5' },
        { ...bankRow, output_ports: 'usb-a:5:25' },
        { ...leadRow, count_owned: '21' },
        { ...leadRow, count_owned: '1.5' },
      ]),
    );
    expect(result.report).toEqual([
      {
        row: 2,
        column: 'kind',
        message: '"tent" is not a kind: panel, bank, battery, converter, controller, lead or device',
      },
      { row: 3, column: 'kind', message: 'Give the kind: panel, bank, battery, converter, controller, lead or device' },
      { row: 4, column: 'input_captive_cable', message: 'Write true or false, not "sometimes"' },
      { row: 5, column: 'output_ports', message: expect.stringContaining('write connector:volts:max_a') },
      { row: 6, column: 'output_ports', message: 'Port 1: Port current may be at most 20 A' },
      { row: 7, column: 'count_owned', message: 'Count owned may be at most 20' },
      { row: 8, column: 'count_owned', message: 'Count owned is a whole number' },
    ]);
  });

  it('a row with more cells than the header, and a broken quote', () => {
    expect(
      readLockerCsv('kind,name,from_connector,to_connector,length_m,mass_g\nlead,a,usb-a,usb-c,1,5,extra\n').report,
    ).toEqual([{ row: 2, column: '', message: 'This row has 7 cells; the header has 6' }]);
    const broken = readLockerCsv('kind,name,from_connector,to_connector,length_m,mass_g\nlead,"a,usb-a,usb-c,1,5\n');
    expect(broken.ok).toBe(false);
    expect(broken.report.some((i) => i.message.startsWith('Broken quotes'))).toBe(true);
  });

  it('more rows than the limit: one clear line, no rows accepted', () => {
    const text = csvOf(Array.from({ length: 10_000 }, (_, i) => ({ ...leadRow, name: `Lead ${i}` })));
    const result = readLockerCsv(text);
    expect(result.ok).toBe(false);
    expect(result.rows).toEqual([]);
    expect(result.rowCount).toBe(10_000);
    expect(result.report).toEqual([
      { row: 2002, column: '', message: 'The file has 10,000 items; at most 2,000 can be imported at once' },
    ]);
  });

  it('the row limit is inclusive: 2,000 rows are read, 2,001 are refused', () => {
    const rows = (n: number) => csvOf(Array.from({ length: n }, (_, i) => ({ ...leadRow, name: `Lead ${i}` })));
    const atLimit = readLockerCsv(rows(2000));
    expect(atLimit.ok).toBe(true);
    expect(atLimit.rows).toHaveLength(2000);
    const over = readLockerCsv(rows(2001));
    expect(over.ok).toBe(false);
    expect(over.report[0]?.row).toBe(2002);
  });

  it('caps a long report and says how many problems are left out', () => {
    const text = csvOf(Array.from({ length: 600 }, (_, i) => ({ ...leadRow, name: `Lead ${i}`, length_m: 'x' })));
    const result = readLockerCsv(text);
    expect(result.report).toHaveLength(maxLockerCsvIssues + 1);
    expect(result.report.at(-1)?.message).toBe('…and 100 more problems');
  });
});

describe('the column table', () => {
  it('has unique snake_case names and a column for every spec field the schemas know', () => {
    const names = lockerCsvColumns.map((c) => c.name);
    expect(new Set(names).size).toBe(names.length);
    for (const name of names) expect(name).toMatch(/^[a-z][a-z0-9_]*$/);
    const paths = new Set(lockerCsvColumns.map((c) => c.path.join('.')));
    const specKeys = (shape: Record<string, unknown>) => Object.keys(shape).map((k) => `spec.${k}`);
    const covered = (key: string) => [...paths].some((p) => p === key || p.startsWith(`${key}.`));
    const objectShape = (schema: unknown) => (schema as { shape?: Record<string, unknown> }).shape;
    for (const schema of [
      usbPanelSpecSchema,
      twelveVoltPanelSpecSchema,
      bankSpecSchema,
      batterySpecSchema,
      converterSpecSchema,
      controllerSpecSchema,
      leadSpecSchema,
      deviceSpecSchema,
    ]) {
      const keys = specKeys(objectShape(schema) ?? {}).filter((k) => k !== 'spec.kind' || covered(k));
      expect(keys.length).toBeGreaterThan(3);
      for (const key of keys) expect(covered(key), key).toBe(true);
    }
    // The use profile's fields too.
    for (const key of [
      'transmitMinutesPerDay',
      'receiveHoursPerDay',
      'standbyHoursPerDay',
      'batterySharePerDay',
      'energyWhPerDay',
    ]) {
      expect(covered(`spec.useProfile.${key}`), key).toBe(true);
    }
  });
});

// Round trip: export a locker, import it into an empty one, get the same items back.

const nameChars = fc.constantFrom(...'abcXYZ 019,;"\'=+-@|:é°日\t'.split(''));
const noteChars = fc.constantFrom(...'ab Z9,;"\'=+-@|:é°日\n\r\t'.split(''));
const nameArb = fc
  .string({ unit: nameChars, minLength: 1, maxLength: 40 })
  .map((s) => s.trim())
  .filter((s) => s.length > 0);
const notesArb = fc.oneof(fc.constant(''), fc.string({ unit: noteChars, maxLength: 120 }));

const whBankArb = bankArb.map((b) => {
  const { capacityMah: _mah, ...rest } = b;
  return bankSpecSchema.parse({ ...rest, capacityWh: Math.round((b.capacityMah ?? 5000) * 0.0037 * 100) / 100 });
});
const usbAdapterArb = fc
  .record({
    outputVolts: fc.constantFrom(5, 9),
    maxOutputA: share(0.5, 3),
    efficiency: share(0.7, 0.95),
    massG: fc.integer({ min: 10, max: 90 }),
  })
  .map((c) =>
    converterSpecSchema.parse({
      kind: 'converter',
      converterType: '12v-to-usb',
      inputVolts: 12,
      ...c,
      inputPort: { connector: '12v-accessory', captiveCable: false },
      outputPort: { connector: 'usb-a', captiveCable: false },
    }),
  );
const energyDeviceArb = fc
  .record({
    energyWhPerDay: share(0, 30),
    ownBatteryWh: share(0, 20),
    massG: fc.option(fc.integer({ min: 20, max: 900 }), { nil: undefined }),
  })
  .map(({ energyWhPerDay, ...d }) =>
    deviceSpecSchema.parse({
      kind: 'device',
      deviceKind: 'camera',
      chargesVia: 'usb-5v',
      chargePowerW: 5,
      chargePort: { connector: 'micro-usb', captiveCable: true },
      ...d,
      useProfile: { basis: 'energy', energyWhPerDay },
    }),
  );
const specArb: fc.Arbitrary<ItemSpec> = fc.oneof(
  panelArb,
  bankArb,
  whBankArb,
  converterArb,
  usbAdapterArb,
  leadArb,
  deviceArb,
  energyDeviceArb,
  twelveVoltPanelArb,
  batteryArb,
  controllerArb,
  dcLeadArb,
);
const lockerItemArb: fc.Arbitrary<LockerItemInput> = fc
  .record({ name: nameArb, notes: notesArb, countOwned: fc.integer({ min: 1, max: 20 }), spec: specArb })
  .map((raw) => lockerItemInputSchema.parse(raw));

describe('writeLockerCsv', () => {
  it('writes a BOM, the full header and CRLF line ends; doubles quotes inside quoted cells (RFC 4180 §2 rule 7)', () => {
    const text = writeLockerCsv([
      {
        name: 'Short C',
        notes: 'say "hi"',
        countOwned: 2,
        spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 },
      },
    ]);
    expect(text.startsWith(`\uFEFF${lockerCsvHeader.join(',')}\r\n`)).toBe(true);
    expect(text).toContain('lead,Short C,2,15,"say ""hi""",');
    expect(text.endsWith('\r\n')).toBe(true);
  });

  it('an empty locker is a header only (which an import reports as having no items)', () => {
    const text = writeLockerCsv([]);
    expect(text).toBe(`\uFEFF${lockerCsvHeader.join(',')}\r\n`);
    expect(readLockerCsv(text).report[0]?.message).toBe('The file has a header but no items');
  });

  it('property: export then import gives back the same items, in order', () => {
    fc.assert(
      fc.property(fc.array(lockerItemArb, { minLength: 1, maxLength: 12 }), (items) => {
        const result = readLockerCsv(writeLockerCsv(items));
        expect(result.report).toEqual([]);
        expect(result.rows.map((r) => r.item)).toEqual(items);
      }),
      { numRuns: 300 },
    );
  });
});
