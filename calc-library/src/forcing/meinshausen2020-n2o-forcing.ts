import { requireInRange } from '../errors/require-finite.js';

// Meinshausen et al. (2020), Table 3 (AR6 Table 7.SM.1); see meinshausen2020-co2-forcing.ts.
const co2Coefficient = -3.4197e-4; // a₂, W m⁻² ppm^(−1/2) ppb^(−1/2)
const n2oCoefficient = 2.5455e-4; // b₂, W m⁻² ppb⁻¹
const ch4Coefficient = -2.4357e-4; // c₂, W m⁻² ppb⁻¹
const baseCoefficient = 0.12173; // d₂, W m⁻² ppb^(−1/2)

/** Inputs of {@link meinshausen2020N2oForcing}. */
export interface Meinshausen2020N2oInputs {
  /** N and N₀, in ppb. */
  readonly n2o: number;
  readonly n2oReference: number;
  /** C, current CO2, in ppm. */
  readonly co2: number;
  /** M, current CH4, in ppb. */
  readonly ch4: number;
}

/**
 * Stratospheric-adjusted radiative forcing of N2O by Meinshausen et al. (2020).
 *
 * Formula: ΔF = (a₂ √C + b₂ √N + c₂ √M + d₂)(√N − √N₀)
 *
 * @returns ΔF (SARF) in W/m²; multiply by 1.07 for the AR6 ERF
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * meinshausen2020N2oForcing({ n2o: 332.1, n2oReference: 270.1, co2: 409.9, ch4: 1866.3 }) // ≈ 0.195
 * @see Meinshausen2020 (Table 3), Smith2021 (7.SM.1.3.1)
 */
export function meinshausen2020N2oForcing({
  n2o,
  n2oReference,
  co2,
  ch4,
}: Meinshausen2020N2oInputs): number {
  requireInRange(n2o, 'n2o', Number.MIN_VALUE, 1e7, 'meinshausen2020N2oForcing', 'ppb');
  requireInRange(
    n2oReference,
    'n2oReference',
    Number.MIN_VALUE,
    1e7,
    'meinshausen2020N2oForcing',
    'ppb',
  );
  requireInRange(co2, 'co2', 0, 1e6, 'meinshausen2020N2oForcing', 'ppm');
  requireInRange(ch4, 'ch4', 0, 1e7, 'meinshausen2020N2oForcing', 'ppb');
  return (
    (co2Coefficient * Math.sqrt(co2) +
      n2oCoefficient * Math.sqrt(n2o) +
      ch4Coefficient * Math.sqrt(ch4) +
      baseCoefficient) *
    (Math.sqrt(n2o) - Math.sqrt(n2oReference))
  );
}
