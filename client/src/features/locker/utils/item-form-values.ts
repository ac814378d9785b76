import {
  defaultMpptEfficiency,
  defaultPanelVocTempCoeffPctPerC,
  type BatteryChemistry,
  type ChargeInput,
  type Connector,
  type ControllerSpec,
  type DeviceKind,
  type ItemKind,
  type ItemSpec,
  type OutputPort,
  type PanelSpec,
  type Port,
  type UseProfile,
} from '@gramwatt/shared';
import { z } from 'zod';

/**
 * The item form's values. Every number is the text in its input (empty = not given), every share is in percent,
 * and the field names are the API's, so a server error on `spec.ratedW` lands on the field `spec.ratedW`.
 * One shape holds every kind's fields; `toItemBody` keeps only the fields of the chosen kind.
 */
export interface PortFormValues {
  connector: Connector;
  captiveCable: boolean;
}

export interface OutputPortFormValues extends PortFormValues {
  volts: string;
  maxA: string;
  /** USB PD voltages as typed, e.g. "9, 12, 15". */
  usbPdVolts: string;
}

export type UseBasis = UseProfile['basis'];

export interface UseProfileFormValues {
  basis: UseBasis;
  transmitMinutesPerDay: string;
  receiveHoursPerDay: string;
  standbyHoursPerDay: string;
  /** Percent of the device's battery per day. */
  batterySharePerDay: string;
  energyWhPerDay: string;
}

export interface SpecFormValues {
  kind: ItemKind;
  massG: string;
  // panel (USB and 12 V)
  panelType: PanelSpec['panelType'];
  ratedW: string;
  portVolts: string;
  portMaxA: string;
  maxPowerVolts: string;
  maxPowerAmps: string;
  openCircuitVolts: string;
  shortCircuitAmps: string;
  dropoutIrradianceWm2: string;
  tempCoeffPctPerC: string;
  tempCoeffVocPctPerC: string;
  outputPort: PortFormValues;
  // battery
  chemistry: BatteryChemistry;
  cellsInSeries: string;
  capacityAh: string;
  chargeCRate: string;
  dischargeCRate: string;
  ratedHours: string;
  peukertExponent: string;
  port: PortFormValues;
  // bank
  capacityMah: string;
  cellVolts: string;
  capacityWh: string;
  inputMaxW: string;
  inputPort: PortFormValues;
  outputPorts: OutputPortFormValues[];
  /** Percent. */
  outputEfficiency: string;
  /** Percent (banks and devices). */
  chargeEfficiency: string;
  // converter
  converterType: 'boost' | '12v-to-usb';
  inputVolts: string;
  outputVolts: string;
  maxOutputA: string;
  /** Percent (converters and controllers). */
  efficiency: string;
  // controller
  controllerType: ControllerSpec['controllerType'];
  maxInputVolts: string;
  maxChargeA: string;
  // lead
  fromConnector: Connector;
  toConnector: Connector;
  lengthM: string;
  gaugeAwg: string;
  fuseA: string;
  // device
  deviceKind: DeviceKind;
  ownBatteryWh: string;
  chargesVia: ChargeInput;
  chargePowerW: string;
  chargeCurrentA: string;
  usbPdVolts: string;
  chargePort: PortFormValues;
  supplyVoltsNominal: string;
  supplyVoltsMin: string;
  supplyVoltsMax: string;
  transmitCurrentA: string;
  receiveCurrentA: string;
  standbyCurrentA: string;
  canRunLive: boolean;
  useProfile: UseProfileFormValues;
}

export interface ItemFormValues {
  name: string;
  notes: string;
  countOwned: string;
  /** How a bank's capacity is given; not sent (only the chosen field is). */
  capacityUnit: 'mah' | 'wh';

  spec: SpecFormValues;
}

/** Form fields that hold a percent on screen and a share 0–1 in the API. */
export const percentFields = [
  'spec.outputEfficiency',
  'spec.chargeEfficiency',
  'spec.efficiency',
  'spec.useProfile.batterySharePerDay',
] as const;

