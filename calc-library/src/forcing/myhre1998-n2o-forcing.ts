import { requireInRange } from '../errors/require-finite.js';
import { methaneNitrousOxideOverlap } from './methane-nitrous-oxide-overlap.js';

// α = 0.12 W m⁻² ppb^(−1/2) (Myhre et al. 1998, Table 3; IPCC TAR Table 6.2).
const n2oSquareRootCoefficient = 0.12;

/** Inputs of {@link myhre1998N2oForcing}, concentrations in ppb. */
export interface Myhre1998N2oInputs {
  readonly n2o: number;
  readonly n2oReference: number;
  /** M₀, the reference CH4 concentration, at which the overlap is taken. */
  readonly ch4Reference: number;
}

/**
 * Radiative forcing of a change of N2O by the simplified expression of Myhre et al. (1998),
 * with the CH4–N2O overlap taken at the reference CH4.
 *
 * Formula: ΔF = 0.12 (√N − √N₀) − [f(M₀, N) − f(M₀, N₀)]
 *
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * myhre1998N2oForcing({ n2o: 314, n2oReference: 270, ch4Reference: 700 }) // ≈ 0.146
 * @see Myhre1998 (Table 3), Ramaswamy2001 (Table 6.2)
 */
export function myhre1998N2oForcing({
  n2o,
  n2oReference,
  ch4Reference,
}: Myhre1998N2oInputs): number {
  requireInRange(n2o, 'n2o', Number.MIN_VALUE, 1e7, 'myhre1998N2oForcing', 'ppb');
  requireInRange(n2oReference, 'n2oReference', Number.MIN_VALUE, 1e7, 'myhre1998N2oForcing', 'ppb');
  requireInRange(ch4Reference, 'ch4Reference', Number.MIN_VALUE, 1e7, 'myhre1998N2oForcing', 'ppb');
  return (
    n2oSquareRootCoefficient * (Math.sqrt(n2o) - Math.sqrt(n2oReference)) -
    (methaneNitrousOxideOverlap(ch4Reference, n2o) -
      methaneNitrousOxideOverlap(ch4Reference, n2oReference))
  );
}
