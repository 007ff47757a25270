import { requireInRange } from '../errors/require-finite.js';

/**
 * Warming with no feedback but the Planck response: the planet only radiates more as it
 * warms, with nothing (water vapour, ice, clouds) amplifying or damping.
 *
 * Formula: ΔT₀ = −ΔF / λ_P
 *
 * @param forcing ΔF in W/m² (−50 to 50)
 * @param planckFeedback λ_P in W m⁻² K⁻¹, negative (−10 to −0.5)
 * @returns ΔT₀ in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * planckResponse(3.93, -3.22) // ≈ 1.2205
 * @see Forster2021 (Table 7.10)
 */
export function planckResponse(forcing: number, planckFeedback: number): number {
  requireInRange(forcing, 'forcing', -50, 50, 'planckResponse', 'W/m^2');
  requireInRange(planckFeedback, 'planckFeedback', -10, -0.5, 'planckResponse', 'W/m^2/K');
  return -forcing / planckFeedback;
}
