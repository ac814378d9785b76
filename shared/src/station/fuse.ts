import { bladeFuseRatingsA, cordAmpacityByAwgA, fuseLoadMarginFactor } from '../constants/station.js';
import { stationCaution, type StationCaution } from './station-cautions.js';
import type { DcLead, StationWarning } from './types.js';

/** A fuse suggestion for a DC lead feeding a radio. */
export interface FuseSuggestion {
  /** Suggested blade fuse, A; undefined when no standard blade rating reaches the load. */
  fuseA?: number;
  /** Current the fuse must carry without blowing, A: the radio's largest current × 1.25. */
  loadWithMarginA: number;
  /** Ampacity of the lead's gauge, A (NEC Table 400.5(A)(1), column B, from memory); undefined when not in the table. */
  leadAmpacityA?: number;
  warnings: StationWarning[];
  /** Always: fuse the positive lead close to the battery. */
  caution: StationCaution;
}

/**
 * Suggests an inline fuse for a DC lead from the radio's largest current and the lead's gauge: the smallest standard
 * blade fuse (ISO 8820-3 ratings, from memory) at or above 125 % of the radio's largest current (common practice),
 * checked against the lead's ampacity (NFPA 70, NEC Table 400.5(A)(1), column B — two current-carrying conductors —
 * from memory): a fuse protects the wire, so it must not exceed what the wire carries. A fuse already in the lead is
 * checked both ways. Always carries the caution to fuse the positive lead close to the battery. The radio maker's
 * own fuse rating, where given, comes first.
 * @example suggestFuse(20, { gaugeAwg: 12 }).fuseA // 25 (20 A × 1.25 = 25 A; 12 AWG cord carries 25 A)
 */
export function suggestFuse(radioMaxCurrentA: number, lead: Pick<DcLead, 'gaugeAwg' | 'fuseA'>): FuseSuggestion {
  const loadWithMarginA = radioMaxCurrentA * fuseLoadMarginFactor;
  const fuseA = bladeFuseRatingsA.find((rating) => rating >= loadWithMarginA);
  const leadAmpacityA = cordAmpacityByAwgA[lead.gaugeAwg];
  const warnings: StationWarning[] = [];

  if (fuseA === undefined) {
    warnings.push({
      id: 'lead-too-thin-for-fuse',
      severity: 'warning',
      text: `A radio drawing up to ${radioMaxCurrentA} A needs more than the largest blade fuse (${bladeFuseRatingsA[bladeFuseRatingsA.length - 1]} A): use the fuse and lead its maker specifies.`,
    });
  }
  if (leadAmpacityA === undefined) {
    warnings.push({
      id: 'lead-gauge-not-rated',
      severity: 'warning',
      text: `${lead.gaugeAwg} AWG is outside the ampacity table used here (18–8 AWG), so the lead cannot be checked against the fuse. Use 18 AWG or heavier for a radio lead.`,
    });
  } else if (fuseA !== undefined && fuseA > leadAmpacityA) {
    warnings.push({
      id: 'lead-too-thin-for-fuse',
      severity: 'warning',
      text: `A ${fuseA} A fuse, enough for the radio, is more than the ${leadAmpacityA} A a ${lead.gaugeAwg} AWG lead carries, so it would not protect the lead: use a heavier gauge.`,
    });
  }
  if (lead.fuseA !== undefined) {
    if (leadAmpacityA !== undefined && lead.fuseA > leadAmpacityA) {
      warnings.push({
        id: 'fuse-over-lead-rating',
        severity: 'danger',
        text: `The lead's ${lead.fuseA} A fuse is more than the ${leadAmpacityA} A its ${lead.gaugeAwg} AWG wire carries: a short could burn the wire before the fuse blows.`,
      });
    }
    if (lead.fuseA < radioMaxCurrentA) {
      warnings.push({
        id: 'fuse-below-load',
        severity: 'warning',
        text: `The lead's ${lead.fuseA} A fuse is below the radio's ${radioMaxCurrentA} A: it will blow when transmitting.`,
      });
    }
  }
  return {
    ...(fuseA === undefined ? {} : { fuseA }),
    loadWithMarginA,
    ...(leadAmpacityA === undefined ? {} : { leadAmpacityA }),
    warnings,
    caution: stationCaution('fuse-positive-near-battery'),
  };
}
