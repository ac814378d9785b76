import { kitCounts } from './kit.js';
import type { KitSearchOptions } from './kit-search.js';
import { optimiseKit } from './optimise.js';
import type { GramPrice, KitJudge, OptimisationProblem, OptimiseAnswer } from './types.js';

/**
 * What a changed requirement costs in grams (10 more transmit minutes a day, one more cloudy day, reserve + 0.1…),
 * given the answer for the trip as it is and the problem and judge with the requirement changed. If the judge still
 * accepts the base kit, the change is `free` (with a monotone judge and a raised requirement no lighter kit can exist);
 * otherwise the changed problem is solved and the gram difference reported.
 * @example gramPrice(base, raisedProblem, raisedJudge) // { kind: 'grams', extraG: 85, kit }
 */
export function gramPrice(
  base: OptimiseAnswer,
  changed: OptimisationProblem,
  changedJudge: KitJudge,
  options: KitSearchOptions = {},
): GramPrice {
  if (base.status !== 'nothing-feasible' && changedJudge(kitCounts(base.kit.lines)).feasible) return { kind: 'free' };
  const answer = optimiseKit(changed, changedJudge, options);
  if (answer.status === 'nothing-feasible') return { kind: 'nothing-feasible' };
  if (base.status === 'nothing-feasible')
    return { kind: 'unknown', note: 'The trip as it is has no feasible kit to compare with.' };
  if (answer.status === 'best-so-far' || base.status === 'best-so-far') {
    const extraG = answer.kit.massG - base.kit.massG;
    // A kit that meets the raised requirement also meets the trip as it is (the judge is monotone): lighter than the
    // base kit means the base was not the lightest, and the difference is no price.
    if (extraG < 0)
      return {
        kind: 'unknown',
        note: 'The search stopped before the lightest kit was proven, so this price is not known.',
      };
    return { kind: 'grams', extraG, kit: answer.kit, approximate: true };
  }
  return { kind: 'grams', extraG: answer.kit.massG - base.kit.massG, kit: answer.kit };
}

/**
 * How many more steps of a requirement a kit absorbs for free: the largest `n ≤ maxSteps` such that the judge for
 * `n` more steps still accepts the kit (bisection; the judges must be monotone in `n`). 0 when the first step costs.
 * @example freeSteps((n) => judgeWithExtraMinutes(10 * n), kit, 12) // 3 → "free up to 30 more minutes"
 */
export function freeSteps(
  judgeForSteps: (steps: number) => KitJudge,
  kit: ReadonlyMap<string, number>,
  maxSteps: number,
): number {
  let lo = 0;
  let hi = maxSteps;
  if (judgeForSteps(hi)(kit).feasible) return hi;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (judgeForSteps(mid)(kit).feasible) lo = mid;
    else hi = mid;
  }
  return lo;
}