const text = (value: number | undefined): string => (value === undefined ? '' : String(value));
/** Share → percent text, rounded away from float noise (0.85 × 100 = 85.00000000000001). */
const percentText = (share: number | undefined): string =>
  share === undefined ? '' : String(Math.round(share * 100 * 1e6) / 1e6);

const defaultPort = (connector: Connector): PortFormValues => ({ connector, captiveCable: false });

/** A new bank's first output port: a 5 V, 2.4 A USB-A socket (a common bank port, common practice). */
export const newOutputPort = (): OutputPortFormValues => ({
  connector: 'usb-a',
  captiveCable: false,
  volts: '5',
  maxA: '2.4',
  usbPdVolts: '',
});

/** The starting values for a new item of a kind; defaults match the shared schema's own defaults. */
export const emptyItemFormValues = (kind: ItemKind): ItemFormValues => ({
  name: '',
  notes: '',
  countOwned: '1',
  capacityUnit: 'mah',
  spec: {
    kind,
    massG: '',
    panelType: 'usb',
    ratedW: '',
    portVolts: '5',
    portMaxA: '',
    maxPowerVolts: '',
    maxPowerAmps: '',
    openCircuitVolts: '',
    shortCircuitAmps: '',
    dropoutIrradianceWm2: '0',
    tempCoeffPctPerC: '-0.4',
    tempCoeffVocPctPerC: String(defaultPanelVocTempCoeffPctPerC),
    outputPort: defaultPort(kind === 'controller' ? 'ring-terminal' : 'usb-a'),
    chemistry: 'lifepo4',
    cellsInSeries: '4',
    capacityAh: '',
    chargeCRate: '',
    dischargeCRate: '',
    ratedHours: '',
    peukertExponent: '',
    port: defaultPort('ring-terminal'),
    capacityMah: '',
    cellVolts: '3.7',
    capacityWh: '',
    inputMaxW: '',
    inputPort: defaultPort(kind === 'controller' ? 'barrel-5.5x2.1' : 'usb-c'),
    outputPorts: [newOutputPort()],
    outputEfficiency: '85',
    chargeEfficiency: kind === 'device' ? '85' : '90',
    converterType: 'boost',
    inputVolts: '5',
    outputVolts: '12',
    maxOutputA: '',
    efficiency: kind === 'controller' ? percentText(defaultMpptEfficiency) : '85',
    controllerType: 'mppt',
    maxInputVolts: '',
    maxChargeA: '',
    fromConnector: 'usb-a',
    toConnector: 'usb-c',
    lengthM: '',
    gaugeAwg: '',
    fuseA: '',
    deviceKind: 'phone',
    ownBatteryWh: '',
    chargesVia: 'usb-5v',
    chargePowerW: '',
    chargeCurrentA: '',
    usbPdVolts: '',
    chargePort: defaultPort('usb-c'),
    supplyVoltsNominal: '',
    supplyVoltsMin: '',
    supplyVoltsMax: '',
    transmitCurrentA: '',
    receiveCurrentA: '',
    standbyCurrentA: '',
    canRunLive: false,
    useProfile: {
      basis: 'battery-share',
      transmitMinutesPerDay: '',
      receiveHoursPerDay: '',
      standbyHoursPerDay: '',
      batterySharePerDay: '',
      energyWhPerDay: '',
    },
  },
});

const outputPortToForm = (port: OutputPort): OutputPortFormValues => ({
  connector: port.connector,
  captiveCable: port.captiveCable,
  volts: text(port.volts),
  maxA: text(port.maxA),
  usbPdVolts: port.usbPdVolts.join(', '),
});

const portToForm = (port: Port): PortFormValues => ({ connector: port.connector, captiveCable: port.captiveCable });

