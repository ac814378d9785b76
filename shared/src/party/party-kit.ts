import { kitLines, kitMassG } from '../optimisation/kit.js';
import { createKitSearch, type KitSearch, type KitSearchOptions } from '../optimisation/kit-search.js';
import { optimiseKit } from '../optimisation/optimise.js';
import type { KitChoice, KitCounts, KitJudge, OptimisationProblem, SearchStats } from '../optimisation/types.js';
import { splitKit, type SplitOptions } from './split-kit.js';
import type { KitSplit, PartyAnswer, PartyProblem, PartyStats } from './types.js';

/**
 * Kits the party search looks at beyond the lightest before it settles (each a model solve and a judge call, plus a
 * split). Every round removes at least the kit it rejected, so the search ends; the cap keeps the answer interactive
 * (common practice: the same order as the optimiser's own round cap per step).
 */
export const defaultPartyRounds = 60;

/** Options of the party search. */
export interface PartyOptions extends KitSearchOptions {
  /** Kits to try beyond the lightest (default {@link defaultPartyRounds}). */
  maxPartyRounds?: number;
  /** Node budget of each split. */
  maxSplitNodes?: number;
}

/** Σ limits, or Infinity when someone has none. */
export function partyLimitG(party: PartyProblem): number {
  return party.carriers.reduce((sum, c) => sum + (c.gramLimitG ?? Infinity), 0);
}

/** The most a kit may weigh: Σ limits and the trip's own limit, whichever is lower (Infinity: no cap). */
function kitCapG(party: PartyProblem): number {
  return Math.min(partyLimitG(party), party.tripLimitG ?? Infinity);
}

function choiceOf(counts: KitCounts, problem: OptimisationProblem, verdict: KitChoice['verdict']): KitChoice {
  return { lines: kitLines(counts), massG: kitMassG(counts, problem.candidates), verdict };
}

/**
 * The best split of a kit under the walking rule; when no split can keep the rule at all, the best split without it
 * (reported with `walkingRuleHeld: false`).
 */
export function bestSplit(party: PartyProblem, counts: KitCounts, options: PartyOptions = {}): KitSplit {
  const splitOptions: SplitOptions = {
    massGById: new Map(party.problem.candidates.map((c) => [c.itemId, c.massG])),
    ...(options.maxSplitNodes !== undefined ? { maxNodes: options.maxSplitNodes } : {}),
  };
  return (
    splitKit(counts, party, splitOptions) ??
    (splitKit(counts, party, { ...splitOptions, walkingRule: false }) as KitSplit)
  );
}

/**
 * Whether a kit is proven too heavy to share out by grams alone. Then every kit holding it is too (a split of the
 * larger kit, less the extra units, would split this one), so the search may cut them all off. A kit that fails only
 * the walking rule is cut off alone: adding a bank can mend it.
 */
function tooHeavyForAnySuperset(party: PartyProblem, counts: KitCounts, options: PartyOptions): boolean {
  if (kitMassG(counts, party.problem.candidates) > kitCapG(party)) return true;
  const split = splitKit(counts, party, {
    massGById: new Map(party.problem.candidates.map((c) => [c.itemId, c.massG])),
    walkingRule: false,
    ...(options.maxSplitNodes !== undefined ? { maxNodes: options.maxSplitNodes } : {}),
  });
  return split !== null && split.proven && !split.withinLimits;
}

function statsOf(search: KitSearch, party: { unsplittableKits: number; supersetCuts: number }): PartyStats {
  const base: SearchStats = {
    rounds: search.stats.rounds,
    judgedKits: search.stats.judgedKits,
    activeItems: search.presolved.items.length,
    candidateItems: search.problem.candidates.length,
  };
  return { ...base, ...party };
}

/**
 * The party's kit: the lightest kit the judge accepts that the carriers can share within their own gram limits under
 * the walking rule (see `types.ts`), with its split. Carrier assignment is not monotone the way the optimiser's cuts
 * assume — a kit too heavy to share makes every LARGER kit too heavy, not every smaller one — so the limits are not
 * put into the model. Instead the optimiser proposes the lightest feasible kit not yet excluded; the exact split
 * checks it; a kit that cannot be shared is cut off (with every kit holding it when grams alone rule it out, alone
 * otherwise) and the next lightest is tried, in bounded rounds. A kit heavier than the trip's own limit is cut off
 * with every kit holding it. A proposed kit heavier than Σ limits (or the trip's limit) ends the search:
 * no kit from there on can be shared. When no kit fits, the answer is the lightest feasible kit with its best split,
 * naming each person's overage. Pass the search to go on with it afterwards (the swaps do).
 * @example optimisePartyKit(party, judge).status // 'optimal'
 */
