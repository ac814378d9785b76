import type { LockerItemKind } from '../schemas/locker.js';
import type { PanelSpec } from '../schemas/items.js';

/** The two panel types: a USB panel or a 12 V panel. */
export type PanelType = PanelSpec['panelType'];
export const lockerPanelTypes: readonly PanelType[] = ['usb', '12v'];

/**
 * Gramwatt's own locker CSV columns: one file for every kind, told apart by the `kind` column; each spec
 * field a snake_case column with its unit in the name. A cell left empty means "not given" (the schema's
 * default applies, or the row is reported when the kind needs the value). The README's "Locker CSV"
 * section documents the same table; the import screen lists it from here.
 */

/** How a cell is read and written. */
export type LockerCsvCellType =
  /** Text, trimmed (names, enum values). */
  | 'text'
  /** Text kept exactly as written (notes). */
  | 'notes'
  /** A decimal number: `.` decimals; in a `;`-separated file `,` decimals too. */
  | 'number'
  /** A boolean: true/false, yes/no or 1/0. */
  | 'boolean'
  /** A bank's output ports in the compact form `connector:volts:max_a[:pd=9/12][:captive]`, ports split by `|`. */
  | 'output-ports';

/** One column of the locker CSV. */
export interface LockerCsvColumn {
  /** Header name (lower-case snake_case, unit last). */
  name: string;
  /** Where the value goes in the locker item input (`['spec', 'ratedW']`). */
  path: readonly string[];
  /** The kinds the column applies to; a value in a row of another kind is reported. */
  kinds: readonly LockerItemKind[];
  type: LockerCsvCellType;
  /** For a device's use-profile columns: the `use_basis` values they belong to. */
  useBases?: readonly string[];
  /** For a panel's type-specific columns: the `panel_type` values they belong to (every type when absent). */
  panelTypes?: readonly PanelType[];
  /** Required in the header (the file is rejected without it). */
  requiredInHeader?: boolean;
  /** What an empty cell stands for, when not the schema's own default. */
  blankMeans?: string | number | boolean;
  /** One line for the docs: meaning, unit, allowed values. */
  description: string;
}

const allKinds: readonly LockerItemKind[] = ['panel', 'bank', 'battery', 'converter', 'controller', 'lead', 'device'];
const connectorList =
  'usb-a, usb-c, micro-usb, barrel-5.5x2.1, barrel-5.5x2.5, 12v-accessory, ring-terminal, radio-dc, other';
const radio = ['radio-hours'] as const;

