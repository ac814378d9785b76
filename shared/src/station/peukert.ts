import {
  leadAcidRatedHours,
  lithiumPeukertExponent,
  sealedLeadAcidPeukertExponent,
  type BatteryChemistry,
} from '../constants/station.js';

/**
 * Peukert's law, t = H × (C / (I × H))^k: a battery rated C Ah over H hours lasts t hours at a steady current I.
 * The capacity it delivers at I is then I × t = C × (C / (I × H))^(k − 1). Peukert, W. (1897), "Über die
 * Abhängigkeit der Kapazität von der Entladestromstärke bei Bleiakkumulatoren", Elektrotechnische Zeitschrift 18,
 * 287–288; the rated-hours form as in Linden & Reddy, Handbook of Batteries, 3rd ed. (from memory).
 *
 * Limits: one exponent fits a rate table well from the rated hours down to a few hours (a 7 Ah sealed lead-acid
 * rate table within 3 % from 20 h to 5 h with k = 1.15) and overstates the capacity near the 1-hour rate (about 4.8 Ah for 4.2 Ah, +15 %); no
 * temperature or age effect. Below the rated current the capacity is capped at the rating: the plan does not count
 * on more than the label.
 */

/** Options of the Peukert model, all with documented defaults. */
export interface PeukertOptions {
  /** Hours over which `ratedAh` is rated, h; default `leadAcidRatedHours` (20). */
  ratedHours?: number;
  /** Peukert exponent k ≥ 1; default `sealedLeadAcidPeukertExponent` (1.15). */
  exponent?: number;
  /** Whether to cap the result at the rated Ah for currents below the rated current; default true. */
  capAtRating?: boolean;
}

/**
 * Capacity a battery delivers at a steady discharge current, Ah, by Peukert's law: C × (C / (I × H))^(k − 1).
 * @example peukertCapacityAh(7, 1.19, { exponent: 1.15 }) // ≈ 5.83 (a 7 Ah sealed lead-acid battery at its 5 h current)
 */
export function peukertCapacityAh(ratedAh: number, currentA: number, options: PeukertOptions = {}): number {
  const ratedHours = options.ratedHours ?? leadAcidRatedHours;
  const exponent = options.exponent ?? sealedLeadAcidPeukertExponent;
  if (!(ratedAh > 0) || !(ratedHours > 0)) throw new RangeError('Rated Ah and rated hours must be above 0');
  if (!(exponent >= 1)) throw new RangeError(`A Peukert exponent is at least 1, got ${exponent}`);
  if (!(currentA > 0)) return ratedAh;
  const capacityAh = ratedAh * (ratedAh / (currentA * ratedHours)) ** (exponent - 1);
  return options.capAtRating === false ? capacityAh : Math.min(ratedAh, capacityAh);
}

/**
 * Hours a battery lasts at a steady current, h, by Peukert's law: H × (C / (I × H))^k (not capped).
 * @example peukertRuntimeH(7, 0.35, { exponent: 1.15 }) // 20 (the rated current gives the rated hours)
 */
export function peukertRuntimeH(ratedAh: number, currentA: number, options: PeukertOptions = {}): number {
  const ratedHours = options.ratedHours ?? leadAcidRatedHours;
  const exponent = options.exponent ?? sealedLeadAcidPeukertExponent;
  if (!(currentA > 0)) return Infinity;
  return ratedHours * (ratedAh / (currentA * ratedHours)) ** exponent;
}

/**
 * The Peukert exponent from two lines of a maker's rate table, dimensionless: k = ln(t₁ / t₂) / ln(I₂ / I₁), with
 * I = Ah / h for each line (Peukert 1897, solved for k).
 * @example peukertExponentFromRates({ capacityAh: 7, hours: 20 }, { capacityAh: 5.95, hours: 5 }) // ≈ 1.13
 */
export function peukertExponentFromRates(
  a: { capacityAh: number; hours: number },
  b: { capacityAh: number; hours: number },
): number {
  const currentA = a.capacityAh / a.hours;
  const currentB = b.capacityAh / b.hours;
  if (currentA === currentB) throw new RangeError('The two rate-table lines must be at different currents');
  return Math.log(a.hours / b.hours) / Math.log(currentB / currentA);
}

/**
 * The Peukert exponent used for a chemistry when the pack does not give one: sealed lead-acid 1.15 (from memory),
 * lithium 1 (no rate loss, common practice).
 * @example defaultPeukertExponent('lead-acid') // 1.15
 */
export function defaultPeukertExponent(chemistry: BatteryChemistry): number {
  return chemistry === 'lead-acid' ? sealedLeadAcidPeukertExponent : lithiumPeukertExponent;
}
