import type { CatalogueEntry, ItemSpec, LockerItem } from '@gramwatt/shared';
import { lockerDb } from './mocks/locker-db';

/** Invented test gear (not the demo scenario): generic names, round figures. */
let nextItem = 1;
const itemUuid = (n: number) => `00000000-0000-4000-9000-${String(n).padStart(12, '0')}`;

export const panelSpec = (
  overrides: Partial<Extract<ItemSpec, { kind: 'panel'; panelType: 'usb' }>> = {},
): ItemSpec => ({
  kind: 'panel',
  panelType: 'usb',
  ratedW: 10,
  portVolts: 5,
  portMaxA: 2,
  dropoutIrradianceWm2: 0,
  tempCoeffPctPerC: -0.4,
  outputPort: { connector: 'usb-a', captiveCable: false },
  massG: 300,
  ...overrides,
});

export const bankSpec = (overrides: Partial<Extract<ItemSpec, { kind: 'bank' }>> = {}): ItemSpec => ({
  kind: 'bank',
  capacityMah: 10_000,
  cellVolts: 3.7,
  inputMaxW: 18,
  inputPort: { connector: 'usb-c', captiveCable: false },
  outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4, usbPdVolts: [] }],
  outputEfficiency: 0.85,
  chargeEfficiency: 0.9,
  massG: 200,
  ...overrides,
});

export const leadSpec = (overrides: Partial<Extract<ItemSpec, { kind: 'lead' }>> = {}): ItemSpec => ({
  kind: 'lead',
  fromConnector: 'usb-a',
  toConnector: 'usb-c',
  lengthM: 1,
  massG: 30,
  ...overrides,
});

/** A 12 V panel: 18 V × 1.67 A ≈ 30 W at maximum power, 21.6 V open circuit. */
export const twelveVoltPanelSpec = (): ItemSpec => ({
  kind: 'panel',
  panelType: '12v',
  ratedW: 30,
  maxPowerVolts: 18,
  maxPowerAmps: 1.67,
  openCircuitVolts: 21.6,
  tempCoeffPctPerC: -0.4,
  tempCoeffVocPctPerC: -0.3,
  dropoutIrradianceWm2: 0,
  outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
  massG: 900,
});

export const batterySpec = (overrides: Partial<Extract<ItemSpec, { kind: 'battery' }>> = {}): ItemSpec => ({
  kind: 'battery',
  chemistry: 'lifepo4',
  cellsInSeries: 4,
  capacityAh: 6,
  port: { connector: 'ring-terminal', captiveCable: false },
  massG: 800,
  ...overrides,
});

export const controllerSpec = (): ItemSpec => ({
  kind: 'controller',
  controllerType: 'pwm',
  maxInputVolts: 25,
  maxChargeA: 5,
  efficiency: 0.95,
  inputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
  outputPort: { connector: 'ring-terminal', captiveCable: false },
  massG: 90,
});

export const phoneSpec = (): ItemSpec => ({
  kind: 'device',
  deviceKind: 'phone',
  ownBatteryWh: 15,
  chargesVia: 'usb-5v',
  chargePowerW: 10,
  chargeEfficiency: 0.85,
  chargePort: { connector: 'usb-c', captiveCable: false },
  canRunLive: false,
  massG: 190,
  useProfile: { basis: 'battery-share', batterySharePerDay: 0.6 },
});

export const buildLockerItem = (
  ownerId: string,
  { spec, ...overrides }: Partial<Omit<LockerItem, 'kind'>> & { spec: ItemSpec },
): LockerItem & { ownerId: string } => {
  const n = nextItem++;
  return {
    id: itemUuid(n),
    ownerId,
    kind: spec.kind,
    name: `Item ${n}`,
    notes: '',
    countOwned: 1,
    massG: Math.round(spec.massG ?? 0),
    spec,
    files: [],
    createdAt: '2026-04-01T08:00:00.000Z',
    updatedAt: '2026-04-01T08:00:00.000Z',
    ...overrides,
  };
};

/** Puts an item into a member's locker on the fake server. */
export const seedLockerItem = (ownerId: string, item: Partial<Omit<LockerItem, 'kind'>> & { spec: ItemSpec }) => {
  const built = buildLockerItem(ownerId, item);
  lockerDb.items.push(built);
  return built;
};

export const seedCatalogueEntry = (
  entry: Partial<Omit<CatalogueEntry, 'kind'>> & { spec: ItemSpec },
): CatalogueEntry => {
  const n = nextItem++;
  const built: CatalogueEntry = {
    id: itemUuid(n),
    kind: entry.spec.kind,
    name: `Entry ${n}`,
    notes: '',
    massG: Math.round(entry.spec.massG ?? 0),
    createdAt: '2026-04-01T08:00:00.000Z',
    updatedAt: '2026-04-01T08:00:00.000Z',
    ...entry,
  };
  lockerDb.catalogue.push(built);
  return built;
};
