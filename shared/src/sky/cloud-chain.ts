/**
 * The day-to-day sky as a two-state Markov chain (clear / cloudy). `p` is the chain's long-run share of
 * clear days and `q` the probability that a cloudy day follows a cloudy day. Stationarity fixes the
 * probability that a clear day is followed by a cloudy one: P(C→K) = (1 − p)(1 − q) / p, which is a
 * probability only when q ≥ 1 − p / (1 − p) (binding for p < 0.5). Two-state chains: e.g. Feller,
 * An Introduction to Probability Theory and Its Applications, vol. 1, 3rd ed., ch. XV.
 */

/** Slack for floating-point comparisons of probabilities. */
const probabilityEpsilon = 1e-12;

/**
 * Smallest persistence `q` a chain with clear share `p` can have: 1 − p / (1 − p) for p < 0.5, else 0.
 * @example minCloudyPersistence(0.4) // 0.3333…
 */
export function minCloudyPersistence(clearShare: number): number {
  if (clearShare >= 0.5) return 0;
  return 1 - clearShare / (1 - clearShare);
}

/**
 * Whether a chain with clear share `p` and cloudy persistence `q` exists.
 * @example isValidCloudChain(0.3, 0.2) // false (needs q ≥ 0.571…)
 */
export function isValidCloudChain(clearShare: number, cloudyPersistence: number): boolean {
  if (!(clearShare >= 0 && clearShare <= 1 && cloudyPersistence >= 0 && cloudyPersistence <= 1)) return false;
  return cloudyPersistence >= minCloudyPersistence(clearShare) - probabilityEpsilon;
}

/** The chain's transition probabilities. */
export interface CloudChain {
  /** Stationary probability that a day is clear (p). */
  clearShare: number;
  /** P(cloudy tomorrow | clear today). */
  clearToCloudy: number;
  /** P(cloudy tomorrow | cloudy today) (q). */
  cloudyToCloudy: number;
}

/**
 * Builds the chain from p and q; throws a RangeError when the pair cannot exist (validate input first).
 * @example cloudChain(0.6, 0.5).clearToCloudy // 0.3333…
 */
export function cloudChain(clearShare: number, cloudyPersistence: number): CloudChain {
  if (!isValidCloudChain(clearShare, cloudyPersistence)) {
    throw new RangeError(`No cloud chain has clear share ${clearShare} and persistence ${cloudyPersistence}`);
  }
  const clearToCloudy = clearShare > 0 ? Math.min(1, ((1 - clearShare) * (1 - cloudyPersistence)) / clearShare) : 1;
  return { clearShare, clearToCloudy, cloudyToCloudy: cloudyPersistence };
}

/**
 * P(longest run of cloudy days in `days` consecutive days ≤ k) for k = 0 … days, exactly, by dynamic
 * programming over the length of the current cloudy run; the first day is drawn from the stationary
 * distribution. Entry `days` is 1 (to rounding).
 * @example longestCloudyRunCdf(0.5, 0.5, 2) // [0.25, 0.75, 1]
 */
export function longestCloudyRunCdf(clearShare: number, cloudyPersistence: number, days: number): number[] {
  const chain = cloudChain(clearShare, cloudyPersistence);
  const cdf: number[] = [];
  for (let k = 0; k <= days; k++) cdf.push(probabilityLongestRunAtMost(chain, days, k));
  return cdf;
}

/** P(longest cloudy run ≤ k) over `days` days, O(days · k). */
function probabilityLongestRunAtMost(chain: CloudChain, days: number, k: number): number {
  if (days <= 0) return 1;
  // run[r] = P(no run longer than k so far and the current cloudy run has length r); r = 0: today is clear.
  let run: number[] = new Array<number>(k + 1).fill(0);
  run[0] = chain.clearShare;
  if (k >= 1) run[1] = 1 - chain.clearShare;
  for (let day = 1; day < days; day++) {
    const next: number[] = new Array<number>(k + 1).fill(0);
    const fromClear = run[0] ?? 0;
    let toClear = fromClear * (1 - chain.clearToCloudy);
    if (k >= 1) next[1] = fromClear * chain.clearToCloudy;
    for (let r = 1; r <= k; r++) {
      const mass = run[r] ?? 0;
      if (mass === 0) continue;
      toClear += mass * (1 - chain.cloudyToCloudy);
      if (r + 1 <= k) next[r + 1] = mass * chain.cloudyToCloudy;
    }
    next[0] = toClear;
    run = next;
  }
  let total = 0;
  for (const mass of run) total += mass;
  return total;
}

/**
 * The design run of cloudy days k: the smallest k such that the longest cloudy run in `days` days is at
 * most k with probability ≥ L. 0 when L is reached with no cloudy run at all; never more than `days`.
 * @param clearShare p, 0–1
 * @param cloudyPersistence q, 0–1, with q ≥ 1 − p / (1 − p) when p < 0.5
 * @param days trip days (nights + 1)
 * @param designLikelihood L, 0–1
 * @example cloudyRunDays(0.6, 0.5, 8, 0.9) // 4
 */
export function cloudyRunDays(
  clearShare: number,
  cloudyPersistence: number,
  days: number,
  designLikelihood: number,
): number {
  const chain = cloudChain(clearShare, cloudyPersistence);
  const wholeDays = Math.max(0, Math.floor(days));
  for (let k = 0; k < wholeDays; k++) {
    if (probabilityLongestRunAtMost(chain, wholeDays, k) >= designLikelihood - probabilityEpsilon) return k;
  }
  return wholeDays;
}