export function optimisePartyKit(
  party: PartyProblem,
  judge: KitJudge,
  options: PartyOptions = {},
  search: KitSearch = createKitSearch(
    { candidates: party.problem.candidates, coefficients: party.problem.coefficients },
    judge,
    options,
  ),
): PartyAnswer {
  const problem: OptimisationProblem = {
    candidates: party.problem.candidates,
    coefficients: party.problem.coefficients,
  };
  const deadlineMs = options.timeBudgetMs === undefined ? Infinity : search.now() + options.timeBudgetMs;
  const counters = { unsplittableKits: 0, supersetCuts: 0 };
  // A search made on a problem with a gram limit may call the lightest kit `over-limit`: the party's limits rule here.
  const first = optimiseKit(problem, judge, options, search);
  if (first.status === 'nothing-feasible')
    return { status: 'nothing-feasible', answer: first, stats: statsOf(search, counters), notes: first.notes };

  const lightestCounts = new Map(first.kit.lines.map((l) => [l.itemId, l.count]));
  const lightest = { kit: first.kit, split: bestSplit(party, lightestCounts, options) };
  const walkingNote = (split: KitSplit): string[] =>
    split.walkingRuleHeld
      ? []
      : ['No split keeps every panel with a store it can fill while walking; this split sets that rule aside.'];
  const splitNote = (split: KitSplit): string[] =>
    split.proven ? [] : ['The split search ran out of steps: a split with less over the limits may exist.'];
  if (first.status === 'best-so-far') {
    return {
      status: 'best-so-far',
      kit: lightest.kit,
      split: lightest.split,
      stats: statsOf(search, counters),
      notes: [...first.notes, ...walkingNote(lightest.split), ...splitNote(lightest.split)],
    };
  }
  const capG = kitCapG(party);
  const fits = (split: KitSplit, massG: number): boolean =>
    split.withinLimits && split.walkingRuleHeld && massG <= capG;
  if (fits(lightest.split, lightest.kit.massG)) {
    return {
      status: 'optimal',
      kit: lightest.kit,
      split: lightest.split,
      stats: statsOf(search, counters),
      notes: [...first.notes, ...splitNote(lightest.split)],
    };
  }

  const limitG = partyLimitG(party);
  const overLimits = (reason: string[]): PartyAnswer => ({
    status: 'over-limits',
    kit: lightest.kit,
    split: lightest.split,
    partyLimitG: Number.isFinite(limitG) ? limitG : null,
    overTripLimitG: Math.max(0, lightest.kit.massG - (party.tripLimitG ?? Infinity)),
    stats: statsOf(search, counters),
    notes: [...reason, ...walkingNote(lightest.split), ...splitNote(lightest.split)],
  });
  const maxRounds = options.maxPartyRounds ?? defaultPartyRounds;
  let counts: KitCounts = lightestCounts;
  let everyCutProven = lightest.split.proven;
  for (let round = 0; round < maxRounds; round++) {
    counters.unsplittableKits++;
    if (tooHeavyForAnySuperset(party, counts, options)) {
      counters.supersetCuts++;
      search.excludeSupersetsOf(counts);
    } else {
      search.excludeKit(counts);
    }
    const step = search.next(deadlineMs);
    if (step.kind === 'exhausted')
      return overLimits(['No kit that keeps every device charged can be shared within everyone’s limits.']);
    if (step.kind === 'stopped')
      return overLimits([`The search for a kit that fits everyone’s limits stopped (${step.reason}).`]);
    // "Every kit" only when the search's bound says so: after the model search set kits aside (`maxOpenNodes`) a kit
    // under the limit may be among them.
    if (step.massG > capG)
      return overLimits([
        step.lowerBoundG <= capG
          ? 'The search for a kit that fits everyone’s limits reached its memory limit and set kits aside: those it kept weigh more than the limits allow, but one that fits may exist.'
          : capG < limitG
            ? 'Every kit that keeps every device charged weighs more than the trip’s limit.'
            : 'Every kit that keeps every device charged weighs more than the party’s limits together.',
      ]);
    const split = bestSplit(party, step.counts, options);
    if (fits(split, step.massG)) {
      const kit = choiceOf(step.counts, problem, step.verdict);
      const proven = step.proven && everyCutProven && split.proven;
      return {
        status: proven ? 'optimal' : 'best-so-far',
        kit,
        split,
        stats: statsOf(search, counters),
        notes: proven
          ? []
          : ['A model solve or a split search stopped early: this kit fits everyone’s limits, but a lighter one may.'],
      };
    }
    everyCutProven &&= split.proven;
    counts = step.counts;
  }
  return overLimits([
    `No kit among the ${maxRounds + 1} lightest that keep every device charged could be shared within everyone’s limits.`,
  ]);
}
