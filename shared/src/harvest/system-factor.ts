import {
  panelDustLossShare,
  panelLabelOptimismLossShare,
  panelMismatchLossShare,
  panelWiringLossShare,
  usbPanelRegulatorEfficiency,
} from '../constants/electrical.js';

/**
 * The named component losses between a panel's label and the energy at its port (each 0–1). They are multiplied,
 * as PVWatts combines its loss categories (Dobos, PVWatts Version 5 Manual, NREL/TP-6A20-62641, 2014, eq. 4):
 * factor = regulator efficiency × Π (1 − loss share). Each default has its own source in `constants/electrical.ts`;
 * none is tuned to a field result.
 */
export interface PanelSystemLosses {
  /** Efficiency of the panel's built-in USB regulator (0–1); default 0.88 (from memory). */
  regulatorEfficiency: number;
  /** Cell and panel mismatch loss (0–1); default 0.02 (PVWatts). */
  mismatchLossShare: number;
  /** Dust and dirt loss (0–1); default 0.02 (PVWatts soiling). */
  dustLossShare: number;
  /** Wiring and cable loss (0–1); default 0.02 (PVWatts DC wiring). */
  wiringLossShare: number;
  /** Share by which the label overstates the panel at STC (0–1); default 0.10 (from memory). */
  labelOptimismLossShare: number;
}

/** The default losses of a USB panel. */
export const defaultUsbPanelLosses: Readonly<PanelSystemLosses> = {
  regulatorEfficiency: usbPanelRegulatorEfficiency,
  mismatchLossShare: panelMismatchLossShare,
  dustLossShare: panelDustLossShare,
  wiringLossShare: panelWiringLossShare,
  labelOptimismLossShare: panelLabelOptimismLossShare,
};

/**
 * The residual system factor (0–1) from named losses.
 * @example panelSystemFactor(defaultUsbPanelLosses) // 0.88 × 0.98³ × 0.90 ≈ 0.745
 */
export function panelSystemFactor(losses: Readonly<PanelSystemLosses> = defaultUsbPanelLosses): number {
  return (
    losses.regulatorEfficiency *
    (1 - losses.mismatchLossShare) *
    (1 - losses.dustLossShare) *
    (1 - losses.wiringLossShare) *
    (1 - losses.labelOptimismLossShare)
  );
}
