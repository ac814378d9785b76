/**
 * The optimiser's narrow interface. It knows nothing of suns, panels' physics or connectors: the caller turns a
 * locker and a trip into candidates (grams, counts owned), daily coefficients (an optimistic daily energy model)
 * and a judge (the hour-by-hour simulation). The optimiser proposes kits from the daily model and keeps only kits
 * the judge accepts.
 *
 * Soundness contract (see `DailyCoefficients`): the daily model must be a RELAXATION of the judge — every kit the
 * judge accepts must be feasible in the daily model — and the judge must be MONOTONE — adding an item never turns
 * a feasible kit into one that runs dry. With both, the answer is the lightest kit the judge accepts.
 */

/** Power roles of kit items. Only `massG`, counts and the coefficients matter to the model; the kind groups dominance. */
export type CandidateKind = 'panel' | 'bank' | 'battery' | 'converter' | 'controller' | 'lead' | 'other';

/**
 * One attribute the judge cares about that the daily model does not see (e.g. a bank's input limit in W, a
 * converter's efficiency, a panel's dropout irradiance). Used only by dominance in the presolve.
 */
export interface DominanceAttribute {
  name: string;
  value: number;
  /** Which direction is better for the kit. */
  better: 'higher' | 'lower';
}

/** One locker item the kit may hold, with the count owned (the party pool sums counts). */
export interface KitCandidate {
  itemId: string;
  kind: CandidateKind;
  /** Grams of one unit; integers (the oracle property compares grams exactly). */
  massG: number;
  /** Units owned, a whole number ≥ 0. */
  ownedCount: number;
  /**
   * Everything besides the daily coefficients that makes one unit better or worse in the judge's eyes. Items with no
   * attributes are never dominated and never dominate: leave it out when unsure.
   */
  dominanceAttributes?: readonly DominanceAttribute[];
}

/**
 * One way to satisfy a need: every listed item must be present, at least as many times as it is listed (a repeated
 * id means two units).
 */
export interface PathAlternative {
  /** For reports ("USB-C lead + boost converter"); defaults to the item ids joined. */
  pathId?: string;
  itemIds: readonly string[];
  /**
   * Optional: besides `itemIds`, at least one of these items must be present (e.g. the stores a converter-and-lead set
   * fits: the set charges the device only from one of them). Empty or absent: no such requirement. It keeps "this set
   * with one of these banks" exact without one alternative per bank.
   */
  anyOfItemIds?: readonly string[];
  /**
   * Optional, 0–1: the MOST of each Wh drawn from a store that this alternative can put into the device's battery (the
   * best path through it × the device's charge efficiency; a device run live counts its best share too). With
   * `PathNeed.gainWh` on the need, the search may judge a kit by the alternatives it holds (see `kit-views.ts`).
   */
  efficiency?: number;
}

/** A device that needs a charging path (its own battery cannot cover the trip): at least one alternative must be present. */
export interface PathNeed {
  needId: string;
  /** Shown in the "nothing feasible" answer, e.g. "the 12 V radio". */
  label?: string;
  /** Compatible alternatives (the caller filters connectors, volts, amps); empty means no path exists in the locker. */
  alternatives: readonly PathAlternative[];
  /**
   * Optional `[sky][day]`: the LEAST Wh the device's battery must gain from stores that day (beyond its own battery).
   * With an `efficiency` on every alternative, `demandWh` must count at least gain / (best alternative's efficiency)
   * for this device; the search then also checks a kit against the device's draw through the alternatives the kit
   * holds, from the stores they reach.
   */
  gainWh?: readonly (readonly number[])[];
  /**
   * Optional: the share `demandWh` counts this device's gain at — the best of the whole locker's paths (default: the
   * best alternative's efficiency). A search over part of the locker (its core) keeps the whole locker's demand rows,
   * and a kit's view raises the demand from this share to the kit's own, not from the best the part holds.
   */
  demandShare?: number;
}

/** Panels whose harvest counts only when one of the alternatives is present (e.g. a 12 V panel needs a controller). */
export interface HarvestGroup {
  groupId: string;
  /** Empty or absent: no requirement. */
  requiresAnyOf?: readonly PathAlternative[];
}

