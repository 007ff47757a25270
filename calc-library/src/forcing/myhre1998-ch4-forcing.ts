import { requireInRange } from '../errors/require-finite.js';
import { methaneNitrousOxideOverlap } from './methane-nitrous-oxide-overlap.js';

// α = 0.036 W m⁻² ppb^(−1/2) (Myhre et al. 1998, Table 3; IPCC TAR Table 6.2).
const ch4SquareRootCoefficient = 0.036;

/** Inputs of {@link myhre1998Ch4Forcing}, concentrations in ppb. */
export interface Myhre1998Ch4Inputs {
  readonly ch4: number;
  readonly ch4Reference: number;
  /** N₀, the reference N2O concentration, at which the overlap is taken. */
  readonly n2oReference: number;
}

/**
 * Radiative forcing of a change of CH4 by the simplified expression of Myhre et al. (1998),
 * with the CH4–N2O overlap taken at the reference N2O.
 *
 * Formula: ΔF = 0.036 (√M − √M₀) − [f(M, N₀) − f(M₀, N₀)]
 *
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * myhre1998Ch4Forcing({ ch4: 1745, ch4Reference: 700, n2oReference: 270 }) // ≈ 0.48
 * @see Myhre1998 (Table 3), Ramaswamy2001 (Table 6.2)
 */
export function myhre1998Ch4Forcing({
  ch4,
  ch4Reference,
  n2oReference,
}: Myhre1998Ch4Inputs): number {
  requireInRange(ch4, 'ch4', Number.MIN_VALUE, 1e7, 'myhre1998Ch4Forcing', 'ppb');
  requireInRange(ch4Reference, 'ch4Reference', Number.MIN_VALUE, 1e7, 'myhre1998Ch4Forcing', 'ppb');
  requireInRange(n2oReference, 'n2oReference', Number.MIN_VALUE, 1e7, 'myhre1998Ch4Forcing', 'ppb');
  return (
    ch4SquareRootCoefficient * (Math.sqrt(ch4) - Math.sqrt(ch4Reference)) -
    (methaneNitrousOxideOverlap(ch4, n2oReference) -
      methaneNitrousOxideOverlap(ch4Reference, n2oReference))
  );
}
