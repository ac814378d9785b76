import {
  annealedCopperResistivityOhmM,
  annealedCopperTempCoeffPerC,
  awg36DiameterMm,
  awgDiameterRatio,
  awgStepsPerRatio,
  copperReferenceTemperatureC,
} from '../constants/station.js';

/**
 * Diameter of a solid round wire of an AWG gauge, mm: d = 0.127 mm × 92^((36 − n) / 39) (ASTM B258). Gauges 0 to 40;
 * 1/0 and heavier are written as 0, −1, … and not modelled here.
 * @example awgDiameterMm(12) // ≈ 2.053
 */
export function awgDiameterMm(gaugeAwg: number): number {
  if (!Number.isInteger(gaugeAwg) || gaugeAwg < 0 || gaugeAwg > 40) {
    throw new RangeError(`AWG gauge must be a whole number from 0 to 40, got ${gaugeAwg}`);
  }
  return awg36DiameterMm * awgDiameterRatio ** ((36 - gaugeAwg) / awgStepsPerRatio);
}

/**
 * Cross-sectional area of a solid AWG wire, mm²: π d² / 4.
 * @example awgAreaMm2(12) // ≈ 3.309
 */
export function awgAreaMm2(gaugeAwg: number): number {
  const d = awgDiameterMm(gaugeAwg);
  return (Math.PI * d * d) / 4;
}

/**
 * Resistance of annealed copper wire of an AWG gauge, Ω/km: ρ / A with ρ = 1.7241 × 10⁻⁸ Ω·m at 20 °C (100 % IACS,
 * IEC 60028), corrected to another temperature by R = R₂₀ × (1 + 0.00393 × (T − 20 °C)) (IEC 60028). Limits: solid
 * wire; stranded wire of the same gauge is a few % higher (lay of the strands), tinned copper a little more.
 * @example copperResistanceOhmPerKm(12) // ≈ 5.21
 */
export function copperResistanceOhmPerKm(gaugeAwg: number, conductorTempC = copperReferenceTemperatureC): number {
  const areaM2 = awgAreaMm2(gaugeAwg) * 1e-6;
  const at20OhmPerM = annealedCopperResistivityOhmM / areaM2;
  return at20OhmPerM * 1000 * (1 + annealedCopperTempCoeffPerC * (conductorTempC - copperReferenceTemperatureC));
}
