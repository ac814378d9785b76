import { kitCounts } from '../optimisation/kit.js';
import { createKitSearch, type KitSearch, type KitSearchOptions } from '../optimisation/kit-search.js';
import { findSwaps, optimiseKit } from '../optimisation/optimise.js';
import { freeSteps, gramPrice } from '../optimisation/gram-price.js';
import type { KitCounts, OptimiseAnswer } from '../optimisation/types.js';
import type { DeviceSpec } from '../schemas/devices.js';
import type { PlanGramPrice, PlanKit, PlanResult, PlanSwap } from '../schemas/plans.js';
import type { TripSolarOptions } from '../sun/trip-solar.js';
import { planningContext, type PlanningContext } from './build-problem.js';
import { evaluateKit, planKit } from './evaluate-kit.js';
import { pathChoice, pathChoicePossible } from './path-choice.js';
import { buysText, countedName, dayLabel, gramsText, listText, percentText, skyName } from './plain-words.js';
import { planModelVersion } from './model-version.js';
import type { PlanningInput } from './planning-input.js';

/** How many more steps of a requirement "free up to N more" looks at. */
const maxFreeSteps = 12;

/** Options of a plan. */
export interface PlanOptions {
  /** The caller's clock, ms (shared has none). Default: a clock that never moves. */
  now?: () => number;
  /** Time for the whole answer, ms, shared out by `planTimeShares`. */
  timeBudgetMs?: number;
  /** Swaps and gram prices too (default true). */
  withExtras?: boolean;
  /**
   * Picks the kit in place of the optimiser's lightest (the party's solver does), given the context and the search the
   * swaps go on with. Default: `optimiseKit`.
   */
  chooseKit?: (
    context: PlanningContext,
    search: KitSearch,
    options: { now: () => number; timeBudgetMs?: number },
  ) => OptimiseAnswer;
}

const stillClock = (): number => 0;

/**
 * Shares of a plan's time left when each part starts; what a part leaves unused flows on to the next. The optimum's
 * share applies when a path choice or extras follow it (alone it has all the time), the path choice's when extras
 * follow; each gram price then gets an even share of what is left. A small locker's optimum takes milliseconds, so only
 * large ones feel this: their model search goes on past its memory cap and takes whatever time it is given. Measured on
 * the 200-item bench plan: with all the time left at each part, the optimum took all 40 s of its budget and every gram
 * price was left out; with these shares, at 20 s, the optimum took 10.2 s (the same 1,479 g), then five swaps and all
 * four prices, 15.4 s in all. At 3 s the parts overrun their shares (a repair judges kits of 0.6–0.9 s each), and a
 * price or two may be left out (in one of four runs read in full).
 */
export const planTimeShares = { optimum: 0.5, pathChoice: 0.3, swaps: 0.4 } as const;

/** The plan's answer in one sentence. */
function headline(
  answer: OptimiseAnswer,
  kit: PlanKit | null,
  verdictText: string | null,
  missingText: string,
): string {
  switch (answer.status) {
    case 'optimal':
      return `The lightest kit that works weighs ${gramsText(kit?.massG ?? 0)}. ${verdictText ?? ''}`.trim();
    case 'over-limit':
      return `Nothing that works fits under ${gramsText(answer.gramLimitG)}: the lightest kit that does weighs ${gramsText(answer.kit.massG)}, ${gramsText(answer.overLimitG)} over the limit.`;
    case 'best-so-far':
      // The model's bound holds for every kit it had not yet cut off (the cut-off ones were rejected): none lighter works.
      // A bound far below the kit (a search stopped after a round or two: "none under 128 g" for a 1,532 g kit) tells
      // the hiker nothing, so it is named only from `namedBoundShare` of the kit's grams up.
      return answer.lowerBoundG >= namedBoundShare * answer.kit.massG && answer.lowerBoundG < answer.kit.massG
        ? `The search stopped early: this kit works (${gramsText(answer.kit.massG)}); a lighter one may exist, but none under ${gramsText(answer.lowerBoundG)}. ${verdictText ?? ''}`.trim()
        : `The search stopped early: this kit works (${gramsText(answer.kit.massG)}), but a lighter one may exist. ${verdictText ?? ''}`.trim();
    case 'nothing-feasible':
      return `No kit from this gear keeps every device charged. ${missingText}`.trim();
  }
}

