import { requireInRange } from '../errors/require-finite.js';

/** Inputs of {@link equilibriumWarming}. */
export interface SensitivityScalingInputs {
  /** ΔF, a sustained forcing, in W/m² (−50 to 50). */
  readonly forcing: number;
  /** S, warming for a doubling of CO2 (ECS or TCR), in K (0–20). */
  readonly sensitivity: number;
  /** F₂ₓ, forcing of a doubling of CO2, in W/m² (0.1–20). */
  readonly doublingForcing: number;
}

/**
 * Warming for a forcing, scaled from a climate sensitivity defined for doubled CO2: the
 * linear forcing–feedback model, ΔT = ΔF / λ with λ = F₂ₓ / S. With S = ECS this is the
 * equilibrium warming, once the ocean has caught up (centuries).
 *
 * Formula: ΔT = S × ΔF / F₂ₓ
 *
 * @returns ΔT in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * equilibriumWarming({ forcing: 3.93, sensitivity: 3, doublingForcing: 3.93 }) // => 3
 * @see Forster2021 (section 7.5 and Box 7.1)
 */
export function equilibriumWarming({
  forcing,
  sensitivity,
  doublingForcing,
}: SensitivityScalingInputs): number {
  requireInRange(forcing, 'forcing', -50, 50, 'equilibriumWarming', 'W/m^2');
  requireInRange(sensitivity, 'sensitivity', 0, 20, 'equilibriumWarming', 'K');
  requireInRange(doublingForcing, 'doublingForcing', 0.1, 20, 'equilibriumWarming', 'W/m^2');
  return (sensitivity * forcing) / doublingForcing;
}
