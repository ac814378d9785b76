/**
 * Constants of the 12 V station (battery packs by chemistry, charge controllers, 12 V panels, DC leads and fuses),
 * each with its unit in its name and its source. `common practice` marks a rule of the trade with no single
 * published source; `from memory` marks a figure recalled from the cited work rather than copied from it.
 */

/** Battery chemistries of a 12 V station pack: lithium polymer, lithium-ion, lithium iron phosphate, lead-acid. */
export const batteryChemistries = ['lipo', 'li-ion', 'lifepo4', 'lead-acid'] as const;
export type BatteryChemistry = (typeof batteryChemistries)[number];

/** The lithium chemistries (protection circuit, no charging below 0 °C). */
export const lithiumChemistries: readonly BatteryChemistry[] = ['lipo', 'li-ion', 'lifepo4'];

// ── Cell voltages ───────────────────────────────────────────────────────────────────────────────────────────────

/**
 * Lithium-polymer (LiCoO₂ class) cell voltages, V: nominal 3.7, end of charge 4.2, cut-off 3.0. Cell makers rate
 * these cells 3.7 V nominal and charge them to 4.2 V by constant current then constant voltage; 3.0 V is the usual
 * floor below which they are damaged (common practice).
 */
export const lipoCellNominalVolts = 3.7;
export const lipoCellFullVolts = 4.2;
export const lipoCellEmptyVolts = 3.0;

/**
 * Lithium-ion (cylindrical NCA/NMC) cell voltages, V: nominal 3.6, end of charge 4.2, discharge cut-off 2.5
 * (18650 cell datasheets: 3.6 V nominal, 4.2 V charge, 2.5 V end of discharge — from memory).
 */
export const liIonCellNominalVolts = 3.6;
export const liIonCellFullVolts = 4.2;
export const liIonCellEmptyVolts = 2.5;

/**
 * Lithium iron phosphate cell voltages, V: nominal 3.2, end of charge 3.65, cut-off 2.5. A 4-cell pack is the
 * trade's "12.8 V" battery, charged to 14.6 V (common practice; LiFePO₄ cell datasheets give 3.2 V nominal,
 * 3.65 V charge and 2.0–2.5 V cut-off — from memory).
 */
export const lifepo4CellNominalVolts = 3.2;
export const lifepo4CellFullVolts = 3.65;
export const lifepo4CellEmptyVolts = 2.5;

/**
 * Lead-acid cell voltages, V: nominal 2.0; end of charge 2.4 (absorption for cyclic use of sealed lead-acid,
 * 2.40–2.45 V/cell at 25 °C on maker datasheets — from memory); end of discharge 1.75 (the usual end voltage at
 * the 20-hour rate; Linden & Reddy, Handbook of Batteries, 3rd ed., ch. 23–24 — from memory).
 * "Full" is the highest voltage the terminals reach while charging, which is what a radio run live sees; a
 * rested full 12 V pack reads about 12.7 V (2.12 V/cell, common practice).
 */
export const leadAcidCellNominalVolts = 2.0;
export const leadAcidCellFullVolts = 2.4;
export const leadAcidCellEmptyVolts = 1.75;

// ── Usable share (depth of discharge) ───────────────────────────────────────────────────────────────────────────

/**
 * Share of a lead-acid battery's rating that is used, 0–1: drained only to about half, as deeper cycles shorten
 * its life sharply (common practice).
 */
export const leadAcidUsableShare = 0.5;

/** Share of a LiFePO₄ battery's rating that is used, 0–1: it can be drained nearly flat (common practice: 80–100 %). */
export const lifepo4UsableShare = 0.9;

/**
 * Share of a lithium-polymer or lithium-ion pack's rating that is used, 0–1: the last part of the discharge curve
 * falls steeply toward the cut-off, and stopping near 20 % spares the cells (common practice).
 */
export const lipoUsableShare = 0.8;
export const liIonUsableShare = 0.8;

// ── Capacity against discharge rate (Peukert) ───────────────────────────────────────────────────────────────────

/** Hours over which a lead-acid battery's capacity is rated, h: the 20-hour rate (C20) of maker datasheets (common practice). */
export const leadAcidRatedHours = 20;

/**
 * Peukert exponent of a sealed (AGM or gel) lead-acid battery, dimensionless. Values quoted for sealed lead-acid
 * are 1.1–1.25 (from memory); 1.15 reproduces the 10-hour and 5-hour capacities of a typical 12 V 7 Ah sealed
 * lead-acid rate table (7.0 Ah at 20 h, 6.5 Ah at 10 h, 5.95 Ah at 5 h — from memory) within 3 %. A maker's rate
 * table gives a better one: `peukertExponentFromRates`.
 */
export const sealedLeadAcidPeukertExponent = 1.15;

/**
 * Peukert exponent used for lithium packs, dimensionless: 1, i.e. no rate loss. Lithium cells hold close to their
 * rating at the currents a radio draws (exponents of about 1.02–1.05 are quoted, common practice).
 */
export const lithiumPeukertExponent = 1;

// ── Charge and discharge rates ─────────────────────────────────────────────────────────────────────────────────

/** Typical charge rate of a lithium-polymer pack when the maker gives none, C (common practice: 1C). */
export const lipoTypicalChargeCRate = 1;

/** Typical charge rate of a lithium-ion pack when the maker gives none, C (common practice: 0.5C standard charge). */
export const liIonTypicalChargeCRate = 0.5;

