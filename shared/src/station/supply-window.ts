import { radioNominalSupplyVolts, radioSupplyToleranceShare } from '../constants/station.js';
import type { PackVolts } from './pack-volts.js';
import type { RadioSupplyWindow, StationWarning } from './types.js';

/**
 * The supply window assumed for a radio that states none, V: 13.8 V ± 15 % (≈ 11.73–15.87 V; common practice).
 * @example defaultRadioSupplyWindow() // { minVolts: 11.73, maxVolts: 15.87 }
 */
export function defaultRadioSupplyWindow(): RadioSupplyWindow {
  return {
    minVolts: radioNominalSupplyVolts * (1 - radioSupplyToleranceShare),
    maxVolts: radioNominalSupplyVolts * (1 + radioSupplyToleranceShare),
  };
}

/**
 * Checks a pack's voltages against a radio's supply window and returns the warnings, most serious first:
 * - full-charge voltage above the radio's maximum (e.g. a 4S lithium-polymer pack at 16.8 V against most radios'
 *   15.9 V): danger, it can damage the radio;
 * - nominal voltage below the radio's minimum (e.g. a 3S lithium-polymer pack at 11.1 V against 11.7 V): the radio
 *   transmits at reduced power or shuts down for much of the discharge;
 * - only the empty voltage below the minimum: the radio drops out before the pack is empty.
 * Pass the volts the radio actually sees (the lead's drop subtracted) when known.
 * @example checkSupplyWindow(packVolts('lipo', 4), { minVolts: 11.7, maxVolts: 15.9 })[0]?.id // 'supply-above-max'
 */
export function checkSupplyWindow(pack: PackVolts, radio: RadioSupplyWindow): StationWarning[] {
  const warnings: StationWarning[] = [];
  if (pack.fullVolts > radio.maxVolts) {
    warnings.push({
      id: 'supply-above-max',
      severity: 'danger',
      text: `The pack reaches ${v(pack.fullVolts)} V when full, above the radio's ${v(radio.maxVolts)} V maximum: it can damage the radio. Use fewer cells or a regulator the radio's maker approves.`,
    });
  }
  if (pack.nominalVolts < radio.minVolts) {
    warnings.push({
      id: 'supply-nominal-below-min',
      severity: 'warning',
      text: `The pack sits near ${v(pack.nominalVolts)} V for most of its discharge, below the radio's ${v(radio.minVolts)} V minimum: expect reduced transmit power or shut-downs.`,
    });
  } else if (pack.emptyVolts < radio.minVolts) {
    warnings.push({
      id: 'supply-empty-below-min',
      severity: 'info',
      text: `Near empty the pack falls below the radio's ${v(radio.minVolts)} V minimum, so the radio may stop before the pack is flat.`,
    });
  }
  return warnings;
}

function v(volts: number): string {
  return (Math.round(volts * 10) / 10).toFixed(1);
}
