import { equilibriumWarming, type SensitivityScalingInputs } from './equilibrium-warming.js';

/**
 * Warming at the time a forcing has been ramped up over about 70 years, scaled from the
 * transient climate response (TCR, the warming when CO2 doubles at 1 % a year). The same
 * linear scaling as the equilibrium case with TCR in place of ECS; it holds only for a
 * forcing that grew at a similar pace.
 *
 * Formula: ΔT = TCR × ΔF / F₂ₓ
 *
 * @param inputs `sensitivity` is the TCR, in K
 * @returns ΔT in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * transientWarming({ forcing: 3.93, sensitivity: 1.8, doublingForcing: 3.93 }) // => 1.8
 * @see Forster2021 (section 7.5)
 */
export function transientWarming(inputs: SensitivityScalingInputs): number {
  return equilibriumWarming(inputs);
}
