import { optimiseKit } from '../optimisation/optimise.js';
import type { KitCounts } from '../optimisation/types.js';
import type { PlanPathChoice } from '../schemas/plans.js';
import type { BatterySpec } from '../schemas/station-items.js';
import { needsChargingPath } from '../demand/device-demand.js';
import { planningContext, type PlanningContext } from './build-problem.js';
import { gramsText } from './plain-words.js';
import type { PlanningGear, PlanningInput } from './planning-input.js';

/**
 * Why the kit gives the 12 V devices the path it does, in plain words: when the gear holds both a 12 V pack and a
 * boost converter and a 12 V device needs charging, the lightest kit without the chosen path is found too and the
 * two are compared by grams ("the LiFePO₄ pack path is 140 g lighter than two banks and a boost converter").
 */

/** How a pack's chemistry is named in a sentence. */
const chemistryWords: Record<BatterySpec['chemistry'], string> = {
  lipo: 'lithium polymer',
  'li-ion': 'lithium-ion',
  lifepo4: 'LiFePO₄',
  'lead-acid': 'lead-acid',
};

const countWords = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten'];

const isStationGear = (g: PlanningGear): boolean =>
  g.spec.kind === 'battery' || g.spec.kind === 'controller' || (g.spec.kind === 'panel' && g.spec.panelType === '12v');
const isBoost = (g: PlanningGear): boolean => g.spec.kind === 'converter' && g.spec.converterType === 'boost';

/** Words for a kit's 12 V pack path ("the LiFePO₄ pack path") or bank path ("two banks and a boost converter"). */
function pathWords(context: PlanningContext, counts: KitCounts, path: 'pack' | 'banks'): string {
  const lines = [...counts].filter(([, n]) => n > 0).map(([id, n]) => ({ gear: context.gearById.get(id), n }));
  if (path === 'pack') {
    const chemistries = [
      ...new Set(
        lines.flatMap(({ gear }) => (gear?.spec.kind === 'battery' ? [chemistryWords[gear.spec.chemistry]] : [])),
      ),
    ];
    return `the ${chemistries.length === 1 ? `${chemistries[0]} ` : '12 V '}pack path`;
  }
  const banks = lines.reduce((a, { gear, n }) => a + (gear?.spec.kind === 'bank' ? n : 0), 0);
  return `${banks === 1 ? 'one bank' : `${countWords[banks] ?? banks} banks`} and a boost converter`;
}

/** The 12 V devices the trip needs to charge. */
function chargedRadios(context: PlanningContext): PlanningInput['devices'] {
  const tripDays = context.solar.steps.reduce((h, s) => h + s.durationH, 0) / 24;
  return context.input.devices.filter((d) => d.spec.chargesVia === '12v-dc' && needsChargingPath(d.spec, tripDays));
}

/**
 * Whether a path choice may apply to some kit: a 12 V device needs charging and the gear holds both a 12 V pack and a
 * boost converter (a plan leaves it time, see `planTimeShares`).
 * @example pathChoicePossible(context) // false for a trip with no 12 V radio
 */
export function pathChoicePossible(context: PlanningContext): boolean {
  const owned = context.input.gear.filter((g) => g.countOwned > 0);
  return chargedRadios(context).length > 0 && owned.some((g) => g.spec.kind === 'battery') && owned.some(isBoost);
}

/**
 * The path choice for a kit, or null when it does not apply (no 12 V device needing charging, or the gear lacks one
 * of the paths). `timeBudgetMs` bounds the extra solve; when it runs out the answer says the comparison is open.
 * @example pathChoice(context, counts)?.text // 'The LiFePO₄ pack path is 95 g lighter than three banks and a boost converter for this trip.'
 */
export function pathChoice(
  context: PlanningContext,
  counts: KitCounts,
  options: { now?: () => number; timeBudgetMs?: number; knownRejected?: readonly KitCounts[] } = {},
): PlanPathChoice | null {
  const { input } = context;
  if (!pathChoicePossible(context)) return null;
  const radios = chargedRadios(context);

  const inKit = (test: (g: PlanningGear) => boolean) =>
    [...counts].some(([id, n]) => n > 0 && context.gearById.has(id) && test(context.gearById.get(id) as PlanningGear));
  const usesPack = inKit((g) => g.spec.kind === 'battery');
  const usesBoost = inKit(isBoost);
  const kitG = [...counts].reduce((a, [id, n]) => a + (context.gearById.get(id)?.massG ?? 0) * n, 0);
  if (usesPack && usesBoost) {
    return {
      path: 'both',
      otherMassG: null,
      savedG: null,
      text: 'This trip needs both paths: the 12 V pack and banks with a boost converter.',
    };
  }
  if (!usesPack && !usesBoost) return null;
  const path = usesPack ? 'pack' : 'banks';
  const without = usesPack ? isStationGear : isBoost;
  const other = planningContext(
    { ...input, gramLimitG: null, gear: input.gear.map((g) => (without(g) ? { ...g, countOwned: 0 } : g)) },
    context.solarOptions,
    context,
  );
  // Only the grams matter here, and every kit the trip's own search rejected (same trip, same judge) is rejected in the
  // smaller gear too.
  const answer = optimiseKit(other.problem, other.judge, {
    ...(options.now ? { now: options.now } : {}),
    ...(options.timeBudgetMs !== undefined ? { timeBudgetMs: options.timeBudgetMs } : {}),
    tieBreakByMargin: false,
    knownRejected: options.knownRejected ?? [],
  });
  const chosen = pathWords(context, counts, path);
  const capitalised = chosen.charAt(0).toUpperCase() + chosen.slice(1);
  if (answer.status === 'nothing-feasible') {
    const otherName = usesPack ? 'the banks and boost converters in this gear' : 'the 12 V packs in this gear';
    return {
      path,
      otherMassG: null,
      savedG: null,
      text: `Only ${chosen} keeps the 12 V ${radios.length > 1 ? 'devices' : 'radio'} charged on this trip: ${otherName} cannot.`,
    };
  }
  const otherCounts: KitCounts = new Map(answer.kit.lines.map((l) => [l.itemId, l.count]));
  const otherWords = pathWords(other, otherCounts, usesPack ? 'banks' : 'pack');
  const savedG = answer.kit.massG - kitG;
  const exact = answer.status !== 'best-so-far';
  // "Two banks and a boost converter" is plural, "the pack path" singular.
  const [is, weighs] = path === 'banks' ? ['are', 'weigh'] : ['is', 'weighs'];
  const text =
    savedG > 0
      ? `${capitalised} ${is} ${exact ? '' : 'at least '}${gramsText(savedG)} lighter than ${otherWords} for this trip.`
      : savedG === 0
        ? `${capitalised} ${weighs} the same as ${otherWords} for this trip and keep${path === 'banks' ? '' : 's'} more to spare.`
        : `${capitalised} ${is} ${gramsText(-savedG)} heavier than ${otherWords} for this trip: the search for this kit stopped early.`;
  return { path, otherMassG: answer.kit.massG, savedG, text };
}
