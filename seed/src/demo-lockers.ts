import type { LockerItemInputRaw } from '@gramwatt/shared';

/**
 * The demo members' lockers: invented gear with invented names (no real brands), with specs in the range
 * such gear has. Fern is the radio operator with both power paths: the USB path (panels, banks, two boost
 * converters to charge a 12 V handheld) and the 12 V path (a 12 V panel, an MPPT controller, a small LiFePO4
 * pack and a fused DC lead); Tobin carries a phone, a camera and a watch. Trips refer to
 * these items by name, so the names are stable: change them only together with the demo trips.
 */

/** USB port of a panel or a charge input without a fixed cable. */
type DemoConnector =
  'usb-a' | 'usb-c' | 'micro-usb' | 'barrel-5.5x2.1' | 'radio-dc' | '12v-accessory' | 'ring-terminal';

const socket = (connector: DemoConnector) => ({
  connector,
  captiveCable: false,
});
/** A fixed cable ending in this plug. */
const cable = (connector: DemoConnector) => ({ connector, captiveCable: true });

const ridgeline: LockerItemInputRaw = {
  name: 'Ridgeline 10 W fold-out',
  notes: 'Two panels, one USB-A port. Rides on the pack lid with four clips.',
  countOwned: 1,
  spec: {
    kind: 'panel',
    panelType: 'usb',
    ratedW: 10,
    portVolts: 5,
    portMaxA: 2,
    dropoutIrradianceWm2: 60,
    tempCoeffPctPerC: -0.4,
    outputPort: socket('usb-a'),
    massG: 290,
  },
};

const scree: LockerItemInputRaw = {
  name: 'Scree 6 W mini panel',
  notes: 'Single sheet; keeps the messenger topped up on the move.',
  countOwned: 1,
  spec: {
    kind: 'panel',
    panelType: 'usb',
    ratedW: 6,
    portVolts: 5,
    portMaxA: 1.2,
    dropoutIrradianceWm2: 80,
    tempCoeffPctPerC: -0.45,
    outputPort: socket('usb-a'),
    massG: 165,
  },
};

const cairn10: LockerItemInputRaw = {
  name: 'Cairn 10 000 mAh bank',
  countOwned: 1,
  spec: {
    kind: 'bank',
    capacityMah: 10_000,
    cellVolts: 3.7,
    inputMaxW: 18,
    inputPort: socket('usb-c'),
    outputPorts: [
      { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
      { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] },
    ],
    outputEfficiency: 0.85,
    chargeEfficiency: 0.9,
    massG: 190,
  },
};

const pebble5: LockerItemInputRaw = {
  name: 'Pebble 5 000 mAh bank',
  countOwned: 1,
  spec: {
    kind: 'bank',
    capacityMah: 5000,
    cellVolts: 3.7,
    inputMaxW: 10,
    inputPort: socket('usb-c'),
    outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.1 }],
    outputEfficiency: 0.82,
    chargeEfficiency: 0.88,
    massG: 105,
  },
};

const shortAtoC: LockerItemInputRaw = {
  name: 'USB-A to USB-C lead, 30 cm',
  countOwned: 2,
  spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 },
};

const shortAtoMicro: LockerItemInputRaw = {
  name: 'USB-A to micro-USB lead, 30 cm',
  countOwned: 1,
  spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'micro-usb', lengthM: 0.3, massG: 14 },
};

const phone = (name: string, ownBatteryWh: number, batterySharePerDay: number, massG: number): LockerItemInputRaw => ({
  name,
  notes: 'Maps, messages and photos; flight mode on the trail.',
  countOwned: 1,
  spec: {
    kind: 'device',
    deviceKind: 'phone',
    ownBatteryWh,
    chargesVia: 'usb-pd',
    chargePowerW: 18,
    usbPdVolts: 9,
    chargeEfficiency: 0.85,
    chargePort: socket('usb-c'),
    massG,
    useProfile: { basis: 'battery-share', batterySharePerDay },
  },
});

const headlamp: LockerItemInputRaw = {
  name: 'Rechargeable headlamp, 400 lm',
  countOwned: 1,
  spec: {
    kind: 'device',
    deviceKind: 'headlamp',
    ownBatteryWh: 5.6,
    chargesVia: 'usb-5v',
    chargePowerW: 5,
    chargeEfficiency: 0.85,
    chargePort: socket('micro-usb'),
    massG: 82,
    useProfile: { basis: 'energy', energyWhPerDay: 1.2 },
  },
};

