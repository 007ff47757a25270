import { requireInRange } from '../errors/require-finite.js';

// α = 5.35 W/m² (Myhre et al. 1998, Table 3; IPCC TAR Table 6.2).
const co2LogarithmicCoefficient = 5.35;

/**
 * Radiative forcing of a change of CO2 by the simplified expression of Myhre et al. (1998),
 * used by IPCC TAR to AR5. It is a stratospheric-adjusted forcing, not an ERF.
 *
 * Formula: ΔF = 5.35 ln(C / C₀)
 *
 * @param co2 C, CO2 concentration, in ppm (> 0)
 * @param co2Reference C₀, reference CO2 concentration, in ppm (> 0)
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * myhre1998Co2Forcing(556, 278) // ≈ 3.708 (5.35 ln 2)
 * @see Myhre1998 (Table 3), Ramaswamy2001 (Table 6.2)
 */
export function myhre1998Co2Forcing(co2: number, co2Reference: number): number {
  requireInRange(co2, 'co2', Number.MIN_VALUE, 1e6, 'myhre1998Co2Forcing', 'ppm');
  requireInRange(co2Reference, 'co2Reference', Number.MIN_VALUE, 1e6, 'myhre1998Co2Forcing', 'ppm');
  return co2LogarithmicCoefficient * Math.log(co2 / co2Reference);
}
