import { shaveGrams, type ShaveLimits } from '../optimisation/shave-grams.js';
import type { CheckResult, KitSelection } from '../schemas/plans.js';
import { planningContext } from './build-problem.js';
import { evaluateKit, planKit } from './evaluate-kit.js';
import { gramsText } from './plain-words.js';
import { partyCarriers } from './plan-party.js';
import { PlanningInputError, type PlanningInput } from './planning-input.js';

/**
 * Simulates a kit picked by hand on the trip, and lists the changes that shave grams and still keep every device
 * charged (one unit left at home, or one unit swapped for a lighter item of the same kind), lightest first. On a
 * party's trip the kit also says who carries what (the best split of that kit), from the same planning context.
 * With `limits`, the changes still untried at the deadline are counted, not judged (the biggest savings come first).
 * Throws `PlanningInputError` for an item not in the gear or a count above the units owned.
 * @example checkKit(input, [{ itemId: 'bank-1', count: 1 }]).evaluation.verdict.status // 'runs-dry'
 */
export function checkKit(input: PlanningInput, selection: KitSelection, limits: ShaveLimits = {}): CheckResult {
  const gearById = new Map(input.gear.map((g) => [g.itemId, g]));
  selection.forEach((line, i) => {
    const g = gearById.get(line.itemId);
    if (!g) throw new PlanningInputError(`kit.${i}.itemId`, 'This item is not among the gear for this trip');
    if (line.count > g.countOwned)
      throw new PlanningInputError(`kit.${i}.count`, `Only ${g.countOwned} of ${g.name} owned`);
  });
  const context = planningContext(input);
  const counts = new Map(selection.map((l) => [l.itemId, l.count]));
  const evaluation = evaluateKit(context, counts);
  const name = (id: string): string => gearById.get(id)?.name ?? id;
  const found = shaveGrams(context.problem.candidates, context.judge, counts, limits);
  const shaves = found.shaves.map((s) => ({
    change: s.change,
    text:
      s.change.kind === 'remove'
        ? `Leave one ${name(s.change.itemId)} at home: saves ${gramsText(s.savedG)} and still keeps every device charged.`
        : `Take ${name(s.change.withItemId)} instead of one ${name(s.change.itemId)}: saves ${gramsText(s.savedG)} and still keeps every device charged.`,
    savedG: s.savedG,
    massG: s.kit.massG,
  }));
  const kit = planKit(context, counts);
  return {
    kit: input.party ? { ...kit, carriers: partyCarriers(context, input.party, counts) } : kit,
    evaluation,
    shaves,
    untriedChanges: found.untriedChanges,
  };
}