/** Fern Altmoor's locker: every kind, both boost converters, the 12 V-charged handheld. */
const fernLocker: LockerItemInputRaw[] = [
  ridgeline,
  scree,
  {
    name: 'Saddleback 21 W three-fold',
    notes: 'Camp panel: prop it facing the sun and re-aim at lunch.',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 21,
      portVolts: 5,
      portMaxA: 3,
      dropoutIrradianceWm2: 50,
      tempCoeffPctPerC: -0.38,
      outputPort: socket('usb-c'),
      massG: 520,
    },
  },
  {
    name: 'Talus 15 W two-fold',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: 'usb',
      ratedW: 15,
      portVolts: 5,
      portMaxA: 2.4,
      dropoutIrradianceWm2: 55,
      tempCoeffPctPerC: -0.4,
      outputPort: socket('usb-a'),
      massG: 410,
    },
  },
  cairn10,
  {
    name: 'Cairn 20 000 mAh bank',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 20_000,
      cellVolts: 3.7,
      inputMaxW: 20,
      inputPort: socket('usb-c'),
      outputPorts: [
        { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
        { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12, 15] },
      ],
      outputEfficiency: 0.86,
      chargeEfficiency: 0.9,
      massG: 350,
    },
  },
  pebble5,
  {
    name: 'Pika 3 350 mAh stick',
    notes: 'Lipstick-size spare for the headlamp.',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 3350,
      cellVolts: 3.6,
      inputMaxW: 5,
      inputPort: socket('micro-usb'),
      outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 1 }],
      outputEfficiency: 0.8,
      chargeEfficiency: 0.85,
      massG: 75,
    },
  },
  {
    name: 'Summit 26 800 mAh bank',
    notes: '26 800 mAh × 3.6 V ≈ 96 Wh: under the 100 Wh airline line.',
    countOwned: 1,
    spec: {
      kind: 'bank',
      capacityMah: 26_800,
      cellVolts: 3.6,
      inputMaxW: 30,
      inputPort: socket('usb-c'),
      outputPorts: [
        { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 3 },
        { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12, 15, 20] },
      ],
      outputEfficiency: 0.87,
      chargeEfficiency: 0.9,
      massG: 490,
    },
  },
  {
    name: 'Uplift 5 V → 13.8 V boost cable',
    notes: 'Charges the handheld from any USB-A port. Radio noise: charge while not operating.',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 5,
      outputVolts: 13.8,
      maxOutputA: 0.6,
      efficiency: 0.83,
      inputPort: cable('usb-a'),
      outputPort: cable('barrel-5.5x2.1'),
      massG: 45,
    },
  },
  {
    name: 'Uplift PD 9 V → 12 V boost',
    notes: 'Asks the bank for 9 V over USB PD, gives 12 V for the charger cradle.',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 9,
      outputVolts: 12,
      maxOutputA: 1.25,
      efficiency: 0.88,
      inputPort: cable('usb-c'),
      outputPort: socket('barrel-5.5x2.1'),
      massG: 38,
    },
  },
  {
    name: 'Dashlink 12 V → USB adapter',
    notes: 'For the car on the drive in, and for a 12 V pack later.',
    countOwned: 1,
    spec: {
      kind: 'converter',
      converterType: '12v-to-usb',
      inputVolts: 12,
      outputVolts: 5,
      maxOutputA: 2.4,
      efficiency: 0.9,
      inputPort: socket('12v-accessory'),
      outputPort: socket('usb-a'),
      massG: 30,
    },
  },
  shortAtoC,
  {
    name: 'USB-C to USB-C lead, 1 m',
    countOwned: 1,
    spec: { kind: 'lead', fromConnector: 'usb-c', toConnector: 'usb-c', lengthM: 1, massG: 28 },
  },
  shortAtoMicro,
  {
    name: 'Barrel to radio DC lead, 1 m',
    notes: 'Fused on the positive side (3 A blade fuse).',
    countOwned: 1,
    spec: {
      kind: 'lead',
      fromConnector: 'barrel-5.5x2.1',
      toConnector: 'radio-dc',
      lengthM: 1,
      gaugeAwg: 20,
      fuseA: 3,
      massG: 45,
    },
  },
  // The 12 V path: panel → controller → LiFePO4 pack → fused lead → the handheld, run live or charging.
  {
    name: 'Bivouac 30 W 12 V panel',
    notes: 'Two-fold 12 V sheet with a fixed barrel lead; for the controller, not for USB.',
    countOwned: 1,
    spec: {
      kind: 'panel',
      panelType: '12v',
      ratedW: 30,
      maxPowerVolts: 18,
      maxPowerAmps: 1.67,
      openCircuitVolts: 21.6,
      shortCircuitAmps: 1.8,
      tempCoeffPctPerC: -0.4,
      tempCoeffVocPctPerC: -0.3,
      dropoutIrradianceWm2: 0,
      outputPort: cable('barrel-5.5x2.1'),
      massG: 950,
    },
  },
  {
    name: 'Meander 5 A MPPT controller',
    notes: 'Set to the LiFePO4 profile. Connect it to the pack before the panel.',
    countOwned: 1,
    spec: {
      kind: 'controller',
      controllerType: 'mppt',
      maxInputVolts: 30,
      maxChargeA: 5,
      efficiency: 0.95,
      inputPort: socket('barrel-5.5x2.1'),
      // Its battery lead ends in ring terminals that bolt onto the pack's.
      outputPort: cable('ring-terminal'),
      massG: 110,
    },
  },
  {
    name: 'Tarn 6 Ah LiFePO4 pack',
    notes: 'Four cells in series (12.8 V nominal) with a protection board; charge at 3 A at most, never below 0 °C.',
    countOwned: 1,
    spec: {
      kind: 'battery',
      chemistry: 'lifepo4',
      cellsInSeries: 4,
      capacityAh: 6,
      chargeCRate: 0.5,
      dischargeCRate: 1,
      port: socket('ring-terminal'),
      massG: 760,
    },
  },
  {
    name: 'Ring to radio DC lead, 1.5 m, fused',
    notes: '5 A blade fuse in the positive wire, next to the pack.',
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
  {
    name: 'Dual-band handheld radio, 5 W',
    notes: '7.4 V 1 800 mAh pack; charges in the cradle from 12–13.8 V DC. Transmit only with your licence.',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'radio',
      ownBatteryWh: 13.3,
      chargesVia: '12v-dc',
      chargeCurrentA: 0.6,
      chargeEfficiency: 0.8,
      chargePort: socket('radio-dc'),
      supplyVoltsNominal: 13.8,
      supplyVoltsMin: 11,
      supplyVoltsMax: 16,
      transmitCurrentA: 1.5,
      receiveCurrentA: 0.15,
      standbyCurrentA: 0.05,
      canRunLive: true,
      massG: 310,
      useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
    },
  },
  phone('Trail phone', 17.3, 0.6, 190),
  {
    name: 'Two-way satellite messenger',
    notes: 'Tracking every 10 minutes while walking.',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'messenger',
      ownBatteryWh: 4.6,
      chargesVia: 'usb-5v',
      chargePowerW: 5,
      chargeEfficiency: 0.85,
      chargePort: socket('usb-c'),
      massG: 115,
      useProfile: { basis: 'battery-share', batterySharePerDay: 0.15 },
    },
  },
  headlamp,
];

