import { requireInRange } from '../errors/require-finite.js';

// Etminan et al. (2016), Table 1, N2O row.
const co2Coefficient = -8.0e-6; // a₂, W m⁻² ppm⁻¹
const n2oCoefficient = 4.2e-6; // b₂, W m⁻² ppb⁻¹
const ch4Coefficient = -4.9e-6; // c₂, W m⁻² ppb⁻¹
const squareRootCoefficient = 0.117; // W m⁻² ppb^(−1/2)

/** Inputs of {@link etminan2016N2oForcing}. */
export interface Etminan2016N2oInputs {
  /** N and N₀, in ppb. */
  readonly n2o: number;
  readonly n2oReference: number;
  /** C and C₀, in ppm. */
  readonly co2: number;
  readonly co2Reference: number;
  /** M and M₀, in ppb. */
  readonly ch4: number;
  readonly ch4Reference: number;
}

/**
 * Stratospheric-adjusted radiative forcing of N2O by Etminan et al. (2016), with its
 * overlaps with CO2 and CH4. Fitted for 200–525 ppb N2O.
 *
 * Formula: ΔF = (a₂ C̄ + b₂ N̄ + c₂ M̄ + 0.117)(√N − √N₀), bars = means of current and reference
 *
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * etminan2016N2oForcing({ n2o: 324, n2oReference: 270, co2: 390.5, co2Reference: 278, ch4: 1803, ch4Reference: 722 })
 * // ≈ 0.17
 * @see Etminan2016 (Table 1)
 */
export function etminan2016N2oForcing({
  n2o,
  n2oReference,
  co2,
  co2Reference,
  ch4,
  ch4Reference,
}: Etminan2016N2oInputs): number {
  requireInRange(n2o, 'n2o', Number.MIN_VALUE, 1e7, 'etminan2016N2oForcing', 'ppb');
  requireInRange(
    n2oReference,
    'n2oReference',
    Number.MIN_VALUE,
    1e7,
    'etminan2016N2oForcing',
    'ppb',
  );
  requireInRange(co2, 'co2', Number.MIN_VALUE, 1e6, 'etminan2016N2oForcing', 'ppm');
  requireInRange(
    co2Reference,
    'co2Reference',
    Number.MIN_VALUE,
    1e6,
    'etminan2016N2oForcing',
    'ppm',
  );
  requireInRange(ch4, 'ch4', Number.MIN_VALUE, 1e7, 'etminan2016N2oForcing', 'ppb');
  requireInRange(
    ch4Reference,
    'ch4Reference',
    Number.MIN_VALUE,
    1e7,
    'etminan2016N2oForcing',
    'ppb',
  );
  const meanCo2 = (co2 + co2Reference) / 2;
  const meanN2o = (n2o + n2oReference) / 2;
  const meanCh4 = (ch4 + ch4Reference) / 2;
  return (
    (co2Coefficient * meanCo2 +
      n2oCoefficient * meanN2o +
      ch4Coefficient * meanCh4 +
      squareRootCoefficient) *
    (Math.sqrt(n2o) - Math.sqrt(n2oReference))
  );
}