/** Per unit of one panel. */
export interface PanelCoefficients {
  itemId: string;
  /**
   * `[sky][day]`: an UPPER BOUND on the Wh one unit can deliver at a store's input that day (sun, carry mode, sky,
   * shade, temperature, system factor, port cap and dropout applied, frozen hours excluded where every store is
   * lithium) — no loss for full stores or input limits (the model and the judge find those).
   */
  harvestWh: readonly (readonly number[])[];
  /** A `HarvestGroup.groupId`; default: a group with no requirement. */
  groupId?: string;
  /**
   * Optional `[sky][step]` detail of `harvestWh` (steps of every day in order, see `DailyCoefficients.dayFirstStep`):
   * an upper bound on the Wh one unit delivers at a store input in that step. With the stores' step detail it lets the
   * model see that hourly input limits cap a day's harvest (still a relaxation).
   */
  harvestWhByStep?: readonly (readonly number[])[];
}

/** Per unit of one store (bank or battery). */
export interface StoreCoefficients {
  itemId: string;
  /** Usable Wh above empty (output loss already applied, counted once). */
  usableWh: number;
  /** Share of input energy that ends up stored, 0–1. */
  chargeEfficiency: number;
  /**
   * `[sky][day]`: an UPPER BOUND on the Wh one unit can take at its input that day (input limit W × hours any panel
   * can feed it, frozen hours excluded).
   */
  acceptWh: readonly (readonly number[])[];
  /** Optional `[sky][step]` detail of `acceptWh`: Wh one unit can take in that step (0 in frozen steps). */
  acceptWhByStep?: readonly (readonly number[])[];
}

/**
 * When in a day devices are topped up relative to harvest. `overlapping` (default, always a relaxation): top-ups may
 * happen while panels still harvest, so the only room limit is at the day's end. `after-harvest`: every top-up
 * happens after the day's last harvest (only valid when the judge's camp top-ups start after the panels stop), so
 * stores cannot hold more than their capacity before the day's demand is drawn.
 */
export type DayTiming = 'overlapping' | 'after-harvest';

/**
 * The daily model's inputs. To keep the model a RELAXATION of the judge, every value must be the most favourable
 * one the hourly simulation could realise: harvest and acceptance as upper bounds, demand as the smallest draw
 * (the best path's efficiencies, after devices' own batteries, which start full), efficiencies as the best.
 */
export interface DailyCoefficients {
  /** Design skies in order (ids for reports only). */
  skyIds: readonly string[];
  dayCount: number;
  /**
   * `[sky][day]`: the LEAST Wh the devices must draw from stores that day (after their own batteries and with the
   * most favourable charging path's losses). Energy must leave stores by the end of that day.
   */
  demandWh: readonly (readonly number[])[];
  /**
   * Optional `[sky][day]`: the MOST Wh the devices could draw from stores that day (the worst path's losses, device
   * batteries topped up to full), for the room rows: stores emptied faster have more room for harvest. Default
   * `demandWh`. Using the least draw for the reserve rows and the most for the room rows keeps the model a relaxation.
   */
  roomDemandWh?: readonly (readonly number[])[];
  /** Share of every store never to go below, 0–1. */
  reserveShare: number;
  panels: readonly PanelCoefficients[];
  stores: readonly StoreCoefficients[];
  harvestGroups?: readonly HarvestGroup[];
  needs: readonly PathNeed[];
  /** Default `overlapping`. */
  timing?: DayTiming;
  /**
   * With step detail on every panel and store: the first step of each day, plus the step count at the end
   * (length `dayCount + 1`). Absent: the model uses daily totals only.
   */
  dayFirstStep?: readonly number[];
  /**
   * With step detail: per day, the first (absolute) step in which stores may give energy to devices (the camp
   * window's start); the day's stored harvest before it must fit in the room left at the previous day's end, so a full
   * bank spills the morning's sun. Every later step of the day counts as overlapping the top-ups.
   */
  firstTopUpStep?: readonly number[];
  /**
   * With `firstTopUpStep`: no store gives energy before a day's first top-up (no device runs live from a store), so
   * the day's stored harvest before it also fits in the stores' room at the day's start, at most their capacity above
   * the reserve — however many days of room the room rows have counted before (their most draw runs ahead of the true
   * draw day after day).
   */
  earlyRoomCapped?: boolean;
}

/** The problem: candidates, daily model, optional gram limit. */
export interface OptimisationProblem {
  candidates: readonly KitCandidate[];
  coefficients: DailyCoefficients;
  /** Grams the kit should stay under (power gear only); absent = no limit. */
  gramLimitG?: number;
}

/** Counts by item id (absent = 0). */
export type KitCounts = ReadonlyMap<string, number>;

/** One line of a kit in an answer. */
export interface KitLine {
  itemId: string;
  count: number;
}

