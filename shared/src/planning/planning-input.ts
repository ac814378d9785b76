import type { KitItemSpec, TripDevice } from '../schemas/kit.js';
import type { TripSolarInput } from '../schemas/trip-solar.js';

/** One candidate locker item: power gear the kit may hold, with the units owned. */
export interface PlanningGear {
  itemId: string;
  name: string;
  countOwned: number;
  /** Grams of one unit (whole grams). */
  massG: number;
  spec: KitItemSpec;
}

/** Someone who carries the party's gear (the leader or a partner), with their own gram limit (null: none). */
export interface PartyPlanningMember {
  memberId: string;
  name: string;
  gramLimitG: number | null;
}

/** The party around a planning input: who carries, and who owns each pooled item (by item id). */
export interface PartyPlanning {
  /** At least one. */
  members: readonly PartyPlanningMember[];
  ownerByItemId: Readonly<Record<string, string>>;
}

/** Everything a plan or a check needs: the trip's sun and sky input, its devices, the gear, reserve and gram limit. */
export interface PlanningInput {
  solarInput: TripSolarInput;
  /** The trip's devices with their effective use profiles. */
  devices: readonly TripDevice[];
  /** Device names for sentences, by device id (default: the id). */
  deviceNames?: Readonly<Record<string, string>>;
  gear: readonly PlanningGear[];
  /** Share of each store never to go below, 0–1. */
  reserveShare: number;
  gramLimitG: number | null;
  /**
   * A party's trip: the carriers and the owners of the pooled gear (`planParty` shares the kit out among them).
   * Absent or null: one hiker carries everything.
   */
  party?: PartyPlanning | null;
}

/** A request that names something the planning input does not hold: the server answers 400/404 with the path. */
export class PlanningInputError extends Error {
  constructor(
    /** Field path, e.g. `kit.2.itemId`. */
    readonly path: string,
    message: string,
  ) {
    super(message);
    this.name = 'PlanningInputError';
  }
}
