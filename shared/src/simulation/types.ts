import type { PanelPowerOptions } from '../harvest/panel-power.js';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import type { DesignSkyId, TripSolarSeries } from '../sun/trip-solar-types.js';
import type { ChargePath, MissingLink } from './connections.js';

/** Options of the simulation, all with documented defaults. */
export interface SimulationOptions {
  /** Panel model options (losses, cell temperature); default the USB panel defaults. */
  panelPower?: PanelPowerOptions;
  /**
   * Precomputed `panelPowerSeries` per panel item id (one array per sky, for ONE panel). Lets the solver compute
   * harvest once per item for every kit it tries. Default: computed here.
   */
  panelSeriesCache?: ReadonlyMap<string, readonly Float64Array[]>;
  /**
   * Whether device top-ups stop below 0 °C air (default false: top-ups happen in the tent or sleeping bag, common
   * practice; banks fed by panels outside never charge below 0 °C).
   */
  freezeBlocksDeviceTopUps?: boolean;
}

/** Everything one simulation needs. */
export interface KitSimulationInput {
  solar: TripSolarSeries;
  /** The kit: locker items with counts (panels, banks, converters, leads). */
  kit: readonly KitEntry[];
  /** The trip's devices, each with its effective use profile in `spec.useProfile`. */
  devices: readonly TripDevice[];
  /** Share of each store never to go below, 0–1. */
  reserveShare: number;
  options?: SimulationOptions;
}

/** Why a device ran dry. */
export type DryReason =
  /** It needs charging and no store in the kit can reach it (see `missing`). */
  | 'no-charging-path'
  /** Every store that can charge it is empty. */
  | 'stores-empty'
  /** The stores that can charge it hold energy only below the reserve: a store would go below its reserve. */
  | 'store-at-reserve'
  /** In camp, the stores held energy but the path's power could not move it fast enough. */
  | 'charge-window-too-short'
  /** Away from camp (no top-ups), its own battery ran out although the stores still held energy. */
  | 'empty-between-top-ups';

/** The first step in a design sky where a device could not get the energy its use profile needs. */
export interface DryEvent {
  skyId: DesignSkyId;
  dayIndex: number;
  stepIndex: number;
  startUtcMs: number;
  localTime: string;
  deviceId: string;
  reason: DryReason;
  /** Store units that could charge the device (ids `itemId#n`). */
  storeIds: string[];
  /** Energy the device lacked in that step, Wh. */
  shortWh: number;
  missing: MissingLink[];
}

/** The verdict, as one definition for the simulation, the solver and every test. */
export type KitVerdict =
  | {
      status: 'runs-dry';
      /** 0-based trip day of the earliest dry event over the design skies. */
      dayIndex: number;
      skyId: DesignSkyId;
      deviceId: string;
      reason: DryReason;
      storeIds: string[];
      missing: MissingLink[];
      text: string;
    }
  | {
      status: 'keeps-up';
      /** Smallest share of storage above the reserve left at any step in any design sky (0–1). */
      worstMarginShare: number;
      text: string;
    }
  | {
      status: 'lasts-trip';
      worstMarginShare: number;
      /** 0-based day on which, in the expected sky, it would run dry if the trip went on (linear extrapolation). */
      wouldRunDryOnDayIndex: number;
      text: string;
    };

/** One row of the ledger: one trip day in one design sky. Every loss comes from its own efficiency. */
export interface LedgerDay {
  dayIndex: number;
  /** What the panels could deliver at their ports, Wh. */
  availableHarvestWh: number;
  /** Harvest taken into stores, Wh (available minus spilled). */
  harvestWh: number;
  /** Harvest no store could take (full, input limit, frozen, no lead), Wh. */
  spilledWh: number;
  /** Of that, harvest refused because lithium may not be charged below 0 °C, Wh. */
  frozenSpilledWh: number;
  /** Stores' charging loss: harvest × (1 − charge efficiency), Wh. */
  storeChargeLossWh: number;
  /** Stores' output loss on harvested energy: harvest × charge eff. × (1 − output eff.), Wh. */
  storeOutputLossWh: number;
  /** Converter loss on top-ups: drawn × (1 − converter efficiency), Wh. */
  converterLossWh: number;
  /** Device charging loss: energy at the device input × (1 − device charge efficiency), Wh. */
  deviceChargeLossWh: number;
  /** Energy put into device batteries by top-ups, Wh. */
  toppedUpWh: number;
  /** Energy the devices used (their demand that was met), Wh. */
  deliveredWh: number;
  /** Demand that could not be met, Wh. */
  unmetWh: number;
  /** Energy in stores (usable Wh) and device batteries at the start and end of the day, Wh. */
  storedStartWh: number;
  storedEndWh: number;
  storesStartWh: number;
  storesEndWh: number;
  devicesStartWh: number;
  devicesEndWh: number;
  /** Hours with air below 0 °C, when lithium stores are not charged, h. */
  frozenHours: number;
}

/** One charging session for the packing list: what charges from what, when. */
export interface ChargeSession {
  /** Harvest into a store, a top-up of a device's battery, or a device running live from a 12 V pack. */
  kind: 'harvest' | 'top-up' | 'live';
  dayIndex: number;
  /** A panel item id (harvest) or a store unit id (top-up, live). */
  fromId: string;
  /** A store unit id (harvest) or a device id (top-up, live). */
  toId: string;
  /** The converter of a top-up, or the charge controller a 12 V panel's harvest goes through. */
  converterItemId: string | null;
  leadItemIds: string[];
  startUtcMs: number;
  endUtcMs: number;
  startLocalTime: string;
  /** Energy taken at the store input (harvest), put into the device battery (top-up) or used live, Wh. */
  energyWh: number;
}

/** One store unit (one of `count` banks of a kit line). */
export interface StoreUnit {
  storeId: string;
  itemId: string;
  unit: number;
  /** A USB bank or a 12 V battery pack. */
  kind: 'bank' | 'battery';
  usableWh: number;
  reserveWh: number;
}

/** One sky's simulation. */
export interface SkySimulation {
  skyId: DesignSkyId;
  ledger: LedgerDay[];
  dry: DryEvent | null;
  /** Stored energy (stores + devices) after each step, Wh. */
  storedWhByStep: Float64Array;
  /** Energy in stores (usable Wh) after each step, Wh. */
  storesWhByStep: Float64Array;
  /** Each unit's energy after each step, row-major: step × (stores in `units.stores` order, then devices), Wh. */
  unitWhByStep: Float64Array;
  /** Smallest share of storage above the reserve (stores + devices) at any step end (0–1). */
  worstMarginShare: number;
}

/** A device as the simulation saw it. */
export interface DeviceUnit {
  deviceId: string;
  demandWhPerDay: number;
  ownBatteryWh: number;
  needsChargingPath: boolean;
  /** Best path per store unit (null where none), in `units.stores` order. */
  paths: (ChargePath | null)[];
  missing: MissingLink[];
}

/** The full result of simulating a kit in every design sky. */
export interface KitSimulation {
  verdict: KitVerdict;
  skies: SkySimulation[];
  stores: StoreUnit[];
  devices: DeviceUnit[];
  /** Charging sessions in the expected sky. */
  schedule: ChargeSession[];
  /** Kit item ids no path uses: a panel that reaches no store, a bank no device can draw from, a converter or lead no path needs. */
  unusedItemIds: string[];
}
