import type {
  KitChoice,
  KitLine,
  OptimisationProblem,
  OptimiseAnswer,
  PathAlternative,
  SearchStats,
} from '../optimisation/types.js';

/**
 * The party's carrier rule (one rule for the solver, its tests and the plan page):
 * - Every pooled item may be carried by anyone who carries gear (the leader and partners; viewers stay at home) —
 *   owners lend freely. Among splits that are otherwise equal, owners carry their own items.
 * - The party walks and camps together. At camp every store charges any member's device, so a device's charging
 *   path never ties a bank, converter or lead to the device's owner.
 * - While walking a panel charges only stores in the same pack: each panel's carrier also carries one store it can
 *   feed (with the lead that hop needs, when the panel cannot plug in directly) — a {@link WalkingFeed}.
 * - Each person's carried power gear stays within their own gram limit (none: no limit).
 * The hourly simulation judges the pooled kit as one (it lets harvest reach any store), so the walking rule is what
 * keeps that pooling honest: every panel has a store on its own pack to fill.
 */

/** Someone who carries gear, with their own gram limit (null: none). */
export interface PartyCarrier {
  memberId: string;
  gramLimitG: number | null;
}

/** The stores (with the leads the hop needs) a panel can fill while walking; any one alternative must share its pack. */
export interface WalkingFeed {
  panelItemId: string;
  /** Empty: the panel can fill no pooled store, so it is never worth carrying and no rule applies to it. */
  alternatives: readonly PathAlternative[];
}

/** Who carries, who owns what and the walking rule: everything a split needs beyond the kit. */
export interface SplitRules {
  /** At least one. */
  carriers: readonly PartyCarrier[];
  /** Owner of each pooled item id (a carrier's member id, or anyone else: then nobody is its owner on the trail). */
  ownerByItemId: ReadonlyMap<string, string>;
  walkingFeeds: readonly WalkingFeed[];
}

/** A party's kit problem: the pooled candidates and daily model (gram limit unused), and the split rules. */
export interface PartyProblem extends SplitRules {
  problem: OptimisationProblem;
  /** The trip's own limit on the whole kit's grams, on top of each person's (absent or null: none). */
  tripLimitG?: number | null;
}

/** One carrier's share of a kit. */
export interface CarrierLoad {
  memberId: string;
  lines: KitLine[];
  massG: number;
  gramLimitG: number | null;
  /** Grams over their limit (0 when within it or no limit). */
  overG: number;
}

/** A kit divided among the carriers. */
export interface KitSplit {
  /** Every carrier in the order given, also those who carry nothing. */
  carriers: CarrierLoad[];
  /** Σ grams over limits. */
  overG: number;
  withinLimits: boolean;
  /** Units carried by someone other than their owner. */
  lentUnits: number;
  /** False when the split search ran out of nodes: a split with less overage may exist. */
  proven: boolean;
  /** False when the walking rule had to be set aside (see `splitKit`). */
  walkingRuleHeld: boolean;
}

/** Counters of a party answer. */
export interface PartyStats extends SearchStats {
  /** Kits the daily model and judge proposed that the party could not split within its limits. */
  unsplittableKits: number;
  /** Of those, cut off with every kit holding them (too heavy to share out by grams alone). */
  supersetCuts: number;
}

/** The party solver's answer: never empty. */
export type PartyAnswer =
  | {
      /** The lightest kit the judge accepts that the party can carry within every limit (ties: most margin). */
      status: 'optimal';
      kit: KitChoice;
      split: KitSplit;
      stats: PartyStats;
      notes: string[];
    }
  | {
      /**
       * No feasible kit splits within the limits (or fits the trip's own limit): the lightest feasible kit and its best
       * split (least total grams over,
       * then the least over for any one person, then the fewest lent items); each carrier's `overG` says by how much.
       */
      status: 'over-limits';
      kit: KitChoice;
      split: KitSplit;
      /** Σ limits (null when someone has none). */
      partyLimitG: number | null;
      /** Grams the kit weighs over the trip's own limit on the whole kit (0 within it or with none). */
      overTripLimitG: number;
      stats: PartyStats;
      notes: string[];
    }
  | {
      /** A search stopped early: a judged feasible kit with its best split, possibly not the lightest that fits. */
      status: 'best-so-far';
      kit: KitChoice;
      split: KitSplit;
      stats: PartyStats;
      notes: string[];
    }
  | {
      /** Nothing in the pool keeps every device charged: the optimiser's own answer. */
      status: 'nothing-feasible';
      answer: Extract<OptimiseAnswer, { status: 'nothing-feasible' }>;
      stats: PartyStats;
      notes: string[];
    };
