import { bench, describe } from 'vitest';
import { lockerItemInputSchema, type LockerItemInput } from '../schemas/locker.js';
import { readLockerCsv } from './read-locker-csv.js';
import { writeLockerCsv } from './write-locker-csv.js';

// A locker at the import limit: 2,000 items, a mix of banks (with a ports cell), leads and radios.
const bank = lockerItemInputSchema.parse({
  name: 'Bank',
  notes: 'Spare, kept charged',
  countOwned: 1,
  spec: {
    kind: 'bank',
    capacityMah: 10000,
    inputMaxW: 18,
    inputPort: { connector: 'usb-c', captiveCable: false },
    outputPorts: [
      { connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4 },
      { connector: 'usb-c', captiveCable: false, volts: 5, maxA: 3, usbPdVolts: [9, 12] },
    ],
    massG: 190,
  },
});
const lead = lockerItemInputSchema.parse({
  name: 'Lead',
  countOwned: 2,
  spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 },
});
const radio = lockerItemInputSchema.parse({
  name: 'Radio',
  countOwned: 1,
  spec: {
    kind: 'device',
    deviceKind: 'radio',
    ownBatteryWh: 13.3,
    chargesVia: '12v-dc',
    chargeCurrentA: 0.6,
    chargePort: { connector: 'radio-dc', captiveCable: false },
    supplyVoltsNominal: 13.8,
    transmitCurrentA: 1.5,
    receiveCurrentA: 0.15,
    standbyCurrentA: 0.05,
    useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
  },
});
const items: LockerItemInput[] = Array.from({ length: 2000 }, (_, i) => ({
  ...[bank, lead, radio][i % 3]!,
  name: `Item ${i}`,
}));
const text = writeLockerCsv(items);

describe(`locker CSV, 2,000 items (${Math.round(text.length / 1024)} KiB)`, () => {
  bench('readLockerCsv', () => {
    readLockerCsv(text);
  });
  bench('writeLockerCsv', () => {
    writeLockerCsv(items);
  });
});