/** Where and why the judge found a kit running dry. */
export interface RunsDry {
  skyId?: string;
  dayIndex: number;
  deviceId?: string;
  /** Wh the device lacked. */
  shortWh?: number;
  reason?: string;
}

/** The judge's answer for one kit. */
export interface JudgeVerdict {
  feasible: boolean;
  /** Worst-case headroom, in whatever unit the judge reports (share or Wh), for swaps' "more margin". */
  margin?: number;
  runsDry?: RunsDry;
  /**
   * Set when the kit works only with some of its items left unused (a converter left home): the lighter kit that works
   * as packed. The judge stays monotone; whatever the search offers is this kit, never the one asked.
   */
  works?: KitCounts;
}

/** The hourly simulation, supplied by the caller. Must be monotone in every item count and deterministic. */
export type KitJudge = (kit: KitCounts) => JudgeVerdict;

/** A kit as reported: lines (non-zero counts, sorted by item id) and grams. */
export interface KitChoice {
  lines: KitLine[];
  massG: number;
  verdict: JudgeVerdict;
}

/** Options of every solve, with defaults. */
export interface OptimiseOptions {
  /** A clock in ms (the caller's; shared has none). Default: a clock that never moves (no time limit). */
  now?: () => number;
  /** Time budget for the whole answer, ms (default: unlimited). */
  timeBudgetMs?: number;
  /** Verify-and-repair rounds before giving up with the best kit so far (default 400). */
  maxRounds?: number;
  /** Timeout handed to each MILP solve, ms (default 10 000; javascript-lp-solver's own clock). */
  solverTimeoutMs?: number;
  /** Break gram ties by the model's worst-day margin (a second solve per round; default true). */
  tieBreakByMargin?: boolean;
}

/** A device with no path, or a sky-day the daily model finds short even with every item owned. */
export interface MissingPath {
  needId: string;
  label?: string;
}
export interface EnergyShortfall {
  skyId: string;
  dayIndex: number;
  /** Wh below the reserve at the end of that day with the whole locker, by the optimistic daily model. */
  shortWh: number;
}

/** Counters of one answer. */
export interface SearchStats {
  /** Verify-and-repair rounds (model solves that proposed a kit). */
  rounds: number;
  /** Distinct kits judged. */
  judgedKits: number;
  /** Items left after the presolve, of the candidates given. */
  activeItems: number;
  candidateItems: number;
}

/** The answer: never empty. */
export type OptimiseAnswer =
  | {
      /** `optimal`: the lightest kit the judge accepts, within the gram limit (or no limit). */
      status: 'optimal';
      kit: KitChoice;
      gramLimitG?: number;
      stats: SearchStats;
      notes: string[];
    }
  | {
      /** The lightest feasible kit weighs more than the gram limit. */
      status: 'over-limit';
      kit: KitChoice;
      gramLimitG: number;
      overLimitG: number;
      stats: SearchStats;
      notes: string[];
    }
  | {
      /** The round cap or time budget was hit: a judged-feasible kit, possibly not the lightest. */
      status: 'best-so-far';
      kit: KitChoice;
      /** No feasible kit weighs less than this (the model's bound when it stopped). */
      lowerBoundG: number;
      gramLimitG?: number;
      overLimitG?: number;
      stats: SearchStats;
      notes: string[];
    }
  | {
      status: 'nothing-feasible';
      missingPaths: MissingPath[];
      shortfalls: EnergyShortfall[];
      /** The judge's finding for the whole locker. */
      runsDry?: RunsDry;
      stats: SearchStats;
      notes: string[];
    };

/** A next-best kit. */
export interface KitSwap {
  kit: KitChoice;
  /** Grams more than the optimum (≥ 0). */
  extraG: number;
  added: KitLine[];
  removed: KitLine[];
  /** What it buys: `more-margin`, `fewer-items`, `no-converter`, `no-lead`, `fewer-panels`. */
  buys: string[];
}

/** One change to a hand-picked kit that stays feasible and weighs less. */
export interface KitShave {
  change: { kind: 'remove'; itemId: string } | { kind: 'replace'; itemId: string; withItemId: string };
  kit: KitChoice;
  /** Grams saved (> 0). */
  savedG: number;
}

/** What a changed requirement costs. */
export type GramPrice =
  | { kind: 'free' }
  /** `approximate`: one of the two answers was a best-so-far kit. */
  | { kind: 'grams'; extraG: number; kit: KitChoice; approximate?: boolean }
  | { kind: 'nothing-feasible' }
  | { kind: 'unknown'; note: string };