/** An item (from the API) as form values: shares become percent, numbers become text. */
export const itemToFormValues = (item: {
  name: string;
  notes: string;
  countOwned?: number;
  spec: ItemSpec;
}): ItemFormValues => {
  const values = emptyItemFormValues(item.spec.kind);
  const s = values.spec;
  const base = { ...values, name: item.name, notes: item.notes, countOwned: text(item.countOwned ?? 1) };
  const spec = item.spec;
  switch (spec.kind) {
    case 'panel': {
      const common = {
        ...s,
        panelType: spec.panelType,
        massG: text(spec.massG),
        ratedW: text(spec.ratedW),
        dropoutIrradianceWm2: text(spec.dropoutIrradianceWm2),
        tempCoeffPctPerC: text(spec.tempCoeffPctPerC),
        outputPort: portToForm(spec.outputPort),
      };
      return spec.panelType === 'usb'
        ? { ...base, spec: { ...common, portVolts: text(spec.portVolts), portMaxA: text(spec.portMaxA) } }
        : {
            ...base,
            spec: {
              ...common,
              maxPowerVolts: text(spec.maxPowerVolts),
              maxPowerAmps: text(spec.maxPowerAmps),
              openCircuitVolts: text(spec.openCircuitVolts),
              shortCircuitAmps: text(spec.shortCircuitAmps),
              tempCoeffVocPctPerC: text(spec.tempCoeffVocPctPerC),
            },
          };
    }
    case 'battery':
      return {
        ...base,
        spec: {
          ...s,
          massG: text(spec.massG),
          chemistry: spec.chemistry,
          cellsInSeries: text(spec.cellsInSeries),
          capacityAh: text(spec.capacityAh),
          chargeCRate: text(spec.chargeCRate),
          dischargeCRate: text(spec.dischargeCRate),
          ratedHours: text(spec.ratedHours),
          peukertExponent: text(spec.peukertExponent),
          port: portToForm(spec.port),
        },
      };
    case 'controller':
      return {
        ...base,
        spec: {
          ...s,
          massG: text(spec.massG),
          controllerType: spec.controllerType,
          maxInputVolts: text(spec.maxInputVolts),
          maxChargeA: text(spec.maxChargeA),
          efficiency: percentText(spec.efficiency),
          inputPort: portToForm(spec.inputPort),
          outputPort: portToForm(spec.outputPort),
        },
      };
    case 'bank':
      return {
        ...base,
        capacityUnit: spec.capacityWh !== undefined ? 'wh' : 'mah',
        spec: {
          ...s,
          massG: text(spec.massG),
          capacityMah: text(spec.capacityMah),
          cellVolts: text(spec.cellVolts),
          capacityWh: text(spec.capacityWh),
          inputMaxW: text(spec.inputMaxW),
          inputPort: portToForm(spec.inputPort),
          outputPorts: spec.outputPorts.map(outputPortToForm),
          outputEfficiency: percentText(spec.outputEfficiency),
          chargeEfficiency: percentText(spec.chargeEfficiency),
        },
      };
    case 'converter':
      return {
        ...base,
        spec: {
          ...s,
          massG: text(spec.massG),
          converterType: spec.converterType,
          inputVolts: text(spec.inputVolts),
          outputVolts: text(spec.outputVolts),
          maxOutputA: text(spec.maxOutputA),
          efficiency: percentText(spec.efficiency),
          inputPort: portToForm(spec.inputPort),
          outputPort: portToForm(spec.outputPort),
        },
      };
    case 'lead':
      return {
        ...base,
        spec: {
          ...s,
          massG: text(spec.massG),
          fromConnector: spec.fromConnector,
          toConnector: spec.toConnector,
          lengthM: text(spec.lengthM),
          gaugeAwg: text(spec.gaugeAwg),
          fuseA: text(spec.fuseA),
        },
      };
    case 'device': {
      const profile = spec.useProfile;
      return {
        ...base,
        spec: {
          ...s,
          massG: text(spec.massG),
          deviceKind: spec.deviceKind,
          ownBatteryWh: text(spec.ownBatteryWh),
          chargesVia: spec.chargesVia,
          chargePowerW: text(spec.chargePowerW),
          chargeCurrentA: text(spec.chargeCurrentA),
          usbPdVolts: text(spec.usbPdVolts),
          chargeEfficiency: percentText(spec.chargeEfficiency),
          chargePort: portToForm(spec.chargePort),
          supplyVoltsNominal: text(spec.supplyVoltsNominal),
          supplyVoltsMin: text(spec.supplyVoltsMin),
          supplyVoltsMax: text(spec.supplyVoltsMax),
          transmitCurrentA: text(spec.transmitCurrentA),
          receiveCurrentA: text(spec.receiveCurrentA),
          standbyCurrentA: text(spec.standbyCurrentA),
          canRunLive: spec.canRunLive,
          useProfile: {
            ...s.useProfile,
            basis: profile.basis,
            ...(profile.basis === 'radio-hours'
              ? {
                  transmitMinutesPerDay: text(profile.transmitMinutesPerDay),
                  receiveHoursPerDay: text(profile.receiveHoursPerDay),
                  standbyHoursPerDay: text(profile.standbyHoursPerDay),
                }
              : profile.basis === 'battery-share'
                ? { batterySharePerDay: percentText(profile.batterySharePerDay) }
                : { energyWhPerDay: text(profile.energyWhPerDay) }),
          },
        },
      };
    }
  }
};

