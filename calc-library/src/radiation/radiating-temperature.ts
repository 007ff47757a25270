import { stefanBoltzmannConstant } from '../constants/stefan-boltzmann-constant.js';
import { requireInRange } from '../errors/require-finite.js';

/**
 * Temperature of a gray body that emits a given flux (Stefan–Boltzmann law solved for T).
 *
 * Formula: T = (F / (ε σ))^(1/4)
 *
 * @param emittedFlux F, emitted flux, in W/m² (≥ 0)
 * @param emissivity ε, dimensionless (above 0, at most 1)
 * @returns T in K
 * @throws {CalcInputError} when the flux is negative or the emissivity out of range
 * @example
 * radiatingTemperature(238.175, 1) // ≈ 254.58
 * @see Tiesinga2021 (σ)
 */
export function radiatingTemperature(emittedFlux: number, emissivity = 1): number {
  requireInRange(emittedFlux, 'emittedFlux', 0, Number.MAX_VALUE, 'radiatingTemperature', 'W/m^2');
  requireInRange(emissivity, 'emissivity', Number.MIN_VALUE, 1, 'radiatingTemperature');
  return (emittedFlux / (emissivity * stefanBoltzmannConstant.value)) ** 0.25;
}
