import { requireInRange } from '../errors/require-finite.js';

// Meinshausen et al. (2020), Table 3 (AR6 Table 7.SM.1); see meinshausen2020-co2-forcing.ts.
const ch4Coefficient = -8.9603e-5; // a₃, W m⁻² ppb⁻¹
const n2oCoefficient = -1.2462e-4; // b₃, W m⁻² ppb⁻¹
const baseCoefficient = 0.045194; // d₃, W m⁻² ppb^(−1/2)

/** Inputs of {@link meinshausen2020Ch4Forcing}, concentrations in ppb. */
export interface Meinshausen2020Ch4Inputs {
  readonly ch4: number;
  readonly ch4Reference: number;
  /** N, current N2O. */
  readonly n2o: number;
}

/**
 * Stratospheric-adjusted radiative forcing of CH4 by Meinshausen et al. (2020).
 *
 * Formula: ΔF = (a₃ √M + b₃ √N + d₃)(√M − √M₀)
 *
 * @returns ΔF (SARF) in W/m²; multiply by 0.86 for the AR6 ERF
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * meinshausen2020Ch4Forcing({ ch4: 1866.3, ch4Reference: 729.2, n2o: 332.1 }) // ≈ 0.633
 * @see Meinshausen2020 (Table 3), Smith2021 (7.SM.1.3.1)
 */
export function meinshausen2020Ch4Forcing({
  ch4,
  ch4Reference,
  n2o,
}: Meinshausen2020Ch4Inputs): number {
  requireInRange(ch4, 'ch4', Number.MIN_VALUE, 1e7, 'meinshausen2020Ch4Forcing', 'ppb');
  requireInRange(
    ch4Reference,
    'ch4Reference',
    Number.MIN_VALUE,
    1e7,
    'meinshausen2020Ch4Forcing',
    'ppb',
  );
  requireInRange(n2o, 'n2o', 0, 1e7, 'meinshausen2020Ch4Forcing', 'ppb');
  return (
    (ch4Coefficient * Math.sqrt(ch4) + n2oCoefficient * Math.sqrt(n2o) + baseCoefficient) *
    (Math.sqrt(ch4) - Math.sqrt(ch4Reference))
  );
}