/** The least share of the kit's grams a stopped search's lower bound must reach to be named in the headline. */
export const namedBoundShare = 0.5;

/** Names devices in a sentence the simulation wrote with device ids. */
function withDeviceNames(context: PlanningContext, text: string): string {
  let out = text;
  for (const [id, name] of Object.entries(context.input.deviceNames ?? {})) out = out.split(id).join(name);
  return out;
}

function swapText(
  context: PlanningContext,
  extraG: number,
  added: { name: string; count: number }[],
  removed: { name: string; count: number }[],
  buys: string[],
): string {
  const parts: string[] = [];
  if (added.length) parts.push(`adds ${listText(added.map((a) => countedName(a.name, a.count)))}`);
  if (removed.length) parts.push(`leaves ${listText(removed.map((r) => countedName(r.name, r.count)))} at home`);
  const gains = buys.map((b) => buysText[b]).filter((b): b is string => !!b);
  void context;
  return `${extraG === 0 ? 'Same grams' : `${gramsText(extraG)} more`}: ${parts.join('; ')}${gains.length ? ` — ${listText(gains)}` : ''}.`;
}

/** A changed requirement for a gram price: its id, words, how to change the input by n steps, and a step's unit. */
interface Requirement {
  requirement: PlanGramPrice['requirement'];
  change: string;
  unit: (n: number) => string;
  changed: (n: number) => { input: PlanningInput; solarOptions?: TripSolarOptions };
}

function withRadioProfiles(
  input: PlanningInput,
  bump: (
    p: Extract<DeviceSpec['useProfile'], { basis: 'radio-hours' }>,
  ) => Extract<DeviceSpec['useProfile'], { basis: 'radio-hours' }>,
): PlanningInput {
  return {
    ...input,
    devices: input.devices.map((d) =>
      d.spec.useProfile.basis === 'radio-hours'
        ? { ...d, spec: { ...d.spec, useProfile: bump(d.spec.useProfile) } }
        : d,
    ),
  };
}

function requirements(context: PlanningContext): Requirement[] {
  const input = context.input;
  const radios = input.devices.some((d) => d.spec.useProfile.basis === 'radio-hours');
  const list: Requirement[] = [];
  if (radios) {
    list.push({
      requirement: 'transmit-minutes',
      change: '10 more transmit minutes a day',
      unit: (n) => `${n * 10} more minutes`,
      changed: (n) => ({
        input: withRadioProfiles(input, (p) => ({ ...p, transmitMinutesPerDay: p.transmitMinutesPerDay + 10 * n })),
      }),
    });
    list.push({
      requirement: 'receive-hours',
      change: '1 more receive hour a day',
      unit: (n) => `${n} more hour${n === 1 ? '' : 's'}`,
      changed: (n) => ({
        input: withRadioProfiles(input, (p) => ({ ...p, receiveHoursPerDay: Math.min(24, p.receiveHoursPerDay + n) })),
      }),
    });
  }
  if (context.solar.cloudyRunDays < context.solar.days.length) {
    list.push({
      requirement: 'cloudy-run',
      change: '1 more cloudy day in the design run',
      unit: (n) => `${n} more cloudy day${n === 1 ? '' : 's'}`,
      changed: (n) => ({ input, solarOptions: { extraCloudyRunDays: n } }),
    });
  }
  if (input.reserveShare + 0.1 < 1) {
    list.push({
      requirement: 'reserve',
      change: 'a reserve 10 points higher',
      unit: (n) => `${n * 10} more points`,
      changed: (n) => ({ input: { ...input, reserveShare: Math.min(0.95, input.reserveShare + 0.1 * n) } }),
    });
  }
  return list;
}

