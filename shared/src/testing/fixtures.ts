import {
  bankSpecSchema,
  converterSpecSchema,
  leadSpecSchema,
  usbPanelSpecSchema,
  type BankSpec,
  type ConverterSpec,
  type LeadSpec,
  type UsbPanelSpec,
} from '../schemas/items.js';
import { deviceSpecSchema, type DeviceSpec } from '../schemas/devices.js';

/**
 * Invented test items (no real products). They are inputs for tests, never check values: every expected figure in a
 * test comes from a published source, a trade rule marked `common practice`, or a hand calculation shown beside it.
 */

/** A 10 W USB panel with a USB-A socket, 5 V 2 A port. */
export function testUsbPanel(overrides: Partial<UsbPanelSpec> = {}): UsbPanelSpec {
  return usbPanelSpecSchema.parse({
    kind: 'panel',
    panelType: 'usb',
    ratedW: 10,
    portVolts: 5,
    portMaxA: 2,
    dropoutIrradianceWm2: 100,
    tempCoeffPctPerC: -0.4,
    outputPort: { connector: 'usb-a', captiveCable: false },
    massG: 280,
    ...overrides,
  });
}

/** A 10,000 mAh bank: USB-C input socket (18 W), one USB-A 5 V 2.4 A output and one USB-C output with PD. */
export function testBank(overrides: Partial<BankSpec> = {}): BankSpec {
  return bankSpecSchema.parse({
    kind: 'bank',
    capacityMah: 10000,
    cellVolts: 3.7,
    inputMaxW: 18,
    inputPort: { connector: 'usb-c', captiveCable: false },
    outputPorts: [
      { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
      { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] },
    ],
    outputEfficiency: 0.85,
    chargeEfficiency: 0.9,
    massG: 190,
    ...overrides,
  });
}

/** A USB-A to 13.8 V boost cable with captive cables both ends, 85 % efficient. */
export function testBoostConverter(overrides: Partial<ConverterSpec> = {}): ConverterSpec {
  return converterSpecSchema.parse({
    kind: 'converter',
    converterType: 'boost',
    inputVolts: 5,
    outputVolts: 13.8,
    maxOutputA: 0.6,
    efficiency: 0.85,
    inputPort: { connector: 'usb-a', captiveCable: true },
    outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
    massG: 45,
    ...overrides,
  });
}

/** A lead between two connectors. */
export function testLead(
  fromConnector: LeadSpec['fromConnector'],
  toConnector: LeadSpec['toConnector'],
  massG = 20,
): LeadSpec {
  return leadSpecSchema.parse({ kind: 'lead', fromConnector, toConnector, lengthM: 0.5, massG });
}

/** A phone: 15 Wh own battery, USB-C socket, 10 W charging, 85 % charge efficiency; uses a share of its battery a day. */
export function testPhone(batterySharePerDay = 0.5, overrides: Partial<DeviceSpec> = {}): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'phone',
    ownBatteryWh: 15,
    chargesVia: 'usb-5v',
    chargePowerW: 10,
    chargeEfficiency: 0.85,
    chargePort: { connector: 'usb-c', captiveCable: false },
    useProfile: { basis: 'battery-share', batterySharePerDay },
    ...overrides,
  });
}

/** A handheld radio charged from 12 V DC through a 5.5×2.1 barrel socket. */
export function testRadio(overrides: Partial<DeviceSpec> = {}): DeviceSpec {
  return deviceSpecSchema.parse({
    kind: 'device',
    deviceKind: 'radio',
    ownBatteryWh: 14.8,
    chargesVia: '12v-dc',
    chargeCurrentA: 0.5,
    chargeEfficiency: 0.85,
    chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false },
    supplyVoltsNominal: 13.8,
    supplyVoltsMin: 11,
    supplyVoltsMax: 16,
    transmitCurrentA: 1.6,
    receiveCurrentA: 0.35,
    standbyCurrentA: 0.08,
    useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 8 },
    ...overrides,
  });
}
