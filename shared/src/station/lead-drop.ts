import { copperReferenceTemperatureC } from '../constants/station.js';
import type { DcLead, StationWarning } from './types.js';
import { copperResistanceOhmPerKm } from './wire-gauge.js';

/**
 * Loop resistance of a two-wire DC lead, Ω: the current goes out on the positive wire and back on the negative, so
 * the copper length is twice the one-way length (Ohm's law over the loop).
 * @example leadLoopResistanceOhm({ gaugeAwg: 12, lengthM: 2 }) // ≈ 4 m × 5.21 Ω/km ≈ 0.0208
 */
export function leadLoopResistanceOhm(
  lead: Pick<DcLead, 'gaugeAwg' | 'lengthM'>,
  conductorTempC = copperReferenceTemperatureC,
): number {
  return ((2 * lead.lengthM) / 1000) * copperResistanceOhmPerKm(lead.gaugeAwg, conductorTempC);
}

/** The outcome of checking a lead's voltage drop at the radio's transmit current. */
export interface LeadDropCheck {
  /** Voltage lost in the lead, V: current × loop resistance. */
  dropVolts: number;
  /** Voltage at the radio's socket, V: supply − drop. */
  voltsAtRadio: number;
  warning?: StationWarning;
}

/**
 * Voltage drop on a DC lead at a current (e.g. the radio's transmit current), V = I × R_loop, and a warning when the
 * radio would then see less than its minimum supply voltage. Connector and fuse-holder resistance are not included,
 * so the real drop is somewhat larger.
 * @example checkLeadDrop({ gaugeAwg: 18, lengthM: 3 }, 20, 12.8, 11.7).warning?.id // 'lead-drop-below-min' (2.5 V lost)
 */
export function checkLeadDrop(
  lead: Pick<DcLead, 'gaugeAwg' | 'lengthM'>,
  currentA: number,
  supplyVolts: number,
  radioMinVolts: number,
  conductorTempC = copperReferenceTemperatureC,
): LeadDropCheck {
  const dropVolts = Math.max(0, currentA) * leadLoopResistanceOhm(lead, conductorTempC);
  const voltsAtRadio = supplyVolts - dropVolts;
  if (voltsAtRadio >= radioMinVolts) return { dropVolts, voltsAtRadio };
  return {
    dropVolts,
    voltsAtRadio,
    warning: {
      id: 'lead-drop-below-min',
      severity: 'warning',
      text: `At ${round1(currentA)} A the ${lead.gaugeAwg} AWG lead loses ${dropVolts.toFixed(2)} V over ${round1(2 * lead.lengthM)} m of copper, leaving ${voltsAtRadio.toFixed(1)} V at the radio, below its ${radioMinVolts} V minimum. Use a heavier gauge or a shorter lead.`,
    },
  };
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
