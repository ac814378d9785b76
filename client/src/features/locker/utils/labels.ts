import type {
  BatteryChemistry,
  ChargeInput,
  Connector,
  ControllerSpec,
  DeviceKind,
  ItemKind,
  PanelSpec,
} from '@gramwatt/shared';

/** Plain names for the shared connector list, as a hiker would say them. */
export const connectorLabels: Record<Connector, string> = {
  'usb-a': 'USB-A',
  'usb-c': 'USB-C',
  'micro-usb': 'Micro-USB',
  'barrel-5.5x2.1': 'DC barrel 5.5 × 2.1 mm',
  'barrel-5.5x2.5': 'DC barrel 5.5 × 2.5 mm',
  '12v-accessory': '12 V accessory plug',
  'ring-terminal': 'Ring terminal',
  'radio-dc': 'Radio DC plug',
  other: 'Other',
};

export const kindLabels: Record<ItemKind, string> = {
  panel: 'Panel',
  bank: 'Bank',
  battery: 'Battery',
  converter: 'Converter',
  controller: 'Controller',
  lead: 'Lead',
  device: 'Device',
};

/** Plural kind names, for filters and "none among the …" lines. */
export const kindPluralLabels: Record<ItemKind, string> = {
  panel: 'Panels',
  bank: 'Banks',
  battery: 'Batteries',
  converter: 'Converters',
  controller: 'Controllers',
  lead: 'Leads',
  device: 'Devices',
};

export const panelTypeLabels: Record<PanelSpec['panelType'], string> = {
  usb: 'USB panel',
  '12v': '12 V panel',
};

/** Chemistry names as the trade writes them. */
export const chemistryLabels: Record<BatteryChemistry, string> = {
  lipo: 'LiPo',
  'li-ion': 'Li-ion',
  lifepo4: 'LiFePO4',
  'lead-acid': 'Lead-acid',
};

export const controllerTypeLabels: Record<ControllerSpec['controllerType'], string> = {
  pwm: 'PWM',
  mppt: 'MPPT',
};

export const deviceKindLabels: Record<DeviceKind, string> = {
  radio: 'Radio',
  phone: 'Phone',
  messenger: 'Messenger',
  headlamp: 'Headlamp',
  camera: 'Camera',
  other: 'Other device',
};

export const chargeInputLabels: Record<ChargeInput, string> = {
  'usb-5v': 'USB 5 V',
  'usb-pd': 'USB PD',
  '12v-dc': '12 V DC',
};