/** Every column, in the order an export writes them. */
export const lockerCsvColumns: readonly LockerCsvColumn[] = [
  {
    name: 'kind',
    path: ['spec', 'kind'],
    kinds: allKinds,
    type: 'text',
    requiredInHeader: true,
    description: 'panel, bank, battery, converter, controller, lead or device',
  },
  {
    name: 'name',
    path: ['name'],
    kinds: allKinds,
    type: 'text',
    requiredInHeader: true,
    description: 'Item name, 1–120 characters',
  },
  {
    name: 'count_owned',
    path: ['countOwned'],
    kinds: allKinds,
    type: 'number',
    blankMeans: 1,
    description: 'How many you own, 1–20 (empty: 1)',
  },
  {
    name: 'mass_g',
    path: ['spec', 'massG'],
    kinds: allKinds,
    type: 'number',
    description: 'Grams of one item (a device may leave it empty)',
  },
  { name: 'notes', path: ['notes'], kinds: allKinds, type: 'notes', description: 'Free text, up to 2000 characters' },
  // Panels
  {
    name: 'panel_type',
    path: ['spec', 'panelType'],
    kinds: ['panel'],
    type: 'text',
    blankMeans: 'usb',
    description: 'usb (a regulated USB output) or 12v (a 12 V-class panel for a charge controller); empty: usb',
  },
  { name: 'rated_w', path: ['spec', 'ratedW'], kinds: ['panel'], type: 'number', description: 'Rated power at STC, W' },
  {
    name: 'port_volts',
    path: ['spec', 'portVolts'],
    kinds: ['panel'],
    panelTypes: ['usb'],
    type: 'number',
    description: 'USB panel: USB port voltage, V',
  },
  {
    name: 'port_max_a',
    path: ['spec', 'portMaxA'],
    kinds: ['panel'],
    panelTypes: ['usb'],
    type: 'number',
    description: 'USB panel: USB port maximum current, A',
  },
  {
    name: 'max_power_volts',
    path: ['spec', 'maxPowerVolts'],
    kinds: ['panel'],
    panelTypes: ['12v'],
    type: 'number',
    description: '12 V panel: voltage at maximum power (Vmp) at STC, V',
  },
  {
    name: 'max_power_amps',
    path: ['spec', 'maxPowerAmps'],
    kinds: ['panel'],
    panelTypes: ['12v'],
    type: 'number',
    description: '12 V panel: current at maximum power (Imp) at STC, A',
  },
  {
    name: 'open_circuit_volts',
    path: ['spec', 'openCircuitVolts'],
    kinds: ['panel'],
    panelTypes: ['12v'],
    type: 'number',
    description: '12 V panel: open-circuit voltage (Voc) at STC, V',
  },
  {
    name: 'short_circuit_amps',
    path: ['spec', 'shortCircuitAmps'],
    kinds: ['panel'],
    panelTypes: ['12v'],
    type: 'number',
    description: '12 V panel: short-circuit current (Isc) at STC, A (optional)',
  },
  {
    name: 'dropout_irradiance_w_m2',
    path: ['spec', 'dropoutIrradianceWm2'],
    kinds: ['panel'],
    type: 'number',
    description: 'Irradiance below which the port gives nothing, W/m² (empty: 0)',
  },
  {
    name: 'temp_coeff_pct_per_c',
    path: ['spec', 'tempCoeffPctPerC'],
    kinds: ['panel'],
    type: 'number',
    description: 'Temperature coefficient of power, %/°C, 0 or negative (empty: −0.4)',
  },
  {
    name: 'temp_coeff_voc_pct_per_c',
    path: ['spec', 'tempCoeffVocPctPerC'],
    kinds: ['panel'],
    panelTypes: ['12v'],
    type: 'number',
    description: '12 V panel: temperature coefficient of Voc, %/°C, 0 or negative (empty: −0.3)',
  },
  {
    name: 'output_connector',
    path: ['spec', 'outputPort', 'connector'],
    kinds: ['panel', 'converter', 'controller'],
    type: 'text',
    description: `Output connector: ${connectorList}`,
  },
  {
    name: 'output_captive_cable',
    path: ['spec', 'outputPort', 'captiveCable'],
    kinds: ['panel', 'converter', 'controller'],
    type: 'boolean',
    blankMeans: false,
    description: 'The output has a fixed cable (connector = its plug); empty: false',
  },
  // Banks
  {
    name: 'capacity_mah',
    path: ['spec', 'capacityMah'],
    kinds: ['bank'],
    type: 'number',
    description: 'Rated capacity at the cell voltage, mAh (or give capacity_wh)',
  },
  {
    name: 'cell_volts',
    path: ['spec', 'cellVolts'],
    kinds: ['bank'],
    type: 'number',
    description: 'Nominal cell voltage the mAh refer to, V (empty: 3.7)',
  },
  {
    name: 'capacity_wh',
    path: ['spec', 'capacityWh'],
    kinds: ['bank'],
    type: 'number',
    description: 'Rated energy, Wh (or give capacity_mah)',
  },
  {
    name: 'input_max_w',
    path: ['spec', 'inputMaxW'],
    kinds: ['bank'],
    type: 'number',
    description: 'Most power the input takes, W',
  },
  {
    name: 'input_connector',
    path: ['spec', 'inputPort', 'connector'],
    kinds: ['bank', 'converter', 'controller'],
    type: 'text',
    description: `Input connector: ${connectorList}`,
  },
  {
    name: 'input_captive_cable',
    path: ['spec', 'inputPort', 'captiveCable'],
    kinds: ['bank', 'converter', 'controller'],
    type: 'boolean',
    blankMeans: false,
    description: 'The input has a fixed cable; empty: false',
  },
  {
    name: 'output_ports',
    path: ['spec', 'outputPorts'],
    kinds: ['bank'],
    type: 'output-ports',
    description:
      'Output ports, `|` between ports, each connector:volts:max_a with optional :pd=9/12 and :captive — e.g. usb-a:5:2.4|usb-c:5:3:pd=9/12',
  },
  {
    name: 'output_efficiency',
    path: ['spec', 'outputEfficiency'],
    kinds: ['bank'],
    type: 'number',
    description: 'Share of stored energy delivered at the ports, 0–1 (empty: 0.85)',
  },
  {
    name: 'charge_efficiency',
    path: ['spec', 'chargeEfficiency'],
    kinds: ['bank', 'device'],
    type: 'number',
    description: 'Share of input energy that is stored, 0–1 (empty: bank 0.9, device 0.85)',
  },
  // Batteries
  {
    name: 'chemistry',
    path: ['spec', 'chemistry'],
    kinds: ['battery'],
    type: 'text',
    description: 'lipo, li-ion, lifepo4 or lead-acid',
  },
  {
    name: 'cells_in_series',
    path: ['spec', 'cellsInSeries'],
    kinds: ['battery'],
    type: 'number',
    description: 'Cells in series, a whole number (4 for a 12.8 V LiFePO4 pack, 6 for a 12 V lead-acid one)',
  },
  {
    name: 'capacity_ah',
    path: ['spec', 'capacityAh'],
    kinds: ['battery'],
    type: 'number',
    description: 'Rated capacity, Ah',
  },
  {
    name: 'charge_c_rate',
    path: ['spec', 'chargeCRate'],
    kinds: ['battery'],
    type: 'number',
    description: "The maker's largest charge rate, C (0.5 = half the Ah in A); empty: typical for the chemistry",
  },
  {
    name: 'discharge_c_rate',
    path: ['spec', 'dischargeCRate'],
    kinds: ['battery'],
    type: 'number',
    description: "The maker's continuous discharge rate, C (optional)",
  },
  {
    name: 'rated_hours',
    path: ['spec', 'ratedHours'],
    kinds: ['battery'],
    type: 'number',
    description: 'Hours the capacity is rated over, h (optional; lead-acid usually 20)',
  },
  {
    name: 'peukert_exponent',
    path: ['spec', 'peukertExponent'],
    kinds: ['battery'],
    type: 'number',
    description: "Peukert exponent from the maker's rate table, 1–2 (optional)",
  },
  {
    name: 'port_connector',
    path: ['spec', 'port', 'connector'],
    kinds: ['battery'],
    type: 'text',
    description: "The battery's terminal or socket (same list as output_connector)",
  },
  {
    name: 'port_captive_cable',
    path: ['spec', 'port', 'captiveCable'],
    kinds: ['battery'],
    type: 'boolean',
    blankMeans: false,
    description: 'The battery has a fixed cable (connector = its plug); empty: false',
  },
  // Converters
  {
    name: 'converter_type',
    path: ['spec', 'converterType'],
    kinds: ['converter'],
    type: 'text',
    description: 'boost (USB 5 V or a USB PD voltage → 12–13.8 V) or 12v-to-usb',
  },
  {
    name: 'input_volts',
    path: ['spec', 'inputVolts'],
    kinds: ['converter'],
    type: 'number',
    description: 'Input voltage, V',
  },
  {
    name: 'output_volts',
    path: ['spec', 'outputVolts'],
    kinds: ['converter'],
    type: 'number',
    description: 'Output voltage, V',
  },
  {
    name: 'max_output_a',
    path: ['spec', 'maxOutputA'],
    kinds: ['converter'],
    type: 'number',
    description: 'Maximum output current, A',
  },
  {
    name: 'efficiency',
    path: ['spec', 'efficiency'],
    kinds: ['converter', 'controller'],
    type: 'number',
    description: 'Conversion efficiency, 0–1 (empty: converter 0.85, controller 0.95)',
  },
  // Controllers
  {
    name: 'controller_type',
    path: ['spec', 'controllerType'],
    kinds: ['controller'],
    type: 'text',
    description: 'pwm or mppt',
  },
  {
    name: 'max_input_volts',
    path: ['spec', 'maxInputVolts'],
    kinds: ['controller'],
    type: 'number',
    description: 'Highest panel voltage the input takes, V',
  },
  {
    name: 'max_charge_a',
    path: ['spec', 'maxChargeA'],
    kinds: ['controller'],
    type: 'number',
    description: 'Largest charge current into the battery, A',
  },
  // Leads
  {
    name: 'from_connector',
    path: ['spec', 'fromConnector'],
    kinds: ['lead'],
    type: 'text',
    description: `One end: ${connectorList}`,
  },
  {
    name: 'to_connector',
    path: ['spec', 'toConnector'],
    kinds: ['lead'],
    type: 'text',
    description: 'The other end (same list)',
  },
  { name: 'length_m', path: ['spec', 'lengthM'], kinds: ['lead'], type: 'number', description: 'One-way length, m' },
  {
    name: 'gauge_awg',
    path: ['spec', 'gaugeAwg'],
    kinds: ['lead'],
    type: 'number',
    description: 'DC lead: copper wire gauge, AWG, a whole number (optional)',
  },
  {
    name: 'fuse_a',
    path: ['spec', 'fuseA'],
    kinds: ['lead'],
    type: 'number',
    description: 'DC lead: inline fuse rating, A (optional)',
  },
  // Devices
  {
    name: 'device_kind',
    path: ['spec', 'deviceKind'],
    kinds: ['device'],
    type: 'text',
    description: 'radio, phone, messenger, headlamp, camera or other',
  },
  {
    name: 'own_battery_wh',
    path: ['spec', 'ownBatteryWh'],
    kinds: ['device'],
    type: 'number',
    description: "The device's own battery, Wh",
  },
  {
    name: 'charges_via',
    path: ['spec', 'chargesVia'],
    kinds: ['device'],
    type: 'text',
    description: 'usb-5v, usb-pd or 12v-dc',
  },
  {
    name: 'charge_power_w',
    path: ['spec', 'chargePowerW'],
    kinds: ['device'],
    type: 'number',
    description: 'Charge power, W (or give charge_current_a)',
  },
  {
    name: 'charge_current_a',
    path: ['spec', 'chargeCurrentA'],
    kinds: ['device'],
    type: 'number',
    description: 'Charge current, A (or give charge_power_w)',
  },
  {
    name: 'usb_pd_volts',
    path: ['spec', 'usbPdVolts'],
    kinds: ['device'],
    type: 'number',
    description: 'For usb-pd: the PD voltage it asks for, V (empty: 9)',
  },
  {
    name: 'charge_connector',
    path: ['spec', 'chargePort', 'connector'],
    kinds: ['device'],
    type: 'text',
    description: 'Charge connector (same list as output_connector)',
  },
  {
    name: 'charge_captive_cable',
    path: ['spec', 'chargePort', 'captiveCable'],
    kinds: ['device'],
    type: 'boolean',
    blankMeans: false,
    description: 'The charge input has a fixed cable; empty: false',
  },
  {
    name: 'supply_volts_nominal',
    path: ['spec', 'supplyVoltsNominal'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: nominal supply voltage, V',
  },
  {
    name: 'supply_volts_min',
    path: ['spec', 'supplyVoltsMin'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: lowest supply voltage, V',
  },
  {
    name: 'supply_volts_max',
    path: ['spec', 'supplyVoltsMax'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: highest supply voltage, V',
  },
  {
    name: 'transmit_current_a',
    path: ['spec', 'transmitCurrentA'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: current while transmitting, A',
  },
  {
    name: 'receive_current_a',
    path: ['spec', 'receiveCurrentA'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: current while receiving, A',
  },
  {
    name: 'standby_current_a',
    path: ['spec', 'standbyCurrentA'],
    kinds: ['device'],
    type: 'number',
    description: 'Radio: current on standby, A',
  },
  {
    name: 'can_run_live',
    path: ['spec', 'canRunLive'],
    kinds: ['device'],
    type: 'boolean',
    description: 'Radio: can run live from a 12 V pack (empty: false)',
  },
  {
    name: 'use_basis',
    path: ['spec', 'useProfile', 'basis'],
    kinds: ['device'],
    type: 'text',
    description: 'Default use profile: radio-hours, battery-share or energy',
  },
  {
    name: 'transmit_minutes_per_day',
    path: ['spec', 'useProfile', 'transmitMinutesPerDay'],
    kinds: ['device'],
    useBases: radio,
    type: 'number',
    description: 'radio-hours: minutes transmitting a day',
  },
  {
    name: 'receive_hours_per_day',
    path: ['spec', 'useProfile', 'receiveHoursPerDay'],
    kinds: ['device'],
    useBases: radio,
    type: 'number',
    description: 'radio-hours: hours receiving a day',
  },
  {
    name: 'standby_hours_per_day',
    path: ['spec', 'useProfile', 'standbyHoursPerDay'],
    kinds: ['device'],
    useBases: radio,
    type: 'number',
    description: 'radio-hours: hours on standby a day',
  },
  {
    name: 'battery_share_per_day',
    path: ['spec', 'useProfile', 'batterySharePerDay'],
    kinds: ['device'],
    useBases: ['battery-share'],
    type: 'number',
    description: 'battery-share: share of its own battery used a day (0.6 = 60 %)',
  },
  {
    name: 'energy_wh_per_day',
    path: ['spec', 'useProfile', 'energyWhPerDay'],
    kinds: ['device'],
    useBases: ['energy'],
    type: 'number',
    description: 'energy: Wh used a day at the device',
  },
];

/** Columns by header name. */
export const lockerCsvColumnsByName: ReadonlyMap<string, LockerCsvColumn> = new Map(
  lockerCsvColumns.map((c) => [c.name, c]),
);

/** The header an export writes (every column, in order). */
export const lockerCsvHeader: readonly string[] = lockerCsvColumns.map((c) => c.name);

/**
 * The column a validation issue belongs to, from its path in the item input: the column with exactly that
 * path, else the first column under it (a missing `outputPort` → `output_connector`), else the column that
 * holds it (`spec.outputPorts.1.maxA` → `output_ports`). `undefined` when none does.
 *
 * @example
 * columnForPath(['spec', 'useProfile']); // → the use_basis column
 */
export function columnForPath(path: readonly PropertyKey[]): LockerCsvColumn | undefined {
  const key = path.map(String);
  const startsWith = (long: readonly string[], short: readonly string[]) => short.every((part, i) => long[i] === part);
  return (
    lockerCsvColumns.find((c) => c.path.length === key.length && startsWith(c.path, key)) ??
    lockerCsvColumns.find((c) => c.path.length > key.length && startsWith(c.path, key)) ??
    lockerCsvColumns.find((c) => key.length > c.path.length && startsWith(key, c.path))
  );
}
