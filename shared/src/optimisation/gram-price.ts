import { kitCounts, kitLines, kitMassG } from './kit.js';
import { createKitSearch, type KitSearchOptions } from './kit-search.js';
import { greedyShave, growToFeasible, optimiseKit, wholeLocker } from './optimise.js';
import type { GramPrice, KitChoice, KitJudge, OptimisationProblem, OptimiseAnswer } from './types.js';

/**
 * What a changed requirement costs in grams (10 more transmit minutes a day, one more cloudy day, reserve + 0.1…),
 * given the answer for the trip as it is and the problem and judge with the requirement changed. If the judge still
 * accepts the base kit, the change is `free` (with a monotone judge and a raised requirement no lighter kit can exist);
 * otherwise the changed problem is solved and the gram difference reported — or, when the base kit is a stopped
 * search's best so far, the base kit is repaired to meet the change (`repairedPrice`, approximate).
 * @example gramPrice(base, raisedProblem, raisedJudge) // { kind: 'grams', extraG: 85, kit }
 */
export function gramPrice(
  base: OptimiseAnswer,
  changed: OptimisationProblem,
  changedJudge: KitJudge,
  options: KitSearchOptions = {},
): GramPrice {
  if (base.status !== 'nothing-feasible' && changedJudge(kitCounts(base.kit.lines)).feasible) return { kind: 'free' };
  if (base.status === 'best-so-far') return repairedPrice(base, changed, changedJudge, options);
  const answer = optimiseKit(changed, changedJudge, options);
  if (answer.status === 'nothing-feasible') return { kind: 'nothing-feasible' };
  if (base.status === 'nothing-feasible')
    return { kind: 'unknown', note: 'The trip as it is has no feasible kit to compare with.' };
  return priceAgainst(base.kit.massG, answer.kit, answer.status === 'best-so-far');
}

/**
 * The price of a kit that meets the raise against the base kit's grams. A kit lighter than the base that meets the
 * raised requirement also meets the trip as it is (the judge is monotone): then the base was not the lightest (a stopped
 * search's), and the difference is no price.
 */
function priceAgainst(baseMassG: number, kit: KitChoice, approximate: boolean): GramPrice {
  if (kit.massG < baseMassG)
    return {
      kind: 'unknown',
      note: 'The search stopped before the lightest kit was proven, so this price is not known.',
    };
  return { kind: 'grams', extraG: kit.massG - baseMassG, kit, ...(approximate ? { approximate } : {}) };
}

/**
 * The price of a raise for a kit that a stopped search answered: what it takes to make that kit meet the raised
 * requirement — the kit grown until the judge accepts it (`growToFeasible`: stores and panels first, lightest first),
 * then shaved with the kit's own items tried last — an approximate price, as the base kit is not proven the lightest
 * either. A search for the raised optimum would stop where the trip's own search stopped: on the 200-item bench locker
 * each of the four ran 8–10 s to its node cap and answered from its repairs, 36 s of a 46 s plan.
 * Source: proximity search, as the stopped search's repairs (M. Fischetti and A. Lodi, Local branching, Mathematical
 * Programming 98, 2003).
 */
function repairedPrice(
  base: Extract<OptimiseAnswer, { status: 'best-so-far' }>,
  changed: OptimisationProblem,
  changedJudge: KitJudge,
  options: KitSearchOptions,
): GramPrice {
  const search = createKitSearch(changed, changedJudge, options);
  const deadlineMs = options.timeBudgetMs === undefined ? Infinity : search.now() + options.timeBudgetMs;
  const kit = kitCounts(base.kit.lines);
  const grown = growToFeasible(search, kit, wholeLocker(changed), deadlineMs);
  if (!grown) {
    if (search.now() < deadlineMs) return { kind: 'nothing-feasible' };
    return { kind: 'unknown', note: 'The time for this plan ran out before this price was found.' };
  }
  const repaired = greedyShave(search, grown, deadlineMs, kit);
  const massG = kitMassG(repaired.counts, changed.candidates);
  return priceAgainst(base.kit.massG, { lines: kitLines(repaired.counts), massG, verdict: repaired.verdict }, true);
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
