import type { TripInputDraft, UseProfileOverride } from '@gramwatt/shared';

/**
 * The invented demo trips: one upcoming trip per demo member, at invented places (the names are our own;
 * the coordinates are plausible subtropical high country, where a trip a few weeks after any seed date
 * still has a usable sun). Shared code has no clock, so each trip gives its start as days from the day
 * the seed runs.
 */

/** A device from the member's demo locker (matched by item name) with the trip's change to its use profile. */
export interface DemoTripDevice {
  itemName: string;
  useProfileOverride?: UseProfileOverride;
}

export interface DemoTrip {
  /** The demo member who leads it (see demo-accounts.ts). */
  leaderEmail: string;
  /** Days from the seed's run to the first trip day. */
  startInDays: number;
  /** The trip body, as a member would send it, without its start date. */
  trip: Omit<TripInputDraft, 'startDate'>;
  devices: DemoTripDevice[];
}

export const demoTrips: readonly DemoTrip[] = [
  {
    leaderEmail: 'fern@gramwatt.example',
    startInDays: 21,
    trip: {
      name: 'Lantern Tarns high route',
      notes: 'Five nights over the Lantern Tarns plateau; a radio net from camp each evening.',
      latitudeDeg: -29.45,
      longitudeDeg: 29.35,
      nights: 5,
      walkWindow: { start: '08:30', end: '16:00' },
      campWindow: { start: '16:00', end: '08:30' },
      walkingBearingsDeg: [20],
      skyPresetId: 'mixed',
      temperatures: { lowC: 2, highC: 16 },
      elevationM: 2800,
      gramLimitG: 1700,
    },
    devices: [
      // The evening net needs more air time than the locker's everyday 20 minutes.
      {
        itemName: 'Dual-band handheld radio, 5 W',
        useProfileOverride: { transmitMinutesPerDay: 35, receiveHoursPerDay: 3 },
      },
      { itemName: 'Trail phone' },
      { itemName: 'Two-way satellite messenger' },
      { itemName: 'Rechargeable headlamp, 400 lm', useProfileOverride: { energyWhPerDay: 0.8 } },
    ],
  },
  {
    // A radio weekend where only the 12 V station keeps up: 90 minutes on the air a day from the knoll's top.
    leaderEmail: 'fern@gramwatt.example',
    startInDays: 35,
    trip: {
      name: 'Cinder Knoll radio weekend',
      notes: 'Two nights on Cinder Knoll for a summit radio contest; long hours on the air from camp.',
      latitudeDeg: -29.3,
      longitudeDeg: 29.5,
      nights: 2,
      skyPresetId: 'mixed',
      temperatures: { lowC: 4, highC: 18 },
      elevationM: 3000,
      gramLimitG: 2200,
    },
    devices: [
      {
        itemName: 'Dual-band handheld radio, 5 W',
        useProfileOverride: { transmitMinutesPerDay: 90, receiveHoursPerDay: 3, standbyHoursPerDay: 4 },
      },
    ],
  },
  {
    leaderEmail: 'tobin@gramwatt.example',
    startInDays: 24,
    trip: {
      name: 'Greywacke Rim traverse',
      notes: 'Three nights along the Greywacke Rim; open ridges, a photo day in the middle.',
      latitudeDeg: 23.9,
      longitudeDeg: -105.4,
      nights: 3,
      skyPresetId: 'open-sky',
      temperatures: { lowC: 5, highC: 22 },
      elevationM: 2400,
      gramLimitG: 800,
    },
    devices: [
      { itemName: 'Everyday phone', useProfileOverride: { batterySharePerDay: 0.7 } },
      { itemName: 'Mirrorless camera', useProfileOverride: { energyWhPerDay: 4.5 } },
      { itemName: 'GPS watch' },
    ],
  },
];
