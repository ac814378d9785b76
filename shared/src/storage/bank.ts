import { lithiumMinChargeTemperatureC } from '../constants/electrical.js';
import type { BankSpec } from '../schemas/items.js';
import { milliampHoursToWattHours } from '../units/energy.js';

/**
 * A bank's rated energy, Wh: rated mAh × nominal cell volts / 1000, or its Wh rating. This is the figure airlines
 * ask for (IATA Lithium Battery Guidance Document: Wh = Ah × V).
 * @example bankRatedWh({ capacityMah: 10000, cellVolts: 3.7, … }) // 37
 */
export function bankRatedWh(bank: Pick<BankSpec, 'capacityMah' | 'cellVolts' | 'capacityWh'>): number {
  if (bank.capacityWh !== undefined) return bank.capacityWh;
  return milliampHoursToWattHours(bank.capacityMah ?? 0, bank.cellVolts);
}

/**
 * A bank's usable energy at its output ports, Wh: rated Wh × output efficiency. The output loss (boost to 5 V,
 * cell internal resistance) is counted here, once. A 10,000 mAh bank delivering 60–70 % of 37 Wh at its USB port is
 * the trade's usual finding (common practice).
 * @example bankUsableWh({ capacityMah: 10000, cellVolts: 3.7, outputEfficiency: 0.85, … }) // 31.45
 */
export function bankUsableWh(
  bank: Pick<BankSpec, 'capacityMah' | 'cellVolts' | 'capacityWh' | 'outputEfficiency'>,
): number {
  return bankRatedWh(bank) * bank.outputEfficiency;
}

/**
 * Usable energy a bank gains from energy at its input, Wh: input × charge efficiency × output efficiency (state is
 * kept as usable energy, so the output loss of harvested energy is booked when it enters).
 * @example bankUsableGainWh(10, { chargeEfficiency: 0.9, outputEfficiency: 0.85 }) // 7.65
 */
export function bankUsableGainWh(
  inputWh: number,
  bank: Pick<BankSpec, 'chargeEfficiency' | 'outputEfficiency'>,
): number {
  return inputWh * bank.chargeEfficiency * bank.outputEfficiency;
}

/**
 * Whether lithium cells may be charged at a temperature: not below 0 °C (lithium plating; cell makers' datasheets
 * give 0–45 °C as the charge range — common practice).
 * @example canChargeLithium(-2) // false
 */
export function canChargeLithium(temperatureC: number): boolean {
  return temperatureC >= lithiumMinChargeTemperatureC;
}

/**
 * Hours in a step series during which lithium may not be charged (air below 0 °C), h.
 * @example frozenHours([{ airTempC: -1, durationH: 1 }, { airTempC: 3, durationH: 1 }]) // 1
 */
export function frozenHours(steps: readonly { airTempC: number; durationH: number }[]): number {
  let hours = 0;
  for (const step of steps) if (!canChargeLithium(step.airTempC)) hours += step.durationH;
  return hours;
}
