import { requireInRange } from '../errors/require-finite.js';

// Etminan et al. (2016), Table 1, CH4 row.
const ch4Coefficient = -1.3e-6; // a₃, W m⁻² ppb⁻¹
const n2oCoefficient = -8.2e-6; // b₃, W m⁻² ppb⁻¹
const squareRootCoefficient = 0.043; // W m⁻² ppb^(−1/2)

/** Inputs of {@link etminan2016Ch4Forcing}, concentrations in ppb. */
export interface Etminan2016Ch4Inputs {
  readonly ch4: number;
  readonly ch4Reference: number;
  readonly n2o: number;
  readonly n2oReference: number;
}

/**
 * Stratospheric-adjusted radiative forcing of CH4 by Etminan et al. (2016), which adds the
 * shortwave absorption of methane (about 25 % more than Myhre et al. 1998 today). Fitted
 * for 340–3500 ppb CH4.
 *
 * Formula: ΔF = (a₃ M̄ + b₃ N̄ + 0.043)(√M − √M₀), M̄ = (M + M₀)/2, N̄ = (N + N₀)/2
 *
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * etminan2016Ch4Forcing({ ch4: 1803, ch4Reference: 722, n2o: 324, n2oReference: 270 }) // ≈ 0.61
 * @see Etminan2016 (Table 1)
 */
export function etminan2016Ch4Forcing({
  ch4,
  ch4Reference,
  n2o,
  n2oReference,
}: Etminan2016Ch4Inputs): number {
  requireInRange(ch4, 'ch4', Number.MIN_VALUE, 1e7, 'etminan2016Ch4Forcing', 'ppb');
  requireInRange(
    ch4Reference,
    'ch4Reference',
    Number.MIN_VALUE,
    1e7,
    'etminan2016Ch4Forcing',
    'ppb',
  );
  requireInRange(n2o, 'n2o', Number.MIN_VALUE, 1e7, 'etminan2016Ch4Forcing', 'ppb');
  requireInRange(
    n2oReference,
    'n2oReference',
    Number.MIN_VALUE,
    1e7,
    'etminan2016Ch4Forcing',
    'ppb',
  );
  const meanCh4 = (ch4 + ch4Reference) / 2;
  const meanN2o = (n2o + n2oReference) / 2;
  return (
    (ch4Coefficient * meanCh4 + n2oCoefficient * meanN2o + squareRootCoefficient) *
    (Math.sqrt(ch4) - Math.sqrt(ch4Reference))
  );
}