function priceOf(
  context: PlanningContext,
  base: OptimiseAnswer,
  req: Requirement,
  options: KitSearchOptions,
): PlanGramPrice {
  const one = req.changed(1);
  const changed = planningContext(one.input, one.solarOptions, context);
  const price = gramPrice(base, changed.problem, changed.judge, options);
  const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);
  switch (price.kind) {
    case 'free': {
      const kit = base.status === 'nothing-feasible' ? new Map<string, number>() : kitCounts(base.kit.lines);
      const judgeFor = (n: number) => {
        const c = req.changed(n);
        return planningContext(c.input, c.solarOptions, context).judge;
      };
      const free = freeSteps(judgeFor, kit, maxFreeSteps);
      const upTo = free >= maxFreeSteps ? `at least ${req.unit(free)}` : req.unit(free);
      return {
        requirement: req.requirement,
        change: req.change,
        kind: 'free',
        extraG: 0,
        freeUpTo: upTo,
        text: `${cap(req.change)}: free — this kit has room for ${upTo}.`,
      };
    }
    case 'grams':
      return {
        requirement: req.requirement,
        change: req.change,
        kind: 'grams',
        extraG: price.extraG,
        freeUpTo: null,
        text: `${cap(req.change)} cost ${gramsText(price.extraG)}${price.approximate ? ' (about)' : ''}.`,
      };
    case 'nothing-feasible':
      return {
        requirement: req.requirement,
        change: req.change,
        kind: 'nothing-feasible',
        extraG: null,
        freeUpTo: null,
        text: `${cap(req.change)}: no kit from this gear would keep up.`,
      };
    case 'unknown':
      return {
        requirement: req.requirement,
        change: req.change,
        kind: 'unknown',
        extraG: null,
        freeUpTo: null,
        text: price.note,
      };
  }
}

/** Plain sentences for what is missing when nothing is feasible, from the simulation of the whole locker. */
function missingSentences(
  context: PlanningContext,
  answer: Extract<OptimiseAnswer, { status: 'nothing-feasible' }>,
  locker: KitCounts,
): { missing: string[]; runsDry: { dayIndex: number; deviceId: string; skyId: string } | null } {
  const simulation = context.simulate(locker);
  const name = (id: string): string => context.input.deviceNames?.[id] ?? id;
  const missing: string[] = [];
  for (const d of simulation.devices) {
    if (d.missing.length > 0)
      missing.push(
        `Nothing in this gear can charge ${name(d.deviceId)}: it needs ${listText(d.missing.map((m) => m.text))}.`,
      );
  }
  for (const p of answer.missingPaths) {
    if (!simulation.devices.some((d) => d.deviceId === p.needId && d.missing.length > 0))
      missing.push(`No charging path reaches ${p.label ?? name(p.needId)}.`);
  }
  const v = simulation.verdict;
  const runsDry = v.status === 'runs-dry' ? { dayIndex: v.dayIndex, deviceId: v.deviceId, skyId: v.skyId } : null;
  // Which device runs dry first, unless a sentence above already says it cannot be charged at all.
  if (runsDry && !simulation.devices.some((d) => d.deviceId === runsDry.deviceId && d.missing.length > 0))
    missing.push(
      `With all this gear packed, ${name(runsDry.deviceId)} runs dry on ${dayLabel(runsDry.dayIndex)} in ${skyName(runsDry.skyId)}.`,
    );
  // One sentence per shortfall, naming every sky it holds in (with no panel, every sky is short alike).
  const skyCount = context.solar.skies.length;
  const bySize = new Map<string, { dayIndex: number; shortWh: number; skyIds: string[] }>();
  for (const s of answer.shortfalls) {
    const key = `${s.dayIndex}|${s.shortWh.toFixed(1)}`;
    const known = bySize.get(key);
    if (known) known.skyIds.push(s.skyId);
    else bySize.set(key, { dayIndex: s.dayIndex, shortWh: s.shortWh, skyIds: [s.skyId] });
  }
  for (const s of bySize.values()) {
    const skies = s.skyIds.length === skyCount && skyCount > 1 ? 'every design sky' : listText(s.skyIds.map(skyName));
    missing.push(
      `Even with all this gear packed, the stores run ${s.shortWh.toFixed(1)} Wh short on ${dayLabel(s.dayIndex)} in ${skies}.`,
    );
  }
  return { missing, runsDry };
}

/**
 * Plans a trip: the lightest kit from the gear that keeps every device charged in every design sky (or the lightest
 * that works when nothing fits the gram limit, or what is missing when nothing works), its simulation, the five next
 * best distinct kits, and what 10 more transmit minutes, one more receive hour, one more cloudy day and a higher
 * reserve would cost. Never an empty answer. Pure and synchronous; the server runs it in a worker thread.
 * @example planTrip(input).headline // 'The lightest kit that works weighs 412 g. Keeps up: 31 % to spare on the worst day.'
 */
