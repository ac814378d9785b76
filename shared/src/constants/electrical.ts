/**
 * Electrical constants of the engine (harvest, storage, demand, cautions), each with its unit in the name
 * and its source. Values marked `from memory` are recalled figures of the trade, not a cited measurement;
 * `common practice` marks a rule of the trade with no single published source.
 */

/** Irradiance at Standard Test Conditions, W/m² (IEC 60904-3 reference spectrum; IEC 61215 STC: 1000 W/m², 25 °C, AM1.5). */
export const stcIrradianceWm2 = 1000;

/** Cell temperature at Standard Test Conditions, °C (IEC 61215 STC). */
export const stcCellTemperatureC = 25;

/**
 * Default power temperature coefficient of crystalline silicon, %/°C. Typical datasheet values are −0.35 to
 * −0.45 %/°C (Duffie & Beckman, 4th ed., §23.2; from memory); −0.4 is the middle.
 */
export const defaultPanelTempCoeffPctPerC = -0.4;

/**
 * Efficiency of the small buck regulator inside a USB panel's junction box (panel ~6 V → 5 V USB), share 0–1.
 * Small synchronous buck regulators at 1–2 A typically reach 85–92 % (from memory, typical buck-regulator
 * datasheet efficiency curves).
 */
export const usbPanelRegulatorEfficiency = 0.88;

/**
 * Loss share from mismatch between cells and panels wired together. PVWatts default mismatch loss 2 %
 * (Dobos, PVWatts Version 5 Manual, NREL/TP-6A20-62641, 2014, table 3).
 */
export const panelMismatchLossShare = 0.02;

/**
 * Loss share from dust and dirt on the panel's face. PVWatts default soiling loss 2 % (Dobos, PVWatts Version 5
 * Manual, NREL/TP-6A20-62641, 2014, table 3).
 */
export const panelDustLossShare = 0.02;

/**
 * Loss share in the panel's own wiring and cable to the store. PVWatts default DC wiring loss 2 % (Dobos,
 * PVWatts Version 5 Manual, NREL/TP-6A20-62641, 2014, table 3).
 */
export const panelWiringLossShare = 0.02;

/**
 * Loss share by which a portable panel's label overstates what it delivers at STC. PVWatts' nameplate loss is 1 %
 * for utility modules (Dobos 2014, table 3); folding portable panels are commonly found 5–15 % under their label
 * in independent tests (from memory) — 10 % is used.
 */
export const panelLabelOptimismLossShare = 0.1;

/** Nominal lithium-ion cell voltage a bank's mAh rating usually refers to, V (common practice: 3.6–3.7 V). */
export const defaultBankCellVolts = 3.7;

/** Lowest nominal cell voltage accepted for a bank's mAh rating, V (Li-ion nominal 3.6 V, common practice). */
export const minBankCellVolts = 3.6;

/** Highest nominal cell voltage accepted for a bank's mAh rating, V (Li-ion/LiPo nominal 3.7 V, common practice). */
export const maxBankCellVolts = 3.7;

/** USB default bus voltage, V (USB 2.0 / USB Type-C specifications: VBUS 5 V nominal). */
export const usbBusVolts = 5;

/** Fixed USB Power Delivery voltages, V (USB Power Delivery Specification rev. 3.x, fixed supply PDOs). */
export const usbPdFixedVolts = [5, 9, 12, 15, 20] as const;

/**
 * Lowest temperature at which lithium cells may be charged, °C. Lithium-ion cells must not be charged below
 * 0 °C (lithium plating); cell makers' datasheets give 0–45 °C as the charge range (common practice).
 */
export const lithiumMinChargeTemperatureC = 0;

/**
 * Air temperature above which a lithium bank left in the sun is at risk, °C. Cell makers give 45 °C as the top of
 * the charge range and ~60 °C for storage (common practice); a bank in direct sun runs well above air temperature.
 */
export const lithiumHeatCautionAirTemperatureC = 35;

/**
 * Lithium-ion battery energy above which a passenger needs the airline's approval, Wh (IATA Lithium Battery
 * Guidance Document, passenger provisions: over 100 Wh and up to 160 Wh with operator approval).
 */
export const airlineApprovalAboveWh = 100;

/** Lithium-ion battery energy above which passengers may not carry it, Wh (IATA Lithium Battery Guidance Document). */
export const airlineForbiddenAboveWh = 160;

/**
 * Default reserve share of storage the user never wants to go below (0–1). A planning choice, not a physical
 * constant: 10 % keeps a margin for the estimate's error (common practice).
 */
export const defaultReserveShare = 0.1;

/**
 * Relative tolerance for "keeps up": stored energy at the start of the last day at least that at the start of the
 * first day within 1 % (the product's verdict definition).
 */
export const keepsUpToleranceShare = 0.01;

/** Energy below which a shortfall is treated as float noise, Wh. */
export const energyEpsilonWh = 1e-9;
