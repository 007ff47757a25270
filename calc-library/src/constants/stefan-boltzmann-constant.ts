import { type PhysicalConstant } from './physical-constant.js';
import { boltzmannConstant, planckConstant, speedOfLight } from './si-defining-constants.js';

/**
 * The Stefan–Boltzmann constant from the SI defining constants.
 *
 * Formula: σ = 2 π⁵ k⁴ / (15 h³ c²)
 *
 * @param planck Planck constant h, in J s
 * @param boltzmann Boltzmann constant k, in J/K
 * @param lightSpeed speed of light c, in m/s
 * @returns σ in W m⁻² K⁻⁴
 * @example
 * stefanBoltzmannFromDefiningConstants(6.62607015e-34, 1.380649e-23, 299792458)
 * // => 5.6703744191844314e-8
 * @see Tiesinga2021 (CODATA 2018 gives σ = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴, exact)
 */
export function stefanBoltzmannFromDefiningConstants(
  planck: number,
  boltzmann: number,
  lightSpeed: number,
): number {
  return (2 * Math.PI ** 5 * boltzmann ** 4) / (15 * planck ** 3 * lightSpeed ** 2);
}

export const stefanBoltzmannConstant: PhysicalConstant = {
  key: 'stefan_boltzmann',
  name: 'Stefan–Boltzmann constant σ',
  value: stefanBoltzmannFromDefiningConstants(
    planckConstant.value,
    boltzmannConstant.value,
    speedOfLight.value,
  ),
  unit: 'W/(m^2 K^4)',
  uncertainty: { kind: 'exact' },
  source: 'Tiesinga2021',
  derivedFrom: [planckConstant.key, boltzmannConstant.key, speedOfLight.key],
  formula: 'σ = 2 π⁵ k⁴ / (15 h³ c²)',
  note: 'CODATA 2018 lists 5.670 374 419 × 10⁻⁸ W m⁻² K⁻⁴, exact (truncated as printed).',
};