export function planTrip(input: PlanningInput, options: PlanOptions = {}): PlanResult {
  const now = options.now ?? stillClock;
  const startMs = now();
  const deadline = options.timeBudgetMs === undefined ? Infinity : startMs + options.timeBudgetMs;
  /** A share of the time left (at least 1 ms), none without a budget. */
  const left = (share = 1): { timeBudgetMs?: number } =>
    deadline === Infinity ? {} : { timeBudgetMs: Math.max(1, share * (deadline - now())) };
  const withExtras = options.withExtras !== false;
  const context = planningContext(input);
  const optimumShare = withExtras || pathChoicePossible(context) ? planTimeShares.optimum : 1;
  const optimumOptions = { now, ...left(optimumShare) };
  const search = createKitSearch(context.problem, context.judge, optimumOptions);
  const answer = options.chooseKit
    ? options.chooseKit(context, search, optimumOptions)
    : optimiseKit(context.problem, context.judge, optimumOptions, search);
  const optimumMs = now() - startMs;
  const notes = [...answer.notes];
  const stats = { ...answer.stats, optimumMs, totalMs: optimumMs };
  const locker = new Map(input.gear.filter((g) => g.countOwned > 0).map((g) => [g.itemId, g.countOwned]));

  if (answer.status === 'nothing-feasible') {
    const { missing, runsDry } = missingSentences(context, answer, locker);
    const text = missing.join(' ');
    return {
      modelVersion: planModelVersion,
      status: answer.status,
      headline: headline(answer, null, null, text),
      kit: null,
      evaluation: null,
      swaps: [],
      gramPrices: [],
      nothingFeasible: { missing, shortfalls: answer.shortfalls, runsDry, text },
      pathChoice: null,
      notes,
      stats: { ...stats, totalMs: now() - startMs },
    };
  }

  const counts = kitCounts(answer.kit.lines);
  const kit = planKit(context, counts);
  const evaluation = evaluateKit(context, counts);
  evaluation.verdict.text = withDeviceNames(context, evaluation.verdict.text);
  const swaps: PlanSwap[] = [];
  const gramPrices: PlanGramPrice[] = [];
  const choice = pathChoice(context, counts, {
    now,
    ...left(withExtras ? planTimeShares.pathChoice : 1),
    knownRejected: [...search.rejectedKits],
  });
  if (withExtras) {
    const named = (lines: { itemId: string; count: number }[]) =>
      lines.map((l) => ({ ...l, name: context.gearById.get(l.itemId)?.name ?? l.itemId }));
    const swapOptions = { now, ...left(planTimeShares.swaps) };
    for (const swap of findSwaps(context.problem, context.judge, answer.kit, swapOptions, search)) {
      const added = named(swap.added);
      const removed = named(swap.removed);
      swaps.push({
        kit: planKit(context, kitCounts(swap.kit.lines)),
        extraG: swap.extraG,
        added,
        removed,
        buys: swap.buys,
        worstMarginShare: swap.kit.verdict.margin ?? null,
        text:
          swapText(context, swap.extraG, added, removed, swap.buys) +
          (swap.kit.verdict.margin !== undefined
            ? ` ${percentText(swap.kit.verdict.margin)} to spare on the worst day.`
            : ''),
      });
    }
    const raised = requirements(context);
    for (const [k, req] of raised.entries()) {
      if (now() >= deadline) {
        notes.push('Some gram prices were left out: the time for this plan ran out.');
        break;
      }
      // A price needs only the grams of the raised optimum, not which of equal kits has the most margin; and the kits the
      // trip's own search rejected fail every raised requirement too.
      const priceOptions: KitSearchOptions = {
        now,
        ...left(1 / (raised.length - k)),
        tieBreakByMargin: false,
        knownRejected: [...search.rejectedKits],
      };
      gramPrices.push(priceOf(context, answer, req, priceOptions));
    }
  }
  return {
    modelVersion: planModelVersion,
    status: answer.status,
    headline: headline(answer, kit, evaluation.verdict.text, ''),
    kit,
    evaluation,
    swaps,
    gramPrices,
    nothingFeasible: null,
    pathChoice: choice,
    notes,
    stats: { ...stats, totalMs: now() - startMs },
  };
}
