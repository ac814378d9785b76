/**
 * The invented demo party: Fern leads the Lantern Tarns high route with Tobin as a partner (who shares part of his
 * light USB kit and brings his phone) and Hollis as the viewer at home who receives the plan. Each carrier has their
 * own gram limit for the power gear they carry. Items are matched by name in the member's own locker (demo-lockers.ts).
 */

export interface DemoPartyMember {
  email: string;
  role: 'partner' | 'viewer';
  /** Grams of power gear this person carries at most (null: no limit; a viewer carries nothing). */
  gramLimitG: number | null;
  /** Locker items shared into the party pool, by name, with how many. */
  pool: readonly { itemName: string; count: number }[];
  /** Own devices brought on the trip, by name (carried by their owner). */
  devices: readonly string[];
}

export interface DemoParty {
  leaderEmail: string;
  tripName: string;
  /** The leader's own gram limit. */
  leaderGramLimitG: number | null;
  members: readonly DemoPartyMember[];
}

export const demoParty: DemoParty = {
  leaderEmail: 'fern@gramwatt.example',
  tripName: 'Lantern Tarns high route',
  leaderGramLimitG: 1000,
  members: [
    {
      email: 'tobin@gramwatt.example',
      role: 'partner',
      gramLimitG: 700,
      pool: [
        { itemName: 'Cairn 10 000 mAh bank', count: 1 },
        { itemName: 'Scree 6 W mini panel', count: 1 },
        { itemName: 'USB-A to USB-C lead, 30 cm', count: 1 },
      ],
      devices: ['Everyday phone'],
    },
    { email: 'hollis@gramwatt.example', role: 'viewer', gramLimitG: null, pool: [], devices: [] },
  ],
};
