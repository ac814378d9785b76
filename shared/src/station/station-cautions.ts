import { lithiumChemistries, type BatteryChemistry } from '../constants/station.js';
import type { StationSeverity } from './types.js';

/** Which station caution it is (stable ids the screens and e-mails can key on). */
export type StationCautionId =
  | 'lithium-protection'
  | 'lithium-cold-charge'
  | 'lead-acid-gassing'
  | 'controller-before-panel'
  | 'fuse-positive-near-battery'
  | 'defer-to-maker';

/** One station caution: an id, a severity and our own plain wording. */
export interface StationCaution {
  id: StationCautionId;
  severity: StationSeverity;
  text: string;
}

/** The wording of every station caution (ours). */
export const stationCautionTexts: Readonly<Record<StationCautionId, string>> = {
  'lithium-protection':
    'Lithium packs need a protection circuit (BMS) and a charge controller set for their chemistry: a lead-acid setting overcharges LiFePO₄, and lithium polymer needs its own charge voltage.',
  'lithium-cold-charge':
    'Never charge lithium below 0 °C. Warm the pack first; the controller must stop charging in the cold, or keep the pack insulated and warm.',
  'lead-acid-gassing':
    'Lead-acid batteries vent hydrogen when overcharged: charge them in open air, never in a closed tent, and keep sparks and flames away.',
  'controller-before-panel':
    'Connect the controller to the battery before the panel, and disconnect the panel first: most controllers set themselves up from the battery, and a panel alone can damage them.',
  'fuse-positive-near-battery':
    'Fuse the positive lead as close to the battery as you can, so a short anywhere along the lead blows the fuse instead of burning the wire.',
  'defer-to-maker':
    "These figures are estimates. Follow the manufacturer's instructions for every pack, controller and radio, and licensed practice for the station.",
};

/** What the station consists of, for choosing the cautions. */
export interface StationCautionInput {
  chemistries: readonly BatteryChemistry[];
  hasController: boolean;
  hasDcLead: boolean;
}

/**
 * The cautions for a 12 V station, most serious first: lithium packs need protection and a controller set for
 * their chemistry; never charge lithium below 0 °C; lead-acid vents gas when overcharged; connect the controller to
 * the battery before the panel; fuse the positive lead near the battery (always, when there is a battery or a DC
 * lead); defer to the manufacturer and licensed practice (always).
 * @example stationCautions({ chemistries: ['lifepo4'], hasController: true, hasDcLead: true }).map((c) => c.id)
 * // ['lithium-protection', 'lithium-cold-charge', 'controller-before-panel', 'fuse-positive-near-battery', 'defer-to-maker']
 */
export function stationCautions(input: StationCautionInput): StationCaution[] {
  const ids: StationCautionId[] = [];
  const hasLithium = input.chemistries.some((c) => lithiumChemistries.includes(c));
  if (hasLithium) ids.push('lithium-protection', 'lithium-cold-charge');
  if (input.chemistries.includes('lead-acid')) ids.push('lead-acid-gassing');
  if (input.hasController) ids.push('controller-before-panel');
  if (input.chemistries.length > 0 || input.hasDcLead) ids.push('fuse-positive-near-battery');
  ids.push('defer-to-maker');
  const cautions = ids.map((id) => stationCaution(id));
  const rank: Record<StationSeverity, number> = { danger: 0, warning: 1, info: 2 };
  return cautions.sort((a, b) => rank[a.severity] - rank[b.severity]);
}

/**
 * One station caution by id, with its severity.
 * @example stationCaution('fuse-positive-near-battery').severity // 'warning'
 */
export function stationCaution(id: StationCautionId): StationCaution {
  return { id, severity: id === 'defer-to-maker' ? 'info' : 'warning', text: stationCautionTexts[id] };
}
