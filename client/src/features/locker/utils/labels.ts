import type { ChargeInput, Connector, DeviceKind, ItemKind } from '@gramwatt/shared';

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
  converter: 'Converter',
  lead: 'Lead',
  device: 'Device',
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
