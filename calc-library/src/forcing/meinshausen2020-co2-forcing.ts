import { requireInRange } from '../errors/require-finite.js';

// Meinshausen et al. (2020), Table 3 (the coefficients AR6 uses, 7.SM.1.3.1 and
// Table 7.SM.1). Recalled from memory and checked against a published implementation of
// the same expressions; the tests reproduce AR6 Table 7.8.
const quadraticCoefficient = -2.4785e-7; // a₁, W m⁻² ppm⁻²
const linearCoefficient = 7.5906e-4; // b₁, W m⁻² ppm⁻¹
const n2oCoefficient = -2.1492e-3; // c₁, W m⁻² ppb^(−1/2)
const baseCoefficient = 5.2488; // d₁, W m⁻²

/** Inputs of {@link meinshausen2020Co2Forcing}. */
export interface Meinshausen2020Co2Inputs {
  /** C, in ppm. */
  readonly co2: number;
  /** C₀, in ppm. */
  readonly co2Reference: number;
  /** N, current N2O, in ppb. */
  readonly n2o: number;
}

/**
 * Stratospheric-adjusted radiative forcing of CO2 by the Meinshausen et al. (2020) refit of
 * Etminan et al. (2016), which stays well behaved above 2000 ppm: the quadratic saturates at
 * C_α,max = C₀ − b₁/(2a₁) (about 1808 ppm for C₀ = 278 ppm).
 *
 * Formula: ΔF = (α′ + c₁ √N) ln(C/C₀); α′ = d₁ + a₁ (C − C₀)² + b₁ (C − C₀) for
 * C₀ < C < C_α,max, d₁ − b₁²/(4a₁) above, d₁ below C₀
 *
 * @returns ΔF (SARF) in W/m²; multiply by 1.05 for the AR6 ERF
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * meinshausen2020Co2Forcing({ co2: 409.9, co2Reference: 278.3, n2o: 332.1 }) // ≈ 2.054
 * @see Meinshausen2020 (Table 3), Smith2021 (7.SM.1.3.1)
 */
export function meinshausen2020Co2Forcing({
  co2,
  co2Reference,
  n2o,
}: Meinshausen2020Co2Inputs): number {
  requireInRange(co2, 'co2', Number.MIN_VALUE, 1e6, 'meinshausen2020Co2Forcing', 'ppm');
  requireInRange(
    co2Reference,
    'co2Reference',
    Number.MIN_VALUE,
    1e6,
    'meinshausen2020Co2Forcing',
    'ppm',
  );
  requireInRange(n2o, 'n2o', 0, 1e7, 'meinshausen2020Co2Forcing', 'ppb');
  const saturationConcentration = co2Reference - linearCoefficient / (2 * quadraticCoefficient);
  let alphaPrime: number;
  if (co2 <= co2Reference) {
    alphaPrime = baseCoefficient;
  } else if (co2 < saturationConcentration) {
    const change = co2 - co2Reference;
    alphaPrime = baseCoefficient + quadraticCoefficient * change ** 2 + linearCoefficient * change;
  } else {
    alphaPrime = baseCoefficient - linearCoefficient ** 2 / (4 * quadraticCoefficient);
  }
  return (alphaPrime + n2oCoefficient * Math.sqrt(n2o)) * Math.log(co2 / co2Reference);
}
