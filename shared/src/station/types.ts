import type { BatteryChemistry } from '../constants/station.js';

/**
 * The inputs of the 12 V station engine. They are the engine's own view of the locker items (a battery pack, a
 * charge controller, a 12 V panel, a DC lead and a radio's supply); the item schemas map onto them.
 */

/** A battery pack: chemistry, cells in series, rated capacity and the maker's C-ratings when given. */
export interface StationBattery {
  chemistry: BatteryChemistry;
  /** Cells in series (e.g. 4 for a 12.8 V LiFePO₄ pack, 6 for a 12 V lead-acid battery). */
  cellsInSeries: number;
  /** Rated capacity, Ah (lead-acid: at its rated hours, usually 20 h). */
  capacityAh: number;
  /** The maker's rated charge current, C (multiples of the Ah rating); omit when not given. */
  chargeCRate?: number;
  /** The maker's continuous discharge rating, C; omit when not given. */
  dischargeCRate?: number;
  /** Hours over which the capacity is rated, h; default 20 for lead-acid (C20), unused for lithium. */
  ratedHours?: number;
  /** Peukert exponent; default by chemistry (`sealedLeadAcidPeukertExponent`, lithium 1). */
  peukertExponent?: number;
}

/** A charge controller between a 12 V panel and the battery. */
export interface StationController {
  controllerType: 'pwm' | 'mppt';
  /** Highest panel voltage the controller's input tolerates, V. */
  maxInputVolts: number;
  /** Largest charge current it puts into the battery, A. */
  maxChargeA: number;
  /** Conversion efficiency of an MPPT controller, 0–1 (a PWM switch is treated as lossless). */
  efficiency: number;
}

/** A 12 V-class panel's datasheet at Standard Test Conditions (1000 W/m², 25 °C cell). */
export interface StationPanel {
  /** Voltage at the maximum power point, V. */
  maxPowerVolts: number;
  /** Current at the maximum power point, A. */
  maxPowerAmps: number;
  /** Open-circuit voltage, V. */
  openCircuitVolts: number;
  /** Short-circuit current, A; when omitted the current below Vmp is taken as flat at Imp (a little pessimistic). */
  shortCircuitAmps?: number;
  /** Temperature coefficient of maximum power, %/°C (negative). */
  tempCoeffPctPerC: number;
  /** Temperature coefficient of open-circuit voltage, %/°C (negative). */
  tempCoeffVocPctPerC: number;
}

/** A DC lead from the battery to the radio. */
export interface DcLead {
  /** Copper gauge, AWG (0 to 40; 1/0 and heavier are not modelled). */
  gaugeAwg: number;
  /** One-way length, m (the current flows out and back: loop = 2 × this). */
  lengthM: number;
  /** Inline fuse rating, A; omit when the lead has no fuse. */
  fuseA?: number;
}

/** A radio's DC supply window, V. */
export interface RadioSupplyWindow {
  minVolts: number;
  maxVolts: number;
}

/** How strongly a station warning is shown (the same levels as the kit cautions). */
export type StationSeverity = 'info' | 'warning' | 'danger';

/** Which station warning it is (stable ids the screens can key on). */
export type StationWarningId =
  | 'supply-above-max'
  | 'supply-nominal-below-min'
  | 'supply-empty-below-min'
  | 'discharge-over-rating'
  | 'discharge-rating-missing'
  | 'charge-too-cold'
  | 'charge-cold-reduced'
  | 'controller-input-over'
  | 'lead-drop-below-min'
  | 'lead-gauge-not-rated'
  | 'lead-too-thin-for-fuse'
  | 'fuse-over-lead-rating'
  | 'fuse-below-load';

/** One warning of the station engine: an id, a severity and our own plain wording. */
export interface StationWarning {
  id: StationWarningId;
  severity: StationSeverity;
  text: string;
}
