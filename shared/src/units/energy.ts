/**
 * Energy, charge, power and time units of the engine. The engine computes in base units (Wh, Ah, W, h) and
 * converts only at the edges; every unit is a literal type with a factor table to its base unit.
 */

/** Energy units; the base unit is the watt-hour. */
export type EnergyUnit = 'Wh' | 'mWh' | 'kWh' | 'J' | 'kJ';

/**
 * Watt-hours per one of each energy unit. 1 Wh = 3600 J by definition of the watt (1 W = 1 J/s) and the hour
 * (3600 s) — BIPM, The International System of Units (SI Brochure), 9th edition 2019, tables 4 and 8.
 */
export const wattHoursPerEnergyUnit: Record<EnergyUnit, number> = {
  Wh: 1,
  mWh: 1e-3,
  kWh: 1e3,
  J: 1 / 3600,
  kJ: 1000 / 3600,
};

/** Charge units; the base unit is the ampere-hour. */
export type ChargeUnit = 'Ah' | 'mAh' | 'C';

/** Ampere-hours per one of each charge unit: 1 Ah = 3600 C (SI Brochure, 9th edition, table 4: 1 C = 1 A·s). */
export const ampHoursPerChargeUnit: Record<ChargeUnit, number> = {
  Ah: 1,
  mAh: 1e-3,
  C: 1 / 3600,
};

/** Duration units; the base unit is the hour. */
export type DurationUnit = 'h' | 'min' | 's' | 'ms';

/** Hours per one of each duration unit (SI Brochure, 9th edition, table 8: 1 h = 60 min = 3600 s). */
export const hoursPerDurationUnit: Record<DurationUnit, number> = {
  h: 1,
  min: 1 / 60,
  s: 1 / 3600,
  ms: 1 / 3_600_000,
};

/**
 * Converts an energy between units.
 * @example convertEnergy(1, 'Wh', 'J') // 3600
 */
export function convertEnergy(value: number, from: EnergyUnit, to: EnergyUnit): number {
  return (value * wattHoursPerEnergyUnit[from]) / wattHoursPerEnergyUnit[to];
}

/**
 * Converts a charge between units.
 * @example convertCharge(10000, 'mAh', 'Ah') // 10
 */
export function convertCharge(value: number, from: ChargeUnit, to: ChargeUnit): number {
  return (value * ampHoursPerChargeUnit[from]) / ampHoursPerChargeUnit[to];
}

/**
 * Converts a duration between units.
 * @example convertDuration(90, 'min', 'h') // 1.5
 */
export function convertDuration(value: number, from: DurationUnit, to: DurationUnit): number {
  return (value * hoursPerDurationUnit[from]) / hoursPerDurationUnit[to];
}

/**
 * Energy of a charge at a constant voltage: Wh = mAh × V / 1000 (W = V × A; SI Brochure, 9th edition, table 4).
 * Power banks are rated in mAh at their cell voltage, so this is the bank's rated energy.
 * @example milliampHoursToWattHours(10000, 3.7) // 37
 */
export function milliampHoursToWattHours(chargeMah: number, volts: number): number {
  return (chargeMah * volts) / 1000;
}

/**
 * Charge that holds an energy at a constant voltage: mAh = Wh × 1000 / V.
 * @example wattHoursToMilliampHours(37, 3.7) // 10000
 */
export function wattHoursToMilliampHours(energyWh: number, volts: number): number {
  return (energyWh * 1000) / volts;
}

/**
 * Energy of an ampere-hour charge at a constant voltage: Wh = Ah × V.
 * @example ampHoursToWattHours(6, 12.8) // 76.8
 */
export function ampHoursToWattHours(chargeAh: number, volts: number): number {
  return chargeAh * volts;
}

/**
 * Watt-hours to joules (1 Wh = 3600 J).
 * @example wattHoursToJoules(2) // 7200
 */
export function wattHoursToJoules(energyWh: number): number {
  return convertEnergy(energyWh, 'Wh', 'J');
}

/**
 * Joules to watt-hours (1 Wh = 3600 J).
 * @example joulesToWattHours(7200) // 2
 */
export function joulesToWattHours(energyJ: number): number {
  return convertEnergy(energyJ, 'J', 'Wh');
}

/**
 * Minutes to hours.
 * @example minutesToHours(30) // 0.5
 */
export function minutesToHours(durationMin: number): number {
  return convertDuration(durationMin, 'min', 'h');
}

/**
 * Hours to minutes.
 * @example hoursToMinutes(0.5) // 30
 */
export function hoursToMinutes(durationH: number): number {
  return convertDuration(durationH, 'h', 'min');
}

/**
 * Electric power from voltage and current: W = V × A (SI Brochure, 9th edition, table 4).
 * @example wattsFromVoltsAmps(5, 2) // 10
 */
export function wattsFromVoltsAmps(volts: number, currentA: number): number {
  return volts * currentA;
}
