import { converterSpecSchema, leadSpecSchema, type ConverterSpec, type LeadSpec } from '../schemas/items.js';
import {
  batterySpecSchema,
  controllerSpecSchema,
  twelveVoltPanelSpecSchema,
  type BatterySpec,
  type ControllerSpec,
  type TwelveVoltPanelSpec,
} from '../schemas/station-items.js';

/**
 * Invented 12 V test items (no real products). Inputs for tests, never check values: expected figures come from a
 * source, a trade rule marked `common practice`, or a hand calculation beside the check.
 */

/** A 4S LiFePO₄ pack, 6 Ah, ring terminals, 760 g (12.8 V nominal, 14.6 V full). */
export function testPack(overrides: Partial<BatterySpec> = {}): BatterySpec {
  return batterySpecSchema.parse({
    kind: 'battery',
    chemistry: 'lifepo4',
    cellsInSeries: 4,
    capacityAh: 6,
    port: { connector: 'ring-terminal', captiveCable: false },
    massG: 760,
    ...overrides,
  });
}

/** A small MPPT controller: 30 V input limit, 5 A charge, 95 % efficient; panel side 12 V accessory, pack side ring. */
export function testController(overrides: Partial<ControllerSpec> = {}): ControllerSpec {
  return controllerSpecSchema.parse({
    kind: 'controller',
    controllerType: 'mppt',
    maxInputVolts: 30,
    maxChargeA: 5,
    efficiency: 0.95,
    inputPort: { connector: '12v-accessory', captiveCable: false },
    outputPort: { connector: 'ring-terminal', captiveCable: true },
    massG: 110,
    ...overrides,
  });
}

/** A 30 W 12 V-class panel: Vmp 18 V, Imp 1.67 A, Voc 21.6 V, captive 12 V accessory plug, 900 g. */
export function testTwelveVoltPanel(overrides: Partial<TwelveVoltPanelSpec> = {}): TwelveVoltPanelSpec {
  return twelveVoltPanelSpecSchema.parse({
    kind: 'panel',
    panelType: '12v',
    ratedW: 30,
    maxPowerVolts: 18,
    maxPowerAmps: 1.67,
    openCircuitVolts: 21.6,
    tempCoeffPctPerC: -0.4,
    tempCoeffVocPctPerC: -0.3,
    outputPort: { connector: '12v-accessory', captiveCable: true },
    massG: 900,
    ...overrides,
  });
}

/** A fused DC lead from ring terminals to a 5.5×2.1 barrel plug: 16 AWG, 1 m one way, 5 A fuse, 40 g. */
export function testDcLead(overrides: Partial<LeadSpec> = {}): LeadSpec {
  return leadSpecSchema.parse({
    kind: 'lead',
    fromConnector: 'ring-terminal',
    toConnector: 'barrel-5.5x2.1',
    lengthM: 1,
    gaugeAwg: 16,
    fuseA: 5,
    massG: 40,
    ...overrides,
  });
}

/** A 12 V → USB adapter: captive ring terminals in, USB-A socket out, 5 V 2.4 A, 90 % efficient, 30 g. */
export function testUsbAdapter(overrides: Partial<ConverterSpec> = {}): ConverterSpec {
  return converterSpecSchema.parse({
    kind: 'converter',
    converterType: '12v-to-usb',
    inputVolts: 12,
    outputVolts: 5,
    maxOutputA: 2.4,
    efficiency: 0.9,
    inputPort: { connector: 'ring-terminal', captiveCable: true },
    outputPort: { connector: 'usb-a', captiveCable: false },
    massG: 30,
    ...overrides,
  });
}
