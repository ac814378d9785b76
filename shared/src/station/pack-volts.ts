import {
  leadAcidCellEmptyVolts,
  leadAcidCellFullVolts,
  leadAcidCellNominalVolts,
  lifepo4CellEmptyVolts,
  lifepo4CellFullVolts,
  lifepo4CellNominalVolts,
  liIonCellEmptyVolts,
  liIonCellFullVolts,
  liIonCellNominalVolts,
  lipoCellEmptyVolts,
  lipoCellFullVolts,
  lipoCellNominalVolts,
  type BatteryChemistry,
} from '../constants/station.js';

/** A cell's or a pack's three voltages, V. */
export interface PackVolts {
  /** Nominal voltage (the label's, and the one to turn Ah into Wh), V. */
  nominalVolts: number;
  /** End-of-charge voltage: the highest the terminals reach while charging, V. */
  fullVolts: number;
  /** End-of-discharge (cut-off) voltage, V. */
  emptyVolts: number;
}

/** Per-cell voltages by chemistry, V (sources in `constants/station.ts`). */
export const cellVoltsByChemistry: Readonly<Record<BatteryChemistry, PackVolts>> = {
  lipo: { nominalVolts: lipoCellNominalVolts, fullVolts: lipoCellFullVolts, emptyVolts: lipoCellEmptyVolts },
  'li-ion': { nominalVolts: liIonCellNominalVolts, fullVolts: liIonCellFullVolts, emptyVolts: liIonCellEmptyVolts },
  lifepo4: {
    nominalVolts: lifepo4CellNominalVolts,
    fullVolts: lifepo4CellFullVolts,
    emptyVolts: lifepo4CellEmptyVolts,
  },
  'lead-acid': {
    nominalVolts: leadAcidCellNominalVolts,
    fullVolts: leadAcidCellFullVolts,
    emptyVolts: leadAcidCellEmptyVolts,
  },
};

/**
 * A pack's nominal, full-charge and empty voltages, V: the cell's voltages × cells in series (cells in series add
 * their voltages). Cell figures: lithium polymer 3.7 / 4.2 / 3.0, lithium-ion 3.6 / 4.2 / 2.5, LiFePO₄ 3.2 / 3.65 /
 * 2.5, lead-acid 2.0 / 2.4 / 1.75 (common practice and maker datasheets, from memory; see `constants/station.ts`).
 * @example packVolts('lipo', 3) // { nominalVolts: 11.1, fullVolts: 12.6, emptyVolts: 9 }
 * @example packVolts('lifepo4', 4) // { nominalVolts: 12.8, fullVolts: 14.6, emptyVolts: 10 }
 */
export function packVolts(chemistry: BatteryChemistry, cellsInSeries: number): PackVolts {
  if (!Number.isInteger(cellsInSeries) || cellsInSeries < 1) {
    throw new RangeError(`Cells in series must be a whole number from 1, got ${cellsInSeries}`);
  }
  const cell = cellVoltsByChemistry[chemistry];
  return {
    nominalVolts: cell.nominalVolts * cellsInSeries,
    fullVolts: cell.fullVolts * cellsInSeries,
    emptyVolts: cell.emptyVolts * cellsInSeries,
  };
}

/**
 * A pack's rated energy, Wh: rated Ah × nominal pack volts (the IATA Lithium Battery Guidance Document's Wh = Ah × V).
 * @example packRatedWh({ chemistry: 'lifepo4', cellsInSeries: 4, capacityAh: 6 }) // 76.8
 */
export function packRatedWh(battery: {
  chemistry: BatteryChemistry;
  cellsInSeries: number;
  capacityAh: number;
}): number {
  return battery.capacityAh * packVolts(battery.chemistry, battery.cellsInSeries).nominalVolts;
}