/** Typical charge rate of a LiFePO₄ pack when the maker gives none, C (common practice: 0.5C). */
export const lifepo4TypicalChargeCRate = 0.5;

/**
 * Typical charge rate of a lead-acid battery when the maker gives none, C (common practice: C/10; sealed lead-acid
 * datasheets allow an initial current of up to 0.25–0.3C — from memory).
 */
export const leadAcidTypicalChargeCRate = 0.1;

/**
 * Lowest temperature at which a lead-acid battery may be charged, °C, and the most it may take below freezing, C.
 * Battery University, BU-410 "Charging at High and Low Temperatures": lead-acid charges from −20 °C to 50 °C, at
 * 0.3C or less below freezing (from memory). A discharged lead-acid battery can freeze; keep it charged in the cold.
 */
export const leadAcidMinChargeTemperatureC = -20;
export const leadAcidColdChargeMaxCRate = 0.3;

// ── Radio supply window ────────────────────────────────────────────────────────────────────────────────────────

/** Nominal supply of a mobile or portable radio, V (13.8 V, the float voltage of a 12 V lead-acid system; common practice). */
export const radioNominalSupplyVolts = 13.8;

/**
 * Supply tolerance radio makers commonly state, share 0–1: "13.8 V DC ± 15 %", i.e. about 11.7–15.9 V (common
 * practice). Used only when the radio's own limits are not given.
 */
export const radioSupplyToleranceShare = 0.15;

// ── 12 V panels and controllers ────────────────────────────────────────────────────────────────────────────────

/**
 * Default temperature coefficient of a crystalline-silicon panel's open-circuit voltage, %/°C. Datasheets give
 * −0.27 to −0.35 %/°C (from memory); −0.3 is the middle.
 */
export const defaultPanelVocTempCoeffPctPerC = -0.3;

/** Default efficiency of a small MPPT charge controller, share 0–1 (common practice: 93–97 % on datasheets). */
export const defaultMpptEfficiency = 0.95;

// ── Copper wire ────────────────────────────────────────────────────────────────────────────────────────────────

/**
 * AWG diameter formula constants: d(n) = 0.127 mm × 92^((36 − n) / 39). 36 AWG is 0.005 in (0.127 mm), 0000 AWG
 * is 0.46 in, and the 39 steps between them are a geometric series of ratio 92 (ASTM B258, Standard Specification
 * for Standard Nominal Diameters and Cross-Sectional Areas of AWG Sizes of Solid Round Wires Used as Electrical
 * Conductors).
 */
export const awg36DiameterMm = 0.127;
export const awgDiameterRatio = 92;
export const awgStepsPerRatio = 39;

/**
 * Resistivity of annealed copper at 20 °C, Ω·m: the International Annealed Copper Standard, 100 % IACS =
 * 1/58 Ω·mm²/m = 1.7241 × 10⁻⁸ Ω·m (IEC 60028, International standard of resistance for copper).
 */
export const annealedCopperResistivityOhmM = 1.7241e-8;

/** Temperature coefficient of resistance of annealed copper at 20 °C, 1/°C (IEC 60028: 0.00393). */
export const annealedCopperTempCoeffPerC = 0.00393;

/** Temperature at which copper resistivity is stated, °C (IEC 60028). */
export const copperReferenceTemperatureC = 20;

// ── Fuses ──────────────────────────────────────────────────────────────────────────────────────────────────────

/**
 * Standard ratings of automotive blade fuses, A (ISO 8820-3 blade fuse ratings — from memory).
 */
export const bladeFuseRatingsA = [1, 2, 3, 4, 5, 7.5, 10, 15, 20, 25, 30, 35, 40] as const;

/**
 * Factor by which a fuse rating exceeds the load's largest steady current, so the fuse does not blow on a long
 * transmission: 125 % of the continuous load (common practice, as for continuous loads in NFPA 70, NEC 210.20(A)
 * — from memory).
 */
export const fuseLoadMarginFactor = 1.25;

/**
 * Ampacity of a two-conductor flexible copper cord by AWG, A: NFPA 70 (National Electrical Code), Table 400.5(A)(1),
 * column B (two current-carrying conductors), at 30 °C ambient — from memory. Gauges thinner than 18 AWG are not in
 * the column, so no fuse is suggested for them from this table.
 */
export const cordAmpacityByAwgA: Readonly<Record<number, number>> = {
  18: 10,
  16: 13,
  14: 18,
  12: 25,
  10: 30,
  8: 40,
};

// ── 12 V packs as stores ───────────────────────────────────────────────────────────────────────────────────────

/**
 * Share of the energy put into a lithium pack (LiPo, Li-ion, LiFePO₄) that comes back out, 0–1: round-trip energy
 * efficiency of about 95 % at the gentle rates of a trip (common practice; maker datasheets give 92–98 %, from memory).
 */
export const lithiumPackRoundTripEfficiency = 0.95;

/**
 * Share of the energy put into a sealed lead-acid battery that comes back out, 0–1: about 80 % round trip (common
 * practice: 75–85 %, the charge's gassing and heat losses; from memory).
 */
export const leadAcidRoundTripEfficiency = 0.8;

/**
 * Voltage tolerance when a pack feeds a 12 V → USB adapter: the adapter class takes 10–15 V (the range the converter
 * schema allows), so a pack whose nominal voltage lies in it can feed one (common practice).
 */
export const twelveVoltAdapterInputMinVolts = 10;
export const twelveVoltAdapterInputMaxVolts = 15;