/**
 * Text → number for the schema: empty is "not given" (undefined, so the schema's default or its "required"
 * applies); a decimal comma is read as a point; anything else that is not a number is passed on as text so the
 * schema reports it as "must be a number".
 */
export const parseNumberText = (value: string): number | string | undefined => {
  const trimmed = value.trim();
  if (trimmed === '') return undefined;
  const number = Number(trimmed.replace(',', '.'));
  return Number.isFinite(number) ? number : trimmed;
};

const num = parseNumberText;
const share = (value: string): number | string | undefined => {
  const parsed = num(value);
  // Rounded so that 85 % is exactly 0.85, not 0.8500000000000001.
  return typeof parsed === 'number' ? Math.round(parsed * 1e6) / 1e8 : parsed;
};
const list = (value: string): Array<number | string> =>
  value
    .split(/[;,\s]+/)
    .filter(Boolean)
    .map((token) => num(token) ?? token);

/** Drops keys whose value is undefined, so optional fields are left out rather than sent empty. */
const compact = (record: Record<string, unknown>): Record<string, unknown> =>
  Object.fromEntries(Object.entries(record).filter(([, value]) => value !== undefined));

/** The API body the form's values stand for: only the chosen kind's fields, numbers parsed, percent → share. */
export const toItemBody = (values: ItemFormValues): Record<string, unknown> => {
  const s = values.spec;
  const specOf = (): Record<string, unknown> => {
    switch (s.kind) {
      case 'panel':
        return {
          kind: 'panel',
          panelType: s.panelType,
          ratedW: num(s.ratedW),
          ...(s.panelType === 'usb'
            ? { portVolts: num(s.portVolts), portMaxA: num(s.portMaxA) }
            : {
                maxPowerVolts: num(s.maxPowerVolts),
                maxPowerAmps: num(s.maxPowerAmps),
                openCircuitVolts: num(s.openCircuitVolts),
                shortCircuitAmps: num(s.shortCircuitAmps),
                tempCoeffVocPctPerC: num(s.tempCoeffVocPctPerC),
              }),
          dropoutIrradianceWm2: num(s.dropoutIrradianceWm2),
          tempCoeffPctPerC: num(s.tempCoeffPctPerC),
          outputPort: s.outputPort,
          massG: num(s.massG),
        };
      case 'battery':
        return {
          kind: 'battery',
          chemistry: s.chemistry,
          cellsInSeries: num(s.cellsInSeries),
          capacityAh: num(s.capacityAh),
          chargeCRate: num(s.chargeCRate),
          dischargeCRate: num(s.dischargeCRate),
          ratedHours: num(s.ratedHours),
          peukertExponent: num(s.peukertExponent),
          port: s.port,
          massG: num(s.massG),
        };
      case 'controller':
        return {
          kind: 'controller',
          controllerType: s.controllerType,
          maxInputVolts: num(s.maxInputVolts),
          maxChargeA: num(s.maxChargeA),
          efficiency: share(s.efficiency),
          inputPort: s.inputPort,
          outputPort: s.outputPort,
          massG: num(s.massG),
        };
      case 'bank':
        return {
          kind: 'bank',
          ...(values.capacityUnit === 'wh'
            ? { capacityWh: num(s.capacityWh) ?? '' }
            : { capacityMah: num(s.capacityMah) ?? '', cellVolts: num(s.cellVolts) }),
          inputMaxW: num(s.inputMaxW),
          inputPort: s.inputPort,
          outputPorts: s.outputPorts.map((port) => ({
            connector: port.connector,
            captiveCable: port.captiveCable,
            volts: num(port.volts),
            maxA: num(port.maxA),
            usbPdVolts: list(port.usbPdVolts),
          })),
          outputEfficiency: share(s.outputEfficiency),
          chargeEfficiency: share(s.chargeEfficiency),
          massG: num(s.massG),
        };
      case 'converter':
        return {
          kind: 'converter',
          converterType: s.converterType,
          inputVolts: num(s.inputVolts),
          outputVolts: num(s.outputVolts),
          maxOutputA: num(s.maxOutputA),
          efficiency: share(s.efficiency),
          inputPort: s.inputPort,
          outputPort: s.outputPort,
          massG: num(s.massG),
        };
      case 'lead':
        return {
          kind: 'lead',
          fromConnector: s.fromConnector,
          toConnector: s.toConnector,
          lengthM: num(s.lengthM),
          gaugeAwg: num(s.gaugeAwg),
          fuseA: num(s.fuseA),
          massG: num(s.massG),
        };
      case 'device': {
        const p = s.useProfile;
        const isRadio = s.deviceKind === 'radio';
        const useProfile =
          p.basis === 'radio-hours'
            ? {
                basis: p.basis,
                transmitMinutesPerDay: num(p.transmitMinutesPerDay),
                receiveHoursPerDay: num(p.receiveHoursPerDay),
                standbyHoursPerDay: num(p.standbyHoursPerDay),
              }
            : p.basis === 'battery-share'
              ? { basis: p.basis, batterySharePerDay: share(p.batterySharePerDay) }
              : { basis: p.basis, energyWhPerDay: num(p.energyWhPerDay) };
        return compact({
          kind: 'device',
          deviceKind: s.deviceKind,
          ownBatteryWh: num(s.ownBatteryWh),
          chargesVia: s.chargesVia,
          chargePowerW: num(s.chargePowerW),
          chargeCurrentA: num(s.chargeCurrentA),
          usbPdVolts: s.chargesVia === 'usb-pd' ? num(s.usbPdVolts) : undefined,
          chargeEfficiency: share(s.chargeEfficiency),
          chargePort: s.chargePort,
          supplyVoltsNominal: isRadio ? num(s.supplyVoltsNominal) : undefined,
          supplyVoltsMin: isRadio ? num(s.supplyVoltsMin) : undefined,
          supplyVoltsMax: isRadio ? num(s.supplyVoltsMax) : undefined,
          transmitCurrentA: isRadio ? num(s.transmitCurrentA) : undefined,
          receiveCurrentA: isRadio ? num(s.receiveCurrentA) : undefined,
          standbyCurrentA: isRadio ? num(s.standbyCurrentA) : undefined,
          canRunLive: isRadio ? s.canRunLive : false,
          massG: num(s.massG),
          useProfile: compact(useProfile),
        });
      }
    }
  };
  return { name: values.name, notes: values.notes, countOwned: num(values.countOwned), spec: compact(specOf()) };
};

/**
 * A form schema over the form's own values: converts them with `toItemBody`, then checks the API body with
 * `bodySchema` (the same schema the server uses). Error paths are the API's, which are the form's field names.
 */
export const itemFormSchema = <Body>(bodySchema: z.ZodType<Body>) =>
  z
    .custom<ItemFormValues>()
    .transform((values) => toItemBody(values))
    // The body schema takes any object; the transform's output is one.
    .pipe(bodySchema as unknown as z.ZodType<Body, Record<string, unknown>>);