/** Tobin Quarry's locker: a light USB kit, a camera and a watch. */
const tobinLocker: LockerItemInputRaw[] = [
  ridgeline,
  scree,
  cairn10,
  pebble5,
  shortAtoC,
  shortAtoMicro,
  phone('Everyday phone', 15.4, 0.5, 175),
  { ...headlamp, name: 'Headlamp, 300 lm' },
  {
    name: 'Mirrorless camera',
    notes: 'Charges in the body over USB-C.',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'camera',
      ownBatteryWh: 7.3,
      chargesVia: 'usb-5v',
      chargePowerW: 7.5,
      chargeEfficiency: 0.85,
      chargePort: socket('usb-c'),
      massG: 450,
      useProfile: { basis: 'energy', energyWhPerDay: 3 },
    },
  },
  {
    name: 'GPS watch',
    notes: 'Clip charger on a fixed USB-A cable.',
    countOwned: 1,
    spec: {
      kind: 'device',
      deviceKind: 'other',
      ownBatteryWh: 1.1,
      chargesVia: 'usb-5v',
      chargePowerW: 2.5,
      chargeEfficiency: 0.85,
      chargePort: cable('usb-a'),
      massG: 52,
      useProfile: { basis: 'battery-share', batterySharePerDay: 0.1 },
    },
  },
];

/** The demo lockers by member e-mail (see demo-accounts.ts). */
export const demoLockers: Readonly<Record<string, readonly LockerItemInputRaw[]>> = {
  'fern@gramwatt.example': fernLocker,
  'tobin@gramwatt.example': tobinLocker,
};
